/**
 * Importing a case set: the whole set is validated first (docs/formats.md, "The case set"); only a set with no
 * problem is stored, in one transaction, so a refused set leaves the database exactly as it was.
 */
import { readCaseSet } from '../io/case-set/read-case-set';
import type { CaseSetProblem, CaseSetSummary, SetSource } from '../io/case-set/types';
import { saveCaseSet } from './case-sets';
import type { HeedDb } from './db';
import type { StoredCaseSet } from './records';

export type ImportOutcome =
  | { ok: true; caseSet: StoredCaseSet; summary: CaseSetSummary }
  | { ok: false; problems: CaseSetProblem[]; total: number };

export const importCaseSet = async (db: HeedDb, source: SetSource): Promise<ImportOutcome> => {
  const result = await readCaseSet(source);
  if (!result.ok) return result;
  const caseSet = await saveCaseSet(db, { name: result.manifest.name, source: 'import', manifest: result.manifest, images: result.images });
  return { ok: true, caseSet, summary: result.summary };
};

/** One line per problem: "cases.csv:12: column truth: must be 0 or 1". */
export const problemLine = (label: string, p: CaseSetProblem): string =>
  `${[label, p.file].filter(Boolean).join('/')}${p.row !== null ? `:${p.row}` : ''}: ${p.column ? `column ${p.column}: ` : ''}${p.message}`;
