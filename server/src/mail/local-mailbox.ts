import { Inject, Injectable, Logger, type OnModuleDestroy, type OnModuleInit } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { CapturedMail } from '@upwell/common';
import { simpleParser } from 'mailparser';
import { randomUUID } from 'node:crypto';
import { chmodSync, mkdirSync } from 'node:fs';
import { readdir, readFile, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { SMTPServer } from 'smtp-server';
import { APP_CONFIG, type AppConfig } from '../config/app-config';

/** Header with which the app tags a mail with the group it concerns, so the outbox can show it to that group's admins. */
export const GROUP_HEADER = 'X-Upwell-Group';

const ID = /^[0-9a-f-]{36}$/;

/**
 * The local mailbox: when SMTP_URL is unset, a real SMTP server
 * (smtp-server) listens on a loopback port inside the app and keeps each
 * message it receives in DATA_DIR/mail as the raw .eml and a small JSON record,
 * readable by the server's own user only (invitation links in them are
 * credentials). Nothing leaves the machine, and the invite flow still works end to end.
 */
@Injectable()
export class LocalMailbox implements OnModuleInit, OnModuleDestroy {
  private readonly logger = new Logger('LocalMailbox');
  private server: SMTPServer | null = null;
  private boundPort: number | null = null;
  private readonly dir: string;
  private readonly enabled: boolean;

  constructor(@Inject(ConfigService) config: ConfigService) {
    const app = config.getOrThrow<AppConfig>(APP_CONFIG);
    this.enabled = app.smtpUrl === null;
    this.dir = join(app.dataDir, 'mail');
  }

  /** Whether the local mailbox stands in for a real SMTP server. */
  get active(): boolean {
    return this.enabled;
  }

  /** The loopback port it listens on (once started). */
  get port(): number {
    if (this.boundPort === null) throw new Error('the local mailbox is not listening');
    return this.boundPort;
  }

  async onModuleInit(): Promise<void> {
    if (!this.enabled) return;
    mkdirSync(this.dir, { recursive: true, mode: 0o700 });
    // A folder made by an older version kept the umask's mode.
    chmodSync(this.dir, 0o700);
    const server = new SMTPServer({
      authOptional: true,
      // Loopback only, so no TLS: STARTTLS would need a certificate for nothing.
      disabledCommands: ['STARTTLS'],
      banner: 'Upwell local mailbox',
      size: 5 * 1024 * 1024,
      logger: false,
      onData: (stream, _session, callback) => {
        const chunks: Buffer[] = [];
        stream.on('data', (c: Buffer) => chunks.push(c));
        stream.on('end', () => {
          this.store(Buffer.concat(chunks)).then(
            () => callback(),
            (err: Error) => callback(err),
          );
        });
      },
    });
    server.on('error', (err) => this.logger.warn(`local mailbox: ${err.message}`));
    await new Promise<void>((resolve, reject) => {
      server.once('error', reject);
      server.listen(0, '127.0.0.1', () => resolve());
    });
    this.server = server;
    this.boundPort = (server.server.address() as { port: number }).port;
    this.logger.log(`no SMTP_URL: catching mail on 127.0.0.1:${this.boundPort}, kept in ${this.dir}`);
  }

  async onModuleDestroy(): Promise<void> {
    const server = this.server;
    this.server = null;
    if (server) await new Promise<void>((resolve) => server.close(() => resolve()));
  }

  /** Every captured message, newest first. */
  async list(): Promise<CapturedMail[]> {
    let names: string[];
    try {
      names = await readdir(this.dir);
    } catch {
      return [];
    }
    const records = await Promise.all(
      names.filter((n) => n.endsWith('.json')).map(async (n) => JSON.parse(await readFile(join(this.dir, n), 'utf8')) as CapturedMail),
    );
    return records.sort((a, b) => b.receivedAt.localeCompare(a.receivedAt) || b.id.localeCompare(a.id));
  }

  /** One captured message, or null. */
  async get(id: string): Promise<CapturedMail | null> {
    if (!ID.test(id)) return null;
    try {
      return JSON.parse(await readFile(join(this.dir, `${id}.json`), 'utf8')) as CapturedMail;
    } catch {
      return null;
    }
  }

  private async store(raw: Buffer): Promise<void> {
    const parsed = await simpleParser(raw);
    const id = randomUUID();
    const addresses = (field: typeof parsed.to): string[] =>
      (Array.isArray(field) ? field : field ? [field] : []).flatMap((a) => a.value.map((v) => v.address ?? '')).filter(Boolean);
    const groupHeader = parsed.headers.get(GROUP_HEADER.toLowerCase());
    const record: CapturedMail = {
      id,
      to: addresses(parsed.to),
      from: parsed.from?.text ?? '',
      subject: parsed.subject ?? '',
      text: parsed.text ?? '',
      html: typeof parsed.html === 'string' ? parsed.html : null,
      receivedAt: new Date().toISOString(),
      groupId: typeof groupHeader === 'string' ? groupHeader : null,
    };
    await writeFile(join(this.dir, `${id}.eml`), raw, { mode: 0o600 });
    // The JSON is written last: a listed record always has its .eml beside it.
    await writeFile(join(this.dir, `${id}.json`), JSON.stringify(record, null, 2), { mode: 0o600 });
  }
}
