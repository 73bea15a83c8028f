/** Case sets and their images. A set is stored whole in one transaction, or not at all. */
import type { CaseImage, CaseSetManifest } from '../core/case-set';
import type { HeedDb } from './db';
import { appendEvent } from './events';
import type { StoredCaseSet, StoredImage } from './records';

/** The set being stored has the same content as one already stored (checked inside the storing transaction). */
export class DuplicateCaseSet extends Error {
  constructor(readonly existing: StoredCaseSet) {
    super(`same content as the stored case set “${existing.name}”`);
    this.name = 'DuplicateCaseSet';
  }
}

export type NewCaseSet = { name: string; source: 'demo' | 'import'; manifest: CaseSetManifest; images: CaseImage[]; contentHash?: string };

export const saveCaseSet = async (db: HeedDb, input: NewCaseSet, id: string = crypto.randomUUID()): Promise<StoredCaseSet> => {
  const record: StoredCaseSet = {
    id,
    name: input.name,
    source: input.source,
    createdAt: new Date().toISOString(),
    manifest: input.manifest,
    imageCount: input.images.length,
    imageBytes: input.images.reduce((sum, image) => sum + image.bytes.byteLength, 0),
    ...(input.contentHash === undefined ? {} : { contentHash: input.contentHash }),
  };
  await db.transaction('rw', db.caseSets, db.images, db.events, async () => {
    if (input.contentHash !== undefined) {
      const same = (await db.caseSets.toArray()).find((s) => s.contentHash === input.contentHash);
      if (same) throw new DuplicateCaseSet(same);
    }
    await db.caseSets.add(record);
    await db.images.bulkAdd(input.images.map((image): StoredImage => ({ setId: id, path: image.path, mime: image.mime, bytes: image.bytes })));
    await appendEvent(db, null, 'case-set-stored', { caseSetId: id, name: input.name, cases: input.manifest.cases.length, images: input.images.length });
  });
  return record;
};

export const listCaseSets = (db: HeedDb): Promise<StoredCaseSet[]> => db.caseSets.orderBy('createdAt').toArray();

export const getCaseSet = async (db: HeedDb, id: string): Promise<StoredCaseSet> => {
  const found = await db.caseSets.get(id);
  if (!found) throw new Error(`no case set with id ${id}`);
  return found;
};

export const getImage = async (db: HeedDb, setId: string, path: string): Promise<StoredImage> => {
  const found = await db.images.get([setId, path]);
  if (!found) throw new Error(`case set ${setId} has no image ${path}`);
  return found;
};
