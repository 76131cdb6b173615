import { hash, verify } from '@node-rs/argon2';

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
