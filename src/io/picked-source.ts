/** A case set picked through the host (a folder's files, or one .zip) as a SetSource. */
import type { SetSource } from './case-set/types';
import { zipSource } from './case-set/zip-source';

export type PickedFiles = { label: string; files: { path: string; read(): Promise<Uint8Array> }[] };

export const pickedSource = async (picked: PickedFiles): Promise<SetSource> => {
  const only = picked.files[0];
  if (picked.files.length === 1 && only && /\.zip$/i.test(only.path)) return zipSource(await only.read(), picked.label);
  const byPath = new Map(picked.files.map((f) => [f.path, f]));
  return {
    label: picked.label,
    list: async () => [...byPath.keys()],
    read: async (path) => {
      const file = byPath.get(path);
      if (!file) throw new Error(`${path} is not in ${picked.label}`);
      return file.read();
    },
  };
};
