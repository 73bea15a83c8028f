import { canonicalJson } from '../../../src/core/chain';

// The same value with every object's keys inserted in reverse order: JSON.stringify would then
// write them unsorted, so canonicalJson must build the text key by key (its slow path). Equal
// results on both paths are the check that the fast path (native JSON.stringify, taken when keys
// are already sorted) writes exactly the canonical text.
const reversedKeys = (value: unknown): unknown => {
  if (Array.isArray(value)) return value.map(reversedKeys);
  if (typeof value !== 'object' || value === null) return value;
  const out: Record<string, unknown> = {};
  for (const k of Object.keys(value).reverse()) out[k] = reversedKeys((value as Record<string, unknown>)[k]);
  return out;
};

const seeded = (seed: number) => () => { seed = (seed * 1103515245 + 12345) % 2147483648; return seed / 2147483648; };
const TEXTS = ['', 'a', 'Zürich', '"quoted"', 'line\nbreak', '\u2028', '😀', '\ud800', 'tab\t', '\\'];
const randomValue = (next: () => number, depth: number): unknown => {
  const kind = Math.floor(next() * (depth > 3 ? 4 : 6));
  if (kind === 0) return null;
  if (kind === 1) return next() < 0.5;
  if (kind === 2) return [0, -0, 1.5, -3, 1e21, 5e-324, 123456789.123, 0.1 + 0.2][Math.floor(next() * 8)];
  if (kind === 3) return TEXTS[Math.floor(next() * TEXTS.length)];
  if (kind === 4) return Array.from({ length: Math.floor(next() * 4) }, () => randomValue(next, depth + 1));
  const keys = ['a', 'B', 'b', 'aa', '10', '2', 'é', '😀', 'z', '_'];
  const record: Record<string, unknown> = {};
  for (const k of keys) if (next() < 0.4) record[k] = randomValue(next, depth + 1);
  return record;
};

describe('canonicalJson: the native fast path and the key-by-key text agree', () => {
  it('gives one text for 2,000 random values whatever the key order, and round-trips through JSON.parse', () => {
    const next = seeded(20261202);
    for (let i = 0; i < 2000; i++) {
      const value = randomValue(next, 0);
      const text = canonicalJson(reversedKeys(value));
      expect(canonicalJson(value)).toBe(text);
      expect(canonicalJson(JSON.parse(text))).toBe(text);
    }
  });

  it('keeps the canonical order for keys that look like array indices, which JSON.stringify would put first', () => {
    expect(canonicalJson(JSON.parse('{"10":1,"2":2,"a":3}'))).toBe('{"10":1,"2":2,"a":3}');
  });

  it('treats what JSON.stringify would write differently as before: dates, undefined, NaN, null prototypes', () => {
    expect(canonicalJson({ a: new Date(0) })).toBe('{"a":{}}');
    expect(canonicalJson({ a: 1, b: undefined })).toBe('{"a":1}');
    expect(canonicalJson([undefined, 1])).toBe('[null,1]');
    expect(() => canonicalJson({ a: Number.NaN })).toThrow(RangeError);
    expect(() => canonicalJson({ a: [Infinity] })).toThrow(RangeError);
    const bare = Object.create(null) as Record<string, unknown>;
    bare.a = 1;
    bare.b = [true];
    expect(canonicalJson(bare)).toBe('{"a":1,"b":[true]}');
  });
});
