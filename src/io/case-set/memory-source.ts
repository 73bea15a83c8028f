// A SetSource over files already in memory: tests, the demo generator's output, drag-and-drop.
import type { SetSource } from './types';

/** Paths as given (relative, '/'); strings are stored as UTF-8. */
export const memorySource = (files: Record<string, Uint8Array | string>, label: string): SetSource => {
  const encoder = new TextEncoder();
  const bytes = new Map(Object.entries(files).map(([path, v]) => [path, typeof v === 'string' ? encoder.encode(v) : v]));
  return {
    label,
    list: async () => [...bytes.keys()],
    read: async (path) => {
      const found = bytes.get(path);
      if (!found) throw new Error(`no file ${path}`);
      return found;
    },
    size: async (path) => bytes.get(path)?.length ?? 0,
  };
};
