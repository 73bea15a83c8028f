// `heed report FILE --reader ID [--out report.html] [--pdf report.pdf]`: one reader's private
// feedback report from a reads.csv, as a self-contained HTML page and/or a PDF.
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { analyzeReads } from '../analysis/engine';
import { readerComplete } from '../analysis/reader-report/log-completion';
import { readerReport } from '../analysis/reader-report/reader-report';
import { parseReadLog, parseReadLogBytes, ReadLogError } from '../io/read-log-parse';
import { readAnalyzeInput } from './analyze-input';
import { reportPage } from '../io/report/render-report';
import { printHtmlToPdf } from './chromium-pdf';
import { cannotWrite, CliError } from './cli-error';
import { plotDocument } from './plot-document';

const USAGE = 'usage: heed report FILE --reader ID [--out report.html] [--pdf report.pdf]';

type ReportArgs = { file: string; reader: string; out: string | null; pdf: string | null };

export const parseReportArgs = (args: string[]): ReportArgs => {
  let file: string | undefined;
  let reader: string | undefined;
  let out: string | null = null;
  let pdf: string | null = null;
  const value = (flag: string, v: string | undefined): string => {
    if (v === undefined || v === '' || v.startsWith('--')) throw new CliError(`report: ${flag} needs a value; ${USAGE}`);
    return v;
  };
  for (let i = 0; i < args.length; i++) {
    const a = args[i] as string;
    if (a === '--reader') reader = value(a, args[++i]);
    else if (a === '--out') out = value(a, args[++i]);
    else if (a === '--pdf') pdf = value(a, args[++i]);
    else if (a.startsWith('--')) throw new CliError(`report: unknown option ${a}; ${USAGE}`);
    else if (file === undefined) file = a;
    else throw new CliError(`report takes one FILE, got a second: ${a}`);
  }
  if (file === undefined) throw new CliError(USAGE);
  if (reader === undefined) throw new CliError(`report: --reader ID is required; ${USAGE}`);
  return { file, reader, out, pdf };
};

/** The report page for one reader of a read log (its text, or its bytes read as strict UTF-8); CliError for bad input. */
export const reportFromLog = (file: string, log: string | Uint8Array, readerId: string, madeAt: string): string => {
  let rows;
  try {
    rows = typeof log === 'string' ? parseReadLog(log) : parseReadLogBytes(log);
  } catch (error) {
    if (error instanceof ReadLogError) throw new CliError(`${file}:${error.line}: ${error.column === null ? '' : `column ${error.column}: `}${error.problem}`);
    throw error;
  }
  if (!rows.some((r) => r.reader_id === readerId && r.practice === 0)) {
    throw new CliError(`${file}: no reader ${JSON.stringify(readerId)} with reads outside practice in this log`);
  }
  try {
    // Group figures (bootstrap, multi-reader analysis) never enter a reader's report: skip them.
    const analysis = analyzeReads(rows, { boot: 0, readersOnly: true });
    const report = readerReport({ analysis, rows, readerId, complete: readerComplete(rows, readerId) });
    return reportPage(report, { document: plotDocument(), madeAt });
  } catch (error) {
    if (error instanceof RangeError) throw new CliError(`${file}: ${error.message}`);
    throw error;
  }
};

export const runReport = async (args: string[]): Promise<number> => {
  const { file, reader, out, pdf } = parseReportArgs(args);
  // a reads.csv, or a study bundle (verified first, then its reads.csv)
  const bytes = await readAnalyzeInput(file);
  const html = reportFromLog(file, bytes, reader, new Date().toISOString());
  if (out !== null) await writeFile(out, html).catch((error: unknown) => { throw cannotWrite(out, error); });
  if (pdf !== null) {
    const work = await mkdtemp(join(tmpdir(), 'heed-report-'));
    try {
      const page = out ?? join(work, 'report.html');
      if (out === null) await writeFile(page, html);
      await printHtmlToPdf(resolve(page), resolve(pdf), join(work, 'profile'));
    } finally {
      await rm(work, { recursive: true, force: true });
    }
  }
  if (out === null && pdf === null) process.stdout.write(html);
  return 0;
};
