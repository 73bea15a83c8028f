import { readFileSync } from 'node:fs';
import path from 'node:path';
import { CONTENT_SECURITY_POLICY, contentTypeFor, resolveInside, securityHeaders } from '../../../scripts/lib/web-policy.mjs';

const root = path.resolve('/srv/heed/dist');

describe('CONTENT_SECURITY_POLICY', () => {
  it('holds exactly the directives Heed promises', () => {
    const directives = CONTENT_SECURITY_POLICY.split(';').map((d) => d.trim());
    expect(directives).toEqual([
      "default-src 'self'",
      "img-src 'self' blob: data:",
      "script-src 'self'",
      "style-src 'self'",
      "object-src 'none'",
      "base-uri 'none'",
      "form-action 'none'",
      "frame-ancestors 'none'",
    ]);
  });

  it('is repeated in index.html, less frame-ancestors (which a meta tag cannot carry)', () => {
    const meta = /http-equiv="Content-Security-Policy" content="([^"]+)"/.exec(readFileSync('index.html', 'utf8'))?.[1] ?? '';
    const expected = CONTENT_SECURITY_POLICY.split('; ').filter((d) => !d.startsWith('frame-ancestors'));
    expect(meta.split('; ')).toEqual(expected);
  });

  it('is sent with the security headers, and no CORS header is', () => {
    const headers = securityHeaders();
    expect(headers['Content-Security-Policy']).toBe(CONTENT_SECURITY_POLICY);
    expect(headers['X-Content-Type-Options']).toBe('nosniff');
    expect(Object.keys(headers).some((h) => h.toLowerCase().startsWith('access-control'))).toBe(false);
  });
});

describe('resolveInside', () => {
  it('maps / and folder paths to index.html, and plain paths to files', () => {
    expect(resolveInside(root, '/')).toBe(path.join(root, 'index.html'));
    expect(resolveInside(root, '/docs/')).toBe(path.join(root, 'docs', 'index.html'));
    expect(resolveInside(root, '/assets/index-abc.js')).toBe(path.join(root, 'assets', 'index-abc.js'));
    expect(resolveInside(root, '/a%20b.png')).toBe(path.join(root, 'a b.png'));
  });

  it('stays inside the root for ".." that does not climb out', () => {
    expect(resolveInside(root, '/assets/../index.html')).toBe(path.join(root, 'index.html'));
  });

  it.each([
    ['/../secret.txt'],
    ['/assets/../../secret.txt'],
    ['/%2e%2e/secret.txt'],
    ['/%2E%2E%2Fsecret.txt'],
    ['/..'],
    ['/a%00.js'],
    ['/a%5c..%5c..%5csecret'],
    ['/a\\b'],
    ['/%E0%A4%A'],
    ['relative/path'],
    [''],
  ])('refuses %s', (p) => {
    expect(resolveInside(root, p)).toBeNull();
  });

  it('refuses a sibling folder whose name starts like the root', () => {
    expect(resolveInside(root, '/../dist-other/x.js')).toBeNull();
  });
});

describe('contentTypeFor', () => {
  it.each([
    ['index.html', 'text/html; charset=utf-8'],
    ['a/b/APP.JS', 'text/javascript; charset=utf-8'],
    ['x.css', 'text/css; charset=utf-8'],
    ['x.svg', 'image/svg+xml'],
    ['x.png', 'image/png'],
    ['x.woff2', 'font/woff2'],
    ['x.js.map', 'application/json; charset=utf-8'],
    ['x.unknown', 'application/octet-stream'],
    ['Makefile', 'application/octet-stream'],
  ])('%s -> %s', (name, type) => {
    expect(contentTypeFor(name)).toBe(type);
  });
});
