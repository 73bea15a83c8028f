export type Kappa = { estimate: number | null; se: number | null; se0: number | null };

/**
 * Cohen's (1960) kappa of a k×k agreement table (rows: rater A, columns: rater B),
 * κ = (po − pe)/(1 − pe), with the large-sample standard error of Fleiss, Cohen & Everitt
 * (1969), Psychological Bulletin 72:323-327:
 *   var = [Σi pii((1−pe) − (p.i + pi.)(1−po))² + (1−po)² Σi≠j pij(p.i + pj.)² − (po·pe − 2pe + po)²] / (n(1−pe)⁴),
 * and se0, its value under κ = 0: var0 = [pe + pe² − Σi pi.·p.i(pi. + p.i)] / (n(1−pe)²).
 * Nulls when n = 0 or pe = 1 (both raters constant and equal: κ undefined).
 * Throws RangeError when the table is not square or holds a negative or non-finite count.
 * Example: cohenKappaTable([[0,4,1],[0,8,0],[0,1,5]]) → κ 0.4842, se 0.1380, se0 0.1484
 * (a SAS worked example, as quoted in statsmodels' tests).
 */
export const cohenKappaTable = (table: number[][]): Kappa => {
  const k = table.length;
  let n = 0;
  for (const [i, row] of table.entries()) {
    if (row.length !== k) throw new RangeError(`kappa table row ${i} has ${row.length} cells, expected ${k}`);
    for (const c of row) {
      if (!(c >= 0) || !Number.isFinite(c)) throw new RangeError(`kappa table row ${i} holds ${c}, not a count`);
      n += c;
    }
  }
  if (n === 0) return { estimate: null, se: null, se0: null };
  const p = table.map((row) => row.map((c) => c / n));
  const rowM = p.map((row) => row.reduce((s, v) => s + v, 0));
  const colM = p[0]?.map((_, j) => p.reduce((s, row) => s + (row[j] as number), 0)) ?? [];
  let po = 0;
  let pe = 0;
  for (let i = 0; i < k; i++) {
    po += p[i]?.[i] as number;
    pe += (rowM[i] as number) * (colM[i] as number);
  }
  if (pe >= 1) return { estimate: null, se: null, se0: null };
  const kappa = (po - pe) / (1 - pe);
  let a = 0;
  let b = 0;
  let c0 = 0;
  for (let i = 0; i < k; i++) {
    const ri = rowM[i] as number;
    const ci = colM[i] as number;
    const pii = p[i]?.[i] as number;
    a += pii * ((1 - pe) - (ci + ri) * (1 - po)) ** 2;
    c0 += ri * ci * (ri + ci);
    for (let j = 0; j < k; j++) if (j !== i) b += (p[i]?.[j] as number) * (ci + (rowM[j] as number)) ** 2;
  }
  const variance = (a + (1 - po) ** 2 * b - (po * pe - 2 * pe + po) ** 2) / (n * (1 - pe) ** 4);
  const variance0 = (pe + pe * pe - c0) / (n * (1 - pe) ** 2);
  return { estimate: kappa, se: Math.sqrt(Math.max(0, variance)), se0: Math.sqrt(Math.max(0, variance0)) };
};

/**
 * Cohen's kappa of two 0/1 call series (e.g. final call against the suggestion's call),
 * via cohenKappaTable on their 2×2 table. Throws RangeError on unequal lengths or non-0/1 values.
 * Example: cohenKappa([1, 1, 0, 0], [1, 0, 0, 0]).estimate → 0.5.
 */
export const cohenKappa = (a: ArrayLike<number>, b: ArrayLike<number>): Kappa => {
  if (a.length !== b.length) throw new RangeError(`kappa series differ in length: ${a.length} and ${b.length}`);
  const t = [[0, 0], [0, 0]] as [[number, number], [number, number]];
  for (let i = 0; i < a.length; i++) {
    const x = a[i];
    const y = b[i];
    if ((x !== 0 && x !== 1) || (y !== 0 && y !== 1)) throw new RangeError(`kappa values must be 0/1 at index ${i}`);
    t[x][y]++;
  }
  return cohenKappaTable(t);
};
