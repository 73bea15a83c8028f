// The coordinator passphrase hash: PBKDF2-HMAC-SHA-256 through WebCrypto, checked against
// Python 3.11.7's hashlib.pbkdf2_hmac (values in the comments were printed by it).
import { derive, hashPassphrase, passphraseProblem, PBKDF2_ITERATIONS, verifyPassphrase } from '../../../src/core/passphrase';

const enc = new TextEncoder();

describe('coordinator passphrase', () => {
  it('derives what Python computes', async () => {
    // hashlib.pbkdf2_hmac('sha256', b'password', b'salt', 1).hex()
    expect(await derive('password', enc.encode('salt'), 1)).toBe('120fb6cffcf8b32c43e7225256c4f837a86548c92ccc35480805987cb70be17b');
    // hashlib.pbkdf2_hmac('sha256', 'Vesper valley coordinator'.encode(), bytes(range(16)), 600000).hex()
    const salt = Uint8Array.from({ length: 16 }, (_, i) => i);
    const stored = await hashPassphrase('Vesper valley coordinator', salt);
    expect(stored).toEqual({
      algorithm: 'PBKDF2-HMAC-SHA-256', iterations: 600_000, salt: '000102030405060708090a0b0c0d0e0f',
      hash: '816851a100c3c10668542ade73c194f84c9edce336be30d5aa38bf4a80b72869',
    });
  });

  it('uses OWASP\'s 600,000 iterations and a fresh salt each time', async () => {
    expect(PBKDF2_ITERATIONS).toBe(600_000);
    const a = await hashPassphrase('a long phrase');
    const b = await hashPassphrase('a long phrase');
    expect(a.salt).toMatch(/^[0-9a-f]{32}$/);
    expect(a.salt).not.toBe(b.salt);
    expect(a.hash).not.toBe(b.hash);
  });

  it('verifies the right passphrase only, and never a downgraded record', async () => {
    const stored = await hashPassphrase('a long phrase');
    expect(await verifyPassphrase('a long phrase', stored)).toBe(true);
    expect(await verifyPassphrase('a long phrasE', stored)).toBe(false);
    const weak = { ...stored, iterations: 1, hash: await derive('a long phrase', enc.encode('x'), 1), salt: '78' };
    expect(await verifyPassphrase('a long phrase', weak)).toBe(false);
  });

  it('asks for at least 8 characters', () => {
    expect(passphraseProblem('short')).toBe('The passphrase needs at least 8 characters.');
    expect(passphraseProblem('long enough')).toBeNull();
  });
});
