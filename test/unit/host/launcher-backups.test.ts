// The browser's backups through the launcher: the secret comes from the page address and goes
// in a header; without it (a window opened any other way) nothing is asked and the reason shown.
import { backupFileName } from '../../../src/host/backup-name';
import { NO_SECRET_REASON, backupSecretOf, createLauncherBackups, type FetchLike } from '../../../src/host/launcher-backups';

const SECRET = 'c'.repeat(64);
const entry = { id: 's1/x.zip', studyId: 's1', fileName: 'x.zip', bytes: 3, savedAt: '2026-12-02T04:00:00.000Z' };

const answer = (status: number, body: unknown) => ({
  ok: status >= 200 && status < 300, status,
  text: async () => (typeof body === 'string' ? body : JSON.stringify(body)),
  json: async () => body,
  arrayBuffer: async () => new Uint8Array([9, 8]).buffer,
});

describe('launcher backups', () => {
  it('takes the secret only from a well-formed ?backup= value', () => {
    expect(backupSecretOf(`?mode=chromium&backup=${SECRET}`)).toBe(SECRET);
    expect(backupSecretOf('?backup=short')).toBeNull();
    expect(backupSecretOf('?mode=serve')).toBeNull();
  });

  it('posts the bundle with the secret header and returns the entry', async () => {
    const fetchFn = vi.fn<FetchLike>(async () => answer(201, entry));
    const saved = await createLauncherBackups(SECRET, fetchFn).saveBackup('s1', 'x.zip', new Uint8Array([1, 2, 3]));
    expect(saved).toEqual(entry);
    const [url, init] = fetchFn.mock.calls[0] ?? [];
    expect(url).toBe('/__heed/backups?study=s1&name=x.zip');
    expect(init).toMatchObject({ method: 'POST', headers: { 'Content-Type': 'application/zip', 'X-Heed-Backup': SECRET } });
  });

  it('turns a refusal into an error naming the status and the server\'s words', async () => {
    const fetchFn = vi.fn<FetchLike>(async () => answer(413, 'backups: larger than 10 bytes\n'));
    await expect(createLauncherBackups(SECRET, fetchFn).saveBackup('s1', 'x.zip', new Uint8Array(11))).rejects.toThrow(/\(413\): backups: larger than 10 bytes/);
  });

  it('without a secret asks nothing and says why', async () => {
    const fetchFn = vi.fn<FetchLike>(async () => answer(200, {}));
    const backups = createLauncherBackups(null, fetchFn);
    expect(await backups.listBackups()).toEqual({ available: false, reason: NO_SECRET_REASON });
    await expect(backups.saveBackup('s1', 'x.zip', new Uint8Array(1))).rejects.toThrow(/not opened by Heed’s launcher/);
    expect(fetchFn).not.toHaveBeenCalled();
  });

  it('lists the folder and entries, and reports a server without backups as unavailable', async () => {
    const listing = { folder: '/home/ana/.local/share/heed/backups', keep: 10, backups: [entry, { id: 7 }] };
    expect(await createLauncherBackups(SECRET, async () => answer(200, listing)).listBackups())
      .toEqual({ available: true, folder: listing.folder, keep: 10, backups: [entry] });
    const none = await createLauncherBackups(SECRET, async () => answer(405, 'method not allowed')).listBackups();
    expect(none).toMatchObject({ available: false, reason: expect.stringMatching(/takes no backups \(the launcher refused the backup request \(405\)/) });
  });

  it('reads a backup\'s bytes by id', async () => {
    const fetchFn = vi.fn<FetchLike>(async () => answer(200, null));
    expect(await createLauncherBackups(SECRET, fetchFn).readBackup('s1/x.zip')).toEqual(new Uint8Array([9, 8]));
    expect(fetchFn.mock.calls[0]?.[0]).toBe('/__heed/backups/file?id=s1%2Fx.zip');
  });
});

describe('backupFileName', () => {
  it('starts with the UTC moment, so name order is time order, then a file-safe study name', () => {
    const at = new Date(Date.UTC(2026, 11, 2, 4, 15, 0, 123));
    expect(backupFileName('Reader study: Halden/Korvik', at)).toBe('2026-12-02T04-15-00-123Z-Reader-study-Halden-Korvik.zip');
    expect(backupFileName('…', at)).toBe('2026-12-02T04-15-00-123Z.zip');
    expect(backupFileName('a', new Date(Date.UTC(2026, 11, 2, 4, 15, 1))) > backupFileName('z', at)).toBe(true);
  });
});
