// `heed analyze FILE [--json] [--seed N] [--boot N] [--covariance jackknife|delong]`: statistics of
// a reads.csv (docs/formats.md),
// as JSON or as a readable table per reader and finding, then the group.
import { analyzeColumns, analyzeColumnsDeferred, DEFAULT_BOOT, DEFAULT_COVARIANCE, DEFAULT_SEED, type CovarianceMethod } from '../analysis/engine';
import type { ORInterval } from '../analysis/or-single-treatment';
import type { AveragedValue } from '../analysis/reader-bootstrap';
import type { AnalysisReport, GroupFinding, ReaderEntry } from '../analysis/report-types';
import type { Sections } from '../analysis/sections';
import type { WeightOfAdvice } from '../analysis/weight-of-advice';
import type { Proportion } from '../analysis/wilson';
import { parseReadLogColumns, ReadLogError } from '../io/read-log-parse';
import { columnsOfLog } from '../analysis/read-columns';
import { BootThreadError, bootThreads, startBootThread } from './boot-threads';
import { CliError } from './cli-error';
import { readAnalyzeInput } from './analyze-input';

type AnalyzeArgs = { file: string; json: boolean; seed: number; boot: number; covariance: CovarianceMethod; includeWithdrawn: boolean };

const USAGE = 'usage: heed analyze FILE [--json] [--seed N] [--boot N] [--covariance jackknife|delong] [--include-withdrawn]';

const covarianceMethod = (value: string | undefined): CovarianceMethod => {
  if (value === 'jackknife' || value === 'delong') return value;
  throw new CliError(`--covariance needs jackknife or delong, got ${value === undefined ? 'nothing' : JSON.stringify(value)}`);
};

/** More resamples than any interval needs; a larger --boot would only keep the machine busy. */
export const MAX_BOOT = 100_000;

const wholeNumber = (flag: string, value: string | undefined, min: number): number => {
  if (value === undefined || !/^\d+$/.test(value) || Number(value) < min || !Number.isSafeInteger(Number(value))) {
    throw new CliError(`${flag} needs a whole number >= ${min}, got ${value === undefined ? 'nothing' : JSON.stringify(value)}`);
  }
  return Number(value);
};

export const parseAnalyzeArgs = (args: string[]): AnalyzeArgs => {
  let file: string | undefined;
  let json = false;
  let seed = DEFAULT_SEED;
  let boot = DEFAULT_BOOT;
  let covariance = DEFAULT_COVARIANCE;
  let includeWithdrawn = false;
  for (let i = 0; i < args.length; i++) {
    const a = args[i] as string;
    if (a === '--json') json = true;
    else if (a === '--include-withdrawn') includeWithdrawn = true;
    else if (a === '--seed') seed = wholeNumber('--seed', args[++i], 0);
    else if (a === '--boot') boot = wholeNumber('--boot', args[++i], 0);
    else if (a === '--covariance') covariance = covarianceMethod(args[++i]);
    else if (a.startsWith('--')) throw new CliError(`analyze: unknown option ${a}; ${USAGE}`);
    else if (file === undefined) file = a;
    else throw new CliError(`analyze takes one FILE, got a second: ${a}`);
  }
  if (file === undefined) throw new CliError(USAGE);
  if (seed > 0x7fffffff) throw new CliError(`--seed must be at most ${0x7fffffff}, got ${seed}`);
  if (boot > MAX_BOOT) throw new CliError(`--boot must be at most ${MAX_BOOT.toLocaleString('en')}, got ${boot}`);
  return { file, json, seed, boot, covariance, includeWithdrawn };
};

export const runAnalyze = async (args: string[]): Promise<number> => {
  const { file, json, seed, boot, covariance, includeWithdrawn } = parseAnalyzeArgs(args);
  let cols;
  try {
    // the bytes are not kept: only the parse holds them, and only until its last line; each read
    // is typed from the bytes straight into columns, so no object or string per read is made
    cols = columnsOfLog(parseReadLogColumns(await readAnalyzeInput(file)));
  } catch (error) {
    if (error instanceof ReadLogError) {
      throw new CliError(`${file}:${error.line}: ${error.column === null ? '' : `column ${error.column}: `}${error.problem}`);
    }
    throw error;
  }
  const options = { seed, boot, covariance, includeWithdrawn };
  const thread = bootThreads(cols.n, boot) === 2 ? startBootThread() : null;
  let report;
  try {
    if (thread === null) report = analyzeColumns(cols, options);
    else {
      const deferred = analyzeColumnsDeferred(cols, options);
      let draws;
      try {
        draws = await thread.run(deferred.plans);
      } catch (error) {
        if (!(error instanceof BootThreadError)) throw error;
        process.stderr.write(`heed: ${error.message}\n`);
        return 1;
      }
      report = deferred.complete(draws);
    }
  } catch (error) {
    thread?.stop();
    if (error instanceof RangeError) throw new CliError(`${file}: ${error.message}`);
    throw error;
  }
  process.stdout.write(json ? `${JSON.stringify(report)}\n` : formatText(report));
  return 0;
};

