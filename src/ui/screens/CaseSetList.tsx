/** The case sets stored on this workstation, with a short summary of each. */
import type { StoredCaseSet } from '../../store/records';
import { CaseSetActions } from './CaseSetActions';
import { ImportCaseSet } from './ImportCaseSet';

type Props = { caseSets: StoredCaseSet[]; onChanged: () => void };

const prevalence = (set: StoredCaseSet, finding: string): string => {
  const rows = set.manifest.cases.filter((c) => !c.practice).flatMap((c) => c.findings.filter((f) => f.finding === finding));
  if (rows.length === 0) return '—';
  return `${Math.round((100 * rows.filter((f) => f.truth === 1).length) / rows.length)}%`;
};

export const CaseSetList = ({ caseSets, onChanged }: Props) => (
  <section className="panel" aria-labelledby="sets-head">
    <div className="panel-head">
      <h2 id="sets-head">Case sets</h2>
    </div>
    <table className="grid">
      <thead><tr><th scope="col">Name</th><th scope="col">Cases</th><th scope="col">Practice</th><th scope="col">Findings (prevalence)</th><th scope="col">Source</th><th scope="col">Actions</th></tr></thead>
      <tbody>
        {caseSets.map((set) => (
          <tr key={set.id}>
            <td>{set.name}</td>
            <td>{set.manifest.cases.filter((c) => !c.practice).length}</td>
            <td>{set.manifest.cases.filter((c) => c.practice).length}</td>
            <td>{set.manifest.findings.map((f) => `${f} (${prevalence(set, f)})`).join(', ')}</td>
            <td>{set.source === 'demo' ? 'demo (generated placeholders)' : 'imported'}</td>
            <td>{set.source === 'demo' ? <span className="muted">generated at launch</span> : <CaseSetActions set={set} onChanged={onChanged} />}</td>
          </tr>
        ))}
      </tbody>
    </table>
    <ImportCaseSet onImported={onChanged} />
  </section>
);
