// The shown_at check by character codes (issue 10) against the pattern and Date round trip it
// replaced, written out here as the oracle, on hand-picked edge cases and many mutated times.
import { isoUtc } from '../../../../src/io/read-log/fields';

const PATTERN = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2})(?::(\d{2})(\.\d+)?)?Z$/;
const oracle = (raw: string): boolean => {
  const m = PATTERN.exec(raw);
  if (m === null) return false;
  const part = (i: number): number => Number(m[i] ?? '0');
  if (part(4) > 23 || part(5) > 59 || part(6) > 59) return false;
  const date = new Date(Date.UTC(part(1), part(2) - 1, part(3)));
  return date.getUTCFullYear() === part(1) && date.getUTCMonth() === part(2) - 1 && date.getUTCDate() === part(3);
};

const accepted = (raw: string): boolean => {
  try {
    isoUtc(raw, 2, 'shown_at');
    return true;
  } catch {
    return false;
  }
};

const EDGES = [
  '2026-01-31T09:15:00Z', '2026-01-31T09:15Z', '2026-01-31T09:15:00.5Z', '2026-01-31T09:15:00.123456Z', '2026-01-31T09:15:00.Z',
  '2026-01-31T09:15:0Z', '2026-01-31T09:15:00', '2026-01-31 09:15:00Z', '2026-02-29T00:00Z', '2028-02-29T00:00Z', '2100-02-29T00:00Z',
  '2000-02-29T00:00Z', '2026-13-01T00:00Z', '2026-00-10T00:00Z', '2026-01-00T00:00Z', '2026-12-31T23:59:59Z', '2026-12-31T24:00:00Z',
  '2026-12-31T23:60:00Z', '2026-12-31T23:59:60Z', '0000-01-01T00:00Z', '9999-12-31T23:59:59.999Z', '2026-1-31T09:15Z', '+2026-01-31T09:15Z',
  '2026-01-31T09:15:00z', '2026-01-31t09:15:00Z', '２０２６-01-31T09:15Z', '2026-01-31T09:15:00+00:00', '', 'Z', '2026-04-31T10:00Z',
];

describe('shown_at check', () => {
  it.each(EDGES)('%j: accepted exactly when the pattern and the calendar accept it', (raw) => {
    expect(accepted(raw)).toBe(oracle(raw));
  });

  it('agrees with the oracle on 20,000 times with one character changed, dropped or added', () => {
    let seed = 7;
    const next = (n: number): number => ((seed = (Math.imul(seed, 1103515245) + 12345) >>> 0) % n);
    const chars = '0123456789-:.TZ tz+1';
    let disagreements = 0;
    let acceptedCount = 0;
    for (let k = 0; k < 20_000; k++) {
      const base = EDGES[next(EDGES.length)] as string;
      const at = next(base.length + 1);
      const c = chars[next(chars.length)] as string;
      const op = next(3);
      const raw = op === 0 ? base.slice(0, at) + c + base.slice(at + 1) : op === 1 ? base.slice(0, at) + base.slice(at + 1) : base.slice(0, at) + c + base.slice(at);
      const want = oracle(raw);
      if (want) acceptedCount++;
      if (accepted(raw) !== want) disagreements++;
    }
    expect(disagreements).toBe(0);
    expect(acceptedCount).toBeGreaterThan(300);
  });
});
