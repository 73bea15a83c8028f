// Large valid logs must analyse, not throw "Maximum call stack size exceeded" (a spread of one
// reader's reads into push() did, at 130,000+ reads). Reads are generated here; boot 0 keeps it
// fast. The 100,000-reader log (about 20 s) is in bench/hostile-inputs.ts.
import type { ReadRow } from '../../../src/core/read-log';
import { analyzeReads } from '../../../src/analysis/engine';
import { makeRead } from './make-read';

const oneReader = (count: number): ReadRow[] => {
  const rows: ReadRow[] = [];
  for (let i = 0; i < count; i += 1) {
    const truth = i % 2 === 0 ? 1 : 0;
    rows.push(makeRead({ case_id: `C${i}`, order: i + 1, truth, final_call: i % 3 === 0 ? 0 : 1, final_confidence: (i * 37) % 101 }));
  }
  return rows;
};

describe('analyzeReads on large logs', () => {
  it('analyses one reader with 150,000 reads', () => {
    const report = analyzeReads(oneReader(150_000), { boot: 0 });
    expect(report.readers).toHaveLength(1);
  });
});
