import { readersAgreement } from '../../../src/analysis/fleiss-readers';
import type { ReadRow } from '../../../src/core/read-log';
import { makeRead } from './make-read';

// readersAgreement keeps a flat reader x case table up to 2^24 cells and a sparse set beyond;
// this log (4,100 readers x 4,100 cases, 16.8 million cells) takes the sparse path.
describe('readersAgreement on very many readers and cases', () => {
  it('counts only cases read by every reader, each reader once, as on a small log', () => {
    const R = 4100;
    const reads: ReadRow[] = [];
    for (let i = 0; i < R; i++) {
      // case A: the first 3000 readers call 1, the rest 0; case B: all call 1, R7 twice (second read ignored)
      reads.push(makeRead({ reader_id: `R${i}`, case_id: 'A', final_call: i < 3000 ? 1 : 0 }));
      reads.push(makeRead({ reader_id: `R${i}`, case_id: 'B', final_call: 1 }));
    }
    reads.push(makeRead({ reader_id: 'R7', case_id: 'B', final_call: 0 }));
    for (let c = 0; c < 4098; c++) reads.push(makeRead({ reader_id: 'R0', case_id: `X${c}` }));
    const a = readersAgreement(reads);
    expect(a).toMatchObject({ readers: R, cases: 2 });
    // Fleiss (1971) by hand, n = 4100 raters: P_A = (3000·2999 + 1100·1099)/(n(n−1)), P_B = 1;
    // p1 = (3000 + 4100)/(2n), p0 = 1100/(2n); κ = (P̄ − P̄e)/(1 − P̄e)
    const n = R;
    const pA = (3000 * 2999 + 1100 * 1099) / (n * (n - 1));
    const pBar = (pA + 1) / 2;
    const p1 = 7100 / (2 * n);
    const pe = p1 ** 2 + (1 - p1) ** 2;
    expect(a.kappa).toBeCloseTo((pBar - pe) / (1 - pe), 12);
  });
});
