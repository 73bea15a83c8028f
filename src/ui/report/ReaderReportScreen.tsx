/**
 * One reader's private report, opened by the coordinator from the study page: the report itself
 * (the same as `heed report`), whether case images go into it, print to PDF and save as HTML.
 */
import { useCallback, useEffect, useState } from 'react';
import { reportPage } from '../../io/report/render-report';
import { getHost } from '../../host';
import { useDb } from '../db-context';
import { signal } from '../signals';
import { actions } from '../state/app-state';
import { useAsync } from '../use-async';
import { caseThumbnails } from './case-thumbnails';
import { loadReaderReport } from './load-reader-report';
import { ReportView } from './ReportView';

const fileBase = (code: string): string => `heed-report-${code.replace(/[^A-Za-z0-9._-]+/g, '-')}`;

export const ReaderReportScreen = ({ studyId, readerId }: { studyId: string; readerId: string }) => {
  const db = useDb();
  const data = useAsync(useCallback(() => loadReaderReport(db, studyId, readerId), [db, studyId, readerId]));
  const [withImages, setWithImages] = useState(false);
  const [status, setStatus] = useState('');
  const value = data.value;
  const thumbs = useAsync(useCallback(async () => (withImages && value?.report.case_review ? caseThumbnails(db, value.study.caseSetId, value.report.case_review) : null), [db, withImages, value]));
  const images = withImages ? thumbs.value ?? null : null;
  const ready = value !== undefined && (!withImages || images !== null || thumbs.error !== null);
  useEffect(() => { if (ready || data.error) signal('ready', { screen: 'report' }); }, [ready, data.error]);

  if (data.error) return <main className="page"><button type="button" className="link" onClick={() => actions.openStudy(studyId)}>← Study</button><p role="alert">Cannot make this report: {data.error.message}</p></main>;
  if (!value) return <main className="page" aria-busy="true"><p>Making the report…</p></main>;
  const code = value.reader.code;
  const saveHtml = async () => {
    const page = reportPage(value.report, { document, images, madeAt: value.madeAt, studyName: value.study.name });
    const result = await getHost().saveFile(`${fileBase(code)}.html`, page, 'text/html');
    setStatus(result.handedTo === 'downloads' ? 'The HTML file was handed to the browser’s downloads.' : result.saved ? `Saved${result.where ? ` to ${result.where}` : ''}.` : 'Not saved.');
    signal('saved', { file: `${fileBase(code)}.html` });
  };
  const print = async () => {
    const result = await getHost().printToPdf(`${fileBase(code)}.pdf`);
    setStatus(result.handedTo === 'print-dialog' ? 'Choose “Save as PDF” in the print dialog.' : result.saved ? `Saved${result.where ? ` to ${result.where}` : ''}.` : 'Not saved.');
  };
  return (
    <main className="page report-page">
      <div className="no-print report-tools" role="region" aria-label="Report options">
        <button type="button" className="link" onClick={() => actions.openStudy(studyId)}>← Study</button>
        <p>Private report for reader <strong>{code}</strong>. Give it to this reader only.</p>
        {!value.complete && <p className="warning" role="status">Interim report: {value.periodsDone} of {value.periods} periods complete. The case review appears once the reader has finished every period.</p>}
        <div className="form-actions">
          {value.report.case_review !== null && value.report.case_review.length > 0 && (
            <label><input type="checkbox" checked={withImages} onChange={(e) => setWithImages(e.target.checked)} /> Include case images in the report</label>
          )}
          <button type="button" onClick={() => void print()}>Print or save as PDF</button>
          <button type="button" onClick={() => void saveHtml().catch((e: unknown) => setStatus(`Not saved: ${e instanceof Error ? e.message : String(e)}`))}>Save as HTML file</button>
        </div>
        <p className="muted" aria-live="polite">{thumbs.error ? `Images could not be added: ${thumbs.error.message}` : status}</p>
      </div>
      <ReportView report={value.report} images={images} madeAt={value.madeAt} studyName={value.study.name} />
    </main>
  );
};
