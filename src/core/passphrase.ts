/**
 * The coordinator's passphrase, kept only as a salted PBKDF2-HMAC-SHA-256 hash made with
 * WebCrypto (in the browser and in Node 20+ alike). 600,000 iterations: the figure OWASP's
 * Password Storage Cheat Sheet gives for PBKDF2 with HMAC-SHA-256
 * (https://cheatsheetseries.owasp.org/cheatsheets/Password_Storage_Cheat_Sheet.html).
 * A stored hash with fewer iterations is never accepted, so a record cannot be downgraded.
 * This is the building block of the coordinator lock; the lock's screens are not built yet.
 * Example: verifyPassphrase('a long phrase', await hashPassphrase('a long phrase')) -> true.
 */

export const PBKDF2_ITERATIONS = 600_000;
/** At least 8 characters: NIST SP 800-63B's minimum for a memorised secret (from memory). */
export const MIN_PASSPHRASE = 8;
const SALT_BYTES = 16;
const HASH_BITS = 256;

export type PassphraseHash = { algorithm: 'PBKDF2-HMAC-SHA-256'; iterations: number; salt: string; hash: string };

const hex = (bytes: Uint8Array): string => {
  let out = '';
  for (const b of bytes) out += b.toString(16).padStart(2, '0');
  return out;
};

const fromHex = (text: string): Uint8Array | null => {
  if (!/^([0-9a-f]{2})+$/.test(text)) return null;
  const out = new Uint8Array(text.length / 2);
  for (let i = 0; i < out.length; i += 1) out[i] = Number.parseInt(text.slice(2 * i, 2 * i + 2), 16);
  return out;
};

/** PBKDF2-HMAC-SHA-256 of the passphrase's UTF-8 bytes, 32 bytes as hex. */
export const derive = async (passphrase: string, salt: Uint8Array, iterations: number): Promise<string> => {
  const key = await crypto.subtle.importKey('raw', new TextEncoder().encode(passphrase), 'PBKDF2', false, ['deriveBits']);
  const bits = await crypto.subtle.deriveBits({ name: 'PBKDF2', hash: 'SHA-256', salt: new Uint8Array(salt), iterations }, key, HASH_BITS);
  return hex(new Uint8Array(bits));
};

/** Why a new passphrase is refused, or null. */
export const passphraseProblem = (passphrase: string): string | null =>
  [...passphrase].length < MIN_PASSPHRASE ? `The passphrase needs at least ${MIN_PASSPHRASE} characters.` : null;

/** A fresh salted hash of the passphrase (random 16-byte salt unless one is given, for tests). */
export const hashPassphrase = async (passphrase: string, salt: Uint8Array = crypto.getRandomValues(new Uint8Array(SALT_BYTES))): Promise<PassphraseHash> => ({
  algorithm: 'PBKDF2-HMAC-SHA-256',
  iterations: PBKDF2_ITERATIONS,
  salt: hex(salt),
  hash: await derive(passphrase, salt, PBKDF2_ITERATIONS),
});

/** Whether the passphrase matches the stored hash (compared without an early exit). */
export const verifyPassphrase = async (passphrase: string, stored: PassphraseHash): Promise<boolean> => {
  const salt = fromHex(stored.salt);
  if (stored.algorithm !== 'PBKDF2-HMAC-SHA-256' || stored.iterations < PBKDF2_ITERATIONS || salt === null) return false;
  const actual = await derive(passphrase, salt, stored.iterations);
  if (actual.length !== stored.hash.length) return false;
  let diff = 0;
  for (let i = 0; i < actual.length; i += 1) diff |= actual.charCodeAt(i) ^ stored.hash.charCodeAt(i);
  return diff === 0;
};
