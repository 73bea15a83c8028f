/** A section of the results page: a heading, one line in plain words, then figures and numbers. */
import type { ReactNode } from 'react';
import { valueAt, type FigureDef } from './figure-list';
import { FigureValue } from './FigureValue';

export const Section = ({ id, title, lead, children }: { id: string; title: string; lead: ReactNode; children: ReactNode }) => (
  <section className="result-section" aria-labelledby={id}>
    <h3 id={id}>{title}</h3>
    <p className="lead">{lead}</p>
    {children}
  </section>
);

/** Group figures as a two-column list: plain label, value (figures the report lacks are left out). */
export const GroupFigures = ({ figures, root, base, caption }: { figures: readonly FigureDef[]; root: unknown; base: string; caption: string }) => {
  const present = figures.filter((f) => valueAt(root, f.path) !== undefined);
  if (present.length === 0) return null;
  return (
    <table className="grid numbers-table group-figures">
      <caption>{caption}</caption>
      <tbody>
        {present.map((f) => <tr key={f.path}><th scope="row">{f.label}</th><td><FigureValue def={f} root={root} base={base} /></td></tr>)}
      </tbody>
    </table>
  );
};
