// A tiny static server for dist/: 127.0.0.1 only, GET/HEAD only, no directory listing, nothing
// outside the root, Heed's CSP on every answer, no CORS. Used by `npm start` and the e2e tests.
// With `backups`, it also takes the page's automatic backups (backup-endpoint.mjs).
import { createServer } from 'node:http';
import { createReadStream } from 'node:fs';
import { realpath, stat } from 'node:fs/promises';
import path from 'node:path';
import { BACKUP_PATH, answerBackupRequest } from './backup-endpoint.mjs';
import { PROOF_PATH, proofFor } from './launch-token.mjs';
import { contentTypeFor, resolveInside, securityHeaders } from './web-policy.mjs';

const HOST = '127.0.0.1';

const send = (res, status, text, extra = {}) => {
  res.writeHead(status, { ...securityHeaders(), 'Content-Type': 'text/plain; charset=utf-8', ...extra });
  res.end(text);
};

/** Only our own address may be asked for: refuses DNS-rebinding pages that name another host. */
const hostAllowed = (hostHeader, port) =>
  hostHeader === `${HOST}:${port}` || hostHeader === `localhost:${port}`;

const isInside = (root, file) => file === root || file.startsWith(root + path.sep);

// Vite names built assets after their content (assets/name-HASH.js), so a name never changes
// meaning: the browser may keep them, which also lets it reuse its compiled code on the next
// launch. Everything else (index.html) is asked for again each time.
const HASHED_ASSET = /^\/assets\/[^/]+-[A-Za-z0-9_-]{8,}\.[a-z0-9]+$/;
export const cacheControlFor = (pathname) => (HASHED_ASSET.test(pathname) ? 'public, max-age=31536000, immutable' : 'no-cache');

const handler = (root, realRoot, getPort, token, backups) => async (req, res) => {
  if (!hostAllowed(req.headers.host, getPort())) return send(res, 421, 'wrong host\n');
  if (backups && (req.url === BACKUP_PATH || req.url?.startsWith(`${BACKUP_PATH}?`) || req.url?.startsWith(`${BACKUP_PATH}/`))) {
    const origins = [`http://${HOST}:${getPort()}`, `http://localhost:${getPort()}`];
    return answerBackupRequest(req, res, { ...backups, origins, url: new URL(req.url, `http://${HOST}`), send });
  }
  if (req.method !== 'GET' && req.method !== 'HEAD') return send(res, 405, 'method not allowed\n', { Allow: 'GET, HEAD' });
  let pathname;
  try {
    pathname = new URL(req.url ?? '/', `http://${HOST}`).pathname;
  } catch {
    return send(res, 400, 'bad request\n');
  }
  if (pathname === PROOF_PATH) {
    // the launcher's challenge (launch-token.mjs); only a server given the profile's token answers
    const answer = token ? proofFor(token, new URL(req.url ?? '/', `http://${HOST}`).searchParams.get('nonce') ?? '') : null;
    return answer === null ? send(res, 404, 'not found\n') : send(res, 200, `${answer}\n`, { 'Cache-Control': 'no-store' });
  }
  const file = resolveInside(root, pathname);
  if (file === null) return send(res, 404, 'not found\n');
  try {
    // realpath: a symlink inside dist/ must not lead outside it either.
    const real = await realpath(file);
    if (!isInside(realRoot, real)) return send(res, 404, 'not found\n');
    const info = await stat(real);
    if (!info.isFile()) return send(res, 404, 'not found\n');
    res.writeHead(200, {
      ...securityHeaders(),
      'Content-Type': contentTypeFor(real),
      'Content-Length': String(info.size),
      'Cache-Control': cacheControlFor(pathname),
    });
    if (req.method === 'HEAD') return res.end();
    createReadStream(real).on('error', () => res.destroy()).pipe(res);
  } catch {
    send(res, 404, 'not found\n');
  }
};

/**
 * Serves `root` on http://127.0.0.1:PORT/. `port` 0 (the default) picks a free port; a busy
 * fixed port rejects with the listen error (code EADDRINUSE) so the caller can decide. With
 * `token`, it answers the launcher's proof challenge at PROOF_PATH (launch-token.mjs).
 * @param {{ root: string; port?: number; token?: string }} options
 * @returns {Promise<{ url: string; port: number; close(): Promise<void> }>}
 */
export const startStaticServer = async ({ root, port = 0, token, backups }) => {
  const absRoot = path.resolve(root);
  const realRoot = await realpath(absRoot);
  let boundPort = port;
  const server = createServer(handler(absRoot, realRoot, () => boundPort, token, backups));
  await new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, HOST, () => {
      server.off('error', reject);
      resolve();
    });
  });
  const address = server.address();
  boundPort = typeof address === 'object' && address !== null ? address.port : port;
  return {
    url: `http://${HOST}:${boundPort}/`,
    port: boundPort,
    close: () =>
      new Promise((resolve) => {
        server.close(() => resolve());
        server.closeAllConnections();
      }),
  };
};
