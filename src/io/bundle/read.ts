/**
 * Reads and verifies a study bundle. Nothing is trusted until checked, in an order that blames
 * the right place: the manifest's shape; every file but the two chained ones against its size and
 * SHA-256 in the manifest; study.json and the fingerprints; cases.csv against study.json; each
 * line of events.jsonl against the chain; reads.csv against the reads the chain holds; then the
 * manifest's entries and chain head for the chained files. Returns the first fault, named by
 * file and line, or the study as a snapshot. Pure and synchronous (no Node APIs).
 */
import { canonicalJson, contentText, eventLine, genesisHash, sha256Hex, type ChainedEvent } from '../../core/chain';
import { parseStudyJson } from '../../core/study-json';
import type { CaseImage } from '../../core/case-set';
import type { StudyDesign } from '../../core/design';
import { sniffImage } from '../case-set/magic';
import { firstDifference, lineOf, type BundleFault } from './fault';
import { manifestFileSchema, studyBundlePartSchema, type StudyBundlePart } from './schemas';
import { ANSWER_EVENTS, type StudySnapshot } from './snapshot';
import { BUNDLE_FORMAT, BUNDLE_VERSION, bundleCasesCsv, caseSetFingerprint, designFingerprint, readsCsv } from './texts';
import { IMAGE_FOLDER, MANIFEST, type BundleManifest } from './write';
import { unzipBundle } from './zip-guard';

export type ReadBundle = { ok: true; snapshot: StudySnapshot; manifest: BundleManifest } | { ok: false; fault: BundleFault };

const CHAINED = new Set(['events.jsonl', 'reads.csv']);
const REQUIRED = ['reads.csv', 'events.jsonl', 'study.json', 'data-dictionary.md', 'datapackage.json', 'cases.csv'];

const fail = (file: string, line: number | null, message: string): ReadBundle => ({ ok: false, fault: { file, line, message } });

const strict = new TextDecoder('utf-8', { fatal: true });
const text = (bytes: Uint8Array): string | null => {
  try {
    return strict.decode(bytes);
  } catch {
    return null;
  }
};
// The chained files are compared line by line: a byte that is not UTF-8 becomes U+FFFD, so the
// comparison names the very line it is on.
const lenient = new TextDecoder('utf-8');

/** The 1-based line of the first bytes that are not UTF-8, or null when all are. */
export const firstNonUtf8Line = (bytes: Uint8Array): number | null => {
  let line = 1;
  for (let start = 0; start <= bytes.length; line++) {
    const end = bytes.indexOf(0x0a, start);
    const stop = end === -1 ? bytes.length : end;
    if (text(bytes.subarray(start, stop)) === null) return line;
    if (end === -1) break;
    start = end + 1;
  }
  return null;
};

// Heed's own JSON is a few levels deep (an event's detail holds its read, which holds an answer);
// recursive code (canonical JSON, schemas) would overflow the stack on thousands of levels.
const MAX_NESTING = 64;

/** Whether JSON text opens more than `max` arrays or objects inside each other (strings skipped). */
export const nestedDeeperThan = (json: string, max: number): boolean => {
  let depth = 0;
  for (let i = 0; i < json.length; i++) {
    const c = json.charCodeAt(i);
    if (c === 0x22) {
      // a string (most of an event's text: hashes, ids, times): to its closing quote, one not
      // preceded by an odd run of backslashes
      let end = json.indexOf('"', i + 1);
      for (;;) {
        if (end === -1) return false; // not JSON: JSON.parse refuses it
        let slashes = 0;
        while (json.charCodeAt(end - 1 - slashes) === 0x5c) slashes++;
        if (slashes % 2 === 0) break;
        end = json.indexOf('"', end + 1);
      }
      i = end;
    } else if (c === 0x7b || c === 0x5b) {
      if (++depth > max) return true;
    } else if (c === 0x7d || c === 0x5d) depth--;
  }
  return false;
};

type ChainCheck = { ok: true; events: ChainedEvent[] } | { ok: false; fault: BundleFault };

const HEX64 = /^[0-9a-f]{64}$/;
const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

