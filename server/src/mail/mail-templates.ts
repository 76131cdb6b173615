/**
 * The words of every mail Upwell sends, as plain text and HTML. Pure functions:
 * no remote images, no tracking pixels, no links but the ones named here, and
 * every name a person typed is HTML-escaped.
 */
import { escapeHtml } from '../common/escape-html';

/** A mail's subject and its two bodies. */
export interface MailContent {
  subject: string;
  text: string;
  html: string;
}


interface Paragraphs {
  subject: string;
  lines: string[];
  link: { href: string; label: string };
  after?: string[];
  /** Notification mails end with where to turn them off. */
  settingsUrl?: string;
}

function render(p: Paragraphs): MailContent {
  const footer = p.settingsUrl
    ? [`You get this mail because notification mail is on for your account. Turn it off in your settings: ${p.settingsUrl}`]
    : [];
  const text = [...p.lines, `${p.link.label}: ${p.link.href}`, ...(p.after ?? []), ...(footer.length ? ['--', ...footer] : [])].join('\n\n') + '\n';
  const para = (s: string) => `<p style="margin:0 0 12px">${escapeHtml(s)}</p>`;
  const html = [
    '<!doctype html><html><body style="font-family:\'Source Sans 3\',Arial,sans-serif;color:#1c2b2d;line-height:1.5">',
    ...p.lines.map(para),
    `<p style="margin:0 0 12px"><a href="${escapeHtml(p.link.href)}" style="color:#0e7c7b">${escapeHtml(p.link.label)}</a></p>`,
    ...(p.after ?? []).map(para),
    ...(p.settingsUrl
      ? [
          '<hr style="border:none;border-top:1px solid #d5dfe0">',
          `<p style="margin:0;font-size:13px;color:#5a6b6d">You get this mail because notification mail is on for your account. <a href="${escapeHtml(p.settingsUrl)}" style="color:#0e7c7b">Turn it off in your settings</a>.</p>`,
        ]
      : []),
    '</body></html>',
  ].join('\n');
  return { subject: p.subject, text, html };
}

/** Which group or notebook an invitation opens, in words. */
export interface InvitationMailInput {
  inviterName: string | null;
  groupName: string;
  notebookTitle: string | null;
  role: string;
  link: string;
  expiresAt: Date;
}

/** The invitation mail: who invites you, to what, as what, the link and until when it works. */
export function invitationMail(i: InvitationMailInput): MailContent {
  const who = i.inviterName ?? 'Someone';
  const what = i.notebookTitle
    ? `the notebook “${i.notebookTitle}” of the research group ${i.groupName}, as ${i.role}`
    : `the research group ${i.groupName}, as ${i.role}`;
  return render({
    subject: i.notebookTitle ? `${who} invites you to “${i.notebookTitle}” on Upwell` : `${who} invites you to ${i.groupName} on Upwell`,
    lines: [`${who} invites you to ${what}.`, 'Open the link to accept. If you have no Upwell account yet, you can make one there with this e-mail address.'],
    link: { href: i.link, label: 'Accept the invitation' },
    after: [
      `The link works once and until ${i.expiresAt.toUTCString()}. If you did not expect this invitation, ignore this mail.`,
    ],
  });
}

/** The mail to a notebook's people when a snapshot of it is published. */
export function snapshotPublishedMail(s: {
  notebookTitle: string;
  number: number;
  title: string;
  publisherName: string | null;
  link: string;
  settingsUrl: string;
}): MailContent {
  const by = s.publisherName ?? 'The lead author';
  return render({
    subject: `Snapshot ${s.number} of “${s.notebookTitle}” published`,
    lines: [`${by} published snapshot ${s.number}, “${s.title}”, of the notebook “${s.notebookTitle}”.`, 'A snapshot is a read-only copy: it stays as it is while the notebook goes on changing.'],
    link: { href: s.link, label: 'Read the snapshot' },
    settingsUrl: s.settingsUrl,
  });
}

/** The mail to a person @-mentioned in a comment. */
export function mentionMail(m: { byName: string; notebookTitle: string; excerpt: string; link: string; settingsUrl: string }): MailContent {
  return render({
    subject: `${m.byName} mentioned you in “${m.notebookTitle}”`,
    lines: [`${m.byName} mentioned you in a comment on the notebook “${m.notebookTitle}”:`, `“${m.excerpt}”`],
    link: { href: m.link, label: 'Open the comment' },
    settingsUrl: m.settingsUrl,
  });
}

/** One mention in a digest. */
export interface MentionItem {
  byName: string;
  notebookTitle: string;
  excerpt: string;
  link: string;
}

/** At most this many mentions are quoted in one digest; the rest are counted. */
export const DIGEST_MAX_ITEMS = 100;

/** Several mentions of one person that came in close together, in one mail. */
export function mentionDigestMail(d: { items: MentionItem[]; link: string; settingsUrl: string }): MailContent {
  const shown = d.items.slice(0, DIGEST_MAX_ITEMS);
  const rest = d.items.length - shown.length;
  const notebooks = new Set(d.items.map((i) => i.notebookTitle));
  const where = notebooks.size === 1 ? `“${[...notebooks][0]}”` : `${notebooks.size} notebooks`;
  return render({
    subject: `You were mentioned ${d.items.length} times in ${where}`,
    lines: [
      `You were mentioned in ${d.items.length} comments in ${where}. They came in close together, so here they are in one mail:`,
      ...shown.map((i) => `${i.byName} in “${i.notebookTitle}”: “${i.excerpt}” (${i.link})`),
      ...(rest > 0 ? [`…and ${rest} more; every one is in your notifications in the app.`] : []),
    ],
    link: { href: d.link, label: notebooks.size === 1 ? 'Open the notebook' : 'Open Upwell' },
    settingsUrl: d.settingsUrl,
  });
}
