import { createHash, randomBytes } from 'node:crypto';

/** A URL-safe random token for links in e-mail; only its SHA-256 is stored. */
export function newToken(): { token: string; tokenHash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, tokenHash: hashToken(token) };
}

export const hashToken = (token: string): string => createHash('sha256').update(token).digest('hex');
