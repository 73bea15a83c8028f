/** The shapes stored in Heed's database. Plain data only, so they survive structured cloning. */
import type { CaseSetManifest } from '../core/case-set';
import type { StudyDesign } from '../core/design';
import type { PassphraseHash } from '../core/passphrase';
import type { Bit } from '../core/read-log';
import type { AnswerPart, SessionItem } from '../core/session';
import type { SuggestionRow } from '../core/suggestions';
import type { WashoutOverride } from '../core/washout';

export type StoredCaseSet = {
  id: string;
  name: string;
  source: 'demo' | 'import';
  createdAt: string;
  manifest: CaseSetManifest;
  imageCount: number;
  imageBytes: number;
  /** content fingerprint (content-hash.ts), to refuse importing the same set twice; absent on sets stored before it existed */
  contentHash?: string;
};

export type StoredImage = { setId: string; path: string; mime: 'image/png' | 'image/jpeg'; bytes: Uint8Array };


export type StoredStudy = {
  id: string;
  name: string;
  caseSetId: string;
  design: StudyDesign;
  /** the suggestion shown for every case-finding, fixed when the design is saved */
  suggestions: SuggestionRow[];
  createdAt: string;
  /** set when the first reading session starts; the design cannot change after it */
  lockedAt: string | null;
  /** show each reader their own report on the handover screen after their last period (absent: no) */
  showReportToReader?: boolean;
};

export type StoredReader = {
  id: string;
  studyId: string;
  code: string;
  role: string;
  years: number | null;
  /** index into design.sequences */
  sequenceIndex: number;
  /** enrolment position, used by the balanced assignment */
  slot: number;
  enrolledAt: string;
  /** set when the coordinator withdraws the reader (no schema change: not indexed); reads stay, marked withdrawn */
  withdrawn?: ReaderWithdrawal | null;
};

export type ReaderWithdrawal = { at: string; reason: string; by: string };

export type { WashoutOverride };

export type StoredSession = {
  /** `${readerId}/${period}` */
  id: string;
  studyId: string;
  readerId: string;
  period: number;
  items: SessionItem[];
  /** the seed the case order was shuffled from, recorded for reproduction */
  orderSeed: string;
  startedAt: string;
  completedAt: string | null;
  override: WashoutOverride | null;
  /** cases the reader was let past because they could not be shown (no index, so no schema version) */
  skipped?: string[];
};

export type StoredAnswerPart = AnswerPart;

export type StoredRead = {
  /** `${sessionId}/${caseId}/${finding}` */
  id: string;
  sessionId: string;
  studyId: string;
  readerId: string;
  period: number;
  caseId: string;
  finding: string;
  initial: StoredAnswerPart | null;
  final: StoredAnswerPart | null;
  /** ISO time the case was first shown for this read */
  shownAt: string;
  /** suggestion and notice as shown, copied so the log says exactly what the reader saw */
  aiCall: Bit | null;
  aiScore: number | null;
  aiPlanted: boolean;
  cautionShown: boolean;
  /** hash of the chain link (event) that last committed this read; see core/chain.ts */
  hash?: string;
};

/**
 * A completed session's reads in one record (read-packs.ts), so a study is read as one record per
 * session rather than one per answer. Derived from the `reads` records, which stay the source of
 * truth: a pack is used only while `count` equals the number of the session's stored reads and
 * `completedAt` the session's.
 */
export type StoredPack = {
  sessionId: string;
  studyId: string;
  readerId: string;
  period: number;
  completedAt: string;
  /** how many `reads` records the session had when the pack was made */
  count: number;
  /** the reads as JSON columns (read-packs.ts, PackColumns) */
  reads: string;
};

export type StoredEvent = {
  seq?: number;
  at: string;
  studyId: string | null;
  type: string;
  detail: Record<string, unknown>;
  /** the chain this event belongs to: its study id, or '' for the workstation's own events */
  chain: string;
  /** hash of the previous event of the chain (the chain's genesis for the first) */
  prev: string;
  /** SHA-256 over prev and this event's content (core/chain.ts) */
  hash: string;
};

/**
 * A workstation setting, by key. `coordinator-lock`: the passphrase's salted hash (never the
 * passphrase) and the idle minutes; `lock-state`: whether the coordinator's side is locked;
 * `store-identity`: a random id given to this database when it was created, and the database this
 * window used before, when the browser lost it (store-identity.ts).
 */
export type StoredSetting =
  | { key: 'coordinator-lock'; hash: PassphraseHash; idleMinutes: number; setAt: string }
  | { key: 'lock-state'; locked: boolean; since: string; why: string }
  | { key: 'store-identity'; id: string; createdAt: string; lost?: LostStore };

/** A database this window used before and no longer has: its identity and dates, and whether the notice was read. */
export type LostStore = { id: string; createdAt: string; lastSeen: string; noticedAt: string; read: boolean };
