// Small thumbnails of the case-review cases, from the stored images, as data: URLs the report
// can carry inside itself (no file or address outside it).
import type { CaseReviewItem } from '../../analysis/reader-report/case-review';
import { getCaseSet, getImage } from '../../store/case-sets';
import type { HeedDb } from '../../store/db';

const SIDE = 160;

const thumbnail = async (bytes: Uint8Array, mime: string): Promise<string> => {
  const bitmap = await createImageBitmap(new Blob([new Uint8Array(bytes)], { type: mime }));
  const scale = Math.min(1, SIDE / Math.max(bitmap.width, bitmap.height));
  const canvas = document.createElement('canvas');
  canvas.width = Math.max(1, Math.round(bitmap.width * scale));
  canvas.height = Math.max(1, Math.round(bitmap.height * scale));
  canvas.getContext('2d')?.drawImage(bitmap, 0, 0, canvas.width, canvas.height);
  bitmap.close();
  return canvas.toDataURL('image/png');
};

/** Case id → thumbnail of its first image, for the cases in the review. */
export const caseThumbnails = async (db: HeedDb, caseSetId: string, items: readonly CaseReviewItem[]): Promise<Map<string, string>> => {
  const set = await getCaseSet(db, caseSetId);
  const paths = new Map(set.manifest.cases.map((c) => [c.caseId, c.images[0]]));
  const out = new Map<string, string>();
  for (const item of items) {
    const path = paths.get(item.case_id);
    if (path === undefined || out.has(item.case_id)) continue;
    const image = await getImage(db, caseSetId, path);
    out.set(item.case_id, await thumbnail(image.bytes, image.mime));
  }
  return out;
};
