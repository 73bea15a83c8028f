/**
 * One number as the results screen shows it: rounded, with its interval as a range. The exact
 * value rides along in data-value, so a test can compare the screen with `heed analyze --json`.
 */
import type { Proportion } from '../../analysis/wilson';

const fmt = (x: number | null | undefined, digits = 3): string => (x === null || x === undefined ? '—' : x.toFixed(digits));

type EstimateLike = { estimate: number | null; lower?: number | null; upper?: number | null };

export const Estimate = ({ value, name }: { value: EstimateLike | null | undefined; name: string }) => (
  <td className="num" data-figure={name} data-value={value?.estimate ?? ''} data-lower={value?.lower ?? ''} data-upper={value?.upper ?? ''}>
    {fmt(value?.estimate)}
    {value && value.lower !== undefined && value.lower !== null && <span className="range"> [{fmt(value.lower)}, {fmt(value.upper)}]</span>}
  </td>
);

export const Share = ({ value, name }: { value: Proportion | null | undefined; name: string }) => (
  <td className="num" data-figure={name} data-value={value?.estimate ?? ''}>
    {value ? <>{fmt(value.estimate)} <span className="muted">({value.k}/{value.n})</span>{value.lower !== null && <span className="range"> [{fmt(value.lower)}, {fmt(value.upper)}]</span>}</> : '—'}
  </td>
);

export const Plain = ({ value, name, digits = 3 }: { value: number | null | undefined; name: string; digits?: number }) => (
  <td className="num" data-figure={name} data-value={value ?? ''}>{fmt(value, digits)}</td>
);
