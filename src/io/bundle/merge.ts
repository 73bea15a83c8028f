/**
 * Merging copies of one study from several workstations (docs/bundle.md, "Merge rules"):
 * - only copies of the same study with the same design fingerprint merge;
 * - readers and sessions are joined by id (a withdrawal on any copy wins; a code corrected on one
 *   copy only is refused); reads are added by read id, and two different answers
 *   under one id are refused, naming both (bundle and events.jsonl line);
 * - events are joined by content: an event in several copies is kept once;
 * - when one copy already holds every event, its chain is kept as it is; otherwise the events are
 *   ordered by time stamp (then by content) and chained again from the study's genesis.
 * So merging is idempotent (a copy merged again adds nothing) and does not depend on the order of
 * its inputs. Throws BundleMergeError with one plain message.
 */
import { canonicalJson, genesisHash, sha256Hex, type ChainedEvent } from '../../core/chain';
import { contentKeyOf } from './detail-text';
import { ANSWER_EVENTS, type SnapshotRead, type SnapshotReader, type SnapshotSession, type StudySnapshot } from './snapshot';
import { designFingerprint } from './texts';

export type MergeInput = { label: string; snapshot: StudySnapshot };

export class BundleMergeError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'BundleMergeError';
  }
}

const byText = (a: string, b: string): number => (a < b ? -1 : a > b ? 1 : 0);

const answerText = (read: SnapshotRead, type: string): string => {
  const part = type === 'initial-committed' ? read.initial : read.final;
  return part ? `${type === 'initial-committed' ? 'initial' : 'final'} call ${part.call}${part.confidence === null ? '' : ` (confidence ${part.confidence})`} after ${part.ms} ms` : 'no answer';
};

type Place = { label: string; line: number; key: string; read: SnapshotRead; type: string };

const joinById = <T extends { id: string }>(lists: { label: string; items: readonly T[] }[], combine: (a: T, b: T, labels: string) => T): T[] => {
  const out = new Map<string, { item: T; label: string }>();
  for (const { label, items } of lists) {
    for (const item of items) {
      const seen = out.get(item.id);
      out.set(item.id, seen ? { item: combine(seen.item, item, `${seen.label} and ${label}`), label: seen.label } : { item, label });
    }
  }
  return [...out.values()].map((v) => v.item);
};

const minText = (a: string | null, b: string | null): string | null => (a === null ? b : b === null ? a : a < b ? a : b);

const joinSessions = (a: SnapshotSession, b: SnapshotSession, labels: string): SnapshotSession => {
  if (canonicalJson(a.items) !== canonicalJson(b.items)) throw new BundleMergeError(`${labels} hold different case lists for session ${a.id}`);
  const override = [a.override, b.override].filter((o) => o !== null).sort((x, y) => byText(canonicalJson(x), canonicalJson(y)))[0] ?? null;
  return { ...a, startedAt: minText(a.startedAt, b.startedAt) ?? a.startedAt, completedAt: minText(a.completedAt, b.completedAt), override };
};

type Withdrawal = NonNullable<SnapshotReader['withdrawn']>;

/** The earlier of two withdrawals (then by content), so the choice does not depend on the order of copies. */
const earlierWithdrawal = (a: Withdrawal, b: Withdrawal): Withdrawal =>
  byText(a.at, b.at) < 0 ? a : byText(a.at, b.at) > 0 ? b : byText(canonicalJson(a), canonicalJson(b)) <= 0 ? a : b;

/**
 * One reader in two copies. A withdrawal recorded on any copy wins and keeps its reason (the
 * earlier one when both copies withdrew); a code corrected on one copy only is refused, naming both
 * codes; every other field must be equal.
 */
const joinReaders = (a: SnapshotReader, b: SnapshotReader, labels: string): SnapshotReader => {
  if (a.code !== b.code) {
    throw new BundleMergeError(`${labels} hold two different codes for one reader (id ${a.id}): ${a.code} and ${b.code}; correct the code on the other copy too, so that both match, then merge`);
  }
  const rest = (r: SnapshotReader) => canonicalJson({ ...r, withdrawn: null });
  if (rest(a) !== rest(b)) throw new BundleMergeError(`${labels} hold two different versions of reader ${a.code}`);
  const withdrawn = a.withdrawn && b.withdrawn ? earlierWithdrawal(a.withdrawn, b.withdrawn) : a.withdrawn ?? b.withdrawn ?? null;
  if (withdrawn !== null) return { ...a, withdrawn };
  // neither withdrawn: the form without the field, if either copy has it, whatever the order
  return a.withdrawn === undefined ? a : b.withdrawn === undefined ? b : a;
};

