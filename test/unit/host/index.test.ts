import type { Host } from '../../../src/host/index';
import { chooseHost } from '../../../src/host/index';

const ok = async () => ({ ok: true as const, value: null });
const fullBridge = { saveFile: ok, printToPdf: ok, pickCaseSet: ok, readCaseFile: ok, openFolder: ok, saveBackup: ok, listBackups: ok, readBackup: ok };
const browser: Host = {
  kind: 'browser',
  saveFile: async () => ({ saved: false }),
  printToPdf: async () => ({ saved: false }),
  pickCaseSet: async () => null,
  saveBackup: async () => { throw new Error('no backups'); },
  listBackups: async () => ({ available: false, reason: 'none' }),
  readBackup: async () => new Uint8Array(0),
};

describe('chooseHost', () => {
  it('chooses the Electron host when the preload bridge is present', () => {
    const factory = vi.fn(() => browser);
    const host = chooseHost({ heedHost: fullBridge }, factory);
    expect(host.kind).toBe('electron');
    expect(typeof host.openFolder).toBe('function');
    expect(factory).not.toHaveBeenCalled();
  });

  it('chooses the browser host without a bridge, or with a partial one', () => {
    expect(chooseHost({}, () => browser)).toBe(browser);
    const { openFolder: _dropped, ...partial } = fullBridge;
    expect(chooseHost({ heedHost: partial }, () => browser)).toBe(browser);
    expect(chooseHost({ heedHost: 'electron' }, () => browser)).toBe(browser);
  });
});
