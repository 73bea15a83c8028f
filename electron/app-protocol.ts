// The heed:// scheme: the app's own files from dist/, nothing else. Registered privileged
// (standard, secure) before the app is ready so the page gets a stable origin for IndexedDB.
import { readFile, realpath, stat } from 'node:fs/promises';
import path from 'node:path';
import { contentTypeFor, resolveInside, securityHeaders } from '../scripts/lib/web-policy.mjs';

export const APP_SCHEME = 'heed';
export const APP_HOST = 'app';
export const APP_URL = `${APP_SCHEME}://${APP_HOST}/index.html`;

/**
 * Privileges for protocol.registerSchemesAsPrivileged. No CORS, no service workers, no streams.
 * codeCache: V8 keeps the compiled app scripts between launches (Electron does this for http(s)
 * only unless a standard scheme asks for it), as Chromium does for the launcher's window.
 */
export const APP_SCHEME_PRIVILEGES = {
  standard: true,
  codeCache: true,
  secure: true,
  supportFetchAPI: true,
  corsEnabled: false,
  allowServiceWorkers: false,
  stream: false,
} as const;

/** True for URLs of the app itself (heed://app/...). Compared by parts: Node gives custom schemes a null origin. */
export const isAppUrl = (url: string): boolean => {
  try {
    const u = new URL(url);
    return u.protocol === `${APP_SCHEME}:` && u.host === APP_HOST;
  } catch {
    return false;
  }
};

const refuse = (status: number, text: string): Response =>
  new Response(text, { status, headers: { ...securityHeaders(), 'Content-Type': 'text/plain; charset=utf-8' } });

const inside = (root: string, file: string): boolean => file === root || file.startsWith(root + path.sep);

/**
 * Answers a heed:// request from the files under `distRoot`. Anything that is not heed://app/,
 * leaves dist/ (lexically or through a symlink), or is not a plain file gets a 404; there are no
 * directory listings. Every answer carries Heed's CSP.
 */
export const appResponse = async (distRoot: string, requestUrl: string): Promise<Response> => {
  let url: URL;
  try {
    url = new URL(requestUrl);
  } catch {
    return refuse(400, 'bad request');
  }
  if (!isAppUrl(requestUrl)) return refuse(404, 'not found');
  const file = resolveInside(distRoot, url.pathname);
  if (file === null) return refuse(404, 'not found');
  try {
    const [realRoot, real] = await Promise.all([realpath(distRoot), realpath(file)]);
    if (!inside(realRoot, real) || !(await stat(real)).isFile()) return refuse(404, 'not found');
    const bytes = await readFile(real);
    return new Response(new Uint8Array(bytes), {
      status: 200,
      headers: { ...securityHeaders(), 'Content-Type': contentTypeFor(real), 'Cache-Control': 'no-cache' },
    });
  } catch {
    return refuse(404, 'not found');
  }
};
