// The launcher's backup endpoint and its folder: who may write, what is refused, what is kept.
import { request } from 'node:http';
import { existsSync, mkdtempSync, mkdirSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { backupProblem, backupsToRemove, createBackupFolder, defaultBackupRoot, parseBackupId } from '../../../scripts/lib/backup-folder.mjs';
import { startStaticServer } from '../../../scripts/lib/static-server.mjs';
import type { StaticServer } from '../../../scripts/lib/static-server.mjs';

type Raw = { status: number; body: Buffer };
type Options = { method?: string; headers?: Record<string, string>; body?: Uint8Array };

const SECRET = 'a'.repeat(64);
const STUDY = '3f1c2b7e-0d6a-4c55-9a43-1f2e3d4c5b6a';
const nameAt = (ms: number) => `${new Date(Date.UTC(2026, 11, 2, 4, 0, 0, ms)).toISOString().replace(/[:.]/g, '-')}-demo.zip`;

const raw = (port: number, rawPath: string, { method = 'GET', headers = {}, body }: Options = {}) =>
  new Promise<Raw>((resolve, reject) => {
    const req = request({ host: '127.0.0.1', port, path: rawPath, method, headers: { host: `127.0.0.1:${port}`, ...headers } }, (res) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => resolve({ status: res.statusCode ?? 0, body: Buffer.concat(chunks) }));
    });
    req.on('error', (error: NodeJS.ErrnoException) => (error.code === 'ECONNRESET' || error.code === 'EPIPE' ? resolve({ status: 413, body: Buffer.alloc(0) }) : reject(error)));
    if (body) req.write(body);
    req.end();
  });

let base: string;
let backupRoot: string;
let server: StaticServer;
const own = () => ({ origin: `http://127.0.0.1:${server.port}`, 'x-heed-backup': SECRET });
const post = (name: string, body: Uint8Array, headers: Record<string, string> = own(), study = STUDY) =>
  raw(server.port, `/__heed/backups?study=${encodeURIComponent(study)}&name=${encodeURIComponent(name)}`, {
    method: 'POST', body, headers: { 'content-type': 'application/zip', 'content-length': String(body.length), ...headers },
  });
const files = () => (existsSync(path.join(backupRoot, STUDY)) ? readdirSync(path.join(backupRoot, STUDY)).sort() : []);

beforeAll(async () => {
  base = mkdtempSync(path.join(tmpdir(), 'heed-backup-endpoint-'));
  const dist = path.join(base, 'dist');
  mkdirSync(dist);
  writeFileSync(path.join(dist, 'index.html'), '<!doctype html><title>Heed</title>');
  backupRoot = path.join(base, 'backups');
  server = await startStaticServer({ root: dist, backups: { folder: createBackupFolder({ root: backupRoot, keep: 3 }), secret: SECRET, maxBytes: 1024 } });
});

afterAll(async () => {
  await server.close();
  rmSync(base, { recursive: true, force: true });
});

