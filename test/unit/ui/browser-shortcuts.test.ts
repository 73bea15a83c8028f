import { isBlockedShortcut, type ShortcutKey } from '../../../src/ui/reading/browser-shortcuts';

const key = (k: string, mods: Partial<Omit<ShortcutKey, 'key'>> = {}): ShortcutKey =>
  ({ key: k, ctrlKey: false, shiftKey: false, altKey: false, metaKey: false, ...mods });

describe('browser shortcuts cancelled during a reading session', () => {
  it('cancels DevTools and Reload shortcuts (Chromium defaults, from memory of its keyboard shortcuts page)', () => {
    for (const k of [key('F12'), key('F5'), key('r', { ctrlKey: true }), key('R', { ctrlKey: true, shiftKey: true }), key('I', { ctrlKey: true, shiftKey: true }),
      key('J', { ctrlKey: true, shiftKey: true }), key('C', { ctrlKey: true, shiftKey: true }), key('r', { metaKey: true }), key('i', { metaKey: true, altKey: true })]) {
      expect(isBlockedShortcut(k), JSON.stringify(k)).toBe(true);
    }
  });

  it('leaves the reading keys alone (R resets the view, C and I are not reading keys but stay free)', () => {
    for (const k of [key('r'), key('p'), key('a'), key('Enter'), key('Escape'), key('c'), key('F'), key('1'), key('c', { ctrlKey: true })]) {
      expect(isBlockedShortcut(k), JSON.stringify(k)).toBe(false);
    }
  });
});
