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
import { ExportPanel } from './ExportPanel';
import { ReaderTable } from './ReaderTable';
import { loadStudyProgress } from './study-progress';

export const StudyScreen = ({ studyId }: { studyId: string }) => {
  const db = useDb();
  const data = useAsync(useCallback(() => loadStudyProgress(db, studyId), [db, studyId]));
  const [, setTick] = useState(0);
  useEffect(() => {
    if (data.value) signal('ready', { screen: 'study' });
  }, [data.value]);
  if (data.error) return <main className="page"><p role="alert">Cannot open this study: {data.error.message}</p></main>;
  if (!data.value) return <main className="page" aria-busy="true"><p>Opening the study…</p></main>;
  const { study, caseSet, progress } = data.value;
  const refresh = () => { data.reload(); setTick((t) => t + 1); };
  return (
    <main className="page">
      <header className="page-head">
        <button type="button" className="link" onClick={actions.goHome}>← Heed</button>
        <h1>{study.name}</h1>
        <p className="muted">on {caseSet.name} · {study.lockedAt ? `design locked since ${study.lockedAt.slice(0, 16).replace('T', ' ')} UTC (reading started)` : 'draft: the design locks when the first reader starts'}</p>
        <CautionLine />
      </header>
      <ReaderTable study={study} progress={progress} onChanged={refresh} />
      <EnrolForm study={study} onEnrolled={refresh} />
      <ExportPanel study={study} caseSet={caseSet} caution={RESEARCH_CAUTION} />
      <DesignSummary study={study} caseSet={caseSet} />
      <DryRunPanel study={study} caseSet={caseSet} />
    </main>
  );
};
