// Link tokens: 32 random bytes sent by e-mail; only their SHA-256 is stored, so a database leak
// does not hand out working links.
import { createHash, randomBytes } from 'node:crypto';

export function newLinkToken(): { token: string; tokenHash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, tokenHash: hashToken(token) };
}

export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

export const HOUR_MS = 3_600_000;
