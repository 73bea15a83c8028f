import { crossoverPairs, crossoverPairsOf, crossoverSection } from '../../../src/analysis/crossover';
import { readColumns } from '../../../src/analysis/read-columns';
import type { ReadRow } from '../../../src/core/read-log';
import { aided, makeRead } from './make-read';

const pair = (caseId: string, truth: 0 | 1, unaidedCall: 0 | 1, ai: 0 | 1, aidedCall: 0 | 1, conf = 80) => [
  makeRead({ case_id: caseId, truth, final_call: unaidedCall, period: 1, final_confidence: conf }),
  aided(truth, ai, aidedCall, { case_id: caseId, period: 2, final_confidence: conf }),
];

describe('crossover', () => {
  it('pairs the same case read unaided and aided in different periods', () => {
    const reads = [...pair('A', 1, 1, 1, 1), makeRead({ case_id: 'B' }), aided(1, 1, 1, { case_id: 'C', period: 1 }),
      makeRead({ case_id: 'C', period: 1 })];
    expect(crossoverPairs(reads).map((p) => p.unaided.case_id)).toEqual(['A']);
  });
  it('gives paired accuracy, McNemar b and c, and the wrong-suggestion subset', () => {
    const reads = [
      ...pair('A', 1, 1, 0, 0), // right unaided, wrong aided (b), wrong suggestion
      ...pair('B', 1, 1, 0, 0), // b, wrong suggestion
      ...pair('C', 0, 1, 0, 0), // wrong unaided, right aided (c)
      ...pair('D', 0, 0, 0, 0), // both right
    ];
    const x = crossoverSection(reads);
    expect(x?.n).toBe(4);
    expect(x?.unaided_accuracy.k).toBe(3);
    expect(x?.aided_accuracy.k).toBe(2);
    expect(x?.accuracy_difference).toBeCloseTo(-0.25, 12);
    expect(x?.mcnemar).toMatchObject({ b: 2, c: 1, p: 1 });
    expect(x?.wrong_suggestion).toMatchObject({ n: 2, accuracy_difference: -1 });
    expect(x?.wrong_suggestion.mcnemar).toMatchObject({ b: 2, c: 0, p: 0.5 });
    expect(x?.auc_difference).not.toBeNull();
  });
  it('is null without pairs', () => {
    expect(crossoverSection([makeRead()])).toBeNull();
  });
});

describe('crossoverPairsOf over several readers', () => {
  // The oracle: each reader's pairs found on that reader's reads alone, readers taken in order
  // of first appearance in the rows given.
  it('pairs within each reader, readers in order of first appearance, rows in the order given', () => {
    const reads: ReadRow[] = [];
    let x = 11;
    const next = (n: number): number => {
      x = (Math.imul(x, 1103515245) + 12345) >>> 0;
      return (x >>> 8) % n;
    };
    for (const reader of ['R3', 'R1', 'R2']) {
      for (let c = 0; c < 12; c++) {
        const truth = next(2) as 0 | 1;
        if (next(5) > 0) reads.push(makeRead({ reader_id: reader, case_id: `C${c}`, truth, period: 1, final_call: next(2) as 0 | 1 }));
        if (next(5) > 0) reads.push(aided(truth, next(2) as 0 | 1, next(2) as 0 | 1, { reader_id: reader, case_id: `C${c}`, period: 2 }));
      }
    }
    // interleaved: R2 appears first, then the others mixed
    const order = reads.map((_, i) => i).sort((a, b) => ((a * 7919) % 31) - ((b * 7919) % 31));
    order.unshift(...order.splice(order.findIndex((i) => reads[i]?.reader_id === 'R2'), 1));
    const cols = readColumns(reads);
    const rows = Int32Array.from(order);
    const got = crossoverPairsOf(cols, rows);
    const firstSeen = [...new Set(order.map((i) => reads[i]?.reader_id))];
    expect(firstSeen[0]).toBe('R2');
    const expected: [number, number][] = [];
    for (const reader of firstSeen) {
      const own = order.filter((i) => reads[i]?.reader_id === reader);
      const p = crossoverPairsOf(cols, Int32Array.from(own));
      p.unaided.forEach((u, k) => expected.push([u, p.aided[k] as number]));
    }
    expect(got.readers).toBe(3);
    expect(expected.length).toBeGreaterThan(10);
    expect(Array.from(got.unaided, (u, k) => [u, got.aided[k]])).toEqual(expected);
  });
});
