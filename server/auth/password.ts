import { randomBytes, scrypt as scryptCb, timingSafeEqual, type ScryptOptions } from 'node:crypto';

// scrypt with N = 2^15, r = 8, p = 1 (32 MiB, roughly 50–100 ms here): the interactive-login
// parameters commonly recommended for scrypt (common practice). The parameters are stored with
// each hash so they can be raised later without breaking existing accounts.
const N = 1 << 15;
const r = 8;
const p = 1;
const keyLength = 32;

function scrypt(password: string, salt: Buffer, len: number, options: ScryptOptions): Promise<Buffer> {
  return new Promise((resolve, reject) =>
    scryptCb(password, salt, len, options, (err, key) => (err ? reject(err) : resolve(key))),
  );
}

const maxmem = (n: number, rr: number) => 256 * n * rr;

/** `scrypt$N$r$p$<salt b64url>$<key b64url>` with a fresh 16-byte salt. */
export async function hashPassword(password: string): Promise<string> {
  const salt = randomBytes(16);
  const key = await scrypt(password.normalize('NFC'), salt, keyLength, { N, r, p, maxmem: maxmem(N, r) });
  return ['scrypt', N, r, p, salt.toString('base64url'), key.toString('base64url')].join('$');
}

/** Constant-time check of `password` against a stored hash; false for a malformed hash. */
export async function verifyPassword(password: string, stored: string): Promise<boolean> {
  const parts = stored.split('$');
  if (parts.length !== 6 || parts[0] !== 'scrypt') return false;
  const [n, rr, pp] = parts.slice(1, 4).map(Number);
  const salt = Buffer.from(parts[4], 'base64url');
  const expected = Buffer.from(parts[5], 'base64url');
  if (!n || !rr || !pp || expected.length === 0) return false;
  const key = await scrypt(password.normalize('NFC'), salt, expected.length, { N: n, r: rr, p: pp, maxmem: maxmem(n, rr) });
  return timingSafeEqual(key, expected);
}

/** A hash of a random password, checked against when the e-mail is unknown so both paths take as long. */
let decoy: Promise<string> | undefined;
export function decoyHash(): Promise<string> {
  decoy ??= hashPassword(randomBytes(16).toString('hex'));
  return decoy;
}