/** What is wrong with an event line's shape (checked by hand: tens of thousands of lines), or null. */
const eventShapeProblem = (v: unknown): string | null => {
  if (!isRecord(v)) return 'not a JSON object';
  const keys = Object.keys(v);
  if (keys.length !== 5) return `has ${keys.length} fields, an event has 5 (at, detail, hash, prev, type)`;
  if (typeof v.at !== 'string') return 'at is not text';
  if (typeof v.type !== 'string' || v.type === '') return 'type is not text';
  if (!isRecord(v.detail)) return 'detail is not an object';
  if (typeof v.prev !== 'string' || !HEX64.test(v.prev)) return 'prev is not a SHA-256';
  if (typeof v.hash !== 'string' || !HEX64.test(v.hash)) return 'hash is not a SHA-256';
  return null;
};

const isPart = (v: unknown): boolean =>
  v === null || (isRecord(v) && (v.call === 0 || v.call === 1) && (v.confidence === null || typeof v.confidence === 'number') && typeof v.ms === 'number');

/** An answer event's read has what reads.csv and a restore need (checked by hand, for speed). */
const isRead = (v: unknown): boolean =>
  isRecord(v) && typeof v.id === 'string' && typeof v.sessionId === 'string' && typeof v.studyId === 'string' && typeof v.readerId === 'string'
  && typeof v.caseId === 'string' && typeof v.finding === 'string' && typeof v.shownAt === 'string'
  && typeof v.period === 'number' && Number.isInteger(v.period) && v.period >= 1 && isPart(v.initial) && isPart(v.final)
  && (v.aiCall === null || v.aiCall === 0 || v.aiCall === 1) && (v.aiScore === null || typeof v.aiScore === 'number')
  && typeof v.aiPlanted === 'boolean' && typeof v.cautionShown === 'boolean';

/** Every line of events.jsonl: canonical JSON, linked to the line before, hash over its content. */
export const checkEventLines = (body: string, studyId: string): ChainCheck => {
  const file = 'events.jsonl';
  const lines = body.split('\n');
  const events: ChainedEvent[] = [];
  if (lines.at(-1) !== '') return { ok: false, fault: { file, line: lines.length, message: 'the last line does not end with a line break: it was cut or edited' } };
  let prev = genesisHash(studyId);
  for (let i = 0; i < lines.length - 1; i++) {
    const line = i + 1;
    const raw = lines[i] as string;
    let value: unknown;
    try {
      value = JSON.parse(raw);
    } catch {
      return { ok: false, fault: { file, line, message: 'not valid JSON: the line was edited, cut or inserted' } };
    }
    const shape = eventShapeProblem(value);
    if (shape !== null) return { ok: false, fault: { file, line, message: `not an event line (${shape}): the line was edited or inserted` } };
    const e = value as ChainedEvent;
    let detailText: string;
    try {
      detailText = canonicalJson(e.detail);
    } catch {
      // JSON.parse reads any depth, canonicalJson recurses: thousands of levels overflow the stack
      // (scanning every line for its depth first would cost a tenth of a verify)
      return { ok: false, fault: { file, line, message: 'its JSON is nested too deeply to read (Heed writes a few levels): the line was edited or inserted' } };
    }
    if (eventLine(e, detailText) !== raw) return { ok: false, fault: { file, line, message: 'not written the way Heed writes it (canonical JSON): the line was edited' } };
    if (e.prev !== prev) {
      return { ok: false, fault: { file, line, message: `does not follow line ${i === 0 ? 'the start of the chain' : i}: a line was removed, inserted or moved here` } };
    }
    if (sha256Hex(`${prev}\n${contentText(e.at, e.type, detailText)}`) !== e.hash) return { ok: false, fault: { file, line, message: 'its hash does not match its content: the line was edited' } };
    if (ANSWER_EVENTS.has(e.type) && !isRead(e.detail.read)) {
      return { ok: false, fault: { file, line, message: 'an answer event without a valid read' } };
    }
    events.push(e);
    prev = e.hash;
  }
  return { ok: true, events };
};

