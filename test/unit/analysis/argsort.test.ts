import { argsort } from '../../../src/analysis/argsort';

describe('argsort', () => {
  it('orders small arrays stably', () => {
    expect(Array.from(argsort(Float64Array.of(3, 1, 2, 1)))).toEqual([1, 3, 2, 0]);
  });
  it('orders large arrays (radix path) with negatives, ties and fractions like a comparison sort', () => {
    const v = Float64Array.from({ length: 20000 }, (_, i) => (((i * 7919) % 4001) - 2000) / 7);
    const perm = argsort(v);
    const expected = Array.from(v.keys()).sort((a, b) => (v[a] as number) - (v[b] as number) || a - b);
    expect(Array.from(perm)).toEqual(expected);
  });
});
