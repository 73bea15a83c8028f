// `heed analyze FILE [--json] [--seed N] [--boot N]`: statistics of a reads.csv (SPEC Contract 3),
// as JSON or as a readable table per reader and finding, then the group.
import { analyzeReads, DEFAULT_BOOT, DEFAULT_SEED } from '../analysis/engine';
import type { AveragedValue } from '../analysis/reader-bootstrap';
import type { AnalysisReport, GroupFinding, ReaderEntry } from '../analysis/report-types';
import type { Sections } from '../analysis/sections';
import type { Proportion } from '../analysis/wilson';
import { parseReadLog, ReadLogError } from '../io/read-log-parse';
import { CliError } from './cli-error';
import { readAnalyzeInput } from './analyze-input';

type AnalyzeArgs = { file: string; json: boolean; seed: number; boot: number };

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
  for (let i = 0; i < args.length; i++) {
    const a = args[i] as string;
    if (a === '--json') json = true;
    else if (a === '--seed') seed = wholeNumber('--seed', args[++i], 0);
    else if (a === '--boot') boot = wholeNumber('--boot', args[++i], 0);
    else if (a.startsWith('--')) throw new CliError(`analyze: unknown option ${a}; usage: heed analyze FILE [--json] [--seed N] [--boot N]`);
    else if (file === undefined) file = a;
    else throw new CliError(`analyze takes one FILE, got a second: ${a}`);
  }
  if (file === undefined) throw new CliError('usage: heed analyze FILE [--json] [--seed N] [--boot N]');
  if (seed > 0x7fffffff) throw new CliError(`--seed must be at most ${0x7fffffff}, got ${seed}`);
  return { file, json, seed, boot };
};

export const runAnalyze = async (args: string[]): Promise<number> => {
  const { file, json, seed, boot } = parseAnalyzeArgs(args);
  const text = await readAnalyzeInput(file);
  let rows;
  try {
    rows = parseReadLog(text);
  } catch (error) {
    if (error instanceof ReadLogError) {
      throw new CliError(`${file}:${error.line}: ${error.column === null ? '' : `column ${error.column}: `}${error.problem}`);
    }
    throw error;
  }
  let report;
  try {
    report = analyzeReads(rows, { seed, boot });
  } catch (error) {
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
const row = (label: string, value: string): string => `  ${label.padEnd(30)}${value}`;

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
    out.push(row('  calibration error (ECE)', num(c.calibration.ece)));
    out.push(row('  median time (IQR)', `${ms(c.median_ms)} (${ms(c.time.q1_ms)} to ${ms(c.time.q3_ms)})`));
  }
  const a = s.aided;
  if (a !== null) {
    out.push(row('  agreement with suggestion', prop(a.agreement)));
    out.push(row('  over-reliance', prop(a.overreliance)));
    out.push(row('  under-reliance', prop(a.underreliance)));
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
    out.push(row('  weight of advice', `mean ${num(q.woa.mean)}, median ${num(q.woa.median)} (n=${q.woa.n})`));
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

const avg = (v: AveragedValue): string => `${num(v.estimate)}${range(v.lower, v.upper)}`;

const groupBlock = (g: GroupFinding, boot: number): string[] => {
  const ra = g.reader_averaged;
  const out = [`group, finding ${g.finding}: ${g.readers} readers, ${g.cases} cases`, '  pooled over readers', ...sectionLines(g.pooled)];
  out.push(`  reader-averaged${boot > 0 ? ` (95% bootstrap over readers and cases, ${boot} resamples, seed ${ra.seed})` : ''}`);
  for (const [label, key] of [
    ['accuracy unaided', 'unaided_accuracy'], ['accuracy aided', 'aided_accuracy'], ['accuracy aided - unaided', 'accuracy_difference'],
    ['AUC unaided', 'unaided_auc'], ['AUC aided', 'aided_auc'], ['AUC aided - unaided', 'auc_difference'],
    ['over-reliance', 'overreliance'], ['under-reliance', 'underreliance'],
  ] as const) out.push(row(`  ${label}`, avg(ra[key])));
  out.push(row('  Fleiss kappa unaided/aided', `${num(g.fleiss_kappa.unaided.kappa)} / ${num(g.fleiss_kappa.aided.kappa)}`));
  if (g.mrmc !== null) {
    const t = g.mrmc.random;
    out.push(row('  MRMC AUC difference', `${num(t.difference)} [${num(t.lower)}, ${num(t.upper)}], F ${num(t.f, 2)} on ${num(t.df1, 0)} and ${num(t.ddf, 1)} df, p ${num(t.p, 4)} (Obuchowski-Rockette, Hillis df)`));
  } else out.push(row('  MRMC', g.mrmc_note ?? '-'));
  for (const s of g.subgroups) {
    out.push(row(`  ${s.attribute} = ${s.value}`, `suggestion accuracy ${prop(s.ai_accuracy)}; over-reliance ${prop(s.overreliance)}`));
  }
  return out;
};

/** The readable table of `heed analyze` without --json, ending with the caution line. */
export const formatText = (report: AnalysisReport): string => {
  const blocks = [
    `${report.group.reads} reads analysed; ${report.group.practice_excluded} practice reads left out. Intervals are 95%.`,
    ...report.readers.map((r) => readerBlock(r).join('\n')),
    ...report.group.findings.map((g) => groupBlock(g, report.group.boot).join('\n')),
    CAUTION,
  ];
  return `${blocks.join('\n\n')}\n`;
};