describe('backup endpoint', () => {
  it('writes a backup from our own page, lists it and reads it back', async () => {
    const bytes = new Uint8Array([80, 75, 5, 6, 1, 2, 3]);
    const saved = await post(nameAt(0), bytes);
    expect(saved.status).toBe(201);
    expect(JSON.parse(saved.body.toString())).toMatchObject({ id: `${STUDY}/${nameAt(0)}`, studyId: STUDY, bytes: 7 });
    const listed = await raw(server.port, '/__heed/backups', { headers: own() });
    expect(listed.status).toBe(200);
    const listing = JSON.parse(listed.body.toString()) as { folder: string; keep: number; backups: { id: string }[] };
    expect(listing.folder).toBe(backupRoot);
    expect(listing.keep).toBe(3);
    expect(listing.backups.map((b) => b.id)).toEqual([`${STUDY}/${nameAt(0)}`]);
    const read = await raw(server.port, `/__heed/backups/file?id=${encodeURIComponent(`${STUDY}/${nameAt(0)}`)}`, { headers: own() });
    expect(read.status).toBe(200);
    expect([...read.body]).toEqual([...bytes]);
  });

  it('refuses another origin, another site, a missing or wrong secret, and a POST naming no origin', async () => {
    const before = files();
    const body = new Uint8Array([1]);
    expect((await post(nameAt(1), body, { origin: 'http://evil.example', 'x-heed-backup': SECRET })).status).toBe(403);
    expect((await post(nameAt(1), body, { ...own(), 'sec-fetch-site': 'cross-site' })).status).toBe(403);
    expect((await post(nameAt(1), body, { origin: own().origin })).status).toBe(403);
    expect((await post(nameAt(1), body, { ...own(), 'x-heed-backup': 'b'.repeat(64) })).status).toBe(403);
    expect((await post(nameAt(1), body, { 'x-heed-backup': SECRET })).status).toBe(403);
    expect((await raw(server.port, '/__heed/backups', { headers: { origin: 'http://evil.example', 'x-heed-backup': SECRET } })).status).toBe(403);
    expect((await raw(server.port, '/__heed/backups')).status).toBe(403);
    expect(files()).toEqual(before);
  });

  it('refuses a body over the limit, in its header or in fact, and another content type', async () => {
    const before = files();
    expect((await post(nameAt(2), new Uint8Array(2048))).status).toBe(413);
    const lying = await raw(server.port, `/__heed/backups?study=${STUDY}&name=${nameAt(2)}`, {
      method: 'POST', body: new Uint8Array(4096), headers: { ...own(), 'content-type': 'application/zip', 'transfer-encoding': 'chunked' },
    });
    expect(lying.status).toBe(413);
    expect((await post(nameAt(2), new Uint8Array(4), { ...own(), 'content-type': 'text/plain' })).status).toBe(415);
    expect(files()).toEqual(before);
  });

  it('refuses path tricks in the study id, the file name and the id read', async () => {
    const body = new Uint8Array([1]);
    for (const [study, name] of [['..', nameAt(3)], [STUDY, `../${nameAt(3)}`], [STUDY, '..%2Fx.zip'], ['a/b', nameAt(3)], [STUDY, 'notes.txt'], [STUDY, `${nameAt(3)}/x.zip`]] as const) {
      expect((await post(name, body, own(), study)).status).toBe(400);
    }
    expect((await raw(server.port, `/__heed/backups/file?id=${encodeURIComponent(`../${STUDY}/${nameAt(0)}`)}`, { headers: own() })).status).toBe(400);
    expect((await raw(server.port, `/__heed/backups/file?id=${encodeURIComponent(`${STUDY}/${nameAt(9)}`)}`, { headers: own() })).status).toBe(404);
    expect(readdirSync(backupRoot)).toEqual([STUDY]);
  });

  it('keeps the last N backups of a study, and never a file that is not a backup', async () => {
    writeFileSync(path.join(backupRoot, STUDY, 'notes.txt'), 'mine');
    for (const ms of [10, 11, 12, 13, 14]) expect((await post(nameAt(ms), new Uint8Array([ms]))).status).toBe(201);
    expect(files()).toEqual([nameAt(12), nameAt(13), nameAt(14), 'notes.txt']);
  });

  it('answers other methods with 405', async () => {
    expect((await raw(server.port, '/__heed/backups', { method: 'DELETE', headers: own() })).status).toBe(405);
  });
});

describe('backup folder rules', () => {
  it('prunes to the newest N by the time in the name', () => {
    expect(backupsToRemove([nameAt(3), 'x.txt', nameAt(1), nameAt(2)], 2)).toEqual([nameAt(1)]);
    expect(backupsToRemove([nameAt(1)], 0)).toEqual([]);
    expect(backupsToRemove([nameAt(1), nameAt(2)], 5)).toEqual([]);
  });

  it('names what is wrong with a study id or file name', () => {
    expect(backupProblem(STUDY, nameAt(0))).toBeNull();
    expect(backupProblem('', nameAt(0))).toMatch(/study id/);
    expect(backupProblem(STUDY, '.zip')).toMatch(/file name/);
    expect(parseBackupId(`${STUDY}/${nameAt(0)}`)).toEqual({ studyId: STUDY, fileName: nameAt(0) });
    expect(parseBackupId(`${STUDY}/${nameAt(0)}/x`)).toBeNull();
  });

  it('lives under $XDG_DATA_HOME when absolute, else ~/.local/share', () => {
    expect(defaultBackupRoot({ XDG_DATA_HOME: '/data' }, '/home/ana')).toBe('/data/heed/backups');
    expect(defaultBackupRoot({ XDG_DATA_HOME: 'rel' }, '/home/ana')).toBe('/home/ana/.local/share/heed/backups');
    expect(defaultBackupRoot({}, '/home/ana')).toBe('/home/ana/.local/share/heed/backups');
  });
});
