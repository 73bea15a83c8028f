import { HomeScreen } from './screens/HomeScreen';
import { NewStudyScreen } from './screens/NewStudyScreen';
import { StudyScreen } from './screens/StudyScreen';
import { ReadingScreen } from './reading/ReadingScreen';
import { ResultsScreen } from './screens/ResultsScreen';
import { HandoverScreen } from './screens/HandoverScreen';
import { EditStudyScreen } from './screens/EditStudyScreen';
import { AuditLogScreen } from './screens/AuditLogScreen';
import { ReaderReportScreen } from './report/ReaderReportScreen';
import { actions, useAppState } from './state/app-state';
import { CoordinatorGate } from './lock/CoordinatorGate';
import { SingleWindowSession } from './reading/SingleWindowSession';

export const App = () => {
  const { screen, notice } = useAppState();
  return (
    <>
      {notice && screen.name !== 'read' && (
        <div className={`notice notice-${notice.kind}`} role={notice.kind === 'error' ? 'alert' : 'status'}>
          <span>{notice.text}</span>
          <button type="button" className="link" onClick={actions.clearNotice} aria-label="Dismiss notice">×</button>
        </div>
      )}
      <CoordinatorGate screen={screen}>
      {screen.name === 'home' && <HomeScreen />}
      {screen.name === 'new-study' && <NewStudyScreen />}
      {screen.name === 'study' && <StudyScreen studyId={screen.studyId} />}
      {screen.name === 'results' && <ResultsScreen studyId={screen.studyId} />}
      {screen.name === 'read' && (
        <SingleWindowSession sessionId={screen.sessionId} onHandBack={() => actions.handOver(screen.studyId)}>
          <ReadingScreen studyId={screen.studyId} sessionId={screen.sessionId} notice={notice} />
        </SingleWindowSession>
      )}
      {screen.name === 'handover' && <HandoverScreen studyId={screen.studyId} readerId={screen.readerId} />}
      {screen.name === 'edit-study' && <EditStudyScreen studyId={screen.studyId} />}
      {screen.name === 'audit' && <AuditLogScreen studyId={screen.studyId} />}
      {screen.name === 'reader-report' && <ReaderReportScreen studyId={screen.studyId} readerId={screen.readerId} />}
      </CoordinatorGate>
    </>
  );
};