export const mergeSnapshots = (inputs: readonly MergeInput[]): StudySnapshot => {
  const first = inputs[0];
  if (!first) throw new BundleMergeError('nothing to merge');
  const fingerprint = designFingerprint(first.snapshot);
  for (const { label, snapshot } of inputs) {
    if (snapshot.study.id !== first.snapshot.study.id) throw new BundleMergeError(`${label} is another study (${snapshot.study.id}, not ${first.snapshot.study.id})`);
    if (designFingerprint(snapshot) !== fingerprint) throw new BundleMergeError(`${label} has another design or case set than ${first.label}: copies of a study merge only with the same design fingerprint`);
    if (canonicalJson(snapshot.suggestions) !== canonicalJson(first.snapshot.suggestions)) throw new BundleMergeError(`${label} shows other suggestions than ${first.label}`);
  }

  const readers = joinById<SnapshotReader>(inputs.map((i) => ({ label: i.label, items: i.snapshot.readers })), joinReaders);
  const codes = new Map<string, string>();
  for (const r of readers) {
    const other = codes.get(r.code.toLowerCase());
    if (other !== undefined) throw new BundleMergeError(`reader code ${r.code} was enrolled separately on two workstations (ids ${other} and ${r.id}); correct one code before merging`);
    codes.set(r.code.toLowerCase(), r.id);
  }
  const sessions = joinById<SnapshotSession>(inputs.map((i) => ({ label: i.label, items: i.snapshot.sessions })), joinSessions);

  // Events by content, each kept as often as the copy that holds it most often; answers checked by read id.
  const counts = new Map<string, { event: ChainedEvent; n: number }>();
  const answers = new Map<string, Place>();
  for (const { label, snapshot } of inputs) {
    const local = new Map<string, number>();
    snapshot.events.forEach((event, index) => {
      const key = contentKeyOf(event);
      local.set(key, (local.get(key) ?? 0) + 1);
      if (!counts.has(key)) counts.set(key, { event, n: 0 });
      if (!ANSWER_EVENTS.has(event.type)) return;
      const read = event.detail.read as SnapshotRead;
      const place: Place = { label, line: index + 1, key, read, type: event.type };
      const slot = `${read.id}\u0000${event.type}`;
      const seen = answers.get(slot);
      if (seen && seen.key !== key) {
        throw new BundleMergeError(`two different answers under read ${read.id}: ${seen.label} (events.jsonl line ${seen.line}) has ${answerText(seen.read, seen.type)}; ${label} (events.jsonl line ${place.line}) has ${answerText(read, event.type)}`);
      }
      if (!seen) answers.set(slot, place);
    });
    for (const [key, n] of local) {
      const entry = counts.get(key);
      if (entry && n > entry.n) entry.n = n;
    }
  }
  const total = [...counts.values()].reduce((sum, c) => sum + c.n, 0);
  // A copy that already holds every event keeps its chain as it is (the smallest head wins a tie).
  const complete = inputs.filter((i) => i.snapshot.events.length === total).map((i) => i.snapshot)
    .sort((a, b) => byText(a.events.at(-1)?.hash ?? '', b.events.at(-1)?.hash ?? ''))[0];
  let events: ChainedEvent[];
  if (complete) {
    events = complete.events;
  } else {
    const keyed: { event: ChainedEvent; key: string }[] = [];
    for (const [key, { event, n }] of counts) for (let k = 0; k < n; k++) keyed.push({ event, key });
    keyed.sort((a, b) => byText(a.event.at, b.event.at) || byText(a.key, b.key));
    // The content key is the very text a link hashes (canonical {at, detail, type}), so the chain is built from it.
    events = [];
    let prev = genesisHash(first.snapshot.study.id);
    for (const { event, key } of keyed) {
      const hash = sha256Hex(`${prev}\n${key}`);
      events.push({ at: event.at, type: event.type, detail: event.detail, prev, hash });
      prev = hash;
    }
  }

  const studies = inputs.map((i) => i.snapshot.study).sort((a, b) => byText(canonicalJson(a), canonicalJson(b)));
  const study = studies[0] ?? first.snapshot.study;
  const imageSha256 = new Map<string, string>();
  for (const { snapshot } of inputs) for (const [p, sha] of snapshot.caseSet.imageSha256) imageSha256.set(p, sha);
  const withImages = inputs.find((i) => i.snapshot.images !== null)?.snapshot.images ?? null;
  const lockedAt = studies.reduce<string | null>((m, s) => minText(m, s.lockedAt), null);
  return {
    study: { ...study, lockedAt },
    suggestions: first.snapshot.suggestions,
    caseSet: { name: inputs.map((i) => i.snapshot.caseSet.name).sort(byText)[0] ?? first.snapshot.caseSet.name, manifest: first.snapshot.caseSet.manifest, imageSha256 },
    images: withImages,
    readers: readers.sort((a, b) => a.slot - b.slot || byText(a.id, b.id)),
    sessions: sessions.sort((a, b) => byText(a.id, b.id)),
    events,
  };
};