export const CAUTION =
  'Heed is a research and training tool, not a medical device; results are for research and training, under local ethics, data-protection and licensed-practice rules.';

const num = (v: number | null | undefined, digits = 3): string => (v === null || v === undefined ? '-' : v.toFixed(digits));
const range = (lo: number | null, hi: number | null): string => (lo === null || hi === null ? '' : ` [${num(lo)}, ${num(hi)}]`);
const prop = (p: Proportion | undefined): string =>
  p === undefined || p.estimate === null ? `- (n=${p?.n ?? 0})` : `${num(p.estimate)}${range(p.lower, p.upper)} (${p.k}/${p.n})`;
const ms = (v: number | null | undefined): string => (v === null || v === undefined ? '-' : `${Math.round(v)} ms`);
const row = (label: string, value: string): string => `  ${label.padEnd(LABEL_WIDTH)}${value}`;
const LABEL_WIDTH = 44;

const woa = (w: WeightOfAdvice): string => `mean ${num(w.mean)}, median ${num(w.median)} (n=${w.n})`;

const sectionLines = (s: Sections): string[] => {
  const out: string[] = [];
  for (const [name, c] of [['unaided', s.unaided], ['aided', s.aided]] as const) {
    if (c === null) continue;
    out.push(`  ${name} (${c.n} reads)`);
    out.push(row('  accuracy', prop(c.accuracy)));
    out.push(row('  sensitivity', prop(c.sensitivity)));
    out.push(row('  specificity', prop(c.specificity)));
    out.push(row('  AUC (DeLong)', `${num(c.auc.estimate)}${range(c.auc.lower, c.auc.upper)}`));
    out.push(row('  Brier score', num(c.brier)));
    out.push(row('  calibration error (ECE)', c.calibration === null ? '- (no probability on this scale)' : num(c.calibration.ece)));
    out.push(row('  median time (IQR)', `${ms(c.median_ms)} (${ms(c.time.q1_ms)} to ${ms(c.time.q3_ms)})`));
  }
  const a = s.aided;
  if (a !== null) {
    out.push(row('  agreement with suggestion', prop(a.agreement)));
    out.push(row('  over-reliance (of all wrong suggestions)', prop(a.overreliance)));
    out.push(row('  under-reliance (of all right suggestions)', prop(a.underreliance)));
    out.push(row('  kappa vs suggestion', a.kappa.estimate === null ? '-' : `${num(a.kappa.estimate)} (SE ${num(a.kappa.se)})`));
    out.push(row('  suggestion accuracy', prop(a.ai_accuracy)));
    out.push(row('  over-reliance, caution', prop(a.caution.shown)));
    out.push(row('  over-reliance, no caution', prop(a.caution.not_shown)));
  }
  const q = s.sequential;
  if (q !== null) {
    out.push(`  sequential (${q.n} reads)`);
    out.push(row('  changed call', prop(q.changed)));
    out.push(row('  changed toward suggestion', prop(q.toward_ai)));
    out.push(row('  beneficial / detrimental', `${q.beneficial.k} / ${q.detrimental.k}`));
    out.push(row('  RAIR', prop(q.rair)));
    out.push(row('  RSR', prop(q.rsr)));
    out.push(row('  over-reliance if first right (1 - RSR)', prop(q.overreliance_given_first_right)));
    out.push(row('  under-reliance if first wrong (1 - RAIR)', prop(q.underreliance_given_first_wrong)));
    out.push(row('  weight of advice, signed', woa(q.woa_signed)));
    out.push(row('  weight of advice, absolute', woa(q.woa_absolute)));
  }
  const x = s.crossover;
  if (x !== null) {
    out.push(`  crossover (${x.n} pairs)`);
    out.push(row('  accuracy aided - unaided', `${num(x.accuracy_difference)}, McNemar p ${num(x.mcnemar.p, 4)} (b=${x.mcnemar.b}, c=${x.mcnemar.c})`));
    out.push(row('  same, wrong suggestion', `${num(x.wrong_suggestion.accuracy_difference)}, McNemar p ${num(x.wrong_suggestion.mcnemar.p, 4)} (${x.wrong_suggestion.n} pairs)`));
    if (x.auc_difference !== null) out.push(row('  AUC aided - unaided', `${num(x.auc_difference.difference)} (SE ${num(x.auc_difference.se)}, p ${num(x.auc_difference.p, 4)})`));
  }
  if (s.time_ratio !== null) out.push(row('  time aided / unaided', num(s.time_ratio, 2)));
  return out;
};

