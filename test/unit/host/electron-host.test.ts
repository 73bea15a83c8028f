import type { BridgeResult, FileChunk, HeedBridge } from '../../../src/host/bridge';
import { createElectronHost } from '../../../src/host/electron-host';

const ok = <T>(value: T): BridgeResult<T> => ({ ok: true, value });

/** A bridge whose readCaseFile serves `content` in chunks of `chunk` bytes. */
const fakeBridge = (content: Uint8Array, chunk: number, overrides: Partial<HeedBridge> = {}) => {
  const reads: number[] = [];
  const bridge: HeedBridge = {
    saveFile: vi.fn(async () => ok({ saved: true, where: '/docs/reads.csv' })),
    printToPdf: vi.fn(async () => ok({ saved: false })),
    pickCaseSet: vi.fn(async () => ok({ token: 't', label: 'set', files: [{ path: 'images/a.png', size: content.length }] })),
    readCaseFile: vi.fn(async ({ offset }): Promise<BridgeResult<FileChunk>> => {
      reads.push(offset);
      return ok({ bytes: content.slice(offset, offset + chunk), size: content.length });
    }),
    openFolder: vi.fn(async () => ok(true)),
    saveBackup: vi.fn(async ({ studyId, fileName }) => ok({ id: `${studyId}/${fileName}`, studyId, fileName, bytes: 3, savedAt: '2026-12-02T04:00:00.000Z' })),
    listBackups: vi.fn(async () => ok({ available: true as const, folder: '/data/backups', keep: 10, backups: [] })),
    readBackup: vi.fn(async () => ok(new Uint8Array([1, 2]))),
    ...overrides,
  };
  return { bridge, reads };
};

const bytes = (n: number) => Uint8Array.from({ length: n }, (_, i) => (i * 13) % 256);

describe('createElectronHost', () => {
  it('reads a picked file chunk by chunk into the exact bytes', async () => {
    const content = bytes(10);
    const { bridge, reads } = fakeBridge(content, 4);
    const set = await createElectronHost(bridge).pickCaseSet('zip');
    expect(bridge.pickCaseSet).toHaveBeenCalledWith({ kind: 'zip' });
    expect(set?.label).toBe('set');
    expect(await set?.files[0]?.read()).toEqual(content);
    expect(reads).toEqual([0, 4, 8]);
  });

  it('picks a folder by default, and reads an empty file', async () => {
    const { bridge } = fakeBridge(new Uint8Array(0), 4);
    const set = await createElectronHost(bridge).pickCaseSet();
    expect(bridge.pickCaseSet).toHaveBeenCalledWith({ kind: 'folder' });
    expect(await set?.files[0]?.read()).toEqual(new Uint8Array(0));
  });

  it('fails instead of looping when a file changes while read', async () => {
    const content = bytes(10);
    let call = 0;
    const { bridge } = fakeBridge(content, 4, {
      readCaseFile: async () => {
        call += 1;
        return ok({ bytes: call === 1 ? content.slice(0, 4) : new Uint8Array(0), size: 10 });
      },
    });
    const set = await createElectronHost(bridge).pickCaseSet();
    await expect(set?.files[0]?.read()).rejects.toThrow('images/a.png changed while it was being read');
  });

  it('returns null when the user cancels', async () => {
    const { bridge } = fakeBridge(bytes(1), 1, { pickCaseSet: async () => ok(null) });
    expect(await createElectronHost(bridge).pickCaseSet()).toBeNull();
  });

  it('throws the main process error message', async () => {
    const { bridge } = fakeBridge(bytes(1), 1, { saveFile: async () => ({ ok: false, error: 'heed:save-file: disk full' }) });
    await expect(createElectronHost(bridge).saveFile('a.csv', 'x', 'text/csv')).rejects.toThrow('heed:save-file: disk full');
  });

  it('checks the suggested name before asking the main process', async () => {
    const { bridge } = fakeBridge(bytes(1), 1);
    const host = createElectronHost(bridge);
    await expect(host.saveFile('../a.csv', 'x', 'text/csv')).rejects.toThrow(/folder separator/);
    await expect(host.printToPdf('')).rejects.toThrow(/empty/);
    expect(bridge.saveFile).not.toHaveBeenCalled();
    expect(bridge.printToPdf).not.toHaveBeenCalled();
    await expect(host.saveFile('reads.csv', 'x', 'text/csv')).resolves.toEqual({ saved: true, where: '/docs/reads.csv' });
    expect(await host.openFolder?.('/docs/reads.csv')).toBe(true);
  });

  it('passes backups through the bridge and unwraps the answers and refusals', async () => {
    const { bridge } = fakeBridge(new Uint8Array(0), 4, {
      readBackup: vi.fn(async () => ({ ok: false as const, error: 'heed:read-backup: id: not a backup id' })),
    });
    const host = createElectronHost(bridge);
    expect(await host.saveBackup('s1', 'x.zip', new Uint8Array([1, 2, 3]))).toMatchObject({ id: 's1/x.zip', bytes: 3 });
    expect(bridge.saveBackup).toHaveBeenCalledWith({ studyId: 's1', fileName: 'x.zip', bytes: new Uint8Array([1, 2, 3]) });
    expect(await host.listBackups()).toEqual({ available: true, folder: '/data/backups', keep: 10, backups: [] });
    expect(bridge.listBackups).toHaveBeenCalledWith(null);
    await expect(host.readBackup('nope')).rejects.toThrow(/not a backup id/);
  });
});
