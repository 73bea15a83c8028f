import { periodGate } from '../../../src/core/washout';

const done = new Date('2026-01-01T09:00:00Z');
const day = 24 * 60 * 60 * 1000;

describe('periodGate', () => {
  it('always opens the first period', () => {
    expect(periodGate(new Date('2026-01-01T00:00:00Z'), null, 28, null)).toEqual({ open: true });
  });

  it('refuses a period inside the washout, saying when it opens', () => {
    const gate = periodGate(new Date(done.getTime() + 10 * day), done, 28, null);
    expect(gate.open).toBe(false);
    if (gate.open) return;
    expect(gate.opensAt.toISOString()).toBe('2026-01-29T09:00:00.000Z');
    expect(gate.message).toContain('2026-01-29 09:00 UTC');
    expect(gate.message).toContain('18 days left');
  });

  it('refuses one millisecond before the end and opens at the end exactly', () => {
    const end = done.getTime() + 28 * day;
    expect(periodGate(new Date(end - 1), done, 28, null).open).toBe(false);
    expect(periodGate(new Date(end), done, 28, null)).toEqual({ open: true });
    expect(periodGate(new Date(end + 5 * day), done, 28, null)).toEqual({ open: true });
  });

  it('opens at once with a washout of 0 days', () => {
    expect(periodGate(done, done, 0, null)).toEqual({ open: true });
  });

  it('refuses an early start whose override has no reason, or no one who allowed it', () => {
    const now = new Date(done.getTime() + day);
    const noReason = periodGate(now, done, 28, { reason: '   ', by: 'Coordinator A', at: now.toISOString() });
    expect(noReason.open).toBe(false);
    if (!noReason.open) expect(noReason.message).toMatch(/needs a reason/);
    const noOne = periodGate(now, done, 28, { reason: 'reader leaves the department', by: '', at: now.toISOString() });
    expect(noOne.open).toBe(false);
    if (!noOne.open) expect(noOne.message).toMatch(/who allows it/);
  });

  it('opens early with an override that has a reason, and hands it back for the log', () => {
    const now = new Date(done.getTime() + day);
    const override = { reason: 'reader leaves the department', by: 'Coordinator A', at: now.toISOString() };
    expect(periodGate(now, done, 28, override)).toEqual({ open: true, override });
  });

  it('refuses nonsense input', () => {
    expect(() => periodGate(done, done, -1, null)).toThrow(RangeError);
    expect(() => periodGate(done, done, 1.5, null)).toThrow(RangeError);
    expect(() => periodGate(done, new Date('nope'), 3, null)).toThrow(/not a valid date/);
  });
});
