// The Electron host: every service goes through the preload's bridge (window.heedHost); this file
// never imports Electron. Errors from the main process become thrown Errors with its message.
import type { BridgeResult, HeedBridge } from './bridge';
import { checkFileName } from './file-name';
import type { CaseSetKind, Host, PickedCaseSet } from './types';

const unwrap = <T>(result: BridgeResult<T>): T => {
  if (!result.ok) throw new Error(result.error);
  return result.value;
};

/** Reads a listed file chunk by chunk into one buffer (the main process bounds each chunk). */
const readWhole = async (bridge: HeedBridge, token: string, path: string): Promise<Uint8Array> => {
  const first = unwrap(await bridge.readCaseFile({ token, path, offset: 0 }));
  if (first.bytes.length === first.size) return first.bytes;
  const whole = new Uint8Array(first.size);
  whole.set(first.bytes, 0);
  let offset = first.bytes.length;
  while (offset < first.size) {
    const chunk = unwrap(await bridge.readCaseFile({ token, path, offset }));
    // A file that changed size under us, or an empty chunk, would otherwise loop or overflow.
    if (chunk.size !== first.size || chunk.bytes.length === 0 || offset + chunk.bytes.length > first.size) {
      throw new Error(`${path} changed while it was being read`);
    }
    whole.set(chunk.bytes, offset);
    offset += chunk.bytes.length;
  }
  return whole;
};

export const createElectronHost = (bridge: HeedBridge): Host => ({
  kind: 'electron',
  saveFile: async (suggestedName, data, mime) =>
    unwrap(await bridge.saveFile({ suggestedName: checkFileName(suggestedName), data, mime })),
  printToPdf: async (suggestedName) =>
    unwrap(await bridge.printToPdf({ suggestedName: checkFileName(suggestedName) })),
  pickCaseSet: async (kind: CaseSetKind = 'folder'): Promise<PickedCaseSet | null> => {
    const listing = unwrap(await bridge.pickCaseSet({ kind }));
    if (listing === null) return null;
    return {
      label: listing.label,
      files: listing.files.map((f) => ({ path: f.path, read: () => readWhole(bridge, listing.token, f.path) })),
    };
  },
  openFolder: async (where) => unwrap(await bridge.openFolder({ where })),
  saveBackup: async (studyId, fileName, bytes) => unwrap(await bridge.saveBackup({ studyId, fileName, bytes })),
  listBackups: async () => unwrap(await bridge.listBackups(null)),
  readBackup: async (id) => unwrap(await bridge.readBackup({ id })),
});
