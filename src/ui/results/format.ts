/** How the results page writes numbers: shares as percentages, AUCs with 2 decimals, times in seconds. */
import type { FigureKind } from './figure-list';

export const DASH = '—';

const isNum = (x: unknown): x is number => typeof x === 'number' && Number.isFinite(x);

export const pct = (x: unknown, digits = 0): string => (isNum(x) ? `${(x * 100).toFixed(digits)}%` : DASH);
export const dec = (x: unknown, digits = 2): string => (isNum(x) ? x.toFixed(digits) : DASH);
export const signed = (x: unknown, digits = 2): string => (isNum(x) ? `${x > 0 ? '+' : x < 0 ? '−' : '±'}${Math.abs(x).toFixed(digits)}` : DASH);
export const seconds = (ms: unknown): string => (isNum(ms) ? `${(ms / 1000).toFixed(1)} s` : DASH);
export const pValue = (p: unknown): string => (isNum(p) ? (p < 0.001 ? '< 0.001' : p.toFixed(3)) : DASH);

/** Plain words for a share: "34% (11 of 32)". */
export const shareWords = (s: { k: number; n: number; estimate: number | null } | null | undefined): string =>
  s && s.n > 0 ? `${pct(s.estimate)} (${s.k} of ${s.n})` : 'no reads';

const get = (o: unknown, key: string): unknown => (o !== null && typeof o === 'object' ? (o as Record<string, unknown>)[key] : undefined);

/** The text of one figure by its kind. */
export const figureText = (kind: FigureKind, value: unknown): { main: string; extra: string } => {
  if (value === null || value === undefined) return { main: DASH, extra: '' };
  switch (kind) {
    case 'share': {
      const n = get(value, 'n');
      if (n === 0) return { main: DASH, extra: 'none' };
      return { main: pct(get(value, 'estimate')), extra: `${String(get(value, 'k'))}/${String(n)} · ${pct(get(value, 'lower'))}–${pct(get(value, 'upper'))}` };
    }
    case 'auc': return { main: dec(get(value, 'estimate'), 3), extra: isNum(get(value, 'lower')) ? `${dec(get(value, 'lower'), 3)}–${dec(get(value, 'upper'), 3)}` : '' };
    case 'averaged': {
      const e = get(value, 'estimate');
      const asPct = (x: unknown) => (isNum(x) ? dec(x, 3) : DASH);
      return { main: asPct(e), extra: isNum(get(value, 'lower')) ? `${asPct(get(value, 'lower'))} to ${asPct(get(value, 'upper'))}` : '' };
    }
    case 'count': return { main: isNum(value) ? String(value) : DASH, extra: '' };
    case 'difference': return { main: signed(value, 3), extra: '' };
    case 'ms': return { main: seconds(value), extra: '' };
    case 'ratio': return { main: isNum(value) ? `× ${value.toFixed(2)}` : DASH, extra: '' };
    case 'score': return { main: dec(value, 3), extra: '' };
    case 'kappa': return { main: dec(get(value, 'estimate'), 3), extra: isNum(get(value, 'se')) ? `SE ${dec(get(value, 'se'), 3)}` : '' };
    case 'woa': return { main: dec(get(value, 'mean'), 2), extra: `median ${dec(get(value, 'median'), 2)}; ${String(get(value, 'n'))} reads` };
    case 'time': return { main: seconds(get(value, 'median_ms')), extra: `${seconds(get(value, 'q1_ms'))}–${seconds(get(value, 'q3_ms'))}; ${String(get(value, 'n'))} reads` };
    case 'calibration': return { main: dec(get(value, 'ece'), 3), extra: '10 bins' };
    case 'mcnemar': return { main: pValue(get(value, 'p')), extra: `b ${String(get(value, 'b'))}, c ${String(get(value, 'c'))}; mid-p ${pValue(get(value, 'mid_p'))}` };
    case 'paired_auc': return { main: signed(get(value, 'difference'), 3), extra: `SE ${dec(get(value, 'se'), 3)}; p ${pValue(get(value, 'p'))}` };
    case 'fleiss': return { main: dec(get(value, 'kappa'), 3), extra: `${String(get(value, 'readers'))} readers, ${String(get(value, 'cases'))} cases` };
    case 'or_test': return { main: signed(get(value, 'difference'), 3), extra: `${dec(get(value, 'lower'), 3)} to ${dec(get(value, 'upper'), 3)}` };
    case 'matrix': return { main: Array.isArray(value) ? value.map((row) => (Array.isArray(row) ? row.map((x) => dec(x, 3)).join(', ') : '')).join('; ') : DASH, extra: '' };
    case 'treatments': return {
      main: Array.isArray(value) ? value.map((t) => `${get(t, 'modality') === 0 ? 'without' : 'with'} ${dec(get(t, 'auc'), 3)} (${dec(get(get(t, 'random'), 'lower'), 3)}–${dec(get(get(t, 'random'), 'upper'), 3)})`).join('; ') : DASH,
      extra: '',
    };
    case 'note': return { main: typeof value === 'string' ? value : DASH, extra: '' };
    case 'covariances': return { main: `var ${dec(get(value, 'varE'), 5)}`, extra: `cov1 ${dec(get(value, 'cov1'), 5)}, cov2 ${dec(get(value, 'cov2'), 5)}, cov3 ${dec(get(value, 'cov3'), 5)}` };
  }
};
