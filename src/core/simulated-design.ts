/**
 * A design prepared for simulated readers: every reader's schedule built once and flattened into
 * steps (one per reader, period, item and finding, in reading order), with each step's truth,
 * shown suggestion and caution flag looked up once. Simulating many studies of one design (the
 * design planner) reuses it: only the draws change from study to study, never the schedule.
 *
 * `cells` are the (case, finding) pairs of the case set in manifest order; a step names its cell
 * by index, so per-case and reader-by-case terms live in flat typed arrays.
 * Throws RangeError when a reader names a sequence the design does not have.
 */
import type { CaseSetManifest } from './case-set';
import type { Assistance, StudyDesign } from './design';
import type { Bit } from './read-log';
import { buildSchedule } from './schedule';
import { indexSuggestions, suggestionKey, type SuggestionRow } from './suggestions';

export type SimulatedReader = { code: string; slot: number; sequenceIndex: number };

export type PreparedStep = {
  /** index into `readers` */
  reader: number;
  period: number;
  itemIndex: number;
  caseId: string;
  finding: string;
  /** index into `cells` */
  cell: number;
  assistance: Assistance;
  truth: Bit;
  /** the suggestion on offer (aided steps only) */
  shown: SuggestionRow | undefined;
  caution: boolean;
};

/** One reader's period: its steps are `steps[from .. to)`. */
export type PreparedPeriod = { period: number; from: number; to: number };
export type PreparedReader = { reader: SimulatedReader; periods: PreparedPeriod[] };
export type PreparedCell = { caseId: string; finding: string };

export type PreparedDesign = {
  design: StudyDesign;
  readers: PreparedReader[];
  steps: PreparedStep[];
  cells: PreparedCell[];
};

export const prepareDesign = (
  design: StudyDesign, manifest: CaseSetManifest, suggestions: readonly SuggestionRow[], readers: readonly SimulatedReader[],
): PreparedDesign => {
  const table = indexSuggestions([...suggestions]);
  const cells: PreparedCell[] = [];
  const cellOf = new Map<string, number>();
  const truthOf = new Map<string, Bit>();
  for (const c of manifest.cases) {
    for (const f of c.findings) truthOf.set(suggestionKey(c.caseId, f.finding), f.truth);
    for (const finding of design.findings) {
      const key = suggestionKey(c.caseId, finding);
      if (cellOf.has(key)) continue;
      cellOf.set(key, cells.length);
      cells.push({ caseId: c.caseId, finding });
    }
  }
  const steps: PreparedStep[] = [];
  const prepared: PreparedReader[] = readers.map((reader, readerIndex) => {
    const sequence = design.sequences[reader.sequenceIndex];
    if (!sequence) throw new RangeError(`reader ${reader.code} has no sequence ${reader.sequenceIndex}`);
    const schedule = buildSchedule(design, manifest, { id: reader.code, index: reader.slot, sequence });
    const periods = schedule.periods.map((period): PreparedPeriod => {
      const from = steps.length;
      period.items.forEach((item, itemIndex) => {
        for (const finding of design.findings) {
          const key = suggestionKey(item.caseId, finding);
          let cell = cellOf.get(key);
          if (cell === undefined) {
            cell = cells.length;
            cellOf.set(key, cell);
            cells.push({ caseId: item.caseId, finding });
          }
          steps.push({
            reader: readerIndex, period: period.period, itemIndex, caseId: item.caseId, finding, cell, assistance: item.assistance,
            truth: truthOf.get(key) ?? 0, shown: item.assistance === 'none' ? undefined : table.get(key), caution: item.caution,
          });
        }
      });
      return { period: period.period, from, to: steps.length };
    });
    return { reader, periods };
  });
  return { design, readers: prepared, steps, cells };
};
