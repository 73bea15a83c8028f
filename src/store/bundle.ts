/**
 * A study in and out of the store as a bundle snapshot (io/bundle): gather one to save, restore
 * one on a workstation that lacks the study, or merge another workstation's copy into the stored
 * study. Restore and merge each change the database in one transaction, or not at all, and write the
 * read packs of the completed sessions (read-packs.ts) in that transaction.
 */
import { sha256Hex } from '../core/chain';
import { faultText } from '../io/bundle/fault';
import { BundleMergeError, mergeSnapshots, type MergeInput } from '../io/bundle/merge';
import { readBundle } from '../io/bundle/read';
import { readsOfChain, type StudySnapshot } from '../io/bundle/snapshot';
import { caseSetFingerprint } from '../io/bundle/texts';
import { getCaseSet, saveCaseSet } from './case-sets';
import type { HeedDb } from './db';
import { appendEvent, eventsOfStudy } from './events';
import { InputError } from './input-error';
import { packsOf } from './read-packs';
import { listReaders } from './readers';
import type { StoredCaseSet, StoredEvent, StoredRead, StoredStudy } from './records';
import { getStudy } from './studies';

/** SHA-256 of every image of a stored case set, by path. */
const storedImageHashes = async (db: HeedDb, setId: string): Promise<Map<string, string>> => {
  const hashes = new Map<string, string>();
  await db.images.where('setId').equals(setId).each((image) => { hashes.set(image.path, sha256Hex(image.bytes)); });
  return hashes;
};

/**
 * A study as it is stored now. Its records are read in one read-only transaction, so the snapshot
 * is one moment of the study (an answer committed meanwhile in another window is either wholly in it
 * or not at all); the image hashes are taken after it, since a stored case set's images never change.
 */
export const gatherStudySnapshot = async (db: HeedDb, studyId: string, withImages = false): Promise<StudySnapshot> => {
  const { study, caseSet, readers, sessions, events } = await db.transaction('r', [db.studies, db.caseSets, db.readers, db.sessions, db.events], async () => {
    const stored = await getStudy(db, studyId);
    return {
      study: stored,
      caseSet: await getCaseSet(db, stored.caseSetId),
      readers: await listReaders(db, studyId),
      sessions: await db.sessions.where('studyId').equals(studyId).toArray(),
      events: await eventsOfStudy(db, studyId),
    };
  });
  return {
    study: { id: study.id, name: study.name, design: study.design, createdAt: study.createdAt, lockedAt: study.lockedAt },
    suggestions: study.suggestions,
    caseSet: { name: caseSet.name, manifest: caseSet.manifest, imageSha256: await storedImageHashes(db, caseSet.id) },
    images: withImages ? (await db.images.where('setId').equals(caseSet.id).toArray()).map((i) => ({ path: i.path, mime: i.mime, bytes: i.bytes })) : null,
    readers,
    sessions,
    events: events.map((e) => ({ at: e.at, type: e.type, detail: e.detail, prev: e.prev, hash: e.hash })),
  };
};

/** A stored case set with the same cases and the same image bytes (by SHA-256), if any. */
const matchingCaseSet = async (db: HeedDb, snapshot: StudySnapshot): Promise<StoredCaseSet | null> => {
  const fingerprint = caseSetFingerprint(snapshot.caseSet.manifest);
  for (const set of await db.caseSets.toArray()) {
    if (caseSetFingerprint(set.manifest) !== fingerprint) continue;
    const hashes = await storedImageHashes(db, set.id);
    if ([...snapshot.caseSet.imageSha256].every(([path, sha]) => hashes.get(path) === sha)) return set;
  }
  return null;
};

const storedRecords = (snapshot: StudySnapshot, caseSetId: string) => {
  const studyId = snapshot.study.id;
  const study: StoredStudy = { ...snapshot.study, caseSetId, suggestions: snapshot.suggestions };
  const events: StoredEvent[] = snapshot.events.map((e) => ({ ...e, studyId, chain: studyId }));
  const reads: StoredRead[] = [...readsOfChain(snapshot.events).values()].map((r) => ({ ...r.read, hash: r.hash }));
  return { study, events, reads };
};

