import { mkdirSync, mkdtempSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { APP_SCHEME_PRIVILEGES, APP_URL, appResponse, isAppUrl } from '../../../electron/app-protocol';
import { CONTENT_SECURITY_POLICY } from '../../../scripts/lib/web-policy.mjs';

let base: string;
let dist: string;

beforeAll(() => {
  base = mkdtempSync(path.join(tmpdir(), 'heed-scheme-'));
  dist = path.join(base, 'dist');
  mkdirSync(path.join(dist, 'assets'), { recursive: true });
  writeFileSync(path.join(dist, 'index.html'), '<!doctype html><title>Heed</title>');
  writeFileSync(path.join(dist, 'assets', 'app.css'), 'body{}');
  writeFileSync(path.join(base, 'secret.txt'), 'outside');
  symlinkSync(path.join(base, 'secret.txt'), path.join(dist, 'link.txt'));
});
afterAll(() => rmSync(base, { recursive: true, force: true }));

describe('isAppUrl', () => {
  it('accepts heed://app/ only', () => {
    expect(isAppUrl(APP_URL)).toBe(true);
    expect(isAppUrl('heed://app/assets/x.js?v=1#top')).toBe(true);
    expect(isAppUrl('heed://other/index.html')).toBe(false);
    expect(isAppUrl('https://app/index.html')).toBe(false);
    expect(isAppUrl('file:///work/main/dist/index.html')).toBe(false);
    expect(isAppUrl('not a url')).toBe(false);
  });
});

describe('the heed scheme', () => {
  it('is standard and secure, without CORS or service workers', () => {
    expect(APP_SCHEME_PRIVILEGES).toMatchObject({ standard: true, secure: true, corsEnabled: false, allowServiceWorkers: false, codeCache: true });
  });

  it('serves files from dist/ with MIME type and CSP', async () => {
    const res = await appResponse(dist, APP_URL);
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toBe('text/html; charset=utf-8');
    expect(res.headers.get('content-security-policy')).toBe(CONTENT_SECURITY_POLICY);
    expect(await res.text()).toContain('<title>Heed</title>');
    const css = await appResponse(dist, 'heed://app/assets/app.css');
    expect(css.headers.get('content-type')).toBe('text/css; charset=utf-8');
  });

  it.each([
    'heed://app/%2e%2e/secret.txt',
    'heed://app/assets/..%2f..%2fsecret.txt',
    'heed://app/link.txt',
    'heed://app/assets/',
    'heed://app/missing.js',
    'heed://elsewhere/index.html',
  ])('refuses %s with 404 and never sends the outside file', async (url) => {
    const res = await appResponse(dist, url);
    expect(res.status).toBe(404);
    expect(await res.text()).not.toContain('outside');
    expect(res.headers.get('content-security-policy')).toBe(CONTENT_SECURITY_POLICY);
  });

  it('refuses a malformed URL', async () => {
    expect((await appResponse(dist, '::::')).status).toBe(400);
  });
});
