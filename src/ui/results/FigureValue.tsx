/**
 * One figure as the page writes it, with the exact JSON value riding along: data-path is the
 * figure's place in `heed analyze --json` ("readers.2.aided.overreliance"), data-key its headline
 * sub-key, data-value / data-lower / data-upper the exact numbers, so a test can compare the page
 * with the CLI figure by figure.
 */
import { HEADLINE_KEY, valueAt, type FigureDef } from './figure-list';
import { figureText } from './format';

const attr = (x: unknown): string => (typeof x === 'number' ? String(x) : typeof x === 'string' ? x : x === null ? 'null' : '');

export const FigureValue = ({ def, root, base }: { def: FigureDef; root: unknown; base: string }) => {
  const value = valueAt(root, def.path);
  const key = HEADLINE_KEY[def.kind];
  const record = value !== null && typeof value === 'object' && !Array.isArray(value) ? (value as Record<string, unknown>) : null;
  const headline = key ? record?.[key] : value;
  const text = figureText(def.kind, value);
  return (
    <span className="fig" data-path={`${base}${def.path}`} data-key={key ?? ''} data-value={Array.isArray(value) ? JSON.stringify(value) : attr(headline)}
      data-lower={record && 'lower' in record ? attr(record.lower) : undefined} data-upper={record && 'upper' in record ? attr(record.upper) : undefined}>
      <span className="fig-main">{text.main}</span>{text.extra && <span className="fig-extra"> {text.extra}</span>}
    </span>
  );
};