export const readBundle = (zip: Uint8Array): ReadBundle => {
  const unzipped = unzipBundle(zip);
  if (!unzipped.ok) return unzipped;
  const entries = unzipped.entries;
  const files = new Map(Object.entries(entries).filter(([path]) => !path.endsWith('/')));
  const manifestBytes = files.get(MANIFEST);
  if (!manifestBytes) return fail(MANIFEST, null, 'missing: this is not a Heed study bundle');
  const manifestBody = text(manifestBytes);
  let manifestValue: unknown;
  try {
    manifestValue = JSON.parse(manifestBody ?? '');
  } catch {
    return fail(MANIFEST, null, 'not valid JSON: the manifest was edited');
  }
  const parsedManifest = manifestFileSchema.safeParse(manifestValue);
  if (!parsedManifest.success || manifestBody === null) {
    const issue = parsedManifest.error?.issues[0];
    const key = issue?.path.at(-1);
    return fail(MANIFEST, typeof key === 'string' ? lineOf(manifestBody ?? '', `"${key}"`) : null, `not a bundle manifest (${issue?.path.join('.') ?? ''}: ${issue?.message ?? 'unreadable'})`);
  }
  const manifest = parsedManifest.data;
  const mline = (needle: string): number | null => lineOf(manifestBody, needle);
  if (manifest.format !== BUNDLE_FORMAT) return fail(MANIFEST, mline('"format"'), `format is ${JSON.stringify(manifest.format)}, not ${BUNDLE_FORMAT}`);
  if (manifest.version !== BUNDLE_VERSION) return fail(MANIFEST, mline('"version"'), `bundle version ${manifest.version} is not supported (this Heed reads version ${BUNDLE_VERSION})`);

  // 1. Files listed and present; every unchained file against its entry.
  const entryLine = (path: string): number | null => mline(`{"path":${JSON.stringify(path)}`);
  const listed = new Map(manifest.files.map((f) => [f.path, f]));
  for (const path of REQUIRED) if (!listed.has(path)) return fail(MANIFEST, mline('"files"'), `does not list ${path}`);
  for (const f of manifest.files) if (!files.has(f.path)) return fail(MANIFEST, entryLine(f.path), `lists ${f.path}, which is not in the bundle`);
  for (const path of files.keys()) if (path !== MANIFEST && !listed.has(path)) return fail(path, null, 'is in the bundle but not listed in manifest.json: it was added');
  for (const f of manifest.files) {
    if (CHAINED.has(f.path)) continue;
    const bytes = files.get(f.path) as Uint8Array;
    if (bytes.length !== f.bytes || sha256Hex(bytes) !== f.sha256) {
      return fail(f.path, null, `its size or SHA-256 differs from manifest.json line ${entryLine(f.path) ?? '?'}: the file or that entry was changed`);
    }
  }

  // 2. study.json, and the manifest's ids and fingerprints against it.
  const studyBody = text(files.get('study.json') as Uint8Array) ?? '';
  if (nestedDeeperThan(studyBody, MAX_NESTING)) return fail('study.json', null, `its JSON is nested deeper than ${MAX_NESTING} levels: Heed never writes that; the file was edited`);
  const record = parseStudyJson(studyBody);
  if (!record.ok) return fail('study.json', null, record.problems[0] ?? 'unreadable');
  // Checked by the schemas, then used as written: a schema's output may reorder or drop keys,
  // and the fingerprints must be those of the very values the writer had.
  const raw = JSON.parse(studyBody) as { design: StudyDesign; bundle?: unknown };
  const part = studyBundlePartSchema.safeParse(raw.bundle);
  if (!part.success) return fail('study.json', lineOf(studyBody, '"bundle"'), `bundle section: ${part.error.issues[0]?.path.join('.') ?? ''} ${part.error.issues[0]?.message ?? ''}`);
  const b = raw.bundle as StudyBundlePart;
  const imageSha256 = new Map(Object.entries(b.imageSha256));
  const snapshot: StudySnapshot = {
    study: { id: record.study.studyId, name: b.name, design: raw.design, createdAt: b.createdAt, lockedAt: b.lockedAt },
    suggestions: b.suggestions,
    caseSet: { name: record.study.caseSet.name, manifest: b.caseSetManifest, imageSha256 },
    images: null,
    readers: b.readers,
    sessions: b.sessions,
    events: [],
  };
  if (manifest.study_id !== snapshot.study.id) return fail(MANIFEST, mline('"study_id"'), `study id ${manifest.study_id} is not the study of study.json (${snapshot.study.id})`);
  if (manifest.case_set_fingerprint !== caseSetFingerprint(b.caseSetManifest)) return fail(MANIFEST, mline('"case_set_fingerprint"'), 'the case set fingerprint does not match study.json');
  if (manifest.design_fingerprint !== designFingerprint(snapshot)) return fail(MANIFEST, mline('"design_fingerprint"'), 'the design fingerprint does not match study.json');

  // 3. cases.csv as study.json says; the images, when carried, as their hashes say.
  const casesFault = firstDifference('cases.csv', lenient.decode(files.get('cases.csv') as Uint8Array), bundleCasesCsv(b.caseSetManifest, imageSha256), true);
  if (casesFault) return { ok: false, fault: casesFault };
  if (manifest.images_included) {
    const images: CaseImage[] = [];
    for (const c of b.caseSetManifest.cases) {
      for (const path of c.images) {
        const bytes = files.get(`${IMAGE_FOLDER}${path}`);
        const mime = bytes ? sniffImage(bytes) : null;
        if (!bytes || !mime) return fail(`${IMAGE_FOLDER}${path}`, null, 'missing or not a PNG/JPEG image');
        if (sha256Hex(bytes) !== imageSha256.get(path)) return fail(`${IMAGE_FOLDER}${path}`, null, 'its SHA-256 differs from the one in study.json');
        images.push({ path, mime, bytes });
      }
    }
    snapshot.images = images;
  }

  // 4. The chain, line by line; then its end against the manifest.
  const eventsBytes = files.get('events.jsonl') as Uint8Array;
  // the chain hashes text, so bytes that are not UTF-8 (which would read as U+FFFD) are refused first
  const eventsBody = text(eventsBytes);
  if (eventsBody === null) return fail('events.jsonl', firstNonUtf8Line(eventsBytes), 'holds bytes that are not UTF-8: the line was edited');
  const chain = checkEventLines(eventsBody, snapshot.study.id);
  if (!chain.ok) return chain;
  snapshot.events = chain.events;
  const head = chain.events.at(-1)?.hash ?? genesisHash(snapshot.study.id);
  const eventsEntry = listed.get('events.jsonl');
  const eventsIntact = eventsEntry !== undefined && eventsEntry.bytes === eventsBytes.length && eventsEntry.sha256 === sha256Hex(eventsBytes);
  if (head !== manifest.chain.head) {
    return eventsIntact
      ? fail(MANIFEST, mline('"head"'), 'the chain head is not the hash of the last line of events.jsonl: the manifest was changed')
      : fail('events.jsonl', chain.events.length + 1, `the chain stops at line ${chain.events.length}, before the head named in manifest.json: lines were removed at the end`);
  }
  if (!eventsIntact) return fail(MANIFEST, entryLine('events.jsonl'), 'the size or SHA-256 of events.jsonl differs from the file, whose chain is intact: the entry was changed');
  if (manifest.chain.events !== chain.events.length) return fail(MANIFEST, mline('"events"'), `says ${manifest.chain.events} events; events.jsonl holds ${chain.events.length}`);

  // 5. reads.csv: exactly the reads the chain holds, as the writer writes them.
  const readsBytes = files.get('reads.csv') as Uint8Array;
  let expectedReads: string;
  try {
    expectedReads = readsCsv(snapshot);
  } catch (error) {
    return fail('events.jsonl', null, `its reads do not fit study.json: ${error instanceof Error ? error.message : String(error)}`);
  }
  const readsFault = firstDifference('reads.csv', lenient.decode(readsBytes), expectedReads, true);
  if (readsFault) return { ok: false, fault: readsFault };
  const readsEntry = listed.get('reads.csv');
  if (!readsEntry || readsEntry.bytes !== readsBytes.length || readsEntry.sha256 !== sha256Hex(readsBytes)) {
    return fail(MANIFEST, entryLine('reads.csv'), 'the size or SHA-256 of reads.csv differs from the file, which matches the chain: the entry was changed');
  }
  const readCount = expectedReads.split('\n').length - 2;
  if (manifest.chain.reads !== readCount) return fail(MANIFEST, mline('"reads"'), `says ${manifest.chain.reads} reads; reads.csv holds ${readCount}`);
  return { ok: true, snapshot, manifest };
};
