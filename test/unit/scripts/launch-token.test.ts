// The launcher reuses a server on Heed's port only when it proves it holds this profile's secret
// token. A squatter serving Heed's page title (the probe's attack) is refused.
import { createServer } from 'node:http';
import type { Server } from 'node:http';
import { mkdtempSync, mkdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { PROOF_PATH, TOKEN_FILE, profileToken, proofFor, provesHeed } from '../../../scripts/lib/launch-token.mjs';
import { startStaticServer } from '../../../scripts/lib/static-server.mjs';

const listen = (server: Server): Promise<string> =>
  new Promise((resolve) => server.listen(0, '127.0.0.1', () => {
    const address = server.address();
    resolve(`http://127.0.0.1:${typeof address === 'object' && address ? address.port : 0}/`);
  }));

const base = mkdtempSync(path.join(tmpdir(), 'heed-token-'));
const dist = path.join(base, 'dist');
mkdirSync(dist);
writeFileSync(path.join(dist, 'index.html'), '<!doctype html><title>Heed</title>');

describe('launch token', () => {
  it('is made once per profile folder, 64 hex digits, readable by its owner only', () => {
    const dir = path.join(base, 'profile-a');
    const token = profileToken(dir);
    expect(token).toMatch(/^[0-9a-f]{64}$/);
    expect(profileToken(dir)).toBe(token);
    expect(readFileSync(path.join(dir, TOKEN_FILE), 'utf8').trim()).toBe(token);
    expect(statSync(path.join(dir, TOKEN_FILE)).mode & 0o077).toBe(0);
    expect(profileToken(path.join(base, 'profile-b'))).not.toBe(token);
  });

  it('answers a nonce with HMAC-SHA256 of the token over it', () => {
    // expected value from Python 3.11.7: hmac.new(b'Jefe', b'0123456789abcdef0123456789abcdef', hashlib.sha256).hexdigest()
    expect(proofFor('Jefe', '0123456789abcdef0123456789abcdef')).toBe('c23ef76462a6452957a6b3c8b4d7f93addcd92703521e3603f639586c2d296ea');
    expect(proofFor('Jefe', 'not hex')).toBeNull();
    expect(proofFor('Jefe', 'ab')).toBeNull();
  });

  it('accepts the real server started with the profile token, and refuses it with another token', async () => {
    const token = profileToken(path.join(base, 'profile-c'));
    const server = await startStaticServer({ root: dist, token });
    try {
      expect(await provesHeed(server.url, token)).toBe(true);
      expect(await provesHeed(server.url, profileToken(path.join(base, 'profile-d')))).toBe(false);
    } finally {
      await server.close();
    }
  });

  it('refuses a squatter that serves Heed\'s title on every path', async () => {
    const squatter = createServer((_req, res) => {
      res.writeHead(200, { 'Content-Type': 'text/html' });
      res.end('<!doctype html><title>Heed</title>');
    });
    const url = await listen(squatter);
    try {
      expect(await (await fetch(url)).text()).toContain('<title>Heed</title>');
      expect(await provesHeed(url, profileToken(path.join(base, 'profile-c')))).toBe(false);
    } finally {
      squatter.close();
    }
  });

  it('refuses a squatter that relays an answer it saw before (each nonce is fresh)', async () => {
    const token = profileToken(path.join(base, 'profile-c'));
    const seen = proofFor(token, 'ab'.repeat(32));
    const squatter = createServer((_req, res) => res.end(`${seen}\n`));
    const url = await listen(squatter);
    try {
      expect(await provesHeed(url, token)).toBe(false);
    } finally {
      squatter.close();
    }
  });

  it('a server without a token does not answer the challenge', async () => {
    const server = await startStaticServer({ root: dist });
    try {
      expect((await fetch(new URL(`${PROOF_PATH.slice(1)}?nonce=${'ab'.repeat(16)}`, server.url))).status).toBe(404);
    } finally {
      await server.close();
    }
  });
});
