// The whole Electron path without Electron: host -> preload bridge -> main handlers -> disk.
import { mkdtempSync, readFileSync, rmSync, writeFileSync, mkdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';

const electron = vi.hoisted(() => ({ showSaveDialog: vi.fn(), showOpenDialog: vi.fn() }));
vi.mock('electron', () => ({
  app: { getPath: () => '/tmp' },
  BrowserWindow: { fromWebContents: () => null },
  dialog: { showSaveDialog: electron.showSaveDialog, showOpenDialog: electron.showOpenDialog },
  shell: { showItemInFolder: vi.fn() },
  contextBridge: { exposeInMainWorld: vi.fn() },
  ipcRenderer: { invoke: vi.fn() },
}));

import type { IpcMainInvokeEvent } from 'electron';
import { CHANNELS, CHANNEL_KEYS, READ_CHUNK_BYTES } from '../../../electron/ipc-contract';
import { createHandlers } from '../../../electron/ipc-main';
import { makeBridge } from '../../../electron/preload';
import { chooseHost } from '../../../src/host/index';

const event = { senderFrame: { url: 'heed://app/index.html' }, sender: {} } satisfies object as unknown as IpcMainInvokeEvent;

const wiredHost = () => {
  const handlers = createHandlers();
  const byChannel = new Map<string, (e: IpcMainInvokeEvent, raw: unknown) => Promise<unknown>>(CHANNEL_KEYS.map((k) => [CHANNELS[k], handlers[k]]));
  // Structured clone stands in for Electron's IPC serialisation.
  const bridge = makeBridge(async (channel, payload) => {
    const handler = byChannel.get(channel);
    if (!handler) throw new Error(`no handler for ${channel}`);
    return structuredClone(await handler(event, structuredClone(payload))) as never;
  });
  return chooseHost({ heedHost: bridge }, () => { throw new Error('should have chosen the Electron host'); });
};

let dir: string;
beforeEach(() => { dir = mkdtempSync(path.join(tmpdir(), 'heed-trip-')); });
afterEach(() => rmSync(dir, { recursive: true, force: true }));

describe('Electron host round trip', () => {
  it('saves a file', async () => {
    const where = path.join(dir, 'reads.csv');
    electron.showSaveDialog.mockResolvedValue({ canceled: false, filePath: where });
    const host = wiredHost();
    expect(host.kind).toBe('electron');
    await expect(host.saveFile('reads.csv', 'study_id\nS1\n', 'text/csv')).resolves.toEqual({ saved: true, where });
    expect(readFileSync(where, 'utf8')).toBe('study_id\nS1\n');
  });

  it('turns a refusal by the main process into a thrown Error with its message', async () => {
    await expect(wiredHost().saveFile('reads.csv', 'x', 'csv')).rejects.toThrow('heed:save-file: mime: mime is not a media type such as text/csv');
  });

  it('picks a folder and reads a file larger than one chunk, byte for byte', async () => {
    const set = path.join(dir, 'set');
    mkdirSync(path.join(set, 'images'), { recursive: true });
    const big = Buffer.alloc(2 * READ_CHUNK_BYTES + 17);
    for (let i = 0; i < big.length; i += 1) big[i] = (i * 7) % 256;
    writeFileSync(path.join(set, 'images', 'big.png'), big);
    writeFileSync(path.join(set, 'cases.csv'), 'case_id\n');
    electron.showOpenDialog.mockResolvedValue({ canceled: false, filePaths: [set] });
    const picked = await wiredHost().pickCaseSet();
    expect(picked?.label).toBe('set');
    expect(picked?.files.map((f) => f.path)).toEqual(['cases.csv', 'images/big.png']);
    const bytes = await picked?.files[1]?.read();
    expect(bytes && Buffer.from(bytes).equals(big)).toBe(true);
  });
});
