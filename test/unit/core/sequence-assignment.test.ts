import { assignSequences, sequenceIndexForSlot } from '../../../src/core/sequence-assignment';
import type { StudyDesign } from '../../../src/core/design';
import { makeDesign } from './design-fixture';

const three = (seed: number): StudyDesign =>
  makeDesign({
    seed,
    sequences: [
      { label: 'A', periods: ['none', 'concurrent', 'sequential'] },
      { label: 'B', periods: ['concurrent', 'sequential', 'none'] },
      { label: 'C', periods: ['sequential', 'none', 'concurrent'] },
    ],
  });

const countsAfter = (design: StudyDesign, readers: number): number[] => {
  const counts = design.sequences.map(() => 0);
  for (let i = 0; i < readers; i += 1) counts[sequenceIndexForSlot(design, i)] = (counts[sequenceIndexForSlot(design, i)] ?? 0) + 1;
  return counts;
};

describe('sequence assignment', () => {
  it('is balanced after every complete block of 2 sequences', () => {
    for (const seed of [1, 2, 3, 20261201]) {
      const design = makeDesign({ seed });
      for (let blocks = 1; blocks <= 30; blocks += 1) expect(countsAfter(design, 2 * blocks)).toEqual([blocks, blocks]);
      // inside a block the counts differ by at most one
      for (let n = 1; n <= 61; n += 2) {
        const c = countsAfter(design, n);
        expect(Math.max(...c) - Math.min(...c)).toBeLessThanOrEqual(1);
      }
    }
  });

  it('is balanced after every complete block of 3 sequences', () => {
    for (const seed of [5, 6, 7]) {
      const design = three(seed);
      for (let blocks = 1; blocks <= 20; blocks += 1) expect(countsAfter(design, 3 * blocks)).toEqual([blocks, blocks, blocks]);
    }
  });

  it('is really randomised: blocks do not all come in the same order', () => {
    const design = three(11);
    const orders = new Set<string>();
    for (let b = 0; b < 30; b += 1) orders.add([0, 1, 2].map((j) => sequenceIndexForSlot(design, 3 * b + j)).join(''));
    expect(orders.size).toBeGreaterThan(1);
  });

  it('is reproducible from the seed and enrolment order', () => {
    const ids = Array.from({ length: 12 }, (_, i) => `R${i + 1}`);
    const a = assignSequences(makeDesign({ seed: 42 }), ids).map((x) => x.sequence.label);
    const b = assignSequences(makeDesign({ seed: 42 }), ids).map((x) => x.sequence.label);
    expect(a).toEqual(b);
    const others = [43, 44, 45, 46].map((seed) => assignSequences(makeDesign({ seed }), ids).map((x) => x.sequence.label).join());
    expect(others.some((o) => o !== a.join())).toBe(true);
  });

  it('never changes existing readers when one is enrolled later', () => {
    const design = three(9);
    const ids = Array.from({ length: 7 }, (_, i) => `R${i + 1}`);
    const before = assignSequences(design, ids);
    const after = assignSequences(design, [...ids, 'R8', 'R9']);
    expect(after.slice(0, 7)).toEqual(before);
    expect(after[7]?.index).toBe(7);
  });

  it('refuses a reader enrolled twice or a bad index', () => {
    expect(() => assignSequences(makeDesign(), ['R1', 'R1'])).toThrow(/"R1" is enrolled twice/);
    expect(() => sequenceIndexForSlot(makeDesign(), -1)).toThrow(RangeError);
  });
});
