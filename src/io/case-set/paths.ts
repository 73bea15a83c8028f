// Image paths in cases.csv: relative to the set's root, '/' separators, never leaving the root.

export type PathCheck = { ok: true; path: string } | { ok: false; message: string };

/**
 * Normalises `a/./b/../c.png` to `a/c.png`. Refuses empty paths, backslashes (write '/'),
 * absolute paths (`/x`, `C:/x`, `//host/x`) and paths whose `..` climbs above the root.
 */
export const checkImagePath = (raw: string): PathCheck => {
  const path = raw.trim();
  if (path === '') return { ok: false, message: 'image path is empty' };
  if (path.includes('\\')) return { ok: false, message: `image path "${path}" uses a backslash; write '/' between folders` };
  if (path.startsWith('/') || /^[A-Za-z]:/.test(path)) {
    return { ok: false, message: `image path "${path}" is absolute; give it relative to the folder holding cases.csv` };
  }
  const parts: string[] = [];
  for (const part of path.split('/')) {
    if (part === '' || part === '.') continue;
    if (part === '..') {
      if (parts.length === 0) return { ok: false, message: `image path "${path}" leaves the set's folder` };
      parts.pop();
    } else {
      parts.push(part);
    }
  }
  if (parts.length === 0) return { ok: false, message: `image path "${path}" names no file` };
  return { ok: true, path: parts.join('/') };
};
