// The reader's private report as one self-contained HTML page: inline CSS and inline SVG plots,
// no script, no address of any kind, no other reader named. The same body sits in the app.
import type { ReaderReport } from '../../analysis/reader-report/reader-report';
import { RESEARCH_CAUTION } from '../../core/research-caution';
import { caseReviewHtml, type CaseImages } from './case-review-html';
import { findingHtml } from './finding-html';
import { esc } from './html';
import { REPORT_CSS } from './report-css';

export type RenderOptions = {
  /** a DOM document to draw plots in: the browser's, or src/cli/plot-document.ts in Node */
  document: Document;
  /** case images for the case review, when the coordinator chose to include them */
  images?: CaseImages | null;
  /** when the report was made, ISO; shown in the footer */
  madeAt?: string;
  /** the study's name where known (the app); a read log alone gives only its id */
  studyName?: string;
  /**
   * 'inline' (the standalone page): the report's CSS in a <style> element and each plot's styles
   * inline. 'outside' (the app, whose CSP allows no inline styles): no <style> element, and each
   * plot goes through `beforeMarkup` first; the app applies REPORT_CSS itself.
   */
  styles?: 'inline' | 'outside';
  beforeMarkup?: (node: Element) => void;
};

export const LEARNING_CAUTION =
  'This report is feedback for your own learning. It is not an appraisal, and it must not be used for credentialing, employment or any other decision about you. Follow your local governance (ethics board, data protection, licensed practice).';

/** The report's body: one element with class heed-report, for the app and the page alike (styles: see RenderOptions). */
export const reportBody = (report: ReaderReport, options: RenderOptions): string => {
  const showFinding = report.findings.length > 1;
  const role = report.reader_role ? ` (${esc(report.reader_role)})` : '';
  const inline = (options.styles ?? 'inline') === 'inline';
  const target = { document: options.document, beforeMarkup: inline ? undefined : options.beforeMarkup };
  return `<article class="heed-report" aria-labelledby="report-title">${inline ? `<style>${REPORT_CSS}</style>` : ''}
<header><h1 id="report-title">Your reading report</h1>
<p class="meta">Reader ${esc(report.reader_id)}${role} · study ${esc(options.studyName ?? report.study_id)} · private: for you and the study coordinator only</p>
<p class="caution" role="note">${esc(RESEARCH_CAUTION)} ${esc(LEARNING_CAUTION)}</p></header>
<section class="rule" aria-label="How to read this report"><p><strong>How to read this report.</strong> Each figure comes with a sentence saying what it means. The range after a percentage (95% CI) is where the true value probably lies; the narrower it is, the surer the figure. ${esc(report.small_count_rule)} Other readers of this study appear only as unnamed dots and a range, and only when there are at least 3 of them.</p></section>
${report.findings.map((f) => findingHtml(f, target, showFinding)).join('\n')}
${caseReviewHtml(report, options.images ?? null)}
<footer><p>Made by Heed${options.madeAt ? ` on ${esc(options.madeAt.slice(0, 16).replace('T', ' '))} UTC` : ''}. Figures are the same as those of the study's analysis for this reader. ${esc(RESEARCH_CAUTION)}</p></footer>
</article>`;
};

/** The whole self-contained page. */
export const reportPage = (report: ReaderReport, options: RenderOptions): string =>
  `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>Reading report: reader ${esc(report.reader_id)}</title><style>body { margin: 0; background: #fff; }</style></head>
<body>${reportBody(report, options)}</body></html>
`;
