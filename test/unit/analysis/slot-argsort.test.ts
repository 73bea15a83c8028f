import { argsort } from '../../../src/analysis/argsort';
import { slotArgsort, SLOT_SORT_SPAN } from '../../../src/analysis/slot-argsort';

// The oracle: a stable comparison sort (ties keep their index order), as in argsort.test.ts.
const stable = (v: Float64Array) => Array.from(v.keys()).sort((a, b) => (v[a] as number) - (v[b] as number) || a - b);

describe('slotArgsort', () => {
  it('gives the doc-comment example', () => {
    expect(Array.from(slotArgsort(Float64Array.of(3, 1.5, 3, 0)) ?? [])).toEqual([3, 1, 0, 2]);
  });
  it('orders whole and half numbers with negatives and ties like a stable comparison sort', () => {
    const v = Float64Array.from({ length: 20000 }, (_, i) => (((i * 7919) % 401) - 150) / 2);
    expect(Array.from(slotArgsort(v) ?? [])).toEqual(stable(v));
    expect(Array.from(argsort(v))).toEqual(stable(v));
  });
  it('orders whole milliseconds over a wide span, up to SLOT_SORT_SPAN slots', () => {
    const v = Float64Array.from({ length: 9000 }, (_, i) => ((i * 104729) % (SLOT_SORT_SPAN / 2)) + 1e6);
    v[0] = 1e6 + (SLOT_SORT_SPAN - 1) / 2;
    expect(Array.from(slotArgsort(v) ?? [])).toEqual(stable(v));
  });
  it('declines what it cannot count: quarters, a span too wide, −0, huge values', () => {
    expect(slotArgsort(Float64Array.of(1, 0.25))).toBeNull();
    expect(slotArgsort(Float64Array.of(0, SLOT_SORT_SPAN / 2))).toBeNull();
    expect(slotArgsort(Float64Array.of(1, -0, 0))).toBeNull();
    expect(slotArgsort(Float64Array.of(2 ** 40, 2 ** 40 + 1))).toBeNull();
  });
  it('argsort still puts −0 before +0 in a large array (it takes the radix path then)', () => {
    const v = Float64Array.from({ length: 5000 }, (_, i) => (i % 2 === 0 ? 0 : -0));
    const perm = Array.from(argsort(v));
    expect(perm.slice(0, 2500).every((i) => i % 2 === 1)).toBe(true);
  });
});
