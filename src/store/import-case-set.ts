/**
 * Importing a case set: the whole set is validated first (docs/formats.md, "The case set"); only a set with no
 * problem is stored, in one transaction, so a refused set leaves the database exactly as it was.
 */
import { readCaseSet } from '../io/case-set/read-case-set';
import type { CaseSetProblem, CaseSetSummary, SetSource } from '../io/case-set/types';
import { DuplicateCaseSet, saveCaseSet } from './case-sets';
import { caseSetContentHash } from './content-hash';
import type { HeedDb } from './db';
import type { StoredCaseSet } from './records';

export type ImportOutcome =
  | { ok: true; caseSet: StoredCaseSet; summary: CaseSetSummary }
  /** `duplicateOf`: the id of a stored set with the same content */
  | { ok: false; problems: CaseSetProblem[]; total: number; duplicateOf?: string };

export const importCaseSet = async (db: HeedDb, source: SetSource): Promise<ImportOutcome> => {
  const result = await readCaseSet(source);
  if (!result.ok) return result;
  const contentHash = await caseSetContentHash(result.manifest, result.images);
  await fingerprintOlderSets(db);
  try {
    const caseSet = await saveCaseSet(db, { name: result.manifest.name, source: 'import', manifest: result.manifest, images: result.images, contentHash });
    return { ok: true, caseSet, summary: result.summary };
  } catch (error) {
    if (!(error instanceof DuplicateCaseSet)) throw error;
    const { existing } = error;
    const message = `this set has the same cases and images as the stored case set “${existing.name}” (stored ${existing.createdAt.slice(0, 10)}); `
      + 'nothing was stored. Use that set, or rename it if you did not recognise it.';
    return { ok: false, problems: [{ file: '', row: null, column: null, message }], total: 1, duplicateOf: existing.id };
  }
};

/** Sets stored before fingerprints existed get theirs now (hashing cannot run inside a transaction). */
const fingerprintOlderSets = async (db: HeedDb): Promise<void> => {
  for (const set of await db.caseSets.toArray()) {
    if (set.contentHash !== undefined) continue;
    const images = await db.images.where('setId').equals(set.id).toArray();
    const contentHash = await caseSetContentHash(set.manifest, images);
    await db.caseSets.update(set.id, { contentHash });
  }
};

/** One line per problem: "cases.csv:12: column truth: must be 0 or 1". */
export const problemLine = (label: string, p: CaseSetProblem): string =>
  `${[label, p.file].filter(Boolean).join('/')}${p.row !== null ? `:${p.row}` : ''}: ${p.column ? `column ${p.column}: ` : ''}${p.message}`;
