/**
 * Compares every figure the results page shows with `heed analyze --json` on the same read log:
 * each element with data-path names its place in the JSON ("readers.2.aided.overreliance"),
 * data-key its headline sub-key, data-value / data-lower / data-upper the page's exact numbers.
 */
import type { Page } from 'playwright-core';

export type ShownFigure = { path: string; key: string; value: string; lower: string | null; upper: string | null; text: string };

/** Opens every disclosure (numbers are built when opened) and collects the figures shown. */
export const shownFigures = async (page: Page): Promise<ShownFigure[]> => {
  await page.evaluate(() => { for (const d of document.querySelectorAll('details')) d.open = true; });
  await page.waitForFunction(() => [...document.querySelectorAll('details.numbers')].every((d) => d.children.length > 1), null, { timeout: 60_000 });
  return page.evaluate(() => [...document.querySelectorAll('[data-path][data-value]')].map((el) => ({
    path: el.getAttribute('data-path') ?? '', key: el.getAttribute('data-key') ?? '', value: el.getAttribute('data-value') ?? '',
    lower: el.getAttribute('data-lower'), upper: el.getAttribute('data-upper'), text: el.textContent ?? '',
  })));
};

const resolve = (root: unknown, path: string): unknown => {
  let node = root;
  for (const part of path.split('.')) node = node === null || typeof node !== 'object' ? undefined : (node as Record<string, unknown>)[part];
  return node;
};

const asNumber = (text: string | null): number | null | undefined => (text === null ? undefined : text === '' || text === 'null' ? null : Number(text));

/** Each shown figure against the JSON: returns the problems found (empty when all agree) and how many were compared. */
export const compareWithCli = (shown: readonly ShownFigure[], cli: unknown): { problems: string[]; compared: number } => {
  const problems: string[] = [];
  let compared = 0;
  for (const f of shown) {
    const node = resolve(cli, f.path);
    if (node === undefined) { problems.push(`${f.path}: not in the JSON`); continue; }
    const record = node !== null && typeof node === 'object' && !Array.isArray(node) ? (node as Record<string, unknown>) : null;
    const expected = f.key ? record?.[f.key] : node;
    if (typeof expected === 'string') {
      if (f.value !== expected) problems.push(`${f.path}: page ${f.value}, JSON ${expected}`);
    } else if (f.value.startsWith('[')) {
      if (JSON.stringify(expected) !== f.value) problems.push(`${f.path}: page ${f.value}, JSON ${JSON.stringify(expected)}`);
    } else if (asNumber(f.value) !== (expected ?? null)) problems.push(`${f.path}${f.key ? `.${f.key}` : ''}: page ${f.value}, JSON ${String(expected)}`);
    for (const end of ['lower', 'upper'] as const) {
      const v = asNumber(f[end]);
      if (v !== undefined && v !== (record?.[end] ?? null)) problems.push(`${f.path}.${end}: page ${String(f[end])}, JSON ${String(record?.[end])}`);
    }
    compared++;
  }
  return { problems, compared };
};

/** Numbers of the JSON that no shown figure covers (a shown figure covers its path and everything under it). */
export const missingFromPage = (cli: unknown, shown: readonly ShownFigure[]): string[] => {
  const paths = new Set(shown.map((f) => f.path));
  const missing: string[] = [];
  const walk = (node: unknown, path: string): void => {
    if (path && paths.has(path)) return;
    if (Array.isArray(node)) node.forEach((x, i) => walk(x, `${path}.${i}`));
    else if (node !== null && typeof node === 'object') for (const [k, v] of Object.entries(node)) walk(v, path ? `${path}.${k}` : k);
    else if (typeof node === 'number') missing.push(path);
  };
  walk(cli, '');
  return missing;
};
