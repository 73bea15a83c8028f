/**
 * The text of each file of a study bundle, built from a snapshot. The writer uses these, and the
 * verifier builds reads.csv and cases.csv again from the chain and study.json and compares them
 * line by line, so an edit anywhere in those files is found at its line.
 */
import Papa from 'papaparse';
import { canonicalJson, eventLine, sha256Hex, type ChainedEvent } from '../../core/chain';
import { detailText } from './detail-text';
import { joinReadRows } from '../../core/read-rows';
import { plantedList } from '../../core/planting';
import { studyJson } from '../../core/study-json';
import type { CaseSetManifest } from '../../core/case-set';
import { dataDictionary } from '../data-dictionary';
import { casesCsv } from '../case-set/write-cases-csv';
import { readLogCsv } from '../read-log-export';
import { readsOfChain, type StudySnapshot } from './snapshot';

export const BUNDLE_FORMAT = 'heed-study-bundle';
export const BUNDLE_VERSION = 1;

/** The extra columns of the bundle's reads.csv, after every read-log column (docs/formats.md). */
export const CHAIN_COLUMNS = ['read_id', 'read_hash'] as const;

// Fingerprints remembered by manifest object: a verify, a merge and a write each ask for the same
// manifest's several times, and a large case set's canonical text takes tens of milliseconds.
// Manifests are never changed in place (as event details, io/bundle/detail-text.ts).
const fingerprints = new WeakMap<CaseSetManifest, string>();

/** A fingerprint of the case set's content (cases, truths, model outputs, attributes), independent of its name and key order. */
export const caseSetFingerprint = (manifest: CaseSetManifest): string => {
  let fingerprint = fingerprints.get(manifest);
  if (fingerprint === undefined) {
    fingerprint = sha256Hex(canonicalJson({ cases: manifest.cases, findings: manifest.findings, attributeNames: manifest.attributeNames }));
    fingerprints.set(manifest, fingerprint);
  }
  return fingerprint;
};

/** What makes two workstations' copies "the same study": its design over the same cases. */
export const designFingerprint = (snapshot: Pick<StudySnapshot, 'study' | 'caseSet'>): string =>
  sha256Hex(canonicalJson({ studyId: snapshot.study.id, design: snapshot.study.design, caseSet: caseSetFingerprint(snapshot.caseSet.manifest) }));

export const eventsJsonl = (events: readonly ChainedEvent[]): string => {
  let out = '';
  for (const e of events) out += `${eventLine(e, detailText(e.detail))}\n`;
  return out;
};

export const readsCsv = (snapshot: StudySnapshot): string => {
  const reads = [...readsOfChain(snapshot.events).values()];
  const hashOf = new Map(reads.map((r) => [r.read.id, r.hash]));
  const joined = joinReadRows(snapshot.study, snapshot.caseSet.manifest, snapshot.readers, snapshot.sessions, reads.map((r) => r.read));
  return readLogCsv(joined.map((j) => j.row), snapshot.caseSet.manifest.attributeNames, {
    names: CHAIN_COLUMNS,
    cells: (i) => {
      const id = joined[i]?.read.id ?? '';
      return [id, hashOf.get(id) ?? ''];
    },
  });
};

/** The case set's cases.csv (docs/formats.md) with one more column: the SHA-256 of each image, `;`-joined like `image`. */
export const bundleCasesCsv = (manifest: CaseSetManifest, imageSha256: ReadonlyMap<string, string>): string => {
  const parsed = Papa.parse<string[]>(casesCsv(manifest), { skipEmptyLines: true });
  const [header, ...rows] = parsed.data;
  const imageColumn = header?.indexOf('image') ?? -1;
  const data = rows.map((row) => [...row, (row[imageColumn] ?? '').split(';').map((p) => imageSha256.get(p) ?? '').join(';')]);
  return `${Papa.unparse({ fields: [...(header ?? []), 'image_sha256'], data }, { newline: '\n' })}\n`;
};

/** study.json: the design record of core/study-json.ts, then what a workstation needs to restore the study. */
export const bundleStudyJson = (snapshot: StudySnapshot): string => {
  const { study, caseSet } = snapshot;
  const record: unknown = JSON.parse(studyJson(study.design, {
    studyId: study.id, caseSet: { name: caseSet.name, fingerprint: caseSetFingerprint(caseSet.manifest) }, planted: plantedList(snapshot.suggestions),
  }));
  const imageSha256 = Object.fromEntries([...caseSet.imageSha256].sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)));
  return `${JSON.stringify({
    ...(record as Record<string, unknown>),
    bundle: {
      name: study.name, createdAt: study.createdAt, lockedAt: study.lockedAt,
      readers: [...snapshot.readers].sort((a, b) => a.slot - b.slot || (a.id < b.id ? -1 : 1)),
      sessions: [...snapshot.sessions].sort((a, b) => (a.id < b.id ? -1 : a.id > b.id ? 1 : 0)), suggestions: snapshot.suggestions,
      caseSetManifest: caseSet.manifest, imageSha256,
    },
  }, null, 2)}\n`;
};

export const bundleDictionary = (manifest: CaseSetManifest): string => [
  dataDictionary(manifest.attributeNames).trimEnd(),
  'read_id: text, bundle only: the read\'s identifier (reader/period/case/finding), unique in the study; merging adds reads by it',
  'read_hash: text, bundle only: SHA-256 (hex) of the event in events.jsonl that committed this answer (the hash chain; see docs/bundle.md)',
  '',
].join('\n');
