// The launcher's backup endpoint, for Heed in a Chromium window (Electron uses IPC instead):
//   GET  /__heed/backups                      -> { folder, keep, backups: [...] }
//   GET  /__heed/backups/file?id=STUDY/NAME   -> the backup's bytes
//   POST /__heed/backups?study=ID&name=NAME   -> writes the body (a zip), answers the entry
// Only Heed's own page may ask: the request must carry the launch's backup secret in the
// X-Heed-Backup header (a page elsewhere cannot read it, and a custom header forces a CORS
// preflight that this server never grants), and any Origin / Sec-Fetch-Site must be this origin.
import { timingSafeEqual } from 'node:crypto';

export const BACKUP_PATH = '/__heed/backups';
export const SECRET_HEADER = 'x-heed-backup';
/** Largest backup accepted: bundles without images are small; this leaves room for large studies. */
export const MAX_BACKUP_BYTES = 128 * 1024 * 1024;

const json = (send, res, status, value) => send(res, status, `${JSON.stringify(value)}\n`, { 'Content-Type': 'application/json; charset=utf-8', 'Cache-Control': 'no-store' });

const sameSecret = (given, secret) => {
  if (typeof given !== 'string') return false;
  const a = Buffer.from(given, 'utf8');
  const b = Buffer.from(secret, 'utf8');
  return a.length === b.length && timingSafeEqual(a, b);
};

/** The request body, or null when it passes `limit` bytes (the socket is then left to close). */
const bodyOf = (req, limit) => new Promise((resolve, reject) => {
  const chunks = [];
  let size = 0;
  req.on('data', (chunk) => {
    size += chunk.length;
    if (size > limit) {
      req.removeAllListeners('data');
      req.resume();
      resolve(null);
      return;
    }
    chunks.push(chunk);
  });
  req.on('end', () => resolve(Buffer.concat(chunks, size)));
  req.on('error', reject);
});

/**
 * Answers a request under BACKUP_PATH. `origins` are the origins this server is reached by.
 * @param {import('node:http').IncomingMessage} req
 * @param {import('node:http').ServerResponse} res
 * @param {{ folder: import('./backup-folder.mjs').BackupFolder; secret: string; maxBytes?: number; origins: string[]; url: URL; send: Function }} context
 */
export const answerBackupRequest = async (req, res, { folder, secret, maxBytes = MAX_BACKUP_BYTES, origins, url, send }) => {
  const origin = req.headers.origin;
  if (origin !== undefined && !origins.includes(origin)) return send(res, 403, 'backups: refused, the request came from another origin\n');
  const site = req.headers['sec-fetch-site'];
  if (site !== undefined && site !== 'same-origin') return send(res, 403, 'backups: refused, the request came from another site\n');
  if (!sameSecret(req.headers[SECRET_HEADER], secret)) return send(res, 403, 'backups: refused, the request does not hold this launch\'s backup secret\n');
  try {
    if (url.pathname === BACKUP_PATH && req.method === 'GET') {
      return json(send, res, 200, { folder: folder.root, keep: folder.keep, backups: await folder.list() });
    }
    if (url.pathname === `${BACKUP_PATH}/file` && req.method === 'GET') {
      const bytes = await folder.read(url.searchParams.get('id') ?? '');
      return send(res, 200, bytes, { 'Content-Type': 'application/zip', 'Content-Length': String(bytes.length), 'Cache-Control': 'no-store' });
    }
    if (url.pathname === BACKUP_PATH && req.method === 'POST') {
      // a POST from a page always carries its Origin: one without it is no page of ours
      if (origin === undefined) return send(res, 403, 'backups: refused, the request names no origin\n');
      if (req.headers['content-type'] !== 'application/zip') return send(res, 415, 'backups: the body must be application/zip\n');
      const declared = Number(req.headers['content-length'] ?? 0);
      if (declared > maxBytes) return send(res, 413, `backups: larger than ${maxBytes} bytes\n`, { Connection: 'close' });
      const body = await bodyOf(req, maxBytes);
      if (body === null) return send(res, 413, `backups: larger than ${maxBytes} bytes\n`, { Connection: 'close' });
      const entry = await folder.save(url.searchParams.get('study') ?? '', url.searchParams.get('name') ?? '', body);
      return json(send, res, 201, entry);
    }
  } catch (error) {
    const missing = error?.code === 'ENOENT';
    return send(res, missing ? 404 : 400, `backups: ${missing ? 'no such backup' : error instanceof Error ? error.message : String(error)}\n`);
  }
  return send(res, 405, 'backups: method not allowed\n', { Allow: 'GET, POST' });
};
