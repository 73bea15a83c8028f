/**
 * The numbers behind a section, one click away: rows are readers (and summaries), columns the
 * section's figures from the figure list, four at a time so the table never runs off the page.
 * The content is only built when opened, which keeps a page of many readers quick.
 */
import { useState, type ReactNode } from 'react';
import { valueAt, type FigureDef } from './figure-list';
import { FigureValue } from './FigureValue';

export type NumbersRow = { label: string; root: unknown; base: string };

const COLUMNS = 4;

export const Disclosure = ({ summary, children, open = false }: { summary: string; children: () => ReactNode; open?: boolean }) => {
  const [shown, setShown] = useState(open);
  return (
    <details className="numbers" open={open} onToggle={(e) => { if (e.currentTarget.open) setShown(true); }}>
      <summary>{summary}</summary>
      {shown && children()}
    </details>
  );
};

export const NumbersTable = ({ caption, rows, figures }: { caption: string; rows: readonly NumbersRow[]; figures: readonly FigureDef[] }) => {
  // a column that no row has (e.g. switching in a study without sequential reads) is left out
  const present = figures.filter((f) => rows.some((r) => { const v = valueAt(r.root, f.path); return v !== null && v !== undefined; }));
  if (present.length === 0) return <p className="muted">{caption}: none in this study.</p>;
  const chunks: FigureDef[][] = [];
  for (let i = 0; i < present.length; i += COLUMNS) chunks.push(present.slice(i, i + COLUMNS));
  return (
    <>
      {chunks.map((chunk, c) => (
        <table className="grid numbers-table" key={c}>
          {c === 0 && <caption>{caption}</caption>}
          <thead><tr><th scope="col">Reader</th>{chunk.map((f) => <th scope="col" key={f.path}>{f.label}</th>)}</tr></thead>
          <tbody>
            {rows.map((r) => (
              <tr key={r.base}><th scope="row">{r.label}</th>{chunk.map((f) => <td key={f.path}><FigureValue def={f} root={r.root} base={r.base} /></td>)}</tr>
            ))}
          </tbody>
        </table>
      ))}
    </>
  );
};
