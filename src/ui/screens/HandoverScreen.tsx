/**
 * Between a reader and the coordinator. A reader who finishes or leaves lands here, not on the
 * study page, so the design, the planted list and other readers' results are not one click away.
 */
import { CautionLine } from '../components/CautionLine';
import { actions } from '../state/app-state';

export const HandoverScreen = ({ studyId }: { studyId: string }) => (
  <main className="page handover">
    <h1>Thank you</h1>
    <p>Your answers are saved. Please hand the workstation back to the study coordinator.</p>
    <button type="button" onClick={() => actions.openStudy(studyId)}>Coordinator: back to the study</button>
    <CautionLine />
  </main>
);
