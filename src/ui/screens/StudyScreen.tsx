/** One study: its design, its readers and their progress, starting periods, and exports. */
import { useCallback, useEffect, useState } from 'react';
import { RESEARCH_CAUTION } from '../../core/research-caution';
import { CautionLine } from '../components/CautionLine';
import { useDb } from '../db-context';
import { signal } from '../signals';
import { actions } from '../state/app-state';
import { useAsync } from '../use-async';
import { DesignSummary } from './DesignSummary';
import { DryRunPanel } from './DryRunPanel';
import { EnrolForm } from './EnrolForm';
import { BundlePanel } from './BundlePanel';
import { ExportPanel } from './ExportPanel';
import { ReaderTable } from './ReaderTable';
import { ReportSetting } from '../report/ReportSetting';
import { loadStudyProgress } from './study-progress';
import { StudyActions } from './StudyActions';

export const StudyScreen = ({ studyId }: { studyId: string }) => {
  const db = useDb();
  const data = useAsync(useCallback(() => loadStudyProgress(db, studyId), [db, studyId]));
  const [, setTick] = useState(0);
  useEffect(() => {
    if (data.value) signal('ready', { screen: 'study' });
  }, [data.value]);
  if (data.error) return <main className="page"><p role="alert">Cannot open this study: {data.error.message}</p></main>;
  if (!data.value) return <main className="page" aria-busy="true"><p>Opening the study…</p></main>;
  const { study, caseSet, progress, status } = data.value;
  const refresh = () => { data.reload(); setTick((t) => t + 1); };
  return (
    <main className="page">
      <header className="page-head">
        <button type="button" className="link" onClick={actions.goHome}>← Heed</button>
        <div className="head-row">
          <h1>{study.name}</h1>
          <button type="button" className="primary" onClick={() => actions.openResults(study.id)}>Results</button>
        </div>
        <p className="muted">on {caseSet.name} · <span aria-label="Study status">{status === 'finished' ? 'finished: every period of every reader is complete'
          : status === 'reading' ? `reading under way (design locked since ${study.lockedAt?.slice(0, 16).replace('T', ' ') ?? ''} UTC)` : 'draft: the design can be edited until the first reader starts'}</span></p>
        <CautionLine />
      </header>
      <StudyActions study={study} onChanged={refresh} />
      <ReaderTable study={study} progress={progress} onChanged={refresh} />
      <EnrolForm study={study} onEnrolled={refresh} />
      <ReportSetting study={study} onChanged={refresh} />
      <ExportPanel study={study} caseSet={caseSet} caution={RESEARCH_CAUTION} />
      <BundlePanel study={study} onMerged={refresh} />
      <DesignSummary study={study} caseSet={caseSet} />
      <DryRunPanel study={study} caseSet={caseSet} />
    </main>
  );
};
