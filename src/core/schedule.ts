/**
 * One reader's reading schedule: for each period, the cases in reading order with their
 * assistance, caution notice and rest breaks. Pure and seeded, so the same design, case set
 * and reader always give the same schedule, and the seeds used are returned for the log.
 *
 * Rules:
 * - Practice cases come first in every period, in case-set order (the same for everyone, so
 *   practice is a shared warm-up and never part of the randomisation).
 * - Main cases follow, shuffled per reader and period with the seed
 *   deriveSeed(design.seed, 'order/<readerId>/p<period>') (period 1-based), recorded as `orderSeed`.
 * - Assistance: with design.blocks = 1, the period's entry of the reader's sequence. With
 *   k >= 2 blocks (see case-blocks.ts), a main case of block b in period p (0-based) gets the
 *   sequence's entry ((p + b) mod P), so each block meets each condition once; blocks are
 *   interleaved in the shuffled order rather than read one after another. Practice item i then
 *   gets the entry of block (i mod k), so practice shows the conditions the period mixes.
 * - `order` is 1-based over the whole period, practice included (docs/formats.md, "The read log").
 * - With breakEvery = N, breakBefore is set on main items N+1, 2N+1, ... (a rest after every N
 *   main cases); never on practice items or the first main item.
 * - Caution notices: see caution.ts.
 *
 * Throws RangeError when the reader's sequence does not have the design's number of periods.
 * Example: UA/AU design, reader R1 on AU: period 1 items are all 'sequential', period 2 'none'.
 */
import type { CaseSetManifest } from './case-set';
import type { Assistance, Sequence, StudyDesign } from './design';
import { caseBlocks } from './case-blocks';
import { cautionFlags } from './caution';
import { deriveSeed, rngFromSeed } from './rng';
import type { SessionItem } from './session';

/** One case in a reader's period; the same shape the session state machine reads. */
export type ScheduleItem = SessionItem;

export type PeriodSchedule = {
  /** 1-based */
  period: number;
  /** derived seed of the main-case shuffle, for the log */
  orderSeed: number;
  /** derived seed of the caution draw, for the log */
  cautionSeed: number;
  items: ScheduleItem[];
};

export type ScheduleReader = { id: string; index: number; sequence: Sequence };

export type ReaderSchedule = {
  readerId: string;
  readerIndex: number;
  sequence: string;
  periods: PeriodSchedule[];
};

const assistanceAt = (sequence: Sequence, slot: number): Assistance => {
  const p = sequence.periods.length;
  const a = sequence.periods[((slot % p) + p) % p];
  if (a === undefined) throw new RangeError(`sequence "${sequence.label}" has no periods`);
  return a;
};

export const buildSchedule = (design: StudyDesign, manifest: CaseSetManifest, reader: ScheduleReader): ReaderSchedule => {
  const periodCount = design.sequences[0]?.periods.length ?? 0;
  if (reader.sequence.periods.length !== periodCount) {
    throw new RangeError(`sequence "${reader.sequence.label}" has ${reader.sequence.periods.length} periods; the design has ${periodCount}`);
  }
  const k = Math.max(1, design.blocks);
  const blocks = caseBlocks(manifest, design);
  const practice = manifest.cases.filter((c) => c.practice).map((c) => c.caseId);
  const main = manifest.cases.filter((c) => !c.practice).map((c) => c.caseId);

  const periods = reader.sequence.periods.map((_, p): PeriodSchedule => {
    const period = p + 1;
    const orderSeed = deriveSeed(design.seed, `order/${reader.id}/p${period}`);
    const shuffled = rngFromSeed(orderSeed).shuffle(main);
    const drafts = [
      ...practice.map((caseId, i) => ({ caseId, practice: true, assistance: assistanceAt(reader.sequence, p + (i % k)), mainIndex: -1 })),
      ...shuffled.map((caseId, i) => ({
        caseId,
        practice: false,
        assistance: assistanceAt(reader.sequence, p + (blocks.get(caseId) ?? 0)),
        mainIndex: i,
      })),
    ];
    const caution = cautionFlags(design.caution.mode, design, reader.id, period, drafts);
    const every = design.breakEvery;
    const items = drafts.map(
      (d, i): ScheduleItem => ({
        caseId: d.caseId,
        practice: d.practice,
        assistance: d.assistance,
        order: i + 1,
        caution: caution.flags[i] ?? false,
        breakBefore: every !== null && d.mainIndex > 0 && d.mainIndex % every === 0,
      }),
    );
    return { period, orderSeed, cautionSeed: caution.seed, items };
  });
  return { readerId: reader.id, readerIndex: reader.index, sequence: reader.sequence.label, periods };
};
