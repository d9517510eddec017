import { createHash, randomBytes } from 'node:crypto';

/** SHA-256 of an e-mailed token, hex: what the database keeps, so a leaked table holds no usable link. */
export function hashToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}

/** A new link token: 32 random bytes (256 bits) in base64url, and its hash for storage. */
export function newToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: hashToken(token) };
}
