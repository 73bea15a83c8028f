// aucOfSet must give aucSummary's numbers to the last bit (the engine's goldens depend on it), on
// both sides of the size where placements switch from counts to midranks, with many ties, and
// on a subset taken from a larger sorted set (how readers and subgroups get theirs).
import { describe, expect, it } from 'vitest';
import { aucOfSet } from '../../../src/analysis/auc-of-set';
import { aucSummary, MIDRANKS_FROM } from '../../../src/analysis/delong';
import { seededInts } from '../../../src/analysis/prng';
import { allRows, readColumns } from '../../../src/analysis/read-columns';
import { partitionSet, sortedSet } from '../../../src/analysis/read-set';
import { makeRead } from './make-read';

const reads = (n: number, seed: number) => {
  const rng = seededInts(seed);
  return Array.from({ length: n }, (_, i) =>
    makeRead({ case_id: `C${i}`, truth: rng.below(3) === 0 ? 1 : 0, final_call: rng.below(2) as 0 | 1, final_confidence: rng.below(101) }),
  );
};

const direct = (rs: ReturnType<typeof reads>) => {
  const cols = readColumns(rs);
  const pos: number[] = [];
  const neg: number[] = [];
  for (let i = 0; i < cols.n; i++) (cols.truth[i] === 1 ? pos : neg).push(cols.score[i] as number);
  return aucSummary(pos, neg);
};

describe('aucOfSet', () => {
  for (const n of [2, 37, 1000, MIDRANKS_FROM - 1, MIDRANKS_FROM, 10831, 20000]) {
    it(`equals aucSummary bit for bit on ${n} tied scores`, () => {
      const rs = reads(n, n);
      const cols = readColumns(rs);
      const got = aucOfSet(cols, sortedSet(cols, allRows(cols)));
      expect(Object.is(got.estimate, direct(rs).estimate) && Object.is(got.se, direct(rs).se)).toBe(true);
      expect(got).toEqual(direct(rs));
    });
  }

  it('a part of a sorted set gives the AUC of those reads alone', () => {
    const rs = reads(12000, 5);
    const cols = readColumns(rs);
    const half = Int32Array.from(rs, (_, i) => i % 3);
    const parts = partitionSet(sortedSet(cols, allRows(cols)), half, 3);
    parts.forEach((part, k) => {
      expect(aucOfSet(cols, part)).toEqual(direct(rs.filter((_, i) => i % 3 === k)));
    });
  });

  it('gives nulls when a class is empty', () => {
    const rs = reads(50, 3).map((r) => ({ ...r, truth: 1 as const }));
    const cols = readColumns(rs);
    expect(aucOfSet(cols, sortedSet(cols, allRows(cols)))).toEqual({ estimate: null, se: null, lower: null, upper: null });
  });
});
