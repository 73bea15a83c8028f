// `heed plan [--design study.json] [--readers N] [--cases N] [--prevalence p] [--wrong K | --wrong-rate r]
// [--overreliance p] [--overreliance-spread s] [--reference p0] [--auc-unaided a] [--auc-difference d]
// [--notice-effect e] [--model-accuracy q] [--preset NAME] [--sims M] [--seed S] [--no-curves] [--json]`:
// dry-runs a design with simulated readers (src/analysis/planner) and says how precise its answers will be.
import { readFile } from 'node:fs/promises';
import type { StudyDesign } from '../core/design';
import { parseStudyJson } from '../core/study-json';
import { DEFAULT_ASSUMPTIONS, isPresetName, PRESETS, type PlanAssumptions } from '../analysis/planner/assumptions';
import { plantedCount } from '../analysis/planner/from-study';
import { planText } from '../analysis/planner/plan-text';
import { runPlan } from '../analysis/planner/run-plan';
import { CliError } from './cli-error';

const USAGE = 'usage: heed plan [--design study.json] [--readers N] [--cases N] [--prevalence p] [--wrong K | --wrong-rate r] '
  + '[--overreliance p] [--overreliance-spread s] [--reference p0] [--auc-unaided a] [--auc-difference d] [--notice-effect e] '
  + '[--model-accuracy q] [--preset NAME] [--sims M] [--seed S] [--no-curves] [--json]';

export type PlanArgs = { assumptions: PlanAssumptions; design: string | null; json: boolean; curves: boolean; wrongGiven: boolean; aucGiven: boolean };

const NUMBER_FLAGS = {
  '--readers': 'readers', '--cases': 'cases', '--prevalence': 'prevalence', '--overreliance': 'overreliance',
  '--overreliance-spread': 'overrelianceSpread', '--reference': 'reference', '--auc-unaided': 'aucUnaided',
  '--auc-difference': 'aucDifference', '--notice-effect': 'noticeEffect', '--model-accuracy': 'modelAccuracy',
  '--sims': 'sims', '--seed': 'seed',
} as const satisfies Record<string, keyof PlanAssumptions>;

const isNumberFlag = (flag: string): flag is keyof typeof NUMBER_FLAGS => Object.hasOwn(NUMBER_FLAGS, flag);

const numberOf = (flag: string, value: string | undefined): number => {
  if (value === undefined || value.trim() === '' || !Number.isFinite(Number(value))) {
    throw new CliError(`${flag} needs a number, got ${value === undefined ? 'nothing' : JSON.stringify(value)}; ${USAGE}`);
  }
  return Number(value);
};

export const parsePlanArgs = (args: string[]): PlanArgs => {
  const a: PlanAssumptions = { ...DEFAULT_ASSUMPTIONS, wrong: { ...DEFAULT_ASSUMPTIONS.wrong } };
  let design: string | null = null;
  let json = false;
  let curves = true;
  let wrongGiven = false;
  let aucGiven = false;
  for (let i = 0; i < args.length; i++) {
    const flag = args[i] as string;
    if (flag === '--json') { json = true; continue; }
    if (flag === '--no-curves') { curves = false; continue; }
    const value = args[++i];
    if (isNumberFlag(flag)) {
      a[NUMBER_FLAGS[flag]] = numberOf(flag, value);
      if (flag === '--auc-unaided') aucGiven = true;
    } else if (flag === '--wrong' || flag === '--wrong-rate') {
      if (wrongGiven) throw new CliError('give either --wrong K or --wrong-rate r, not both');
      wrongGiven = true;
      a.wrong = { mode: flag === '--wrong' ? 'count' : 'rate', value: numberOf(flag, value) };
    } else if (flag === '--preset') {
      if (value === undefined || !isPresetName(value)) throw new CliError(`--preset must be one of ${Object.keys(PRESETS).join(', ')}, got ${JSON.stringify(value ?? '')}`);
      a.preset = value;
    } else if (flag === '--design') {
      if (value === undefined || value.startsWith('--')) throw new CliError(`--design needs the path of a study.json; ${USAGE}`);
      design = value;
    } else throw new CliError(`plan: unknown option ${flag}; ${USAGE}`);
  }
  // a preset sets the unaided AUC too, unless --auc-unaided says otherwise
  if (!aucGiven) a.aucUnaided = PRESETS[a.preset].auc;
  return { assumptions: a, design, json, curves, wrongGiven, aucGiven };
};

const loadDesign = async (path: string): Promise<{ design: StudyDesign; planted: ReturnType<typeof plantedCount> }> => {
  let text: string;
  try {
    text = await readFile(path, 'utf8');
  } catch (error) {
    throw new CliError(`cannot read ${path}: ${error instanceof Error ? error.message : String(error)}`);
  }
  const parsed = parseStudyJson(text, path);
  if (!parsed.ok) throw new CliError(parsed.problems[0] ?? `${path}: not a Heed study file`);
  return { design: parsed.study.design, planted: plantedCount(parsed.study.design, parsed.study.planted) };
};

export const runPlanCommand = async (args: string[]): Promise<number> => {
  const options = parsePlanArgs(args);
  let base: StudyDesign | null = null;
  if (options.design !== null) {
    const loaded = await loadDesign(options.design);
    base = loaded.design;
    if (!options.wrongGiven) options.assumptions.wrong = loaded.planted;
  }
  const tty = process.stderr.isTTY === true && !options.json;
  let shown = -1;
  let report;
  try {
    report = runPlan({ assumptions: options.assumptions, base, curves: options.curves }, (p) => {
      const percent = Math.floor((100 * p.done) / p.total);
      if (tty && percent !== shown) { shown = percent; process.stderr.write(`\rsimulating: ${percent}%`); }
    });
  } catch (error) {
    if (error instanceof RangeError) throw new CliError(error.message);
    throw error;
  }
  if (tty) process.stderr.write('\r');
  console.log(options.json ? JSON.stringify(report, null, 2) : planText(report));
  return 0;
};
