/** The reader's report as the HTML and CLI give it: the same markup, drawn with the browser's document. */
import { useMemo } from 'react';
import type { ReaderReport } from '../../analysis/reader-report/reader-report';
import { reportBody } from '../../io/report/render-report';

type Props = { report: ReaderReport; images: ReadonlyMap<string, string> | null; madeAt: string; studyName: string };

export const ReportView = ({ report, images, madeAt, studyName }: Props) => {
  // The markup is built by our own renderer, which escapes every value from outside.
  const html = useMemo(() => reportBody(report, { document, images, madeAt, studyName }), [report, images, madeAt, studyName]);
  return <div className="report-host" dangerouslySetInnerHTML={{ __html: html }} />;
};
