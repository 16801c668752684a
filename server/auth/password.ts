import { randomBytes, scrypt, timingSafeEqual, type ScryptOptions } from 'node:crypto';
import bcrypt from 'bcryptjs';

/**
 * Password hashes: scrypt from Node's crypto, which runs in libuv's thread pool, so hashing never
 * blocks the event loop. Stored as `$scrypt$ln=15,r=8,p=1$<salt>$<key>` (base64 without padding),
 * so the parameters travel with the hash. Hashes made before (bcrypt, `$2…`) still verify, through
 * bcryptjs, and `needsRehash` tells sign-in to replace them.
 */
const LOG2_COST = 15; // N = 2^15
const BLOCK_SIZE = 8;
const PARALLELISM = 1;
const SALT_BYTES = 16;
const KEY_BYTES = 32;
/** scrypt needs 128·N·r bytes; allow twice that (Node's default ceiling is exactly 32 MiB). */
const maxmem = (log2Cost: number, blockSize: number) => 256 * 2 ** log2Cost * blockSize;

const SCRYPT_HASH = /^\$scrypt\$ln=(\d{1,2}),r=(\d{1,2}),p=(\d{1,2})\$([A-Za-z0-9+/]+)\$([A-Za-z0-9+/]+)$/;

interface ScryptHash {
  log2Cost: number;
  blockSize: number;
  parallelism: number;
  salt: Buffer;
  key: Buffer;
}

const b64 = (bytes: Buffer) => bytes.toString('base64').replace(/=+$/, '');

function encode(hash: ScryptHash): string {
  return `$scrypt$ln=${hash.log2Cost},r=${hash.blockSize},p=${hash.parallelism}$${b64(hash.salt)}$${b64(hash.key)}`;
}

/** Reads a stored scrypt string; parameters outside a sane range (a damaged row) read as nothing. */
function decode(stored: string): ScryptHash | null {
  const match = SCRYPT_HASH.exec(stored);
  if (!match) return null;
  const [log2Cost, blockSize, parallelism] = [Number(match[1]), Number(match[2]), Number(match[3])];
  if (log2Cost < 10 || log2Cost > 20 || blockSize < 1 || blockSize > 16 || parallelism < 1 || parallelism > 4)
    return null;
  const salt = Buffer.from(match[4], 'base64');
  const key = Buffer.from(match[5], 'base64');
  if (salt.length < SALT_BYTES || key.length < 16) return null;
  return { log2Cost, blockSize, parallelism, salt, key };
}

function derive(password: string, hash: Omit<ScryptHash, 'key'>, keyLength: number): Promise<Buffer> {
  const options: ScryptOptions = {
    N: 2 ** hash.log2Cost,
    r: hash.blockSize,
    p: hash.parallelism,
    maxmem: maxmem(hash.log2Cost, hash.blockSize),
  };
  return new Promise((resolve, reject) =>
    scrypt(password.normalize('NFC'), hash.salt, keyLength, options, (error, key) =>
      error ? reject(error) : resolve(key),
    ),
  );
}

const current = () => ({ log2Cost: LOG2_COST, blockSize: BLOCK_SIZE, parallelism: PARALLELISM });

/** A new scrypt hash of `password` with a fresh random salt. */
export async function hashPassword(password: string): Promise<string> {
  const salt = randomBytes(SALT_BYTES);
  const key = await derive(password, { ...current(), salt }, KEY_BYTES);
  return encode({ ...current(), salt, key });
}

/** True when `password` matches the stored hash (scrypt, or bcrypt from before); false for anything unreadable. */
export async function verifyPassword(password: string, stored: string): Promise<boolean> {
  if (stored.startsWith('$2')) return bcrypt.compare(password, stored).catch(() => false);
  const hash = decode(stored);
  if (!hash) return false;
  const key = await derive(password, hash, hash.key.length);
  return timingSafeEqual(key, hash.key);
}

/** True when the stored hash is not scrypt with today's parameters (so sign-in stores a new one). */
export function needsRehash(stored: string): boolean {
  const hash = decode(stored);
  return (
    !hash ||
    hash.log2Cost !== LOG2_COST ||
    hash.blockSize !== BLOCK_SIZE ||
    hash.parallelism !== PARALLELISM ||
    hash.key.length !== KEY_BYTES
  );
}

/**
 * Compared against when the e-mail is unknown, so both paths cost one scrypt with today's
 * parameters. Random bytes, not a hash of anything: no password matches it.
 */
export const DUMMY_HASH = encode({ ...current(), salt: randomBytes(SALT_BYTES), key: randomBytes(KEY_BYTES) });
