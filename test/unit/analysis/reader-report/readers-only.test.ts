import { describe, expect, it } from 'vitest';
import { analyzeReads } from '../../../../src/analysis/engine';
import { simulateReadRows } from '../../../../bench/simulate-log';

describe('analyzeReads with readersOnly (what heed report uses)', () => {
  it('gives exactly the per-reader entries of the full analysis, and no group figures', () => {
    const rows = simulateReadRows({ seed: 8, readers: 4, cases: 30, practiceCases: 2 });
    const full = analyzeReads(rows, { boot: 0 });
    const lean = analyzeReads(rows, { boot: 0, readersOnly: true });
    expect(lean.readers).toEqual(full.readers);
    expect(lean.group.findings).toEqual([]);
    expect(full.group.findings).toHaveLength(1);
  });
});
