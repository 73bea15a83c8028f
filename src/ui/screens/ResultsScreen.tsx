/** Results of a study: computed by the same analysis engine as `heed analyze`. */
import { CautionLine } from '../components/CautionLine';
import { actions } from '../state/app-state';

export const ResultsScreen = ({ studyId }: { studyId: string }) => (
  <main className="page">
    <header className="page-head">
      <button type="button" className="link" onClick={() => actions.openStudy(studyId)}>← Study</button>
      <h1>Results</h1>
      <CautionLine />
    </header>
  </main>
);
