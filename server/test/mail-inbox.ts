import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { CapturedMail } from '@upwell/common';

/** Every message the app's local mailbox has stored in DATA_DIR/mail so far. */
export function capturedMail(dataDir: string): CapturedMail[] {
  let names: string[] = [];
  try {
    names = readdirSync(join(dataDir, 'mail'));
  } catch {
    return [];
  }
  return names.filter((n) => n.endsWith('.json')).map((n) => JSON.parse(readFileSync(join(dataDir, 'mail', n), 'utf8')) as CapturedMail);
}

/** Waits until a message to `to` matching `where` has arrived, and answers it. */
export async function mailTo(dataDir: string, to: string, where: (m: CapturedMail) => boolean = () => true, ms = 5000): Promise<CapturedMail> {
  const deadline = Date.now() + ms;
  for (;;) {
    const found = capturedMail(dataDir).find((m) => m.to.includes(to) && where(m));
    if (found) return found;
    if (Date.now() > deadline) throw new Error(`no mail to ${to} arrived`);
    await new Promise((r) => setTimeout(r, 25));
  }
}

/** The invitation token in a mail's text body (the link `${APP_URL}/invitations/<token>`). */
export function invitationToken(text: string): string {
  const m = /\/invitations\/([A-Za-z0-9_-]{43})\b/.exec(text);
  if (!m) throw new Error(`no invitation link in:\n${text}`);
  return m[1];
}
