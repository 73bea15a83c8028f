/** The reader's report as the HTML and CLI give it: the same markup, drawn with the browser's document. */
import { useMemo } from 'react';
import type { ReaderReport } from '../../analysis/reader-report/reader-report';
import { reportBody } from '../../io/report/render-report';
import { REPORT_CSS } from '../../io/report/report-css';
import { adoptCss, liftInlineStyles } from '../adopted-styles';

type Props = { report: ReaderReport; images: ReadonlyMap<string, string> | null; madeAt: string; studyName: string };

export const ReportView = ({ report, images, madeAt, studyName }: Props) => {
  // The markup is built by our own renderer, which escapes every value from outside. It carries no
  // <style> element or style attribute (the page's policy would block them): the report's CSS and
  // each plot's styles are adopted as style sheets (adopted-styles.ts).
  const html = useMemo(() => {
    adoptCss(REPORT_CSS);
    return reportBody(report, { document, images, madeAt, studyName, styles: 'outside', beforeMarkup: liftInlineStyles });
  }, [report, images, madeAt, studyName]);
  return <div className="report-host" dangerouslySetInnerHTML={{ __html: html }} />;
};
