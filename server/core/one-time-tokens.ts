import { createHash, randomBytes } from 'node:crypto';

/** A random URL-safe token (32 bytes) and the SHA-256 we store instead of it. */
export function newOneTimeToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: hashOneTimeToken(token) };
}

export function hashOneTimeToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

export const minutesAfter = (d: Date, minutes: number) => new Date(d.getTime() + minutes * 60_000);
