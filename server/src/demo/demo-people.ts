import type { DemoPerson } from '@upwell/common';

/** Name of the demo's research group (invented). */
export const DEMO_GROUP_NAME = 'Equatorial Carbon Group (demo)';

/**
 * The demo's people: invented names, addresses on the reserved `.example`
 * domain (RFC 2606), fixed passwords printed on purpose so a newcomer can
 * sign in as each role. The lead author comes first and does the seeding.
 */
export const DEMO_PEOPLE: readonly DemoPerson[] = [
  { role: 'lead-author', name: 'Ilse Marrow', email: 'ilse.marrow@upwell.example', password: 'demo-lead-author' },
  { role: 'co-author', name: 'Tavi Okonjo', email: 'tavi.okonjo@upwell.example', password: 'demo-co-author' },
  { role: 'reviewer', name: 'Wren Halvorsen', email: 'wren.halvorsen@upwell.example', password: 'demo-reviewer' },
  { role: 'reader', name: 'Sami Ojala', email: 'sami.ojala@upwell.example', password: 'demo-reader' },
];

/** The sign-in details as the start-up log prints them. */
export function demoBanner(url?: string): string {
  const lines = [
    `Demo seed in use (set SEED_DEMO=false to start empty). Group: ${DEMO_GROUP_NAME}`,
    ...DEMO_PEOPLE.map((p) => `  ${p.role.padEnd(12)} ${p.name.padEnd(16)} ${p.email.padEnd(32)} password: ${p.password}`),
  ];
  if (url) lines.push(`  sign in at ${url}/sign-in`);
  const width = Math.max(...lines.map((l) => l.length));
  const rule = '─'.repeat(width + 2);
  return [`┌${rule}┐`, ...lines.map((l) => `│ ${l.padEnd(width)} │`), `└${rule}┘`].join('\n');
}
