/**
 * A whole study as plain data: what a bundle carries and what the store gathers or restores.
 * The reads are not listed apart: each is the `read` of the last answer event of the chain that
 * committed it (readsOfChain), so reads and their hashes can never disagree with the chain.
 */
import type { CaseImage, CaseSetManifest } from '../../core/case-set';
import type { ChainedEvent } from '../../core/chain';
import type { StudyDesign } from '../../core/design';
import type { RowRead } from '../../core/read-rows';
import type { SessionItem } from '../../core/session';
import type { SuggestionRow } from '../../core/suggestions';
import type { WashoutOverride } from '../../core/washout';

export type SnapshotStudy = { id: string; name: string; design: StudyDesign; createdAt: string; lockedAt: string | null };

export type SnapshotReader = {
  id: string; studyId: string; code: string; role: string; years: number | null;
  sequenceIndex: number; slot: number; enrolledAt: string;
  /** set when the reader was withdrawn (their reads are marked withdrawn = 1) */
  withdrawn?: { at: string; reason: string; by: string } | null;
};

export type SnapshotSession = {
  id: string; studyId: string; readerId: string; period: number; items: SessionItem[]; orderSeed: string;
  startedAt: string; completedAt: string | null; override: WashoutOverride | null;
};

/** A read as its answer event carries it (any fields a later version adds travel along). */
export type SnapshotRead = RowRead & { studyId: string; [field: string]: unknown };

export type StudySnapshot = {
  study: SnapshotStudy;
  /** the suggestion shown for every case-finding */
  suggestions: SuggestionRow[];
  caseSet: { name: string; manifest: CaseSetManifest; imageSha256: Map<string, string> };
  /** the images themselves, only when the bundle carries them */
  images: CaseImage[] | null;
  readers: SnapshotReader[];
  sessions: SnapshotSession[];
  /** the study's chain, in order */
  events: ChainedEvent[];
};

export const ANSWER_EVENTS: ReadonlySet<string> = new Set(['initial-committed', 'final-committed']);

/** A read with the hash of the link that last committed it, and that link's 0-based index. */
export type ChainRead = { read: SnapshotRead; hash: string; index: number };

/** The reads of a chain: for each read id, the read of its last answer event. */
export const readsOfChain = (events: readonly ChainedEvent[]): Map<string, ChainRead> => {
  const reads = new Map<string, ChainRead>();
  events.forEach((event, index) => {
    if (!ANSWER_EVENTS.has(event.type)) return;
    const read = event.detail.read as SnapshotRead | undefined;
    if (read && typeof read.id === 'string') reads.set(read.id, { read, hash: event.hash, index });
  });
  return reads;
};