export type Restored = { study: StoredStudy; caseSet: StoredCaseSet; caseSetImported: boolean };

/**
 * Restores a verified bundle's study: design, readers, sessions, reads and events, over a stored
 * case set with the same images, or over the bundle's own images. Refused, with nothing stored,
 * when the study is already here or its case set is neither stored nor carried.
 */
export const restoreStudy = async (db: HeedDb, snapshot: StudySnapshot): Promise<Restored> => {
  const existing = await db.studies.get(snapshot.study.id);
  if (existing) throw new InputError(`Study "${existing.name}" is already on this workstation: open it and merge the bundle into it instead.`);
  const match = await matchingCaseSet(db, snapshot);
  if (!match && !snapshot.images) {
    throw new InputError(`The case set "${snapshot.caseSet.name}" (${snapshot.caseSet.manifest.cases.length} cases) of this study is not on this workstation, and the bundle does not carry its images: import that case set first, or save the bundle again with its images.`);
  }
  return db.transaction('rw', [db.caseSets, db.images, db.studies, db.readers, db.sessions, db.reads, db.packs, db.events], async () => {
    // checked again here: another window may have restored the study, or deleted the matching case set, since
    const restored = await db.studies.get(snapshot.study.id);
    if (restored) throw new InputError(`Study "${restored.name}" was stored on this workstation meanwhile (another window): open it and merge the bundle into it instead.`);
    if (match && !(await db.caseSets.get(match.id))) throw new InputError(`The case set "${match.name}" was deleted meanwhile (another window): open the bundle again.`);
    const caseSet = match ?? await saveCaseSet(db, { name: snapshot.caseSet.name, source: 'import', manifest: snapshot.caseSet.manifest, images: snapshot.images ?? [] });
    const { study, events, reads } = storedRecords(snapshot, caseSet.id);
    await db.studies.add(study);
    await db.readers.bulkAdd(snapshot.readers);
    await db.sessions.bulkAdd(snapshot.sessions);
    await db.events.bulkAdd(events);
    await db.reads.bulkAdd(reads);
    // put, not add: a build from before packs deletes a study without its packs
    await db.packs.bulkPut(packsOf(snapshot.sessions, reads));
    await appendEvent(db, null, 'study-restored', { studyId: study.id, name: study.name, caseSetId: caseSet.id, head: events.at(-1)?.hash ?? null });
    return { study, caseSet, caseSetImported: !match };
  });
};

export type MergeOutcome = { added: number; snapshot: StudySnapshot };

/** How many times a merge is computed again when the study changes under it before it gives up. */
export const MERGE_TRIES = 3;

/** The study changed (another window) between gathering its copy and storing the merge. */
class StudyChangedMeanwhile extends Error {}

/**
 * Merges another workstation's copy of a stored study (io/bundle/merge.ts rules) and stores the
 * result in place of the study's readers, sessions, reads and events. Merging a copy that adds
 * nothing leaves the store untouched.
 *
 * The merge is computed from a snapshot gathered before the transaction that replaces the
 * study's records. Every change to a study's readers, sessions and reads appends to its chain in
 * the change's own transaction, so the replacing transaction first checks the chain's head and
 * length against the snapshot's: if another window changed the study meanwhile (an answer
 * committed, a reader withdrawn), nothing is written, and the merge is gathered and computed
 * again, at most MERGE_TRIES times; then it is refused with an InputError, nothing changed.
 */
export const mergeIntoStudy = async (db: HeedDb, other: MergeInput): Promise<MergeOutcome> => {
  for (let attempt = 1; ; attempt++) {
    try {
      return await mergeOnce(db, other);
    } catch (error) {
      if (!(error instanceof StudyChangedMeanwhile)) throw error;
      if (attempt >= MERGE_TRIES) {
        throw new InputError(`the study kept changing in another window of this workstation while the bundle was merged (${MERGE_TRIES} tries), so nothing was merged; merge it again when no reader is answering in this study.`);
      }
    }
  }
};

