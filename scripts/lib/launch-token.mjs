// Proof that the server on Heed's port is this Heed, not a squatter with Heed's page title: a
// secret random token kept in the profile folder (readable only by its owner), and a
// challenge-response over it. The launcher sends a fresh random nonce; only a server started
// with the token can answer HMAC-SHA256(token, nonce), and an answer seen once is no use again.
import { createHmac, randomBytes, timingSafeEqual } from 'node:crypto';
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';

export const PROOF_PATH = '/__heed/proof';
export const TOKEN_FILE = 'heed-launch-token';
const TOKEN = /^[0-9a-f]{64}$/;
const NONCE = /^[0-9a-f]{32,128}$/;

/**
 * The profile's token, made on first use (32 random bytes as hex, file mode 0600). A damaged
 * token file is replaced, which only means a server started before it cannot be reused.
 * @param {string} dir the profile folder
 * @returns {string}
 */
export const profileToken = (dir) => {
  const file = path.join(dir, TOKEN_FILE);
  try {
    const text = readFileSync(file, 'utf8').trim();
    if (TOKEN.test(text)) return text;
  } catch {
    // not made yet
  }
  mkdirSync(dir, { recursive: true, mode: 0o700 });
  const token = randomBytes(32).toString('hex');
  writeFileSync(file, `${token}\n`, { mode: 0o600 });
  return token;
};

/** The answer to a nonce, or null when the nonce is not 32-128 hex digits. */
export const proofFor = (token, nonce) => (NONCE.test(nonce) ? createHmac('sha256', token).update(nonce).digest('hex') : null);

/**
 * Whether the server at `url` (ending in '/') holds `token`: asks PROOF_PATH with a fresh nonce
 * and compares the answer in constant time. Any failure (refused, timeout, wrong answer) is false.
 * @param {string} url
 * @param {string} token
 * @returns {Promise<boolean>}
 */
export const provesHeed = async (url, token) => {
  const nonce = randomBytes(32).toString('hex');
  try {
    const response = await fetch(new URL(`${PROOF_PATH.slice(1)}?nonce=${nonce}`, url), { signal: AbortSignal.timeout(2000) });
    if (!response.ok) return false;
    const answer = Buffer.from((await response.text()).trim(), 'utf8');
    const expected = Buffer.from(proofFor(token, nonce) ?? '', 'utf8');
    return answer.length === expected.length && timingSafeEqual(answer, expected);
  } catch {
    return false;
  }
};
