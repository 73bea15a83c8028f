import { lazy, Suspense } from 'react';
import { HomeScreen } from './screens/HomeScreen';
import { loadReading } from './reading/load-reading';

// The start screen's bundle holds only what it shows: every other screen (and with them results,
// reports, plots and the planner) is loaded when first opened. The reading view too: the start
// screen (when a session can be resumed) and the study screen preload it (reading/load-reading.ts).
const ReadView = lazy(async () => ({ default: (await loadReading()).ReadView }));
const NewStudyScreen = lazy(async () => ({ default: (await import('./screens/NewStudyScreen')).NewStudyScreen }));
const StudyScreen = lazy(async () => ({ default: (await import('./screens/StudyScreen')).StudyScreen }));
const ResultsScreen = lazy(async () => ({ default: (await import('./screens/ResultsScreen')).ResultsScreen }));
const HandoverScreen = lazy(async () => ({ default: (await import('./screens/HandoverScreen')).HandoverScreen }));
const EditStudyScreen = lazy(async () => ({ default: (await import('./screens/EditStudyScreen')).EditStudyScreen }));
const AuditLogScreen = lazy(async () => ({ default: (await import('./screens/AuditLogScreen')).AuditLogScreen }));
const ReaderReportScreen = lazy(async () => ({ default: (await import('./report/ReaderReportScreen')).ReaderReportScreen }));
import { actions, useAppState } from './state/app-state';
import { CoordinatorGate } from './lock/CoordinatorGate';

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
      <Suspense fallback={<p className="page" aria-busy="true">Opening…</p>}>
      <CoordinatorGate screen={screen}>
      {screen.name === 'home' && <HomeScreen />}
      {screen.name === 'new-study' && <NewStudyScreen />}
      {screen.name === 'study' && <StudyScreen studyId={screen.studyId} />}
      {screen.name === 'results' && <ResultsScreen studyId={screen.studyId} />}
      {screen.name === 'read' && (
        <ReadView studyId={screen.studyId} sessionId={screen.sessionId} notice={notice} onHandBack={() => actions.handOver(screen.studyId)} />
      )}
      {screen.name === 'handover' && <HandoverScreen studyId={screen.studyId} readerId={screen.readerId} />}
      {screen.name === 'edit-study' && <EditStudyScreen studyId={screen.studyId} />}
      {screen.name === 'audit' && <AuditLogScreen studyId={screen.studyId} />}
      {screen.name === 'reader-report' && <ReaderReportScreen studyId={screen.studyId} readerId={screen.readerId} />}
      </CoordinatorGate>
      </Suspense>
    </>
  );
};