const mergeOnce = async (db: HeedDb, other: MergeInput): Promise<MergeOutcome> => {
  const local = await gatherStudySnapshot(db, other.snapshot.study.id);
  const before = readsOfChain(local.events);
  const merged = mergeSnapshots([{ label: 'this workstation', snapshot: local }, other]);
  const after = readsOfChain(merged.events);
  const added = [...after.keys()].filter((id) => !before.has(id)).length;
  const unchanged = merged.events.length === local.events.length && merged.events.every((e, i) => e.hash === local.events[i]?.hash)
    && merged.readers.length === local.readers.length && merged.sessions.length === local.sessions.length;
  if (unchanged) return { added: 0, snapshot: local };
  await db.transaction('rw', [db.studies, db.readers, db.sessions, db.reads, db.packs, db.events], async () => {
    const id = local.study.id;
    // the snapshot must still be the study as stored: same chain head, same number of links
    const study = await db.studies.get(id);
    if (!study) throw new InputError('the study was deleted meanwhile (another window), so nothing was merged.');
    const head = (await db.events.where('chain').equals(id).last())?.hash ?? null;
    const links = await db.events.where('chain').equals(id).count();
    if (head !== (local.events.at(-1)?.hash ?? null) || links !== local.events.length) throw new StudyChangedMeanwhile();
    await db.readers.where('studyId').equals(id).delete();
    await db.sessions.where('studyId').equals(id).delete();
    await db.reads.where('studyId').equals(id).delete();
    await db.packs.where('studyId').equals(id).delete();
    await db.events.where('studyId').equals(id).delete();
    const { events, reads } = storedRecords(merged, study.caseSetId);
    await db.studies.put({ ...study, lockedAt: merged.study.lockedAt });
    await db.readers.bulkAdd(merged.readers);
    await db.sessions.bulkAdd(merged.sessions);
    await db.events.bulkAdd(events);
    await db.reads.bulkAdd(reads);
    await db.packs.bulkAdd(packsOf(merged.sessions, reads));
  });
  return { added, snapshot: merged };
};

export type BundleOpening = { ok: true; restored: Restored } | { ok: false; message: string };

/** "Open a study bundle": verify, then restore; a faulty or unfit bundle is refused with one message and nothing stored. */
export const openStudyBundle = async (db: HeedDb, fileName: string, zip: Uint8Array): Promise<BundleOpening> => {
  const read = readBundle(zip);
  if (!read.ok) return { ok: false, message: `${fileName} was not opened: ${faultText(read.fault)}` };
  try {
    return { ok: true, restored: await restoreStudy(db, read.snapshot) };
  } catch (error) {
    if (error instanceof InputError) return { ok: false, message: `${fileName} was not opened: ${error.message}` };
    throw error;
  }
};

export type BundleMerging = { ok: true; added: number } | { ok: false; message: string };

/** "Merge a workstation's bundle" into a stored study: verify, check it is the same study, merge. */
export const mergeStudyBundle = async (db: HeedDb, studyId: string, fileName: string, zip: Uint8Array): Promise<BundleMerging> => {
  const read = readBundle(zip);
  if (!read.ok) return { ok: false, message: `${fileName} was not merged: ${faultText(read.fault)}` };
  if (read.snapshot.study.id !== studyId) return { ok: false, message: `${fileName} was not merged: it holds another study ("${read.snapshot.study.name}").` };
  try {
    const outcome = await mergeIntoStudy(db, { label: fileName, snapshot: read.snapshot });
    return { ok: true, added: outcome.added };
  } catch (error) {
    if (error instanceof BundleMergeError || error instanceof InputError) return { ok: false, message: `${fileName} was not merged: ${error.message}` };
    throw error;
  }
};
