import { createHash, randomBytes } from 'node:crypto';

// Tokens that travel in e-mailed links. Only their SHA-256 is stored: they are long random values, so a fast
// hash is enough, and a leaked table opens nothing.

export function newToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: hashToken(token) };
}

export function hashToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}
