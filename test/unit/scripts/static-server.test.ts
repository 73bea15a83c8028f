import { request } from 'node:http';
import { mkdtempSync, mkdirSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { startStaticServer } from '../../../scripts/lib/static-server.mjs';
import type { StaticServer } from '../../../scripts/lib/static-server.mjs';
import { CONTENT_SECURITY_POLICY } from '../../../scripts/lib/web-policy.mjs';

type Raw = { status: number; headers: Record<string, string | string[] | undefined>; body: string };

/** A raw request, so paths like /../x reach the server unnormalised (fetch would tidy them). */
const raw = (port: number, rawPath: string, options: { method?: string; host?: string } = {}) =>
  new Promise<Raw>((resolve, reject) => {
    const req = request({
      host: '127.0.0.1', port, path: rawPath, method: options.method ?? 'GET',
      headers: { host: options.host ?? `127.0.0.1:${port}` },
    }, (res) => {
      let body = '';
      res.setEncoding('utf8');
      res.on('data', (c: string) => { body += c; });
      res.on('end', () => resolve({ status: res.statusCode ?? 0, headers: res.headers, body }));
    });
    req.on('error', reject);
    req.end();
  });

let base: string;
let server: StaticServer;

beforeAll(async () => {
  base = mkdtempSync(path.join(tmpdir(), 'heed-static-'));
  const dist = path.join(base, 'dist');
  mkdirSync(path.join(dist, 'assets'), { recursive: true });
  mkdirSync(path.join(dist, 'empty'));
  writeFileSync(path.join(dist, 'index.html'), '<!doctype html><title>Heed</title>');
  writeFileSync(path.join(dist, 'assets', 'app.js'), 'console.log(1);');
  writeFileSync(path.join(dist, 'assets', 'index-B4x_9kQz.js'), 'console.log(2);');
  writeFileSync(path.join(base, 'secret.txt'), 'outside');
  symlinkSync(path.join(base, 'secret.txt'), path.join(dist, 'link.txt'));
  server = await startStaticServer({ root: dist, port: 0 });
});

afterAll(async () => {
  await server.close();
  rmSync(base, { recursive: true, force: true });
});

describe('startStaticServer', () => {
  it('lets the browser keep content-named assets, and asks again for everything else', async () => {
    const hashed = await fetch(`${server.url}assets/index-B4x_9kQz.js`);
    expect(hashed.status).toBe(200);
    expect(hashed.headers.get('cache-control')).toBe('public, max-age=31536000, immutable');
    expect((await fetch(`${server.url}assets/app.js`)).headers.get('cache-control')).toBe('no-cache');
    expect((await fetch(server.url)).headers.get('cache-control')).toBe('no-cache');
  });

  it('listens on 127.0.0.1 only, on the port it reports', () => {
    expect(server.url).toBe(`http://127.0.0.1:${server.port}/`);
    expect(server.port).toBeGreaterThan(0);
  });

  it('serves index.html at / with its MIME type and the CSP, and no CORS header', async () => {
    const res = await fetch(server.url);
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toBe('text/html; charset=utf-8');
    expect(res.headers.get('content-security-policy')).toBe(CONTENT_SECURITY_POLICY);
    expect(res.headers.get('access-control-allow-origin')).toBeNull();
    expect(await res.text()).toContain('<title>Heed</title>');
  });

  it('serves assets with the right MIME type', async () => {
    const res = await fetch(new URL('assets/app.js', server.url));
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toBe('text/javascript; charset=utf-8');
    expect(await res.text()).toBe('console.log(1);');
  });

  it('answers HEAD with headers and no body', async () => {
    const res = await raw(server.port, '/assets/app.js', { method: 'HEAD' });
    expect(res.status).toBe(200);
    expect(res.headers['content-length']).toBe('15');
    expect(res.body).toBe('');
  });

  it('never lists a folder', async () => {
    expect((await raw(server.port, '/empty/')).status).toBe(404);
    expect((await raw(server.port, '/empty')).status).toBe(404);
    expect((await raw(server.port, '/assets/')).status).toBe(404);
  });

  it.each(['/../secret.txt', '/%2e%2e/secret.txt', '/assets/..%2f..%2fsecret.txt', '/link.txt', '/missing.js'])(
    'refuses %s with 404 and never sends the outside file',
    async (p) => {
      const res = await raw(server.port, p);
      expect(res.status).toBe(404);
      expect(res.body).not.toContain('outside');
    },
  );

  it('refuses methods other than GET and HEAD', async () => {
    const res = await raw(server.port, '/', { method: 'POST' });
    expect(res.status).toBe(405);
    expect(res.headers.allow).toBe('GET, HEAD');
  });

  it('refuses requests naming another host (DNS rebinding)', async () => {
    const res = await raw(server.port, '/', { host: `evil.example:${server.port}` });
    expect(res.status).toBe(421);
    expect((await raw(server.port, '/', { host: `localhost:${server.port}` })).status).toBe(200);
  });

  it('rejects with EADDRINUSE when a fixed port is busy', async () => {
    await expect(startStaticServer({ root: path.join(base, 'dist'), port: server.port })).rejects.toMatchObject({ code: 'EADDRINUSE' });
  });

  it('stops listening after close()', async () => {
    const other = await startStaticServer({ root: path.join(base, 'dist') });
    expect((await fetch(other.url)).status).toBe(200);
    await other.close();
    await expect(fetch(other.url)).rejects.toThrow();
  });
});
