import { createHash, randomBytes } from 'node:crypto';

/** A random single-use token for an e-mailed link, and the hash that is stored in its place. */
export function newToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: hashToken(token) };
}

/** SHA-256 hex of a token; a leaked table of hashes cannot be turned back into working links. */
export function hashToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}
