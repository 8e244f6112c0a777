import { createHash, randomBytes } from 'node:crypto';

/** A token for a link in an e-mail: 32 random bytes, URL-safe. Only its hash is stored. */
export function newLinkToken(): { token: string; tokenHash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, tokenHash: hashLinkToken(token) };
}

export function hashLinkToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}
