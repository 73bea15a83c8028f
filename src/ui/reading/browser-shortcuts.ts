/**
 * Browser shortcuts a reader should not use while a reading session is open: DevTools (F12,
 * Ctrl+Shift+I/J/C, and Cmd+Option+I/J/C on a Mac) and Reload (F5, Ctrl+R, Ctrl+Shift+R, Cmd+R).
 * The page cancels them at keydown; the browser's own menus and command-line switches are beyond
 * a page's reach (docs/security.md).
 */
export type ShortcutKey = { key: string; ctrlKey: boolean; shiftKey: boolean; altKey: boolean; metaKey: boolean };

const DEVTOOLS_LETTERS = new Set(['i', 'j', 'c']);

export const isBlockedShortcut = (event: ShortcutKey): boolean => {
  if (event.key === 'F12' || event.key === 'F5') return true;
  const letter = event.key.toLowerCase();
  const command = event.ctrlKey || event.metaKey;
  if (command && letter === 'r') return true;
  if (event.ctrlKey && event.shiftKey && DEVTOOLS_LETTERS.has(letter)) return true;
  if (event.metaKey && event.altKey && DEVTOOLS_LETTERS.has(letter)) return true;
  return false;
};

/** Cancels those shortcuts until the returned function is called. */
export const blockBrowserShortcuts = (target: Window): (() => void) => {
  const onKey = (event: KeyboardEvent) => { if (isBlockedShortcut(event)) { event.preventDefault(); event.stopPropagation(); } };
  target.addEventListener('keydown', onKey, { capture: true });
  return () => target.removeEventListener('keydown', onKey, { capture: true });
};
