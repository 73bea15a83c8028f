/**
 * Between a reader and the coordinator. A reader who finishes or leaves lands here, not on the
 * study page, so the design, the planted list and other readers' results are not one click away.
 * When the study allows it and this reader has finished every period, their own report follows.
 */
import { useCallback, useEffect } from 'react';
import { getStudy } from '../../store/studies';
import { CautionLine } from '../components/CautionLine';
import { useDb } from '../db-context';
import { loadReaderReport, readerPeriods } from '../report/load-reader-report';
import { ReportView } from '../report/ReportView';
import { signal } from '../signals';
import { actions } from '../state/app-state';
import { useAsync } from '../use-async';

const ReaderOwnReport = ({ studyId, readerId }: { studyId: string; readerId: string }) => {
  const db = useDb();
  const data = useAsync(useCallback(async () => {
    const study = await getStudy(db, studyId);
    if (study.showReportToReader !== true) return null;
    const { done, periods } = await readerPeriods(db, study, readerId);
    return periods > 0 && done >= periods ? loadReaderReport(db, studyId, readerId) : null;
  }, [db, studyId, readerId]));
  const value = data.value;
  useEffect(() => { if (value) signal('ready', { screen: 'handover-report' }); }, [value]);
  if (data.error) return <p role="alert">Your report could not be made: {data.error.message}</p>;
  if (!value) return null;
  return (
    <section className="handover-report" aria-label="Your report">
      <p>You have finished every period of this study. Here is your own report, for your learning.</p>
      <ReportView report={value.report} images={null} madeAt={value.madeAt} studyName={value.study.name} />
    </section>
  );
};

export const HandoverScreen = ({ studyId, readerId }: { studyId: string; readerId?: string | undefined }) => (
  <main className="page handover">
    <h1>Thank you</h1>
    <p>Your answers are saved. Please hand the workstation back to the study coordinator.</p>
    <button type="button" onClick={() => actions.openStudy(studyId)}>Coordinator: back to the study</button>
    <CautionLine />
    {readerId !== undefined && <ReaderOwnReport studyId={studyId} readerId={readerId} />}
  </main>
);
