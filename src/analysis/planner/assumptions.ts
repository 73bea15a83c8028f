/**
 * What a coordinator assumes when planning a study: the numbers `heed plan` and the study page's
 * dry run take, their defaults, the named Roe & Metz presets, and their checks.
 * `checkAssumptions` throws RangeError naming the first value out of range (e.g. "readers must be ...").
 */

/** Planted wrong suggestions per finding: a total count split between the two kinds, or a rate of the eligible. */
export type WrongSpec = { mode: 'count' | 'rate'; value: number };

export type PlanAssumptions = {
  readers: number;
  /** main cases of the in-memory case set */
  cases: number;
  /** share of cases with the finding present */
  prevalence: number;
  /** share of cases on which the model's own (natural) suggestion is right */
  modelAccuracy: number;
  wrong: WrongSpec;
  /** mean reader probability of following a wrong suggestion when the own call was right */
  overreliance: number;
  /** sd of that probability between readers (a Beta with this mean and sd) */
  overrelianceSpread: number;
  /** the rate the group's over-reliance is tested against (one-sided, above) */
  reference: number;
  /** reader-averaged AUC of the own judgement without a suggestion */
  aucUnaided: number;
  /** aided minus unaided AUC of the own judgement */
  aucDifference: number;
  /** relative drop in following a wrong suggestion when the caution notice is shown (0.3: 30% fewer) */
  noticeEffect: number;
  /** Roe & Metz variance structure, by name (PRESETS) */
  preset: PresetName;
  sims: number;
  seed: number;
};

export type VarianceComponents = { reader: number; case: number; readerCase: number; modalityReader: number; modalityCase: number; error: number };

export type Preset = { label: string; source: string; auc: number; variance: VarianceComponents };

// The variance structure the repository remembers as the "low reader variability" line of
// Roe & Metz (1997, Acad Radiol 4:298-303) Table 1; values from memory, not checked against the paper.
const ROE_METZ_LOW_VARIANCE: VarianceComponents = { reader: 0.011, case: 0.1, readerCase: 0.2, modalityReader: 0.011, modalityCase: 0.1, error: 0.6 };
const ROE_METZ_SOURCE = 'Roe & Metz (1997), Acad Radiol 4:298-303, Table 1 (variance components and mu from memory)';

/** Named presets: the three AUC levels of Roe & Metz (mu 0.75, 1.5, 2.5) with the remembered variance structure. */
export const PRESETS = {
  'roe-metz-low': { label: 'Roe & Metz, mu 0.75', source: ROE_METZ_SOURCE, auc: 0.702, variance: ROE_METZ_LOW_VARIANCE },
  'roe-metz-medium': { label: 'Roe & Metz, mu 1.5', source: ROE_METZ_SOURCE, auc: 0.855, variance: ROE_METZ_LOW_VARIANCE },
  'roe-metz-high': { label: 'Roe & Metz, mu 2.5', source: ROE_METZ_SOURCE, auc: 0.96, variance: ROE_METZ_LOW_VARIANCE },
} as const satisfies Record<string, Preset>;

export type PresetName = keyof typeof PRESETS;

export const isPresetName = (name: string): name is PresetName => Object.hasOwn(PRESETS, name);

export const DEFAULT_ASSUMPTIONS: PlanAssumptions = {
  readers: 10,
  cases: 200,
  prevalence: 0.5,
  modelAccuracy: 0.9,
  wrong: { mode: 'count', value: 12 },
  overreliance: 0.3,
  overrelianceSpread: 0.1,
  reference: 0.1,
  aucUnaided: 0.855,
  aucDifference: 0.05,
  noticeEffect: 0.3,
  preset: 'roe-metz-medium',
  sims: 200,
  seed: 20261201,
};

const within = (name: string, v: number, lo: number, hi: number, open = false): void => {
  const ok = open ? v > lo && v < hi : v >= lo && v <= hi;
  if (!Number.isFinite(v) || !ok) throw new RangeError(`${name} must be ${open ? 'between' : 'from'} ${lo} ${open ? 'and' : 'to'} ${hi}${open ? ' (both excluded)' : ''}, got ${v}`);
};

const whole = (name: string, v: number, lo: number, hi: number): void => {
  if (!Number.isInteger(v) || v < lo || v > hi) throw new RangeError(`${name} must be a whole number from ${lo} to ${hi}, got ${v}`);
};

export const checkAssumptions = (a: PlanAssumptions): void => {
  whole('readers', a.readers, 2, 200);
  whole('cases', a.cases, 8, 5000);
  within('prevalence', a.prevalence, 0, 1, true);
  within('model accuracy', a.modelAccuracy, 0.5, 1);
  if (a.wrong.mode === 'count') whole('wrong (planted errors)', a.wrong.value, 0, 5000);
  else within('wrong-rate', a.wrong.value, 0, 1);
  within('overreliance', a.overreliance, 0, 1, true);
  const maxSd = Math.sqrt(a.overreliance * (1 - a.overreliance));
  if (!(a.overrelianceSpread >= 0 && a.overrelianceSpread < maxSd)) {
    throw new RangeError(`overreliance-spread must be from 0 to below ${maxSd.toFixed(3)} for a mean of ${a.overreliance}, got ${a.overrelianceSpread}`);
  }
  within('reference', a.reference, 0, 1, true);
  within('auc-unaided', a.aucUnaided, 0.5, 1, true);
  within('auc-unaided + auc-difference', a.aucUnaided + a.aucDifference, 0.5, 1, true);
  within('notice-effect', a.noticeEffect, 0, 1);
  if (!isPresetName(a.preset)) throw new RangeError(`preset must be one of ${Object.keys(PRESETS).join(', ')}, got ${String(a.preset)}`);
  whole('sims', a.sims, 10, 100000);
  whole('seed', a.seed, 0, 0x7fffffff);
};
