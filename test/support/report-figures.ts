// Compares the figures a reader's report shows (data-figure cells with their exact values in
// data attributes) with the same reader's entry of `heed analyze --json`. Used by the CLI test
// and the end-to-end test, so the report, the app and the CLI are held to one analysis.

export type ShownFigure = { key: string; value?: string; lower?: string; upper?: string; k?: string; n?: string };

type Json = Record<string, unknown>;

const isObject = (v: unknown): v is Json => typeof v === 'object' && v !== null;

/** Keys the report computes itself from the reader's rows: not part of `heed analyze --json`. */
const OWN_SUMMARY = /^(calibration|bands|followed)\./;

const at = (entry: Json, path: readonly string[]): unknown => {
  let v: unknown = entry;
  for (const p of path) v = isObject(v) ? v[p] : undefined;
  return v;
};

const median7 = (xs: number[]): number => {
  const s = [...xs].sort((a, b) => a - b);
  const h = (s.length - 1) * 0.5;
  const lo = Math.floor(h);
  return lo + 1 < s.length ? (s[lo] as number) + (h - lo) * ((s[lo + 1] as number) - (s[lo] as number)) : (s[lo] as number);
};

/** The value `heed analyze --json` has for a shown key, as {value, lower, upper, k, n}; undefined when the key is the report's own. */
const expected = (key: string, entry: Json, others: Json[]): Record<string, number | null> | undefined => {
  if (OWN_SUMMARY.test(key)) return undefined;
  if (key === 'peers.median' || key === 'peers.range') {
    const vals = others.map((o) => at(o, ['aided', 'overreliance', 'estimate'])).filter((v): v is number => typeof v === 'number');
    return key === 'peers.median' ? { value: median7(vals) } : { lower: Math.min(...vals), upper: Math.max(...vals) };
  }
  if (key.startsWith('subgroups|')) {
    // subgroups|attribute|value|measure: '|' because attribute values may hold dots
    const [, attribute, value, measure] = key.split('|');
    const groups = at(entry, ['subgroups']);
    const g = Array.isArray(groups) ? groups.find((x: unknown) => isObject(x) && x.attribute === attribute && x.value === value) : undefined;
    const p = isObject(g) && measure !== undefined ? g[measure] : undefined;
    return isObject(p) ? { value: p.estimate as number, lower: p.lower as number, upper: p.upper as number, k: p.k as number, n: p.n as number } : { value: null };
  }
  if (key.endsWith('.median_s')) {
    const ms = at(entry, [key.split('.')[0] as string, 'median_ms']);
    return { value: typeof ms === 'number' ? ms / 1000 : null };
  }
  const v = at(entry, key.split('.'));
  if (typeof v === 'number') return { value: v };
  if (isObject(v)) {
    const out: Record<string, number | null> = { value: v.estimate as number | null };
    for (const f of ['lower', 'upper', 'k', 'n'] as const) if (f in v) out[f] = v[f] as number | null;
    return out;
  }
  return { value: null };
};

/**
 * Every mismatch between the shown figures and the JSON: entry is the reader's own entry (same
 * finding), others the other readers' entries of that finding. Returns [] when all agree, and
 * how many figures were compared.
 */
export const compareFigures = (shown: readonly ShownFigure[], entry: Json, others: Json[]): { mismatches: string[]; compared: number } => {
  const mismatches: string[] = [];
  let compared = 0;
  for (const f of shown) {
    const want = expected(f.key, entry, others);
    if (want === undefined) continue;
    compared++;
    for (const [field, w] of Object.entries(want)) {
      const got = f[field as keyof ShownFigure];
      if (w === null || w === undefined) {
        if (got !== undefined && got !== '') mismatches.push(`${f.key}.${field}: shown ${got}, JSON has none`);
      } else if (got === undefined || Number(got) !== w) {
        mismatches.push(`${f.key}.${field}: shown ${got ?? 'nothing'}, JSON ${w}`);
      }
    }
  }
  return { mismatches, compared };
};
