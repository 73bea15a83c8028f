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
