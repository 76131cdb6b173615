import { hash, verify } from '@node-rs/argon2';
import { randomBytes } from 'node:crypto';

/**
 * Password hashing with Argon2id (RFC 9106) through @node-rs/argon2, using
 * the library's defaults (19 MiB memory, 2 passes: the OWASP minimum).
 */
export function hashPassword(password: string): Promise<string> {
  return hash(password);
}

/** Whether a password matches a stored Argon2 hash; a malformed hash is a mismatch. */
export async function verifyPassword(storedHash: string, password: string): Promise<boolean> {
  try {
    return await verify(storedHash, password);
  } catch {
    return false;
  }
}

let dummyHash: Promise<string> | null = null;

/**
 * Spends the time of a real verification and answers false: sign-in calls it
 * for an unknown address, so its answer time does not tell which addresses
 * have accounts (OWASP Authentication Cheat Sheet, "authentication responses").
 * The dummy hash is made once, with the same parameters as real ones, from a
 * random password nobody knows.
 */
export async function verifyAgainstDummy(password: string): Promise<false> {
  dummyHash ??= hash(randomBytes(24).toString('base64url'));
  await verifyPassword(await dummyHash, password);
  return false;
}
