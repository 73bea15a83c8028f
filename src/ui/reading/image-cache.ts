/** Decoded images of a case set, loaded ahead so the next case paints in the next frame. */
import type { HeedDb } from '../../store/db';
import { getImage } from '../../store/case-sets';
import { decodeGray, prepareWindow, type GrayImage } from './gray-image';

export type ImageCache = {
  get: (path: string) => Promise<GrayImage>;
  /** the decoded image when it is already loaded, so a prefetched case can be drawn in the same render */
  peek: (path: string) => GrayImage | undefined;
  forget: (keep: ReadonlySet<string>) => void;
};

export const createImageCache = (db: HeedDb, setId: string): ImageCache => {
  const entries = new Map<string, Promise<GrayImage>>();
  const decoded = new Map<string, GrayImage>();
  return {
    peek: (path) => decoded.get(path),
    get: (path) => {
      let entry = entries.get(path);
      if (!entry) {
        entry = getImage(db, setId, path).then((stored) => decodeGray(stored.bytes, stored.mime)).then((image) => {
          // its pixels at the opening window too, so the case's first draw is one copy
          prepareWindow(image);
          decoded.set(path, image);
          return image;
        });
        entries.set(path, entry);
        entry.catch(() => entries.delete(path));
      }
      return entry;
    },
    forget: (keep) => {
      for (const path of entries.keys()) if (!keep.has(path)) { entries.delete(path); decoded.delete(path); }
    },
  };
};
