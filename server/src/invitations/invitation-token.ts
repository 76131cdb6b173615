import { createHash, randomBytes } from 'node:crypto';

/** A new link token: 32 random bytes, base64url (43 characters). */
export function newInvitationToken(): string {
  return randomBytes(32).toString('base64url');
}

/** What is stored of a token: its SHA-256, hex. */
export function invitationTokenHash(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}
