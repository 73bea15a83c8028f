import { compareReaderIds } from '../../../src/analysis/reader-order';

// The oracle is ICU's own numeric collation, as String.prototype.localeCompare gives it.
const icu = (a: string, b: string): number => Math.sign(a.localeCompare(b, 'en', { numeric: true }));

describe('compareReaderIds', () => {
  it('gives the doc-comment example', () => {
    expect(['R10', 'R2', 'R1'].sort(compareReaderIds)).toEqual(['R1', 'R2', 'R10']);
  });
  it('orders every pair as localeCompare(b, "en", { numeric: true }) does', () => {
    let seed = 2024;
    const next = (n: number) => {
      seed = (seed * 1103515245 + 12345) % 2147483648;
      return Math.floor((seed / 2147483648) * n);
    };
    const prefixes = ['', 'R', 'r', 'Reader', 'READER', 'Rb', 'S', 'a', 'Z', 'R-', 'R_', 'rdr ', 'Ré', 'R.'];
    const numberOf = (): string => {
      const len = 1 + next(next(4) === 0 ? 30 : 6);
      let s = String(next(10));
      for (let k = 1; k < len; k++) s += String(next(10));
      return s;
    };
    const ids: string[] = ['', '0', '00', '1', '10', '9', 'R', 'R0', 'R00', 'R01', 'R1', 'R1a', 'R1 ', ' R1', 'R10', 'R9', 'R99999999999999999999', 'R100000000000000000000'];
    for (let t = 0; t < 600; t++) ids.push(`${prefixes[next(prefixes.length)] as string}${numberOf()}`);
    for (const a of ids) {
      for (let t = 0; t < 40; t++) {
        const b = ids[next(ids.length)] as string;
        expect([a, b, Math.sign(compareReaderIds(a, b))]).toEqual([a, b, icu(a, b)]);
      }
      expect(compareReaderIds(a, a)).toBe(0);
    }
  });
  it('leaves numbers of over 254 digits to the collator, which compares them in 254-digit pieces', () => {
    const ids = [`R2${'0'.repeat(254)}`, `R1${'0'.repeat(255)}`, `R9${'9'.repeat(253)}`, `R1${'0'.repeat(254)}`, `R${'9'.repeat(300)}`, 'R7'];
    for (const a of ids) for (const b of ids) expect([a.length, b.length, Math.sign(compareReaderIds(a, b))]).toEqual([a.length, b.length, icu(a, b)]);
  });
  it('sorts a shuffled list of plain ids as the collator does', () => {
    const ids = Array.from({ length: 300 }, (_, i) => `R${(i * 7919) % 1000}`);
    expect([...ids].sort(compareReaderIds)).toEqual([...ids].sort((a, b) => a.localeCompare(b, 'en', { numeric: true })));
  });
});
