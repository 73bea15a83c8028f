// Small helpers for writing the report's HTML as text: escaping, and figures that carry their
// exact value in data attributes so a test can compare the page with `heed analyze --json`.
import type { Proportion } from '../../analysis/wilson';

const ESCAPES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' };

/** Text or attribute value made safe for HTML. */
export const esc = (s: string): string => s.replace(/[&<>"']/g, (c) => ESCAPES[c] ?? c);

export const pctText = (x: number | null | undefined): string => (x === null || x === undefined ? '–' : `${Math.round(x * 100)}%`);

const dataNum = (name: string, v: number | null | undefined): string => (v === null || v === undefined ? '' : ` data-${name}="${v}"`);

/** A table cell holding a proportion: "85% (78–90%) 34 of 40", marked too few when n < minReads. */
export const shareCell = (key: string, p: Proportion | null | undefined, tooFew: (n: number) => boolean): string => {
  if (p === null || p === undefined || p.n === 0 || p.estimate === null) {
    return `<td class="num" data-figure="${esc(key)}" data-n="${p?.n ?? 0}">–<span class="sub">no reads</span></td>`;
  }
  const few = tooFew(p.n) ? '<span class="few">too few to judge</span>' : '';
  return `<td class="num" data-figure="${esc(key)}"${dataNum('value', p.estimate)}${dataNum('lower', p.lower)}${dataNum('upper', p.upper)} data-k="${p.k}" data-n="${p.n}">`
    + `<strong>${pctText(p.estimate)}</strong> <span class="ci">(${Math.round((p.lower ?? 0) * 100)}–${pctText(p.upper)})</span><span class="sub">${p.k} of ${p.n}</span>${few}</td>`;
};

/** A table cell holding an estimate with an optional interval, shown with `digits` decimals. */
export const numberCell = (key: string, value: number | null | undefined, digits: number, interval?: { lower: number | null; upper: number | null }): string => {
  if (value === null || value === undefined) return `<td class="num" data-figure="${esc(key)}">–</td>`;
  const ci = interval && interval.lower !== null && interval.upper !== null ? ` <span class="ci">(${interval.lower.toFixed(digits)}–${interval.upper.toFixed(digits)})</span>` : '';
  return `<td class="num" data-figure="${esc(key)}"${dataNum('value', value)}${dataNum('lower', interval?.lower)}${dataNum('upper', interval?.upper)}><strong>${value.toFixed(digits)}</strong>${ci}</td>`;
};

/** A count cell (exact integer). */
export const countCell = (key: string, value: number): string => `<td class="num" data-figure="${esc(key)}" data-value="${value}">${value}</td>`;