const readerBlock = (r: ReaderEntry): string[] => [`reader ${r.reader_id}${r.reader_role ? ` (${r.reader_role})` : ''}, finding ${r.finding}`, ...sectionLines(r)];

// An AUC lies in [0,1], so the table cuts the interval there; the JSON keeps the formula's ends.
const orInterval = (x: ORInterval): string =>
  ` [${num(Math.max(0, x.lower))}, ${num(Math.min(1, x.upper))}] (random readers, ${Number.isFinite(x.ddf) ? `${num(x.ddf, 1)} df` : 'normal'})`;

const avg = (v: AveragedValue): string => `${num(v.estimate)}${range(v.lower, v.upper)}`;

const groupBlock = (g: GroupFinding, boot: number): string[] => {
  const ra = g.reader_averaged;
  const out = [`group, finding ${g.finding}: ${g.readers} readers, ${g.cases} cases`, '  pooled over readers', ...sectionLines(g.pooled)];
  out.push(`  reader-averaged${boot > 0 ? ` (95% bootstrap over readers and cases, ${boot} resamples, seed ${ra.seed})` : ''}`);
  for (const [label, key] of [
    ['accuracy unaided', 'unaided_accuracy'], ['accuracy aided', 'aided_accuracy'], ['accuracy aided - unaided', 'accuracy_difference'],
    ['AUC unaided', 'unaided_auc'], ['AUC aided', 'aided_auc'], ['AUC aided - unaided', 'auc_difference'],
    ['over-reliance (of all wrong suggestions)', 'overreliance'], ['under-reliance (of all right suggestions)', 'underreliance'],
  ] as const) out.push(row(`  ${label}`, avg(ra[key])));
  out.push(row('  Fleiss kappa unaided/aided', `${num(g.fleiss_kappa.unaided.kappa)} / ${num(g.fleiss_kappa.aided.kappa)}`));
  if (g.mrmc !== null) {
    const m = g.mrmc;
    const t = m.random;
    out.push(`  multi-reader analysis (Obuchowski-Rockette, ${m.covarianceMethod === 'delong' ? 'DeLong' : 'jackknife'} covariances, Hillis df)`);
    out.push(row('  AUC aided - unaided, random readers', `${num(t.difference)} [${num(t.lower)}, ${num(t.upper)}], F ${num(t.f, 2)} on ${num(t.df1, 0)} and ${num(t.ddf, 1)} df, p ${num(t.p, 4)}`));
    for (const [label, x] of [['fixed readers', m.fixedReaders], ['fixed cases', m.fixedCases]] as const) {
      out.push(row(`  AUC aided - unaided, ${label}`, `${num(x.difference)} [${num(x.lower)}, ${num(x.upper)}], p ${num(x.p, 4)}`));
    }
    for (const tr of m.treatments) out.push(row(`  AUC ${tr.modality === 1 ? 'aided' : 'unaided'}, readers averaged`, `${num(tr.auc)}${orInterval(tr.random)}`));
    if (m.warning !== null) out.push(row('  warning', m.warning));
  } else out.push(row('  multi-reader analysis', g.mrmc_note ?? '-'));
  for (const s of g.subgroups) {
    out.push(row(`  ${s.attribute} = ${s.value}`, `suggestion accuracy ${prop(s.ai_accuracy)}; over-reliance ${prop(s.overreliance)}`));
  }
  return out;
};

// Training and withdrawn exclusions and the log note, one line each, only when they apply.
const exclusionLines = (report: AnalysisReport): string[] => {
  const g = report.group;
  const lines: string[] = [];
  if (g.training_excluded > 0) lines.push(`${g.training_excluded} training reads (truth shown to the reader) left out.`);
  if (g.withdrawn_excluded > 0) lines.push(`${g.withdrawn_excluded} reads of withdrawn readers left out (--include-withdrawn keeps them).`);
  if (g.include_withdrawn) lines.push('Reads of withdrawn readers are included (--include-withdrawn).');
  if (g.note !== null) lines.push(`Note: ${g.note}`);
  return lines;
};

/** The readable table of `heed analyze` without --json, ending with the caution line. */
export const formatText = (report: AnalysisReport): string => {
  const blocks = [
    `${report.group.reads} reads analysed; ${report.group.practice_excluded} practice reads left out. Intervals are 95%.`,
    ...exclusionLines(report),
    ...report.readers.map((r) => readerBlock(r).join('\n')),
    ...report.group.findings.map((g) => groupBlock(g, report.group.boot).join('\n')),
    CAUTION,
  ];
  return `${blocks.join('\n\n')}\n`;
};
