/** Which suggestions are planted errors: for the coordinator only, never shown while reading. */
import { plantedList } from '../../core/planting';
import type { StoredStudy } from '../../store/records';

export const PlantedList = ({ study }: { study: StoredStudy }) => {
  const planted = plantedList(study.suggestions);
  return (
    <details className="planted">
      <summary>Planted errors ({planted.length}) — coordinator only; readers never see which suggestions were planted</summary>
      {planted.length === 0 ? <p className="muted">None planted.</p> : (
        <table className="grid" aria-label="Planted errors">
          <thead><tr><th scope="col">Case</th><th scope="col">Finding</th><th scope="col">Truth</th><th scope="col">Shown call</th><th scope="col">Shown score</th><th scope="col">Model’s own score</th></tr></thead>
          <tbody>
            {planted.map((p) => (
              <tr key={`${p.caseId}/${p.finding}`}>
                <td>{p.caseId}</td><td>{p.finding}</td><td>{p.truth === 1 ? 'present' : 'absent'}</td>
                <td>{p.call === 1 ? 'present' : 'absent'}</td><td>{p.score?.toFixed(3) ?? '—'}</td><td>{p.naturalScore?.toFixed(3) ?? '—'}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </details>
  );
};
