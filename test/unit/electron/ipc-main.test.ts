import { existsSync, mkdirSync, mkdtempSync, readFileSync, readdirSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';

const electron = vi.hoisted(() => ({
  showSaveDialog: vi.fn(),
  showOpenDialog: vi.fn(),
  showItemInFolder: vi.fn(),
  handle: vi.fn(),
}));
vi.mock('electron', () => ({
  app: { getPath: () => '/home/reader/Documents' },
  BrowserWindow: { fromWebContents: () => null },
  dialog: { showSaveDialog: electron.showSaveDialog, showOpenDialog: electron.showOpenDialog },
  shell: { showItemInFolder: electron.showItemInFolder },
}));

import type { IpcMain, IpcMainInvokeEvent } from 'electron';
import { CHANNELS, CHANNEL_KEYS, READ_CHUNK_BYTES } from '../../../electron/ipc-contract';
import { createHandlers, registerIpc } from '../../../electron/ipc-main';
import { createBackupFolder } from '../../../scripts/lib/backup-folder.mjs';

const printToPDF = vi.fn(async () => Buffer.from('%PDF-1.7 fake'));
const eventFrom = (url: string | null) =>
  ({ senderFrame: url === null ? null : { url }, sender: { printToPDF } }) satisfies object as unknown as IpcMainInvokeEvent;
const fromApp = eventFrom('heed://app/index.html');
const STUDY = '3f1c2b7e-0d6a-4c55-9a43-1f2e3d4c5b6a';
const BACKUP = '2026-12-02T04-00-00-000Z-demo.zip';

let dir: string;
beforeEach(() => {
  dir = mkdtempSync(path.join(tmpdir(), 'heed-ipc-'));
  vi.clearAllMocks();
});
afterEach(() => rmSync(dir, { recursive: true, force: true }));

describe('every handler refuses malformed payloads with { ok: false }', () => {
  const bad: Record<(typeof CHANNEL_KEYS)[number], unknown[]> = {
    saveFile: [undefined, null, 'x', {}, { suggestedName: 'a.csv', data: 'x' },
      { suggestedName: '../a.csv', data: 'x', mime: 'text/csv' },
      { suggestedName: 'a.csv', data: 42, mime: 'text/csv' },
      { suggestedName: 'a.csv', data: 'x', mime: 'not a mime' },
      { suggestedName: 'a.csv', data: 'x', mime: 'text/csv', extra: 1 }],
    printToPdf: [undefined, {}, { suggestedName: '' }, { suggestedName: 'a/b.pdf' }, { suggestedName: 7 }],
    pickCaseSet: [undefined, {}, { kind: 'file' }, { kind: 'folder', path: '/etc' }],
    readCaseFile: [undefined, { token: 'not-a-uuid', path: 'a', offset: 0 },
      { token: crypto.randomUUID(), path: 'a', offset: -1 },
      { token: crypto.randomUUID(), path: 'a', offset: 1.5 },
      { token: crypto.randomUUID(), path: '', offset: 0 }],
    openFolder: [undefined, {}, { where: '' }, { where: 3 }],
    saveBackup: [undefined, {}, { studyId: STUDY, fileName: BACKUP, bytes: 'x' },
      { studyId: '..', fileName: BACKUP, bytes: new Uint8Array(1) },
      { studyId: STUDY, fileName: `../${BACKUP}`, bytes: new Uint8Array(1) },
      { studyId: STUDY, fileName: 'notes.txt', bytes: new Uint8Array(1) },
      { studyId: STUDY, fileName: BACKUP, bytes: new Uint8Array(1), extra: 1 }],
    listBackups: [undefined, {}, 'all'],
    readBackup: [undefined, {}, { id: `../${STUDY}/${BACKUP}` }, { id: `${STUDY}/${BACKUP}/x` }, { id: 3 }],
  };

  it.each(CHANNEL_KEYS)('%s', async (key) => {
    const handlers = createHandlers();
    for (const payload of bad[key]) {
      const answer = await handlers[key](fromApp, payload);
      expect(answer, JSON.stringify(payload)).toMatchObject({ ok: false, error: expect.stringContaining(CHANNELS[key]) });
    }
    expect(electron.showSaveDialog).not.toHaveBeenCalled();
    expect(electron.showOpenDialog).not.toHaveBeenCalled();
  });

  it('names the field at fault', async () => {
    const answer = await createHandlers().saveFile(fromApp, { suggestedName: 'a\\b.csv', data: 'x', mime: 'text/csv' });
    expect(answer).toEqual({ ok: false, error: 'heed:save-file: suggestedName: the suggested file name "a\\b.csv" holds a folder separator' });
  });
});

describe('origin check', () => {
  it.each([null, 'https://example.org/', 'file:///tmp/x.html', 'heed://other/'])('refuses a request from %s', async (url) => {
    const answer = await createHandlers().saveFile(eventFrom(url), { suggestedName: 'a.csv', data: 'x', mime: 'text/csv' });
    expect(answer).toMatchObject({ ok: false, error: expect.stringMatching(/did not come from Heed's own page/) });
    expect(electron.showSaveDialog).not.toHaveBeenCalled();
  });
});

describe('saveFile, printToPdf and openFolder', () => {
  it('writes where the user chose, and reports it', async () => {
    const where = path.join(dir, 'reads.csv');
    electron.showSaveDialog.mockResolvedValue({ canceled: false, filePath: where });
    const handlers = createHandlers();
    const answer = await handlers.saveFile(fromApp, { suggestedName: 'reads.csv', data: 'a,b\n1,2\n', mime: 'text/csv' });
    expect(answer).toEqual({ ok: true, value: { saved: true, where } });
    expect(readFileSync(where, 'utf8')).toBe('a,b\n1,2\n');
    expect(electron.showSaveDialog.mock.calls[0]?.[0]).toMatchObject({ defaultPath: '/home/reader/Documents/reads.csv' });
    const bytes = await handlers.saveFile(fromApp, { suggestedName: 'b.bin', data: new Uint8Array([1, 2, 3]), mime: 'application/octet-stream' });
    expect(bytes.ok).toBe(true);
    expect([...readFileSync(where)]).toEqual([1, 2, 3]);
  });

  it('writes nothing when the dialog is cancelled', async () => {
    electron.showSaveDialog.mockResolvedValue({ canceled: true, filePath: '' });
    const answer = await createHandlers().saveFile(fromApp, { suggestedName: 'reads.csv', data: 'x', mime: 'text/csv' });
    expect(answer).toEqual({ ok: true, value: { saved: false } });
  });

  it('turns a failed write into { ok: false } with the reason', async () => {
    electron.showSaveDialog.mockResolvedValue({ canceled: false, filePath: path.join(dir, 'no-such-folder', 'x.csv') });
    const answer = await createHandlers().saveFile(fromApp, { suggestedName: 'x.csv', data: 'x', mime: 'text/csv' });
    expect(answer).toMatchObject({ ok: false, error: expect.stringMatching(/^heed:save-file: ENOENT/) });
  });

  it('prints the sender to PDF and saves it', async () => {
    const where = path.join(dir, 'feedback.pdf');
    electron.showSaveDialog.mockResolvedValue({ canceled: false, filePath: where });
    const answer = await createHandlers().printToPdf(fromApp, { suggestedName: 'feedback.pdf' });
    expect(answer).toEqual({ ok: true, value: { saved: true, where } });
    expect(printToPDF).toHaveBeenCalledTimes(1);
    expect(readFileSync(where, 'utf8')).toBe('%PDF-1.7 fake');
  });

  it('shows only files it saved in this session', async () => {
    const where = path.join(dir, 'reads.csv');
    electron.showSaveDialog.mockResolvedValue({ canceled: false, filePath: where });
    const handlers = createHandlers();
    expect(await handlers.openFolder(fromApp, { where: '/etc/passwd' })).toMatchObject({ ok: false });
    expect(electron.showItemInFolder).not.toHaveBeenCalled();
    await handlers.saveFile(fromApp, { suggestedName: 'reads.csv', data: 'x', mime: 'text/csv' });
    expect(await handlers.openFolder(fromApp, { where })).toEqual({ ok: true, value: true });
    expect(electron.showItemInFolder).toHaveBeenCalledWith(where);
  });
});

describe('pickCaseSet and readCaseFile', () => {
  const makeSet = () => {
    const set = path.join(dir, 'vesper-set');
    mkdirSync(path.join(set, 'images', 'deep'), { recursive: true });
    mkdirSync(path.join(set, '.git'));
    writeFileSync(path.join(set, 'cases.csv'), 'case_id,finding,truth,image\n');
    writeFileSync(path.join(set, 'images', 'a.png'), 'png-a');
    writeFileSync(path.join(set, 'images', 'deep', 'b.png'), 'png-b');
    writeFileSync(path.join(set, '.DS_Store'), 'junk');
    writeFileSync(path.join(set, '.git', 'HEAD'), 'ref');
    writeFileSync(path.join(dir, 'secret.txt'), 'outside');
    symlinkSync(path.join(dir, 'secret.txt'), path.join(set, 'images', 'link.png'));
    return set;
  };

  it('lists a folder with relative paths, skipping hidden entries and symlinks', async () => {
    const set = makeSet();
    electron.showOpenDialog.mockResolvedValue({ canceled: false, filePaths: [set] });
    const answer = await createHandlers().pickCaseSet(fromApp, { kind: 'folder' });
    expect(answer.ok).toBe(true);
    if (!answer.ok) return;
    expect(answer.value).toMatchObject({
      label: 'vesper-set',
      files: [{ path: 'cases.csv', size: 28 }, { path: 'images/a.png', size: 5 }, { path: 'images/deep/b.png', size: 5 }],
    });
    expect(electron.showOpenDialog.mock.calls[0]?.[0]).toMatchObject({ properties: ['openDirectory'] });
  });

  it('returns null when the dialog is cancelled', async () => {
    electron.showOpenDialog.mockResolvedValue({ canceled: true, filePaths: [] });
    expect(await createHandlers().pickCaseSet(fromApp, { kind: 'zip' })).toEqual({ ok: true, value: null });
  });

  it('reads only listed files of a known token', async () => {
    const set = makeSet();
    electron.showOpenDialog.mockResolvedValue({ canceled: false, filePaths: [set] });
    const handlers = createHandlers();
    const picked = await handlers.pickCaseSet(fromApp, { kind: 'folder' });
    if (!picked.ok || picked.value === null) throw new Error('pick failed');
    const token = picked.value.token;
    const a = await handlers.readCaseFile(fromApp, { token, path: 'images/a.png', offset: 0 });
    expect(a).toMatchObject({ ok: true, value: { size: 5 } });
    if (a.ok) expect(Buffer.from(a.value.bytes).toString()).toBe('png-a');
    for (const p of ['images/link.png', '../secret.txt', '.DS_Store', '/etc/passwd', 'images/../../secret.txt']) {
      expect(await handlers.readCaseFile(fromApp, { token, path: p, offset: 0 }), p).toMatchObject({ ok: false, error: expect.stringMatching(/is not a file of the picked case set/) });
    }
    expect(await handlers.readCaseFile(fromApp, { token: crypto.randomUUID(), path: 'cases.csv', offset: 0 })).toMatchObject({ ok: false, error: expect.stringMatching(/no longer open/) });
    expect(await handlers.readCaseFile(fromApp, { token, path: 'images/a.png', offset: 6 })).toMatchObject({ ok: false, error: expect.stringMatching(/past the end/) });
  });

  it('answers big files in bounded chunks', async () => {
    const zip = path.join(dir, 'big-set.zip');
    const size = READ_CHUNK_BYTES + 1234;
    const content = Buffer.alloc(size);
    for (let i = 0; i < size; i += 1) content[i] = i % 251;
    writeFileSync(zip, content);
    electron.showOpenDialog.mockResolvedValue({ canceled: false, filePaths: [zip] });
    const handlers = createHandlers();
    const picked = await handlers.pickCaseSet(fromApp, { kind: 'zip' });
    if (!picked.ok || picked.value === null) throw new Error('pick failed');
    expect(picked.value).toMatchObject({ label: 'big-set', files: [{ path: 'big-set.zip', size }] });
    const first = await handlers.readCaseFile(fromApp, { token: picked.value.token, path: 'big-set.zip', offset: 0 });
    const rest = await handlers.readCaseFile(fromApp, { token: picked.value.token, path: 'big-set.zip', offset: READ_CHUNK_BYTES });
    if (!first.ok || !rest.ok) throw new Error('read failed');
    expect(first.value.bytes.length).toBe(READ_CHUNK_BYTES);
    expect(rest.value.bytes.length).toBe(1234);
    expect(Buffer.concat([first.value.bytes, rest.value.bytes]).equals(content)).toBe(true);
  });

  it('refuses a picked file that is not a .zip', async () => {
    const notZip = path.join(dir, 'cases.csv');
    writeFileSync(notZip, 'x');
    electron.showOpenDialog.mockResolvedValue({ canceled: false, filePaths: [notZip] });
    expect(await createHandlers().pickCaseSet(fromApp, { kind: 'zip' })).toMatchObject({ ok: false, error: expect.stringMatching(/is not a \.zip file/) });
  });
});

describe('saveBackup, listBackups and readBackup', () => {
  it('write into the backup folder, list newest first, read back, and keep the last ten of a study', async () => {
    const root = path.join(dir, 'backups');
    const handlers = createHandlers(undefined, () => createBackupFolder({ root }));
    const names = Array.from({ length: 12 }, (_, i) => `2026-12-02T04-00-${String(i).padStart(2, '0')}-000Z-demo.zip`);
    for (const [i, fileName] of names.entries()) {
      expect(await handlers.saveBackup(fromApp, { studyId: STUDY, fileName, bytes: new Uint8Array([i]) })).toMatchObject({ ok: true, value: { id: `${STUDY}/${fileName}`, bytes: 1 } });
    }
    const listed = await handlers.listBackups(fromApp, null);
    if (!listed.ok || !listed.value.available) throw new Error('listing failed');
    expect(listed.value.folder).toBe(root);
    expect(listed.value.backups.map((b) => b.fileName)).toEqual(names.slice(2).reverse());
    expect(await handlers.readBackup(fromApp, { id: `${STUDY}/${names[11]}` })).toEqual({ ok: true, value: new Uint8Array([11]) });
    expect(readdirSync(path.join(root, STUDY))).toHaveLength(10);
  });

  it('refuses a backup request from another page', async () => {
    const root = path.join(dir, 'backups');
    const answer = await createHandlers(undefined, () => createBackupFolder({ root })).saveBackup(eventFrom('https://example.org/'), { studyId: STUDY, fileName: BACKUP, bytes: new Uint8Array(1) });
    expect(answer).toMatchObject({ ok: false, error: expect.stringMatching(/did not come from Heed's own page/) });
    expect(existsSync(root)).toBe(false);
  });
});

describe('registerIpc', () => {
  it('registers one handler per channel, and nothing else', () => {
    const handle = vi.fn();
    registerIpc({ handle } satisfies Partial<IpcMain> as unknown as IpcMain);
    expect(handle.mock.calls.map((c) => c[0]).sort()).toEqual(Object.values(CHANNELS).sort());
    expect(CHANNEL_KEYS.slice().sort()).toEqual(Object.keys(CHANNELS).sort());
  });
});
