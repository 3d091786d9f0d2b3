import { createHash, randomBytes } from 'node:crypto';

/** A random token for links and cookies (256 bits, base64url) and the SHA-256 we store instead. */
export function newSecureToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: hashToken(token) };
}

/** SHA-256 hex of a token: what the database keeps, so a leaked table grants nothing. */
export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}
