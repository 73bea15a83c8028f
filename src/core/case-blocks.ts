/**
 * Split of a study's main (non-practice) cases into `design.blocks` blocks, for designs in which
 * each block meets each assistance condition once (see StudyDesign.blocks).
 *
 * Stratified by the truth of the design's first finding, so blocks have similar prevalence: the
 * cases of each truth value are shuffled (stream 'case-blocks/truth<v>') and dealt round-robin,
 * the second stratum continuing where the first stopped. Block sizes then differ by at most 1,
 * and so do the counts of each truth value. One split per study, the same for every reader.
 *
 * Throws Error when a main case has no row for the first finding.
 * Example: 10 cases (4 positive), 2 blocks -> two blocks of 5, each with 2 positives.
 */
import type { CaseSetManifest } from './case-set';
import type { Assistance, Sequence, StudyDesign } from './design';
import { createRng } from './rng';

/** Block index (0-based) of every main case; all 0 when design.blocks is 1. */
export const caseBlocks = (manifest: CaseSetManifest, design: StudyDesign): Map<string, number> => {
  const main = manifest.cases.filter((c) => !c.practice);
  const k = Math.max(1, design.blocks);
  if (k === 1) return new Map(main.map((c) => [c.caseId, 0]));
  const first = design.findings[0];
  const truthOf = (caseId: string, findings: { finding: string; truth: 0 | 1 }[]): 0 | 1 => {
    const row = findings.find((f) => f.finding === first);
    if (row === undefined) throw new Error(`case "${caseId}" has no row for finding "${first}"`);
    return row.truth;
  };
  const blocks = new Map<string, number>();
  let next = 0;
  for (const truth of [0, 1] as const) {
    const stratum = main.filter((c) => truthOf(c.caseId, c.findings) === truth).map((c) => c.caseId);
    for (const id of createRng(design.seed, `case-blocks/truth${truth}`).shuffle(stratum)) {
      blocks.set(id, next);
      next = (next + 1) % k;
    }
  }
  return blocks;
};

/**
 * The assistance each block gets in one period (0-based) of a sequence: block b reads under the
 * sequence's entry ((period + b) mod P), the rule buildSchedule applies to every main case. With one
 * block this is the period's own entry. Example: UA with 2 blocks, period 0 -> ['none', 'sequential'].
 */
export const blockAssistance = (sequence: Sequence, period: number, blocks: number): Assistance[] => {
  const p = sequence.periods.length;
  return Array.from({ length: Math.max(1, blocks) }, (_, b) => sequence.periods[(((period + b) % p) + p) % p] ?? 'none');
};
