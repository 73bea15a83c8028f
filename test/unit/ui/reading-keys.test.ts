import { readingKeyAction } from '../../../src/ui/reading/reading-keys';

const press = (key: string, mods: Partial<{ ctrlKey: boolean; metaKey: boolean; altKey: boolean }> = {}) =>
  readingKeyAction({ key, ctrlKey: false, metaKey: false, altKey: false, ...mods });

describe('reading keys', () => {
  it('maps one key each to present and absent, digits and arrows to confidence, Enter to commit', () => {
    expect(press('p')).toEqual({ kind: 'call', call: 1 });
    expect(press('A')).toEqual({ kind: 'call', call: 0 });
    expect(press('7')).toEqual({ kind: 'confidence', value: 70 });
    expect(press('0')).toEqual({ kind: 'confidence', value: 100 });
    expect(press('ArrowUp')).toEqual({ kind: 'confidence-step', step: 5 });
    expect(press('ArrowDown')).toEqual({ kind: 'confidence-step', step: -5 });
    expect(press('Enter')).toEqual({ kind: 'commit' });
    expect(press('Escape')).toEqual({ kind: 'pause' });
    expect(press('f')).toEqual({ kind: 'fullscreen' });
  });
  it('leaves modified keys and unknown keys to the browser', () => {
    expect(press('p', { ctrlKey: true })).toBeNull();
    expect(press('Backspace')).toBeNull();
    expect(press('ArrowLeft')).toBeNull();
  });
});

describe('reading keys on rating scales', () => {
  const on = (scale: 'five-point' | 'percent', key: string) => readingKeyAction({ key, ctrlKey: false, metaKey: false, altKey: false }, scale);
  it('five-point: 1-5 give the rating; 6-9, 0 and P/A do nothing', () => {
    expect([1, 2, 3, 4, 5].map((k) => on('five-point', String(k)))).toEqual([1, 2, 3, 4, 5].map((value) => ({ kind: 'rating', value })));
    expect(on('five-point', '6')).toBeNull();
    expect(on('five-point', '0')).toBeNull();
    expect(on('five-point', 'p')).toBeNull();
    expect(on('five-point', 'Enter')).toEqual({ kind: 'commit' });
  });
  it('percent: digits give tens, 0 gives 0, Home/End the ends, arrows step 5', () => {
    expect(on('percent', '7')).toEqual({ kind: 'rating', value: 70 });
    expect(on('percent', '0')).toEqual({ kind: 'rating', value: 0 });
    expect(on('percent', 'End')).toEqual({ kind: 'rating', value: 100 });
    expect(on('percent', 'ArrowUp')).toEqual({ kind: 'rating-step', step: 5 });
    expect(on('percent', 'a')).toBeNull();
  });
});
