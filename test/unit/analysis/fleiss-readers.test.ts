import { readersAgreement } from '../../../src/analysis/fleiss-readers';
import { makeRead } from './make-read';

describe('readersAgreement', () => {
  it('uses cases read by every reader and gives Fleiss kappa', () => {
    const calls: Record<string, (0 | 1)[]> = { A: [1, 1, 1], B: [0, 0, 0], C: [1, 0, 1], D: [0, 0, 1] };
    const reads = Object.entries(calls).flatMap(([c, cs]) => cs.map((d, i) => makeRead({ case_id: c, reader_id: `R${i + 1}`, final_call: d })));
    reads.push(makeRead({ case_id: 'E', reader_id: 'R1' }));
    const a = readersAgreement(reads);
    expect(a.readers).toBe(3);
    expect(a.cases).toBe(4);
    // Fleiss (1971) by hand: Pi = 1, 1, 1/3, 1/3 → P̄ = 2/3; p1 = 6/12 → P̄e = 0.5; κ = 1/3
    expect(a.kappa).toBeCloseTo(1 / 3, 12);
  });
  it('is null with one reader', () => {
    expect(readersAgreement([makeRead()]).kappa).toBeNull();
  });
});
