/**
 * Every figure of `heed analyze --json` that the results page shows, as one table-driven list:
 * adding a figure to the engine's output is one entry here (its path, a plain label, its kind and
 * the topic whose "numbers" table shows it). A unit test walks a real report and fails when a
 * number in it is covered by no entry, so the page cannot silently fall behind the CLI.
 */

/** How a figure is shaped in the JSON, which decides the sub-keys it covers and how it is written. */
export type FigureKind =
  | 'share' // {k, n, estimate, lower, upper}: a Wilson proportion
  | 'auc' // {estimate, se, lower, upper}
  | 'averaged' // {estimate, lower, upper, readers}: reader-averaged with a bootstrap interval
  | 'count' | 'difference' | 'ms' | 'ratio' | 'score' // one number
  | 'kappa' // {estimate, se}
  | 'woa' // {n, mean, median}
  | 'time' // {n, median_ms, q1_ms, q3_ms, iqr_ms}
  | 'calibration' // {ece, bins[]}
  | 'mcnemar' // {b, c, p, mid_p, chi_square}
  | 'paired_auc' // {auc1, auc2, difference, se, z, p}
  | 'fleiss' // {kappa, readers, cases}
  | 'or_test' // {difference, se, lower, upper, f, df1, ddf, p}
  | 'matrix' // number[][]
  | 'covariances' // {varE, cov1, cov2, cov3}
  | 'treatments' // [{modality, auc, random, fixedReaders, fixedCases, msR, varE, cov2}]: each condition on its own
  | 'note'; // a sentence, or null

export type Topic = 'accuracy' | 'auc' | 'crossover' | 'reliance' | 'switching' | 'caution' | 'time' | 'calibration' | 'agreement' | 'design' | 'mrmc';

export type FigureDef = { path: string; label: string; kind: FigureKind; topic: Topic };

/** The sub-keys each kind covers (empty: the value itself is the number). */
export const KIND_KEYS: Record<FigureKind, readonly string[]> = {
  share: ['k', 'n', 'estimate', 'lower', 'upper'],
  auc: ['estimate', 'se', 'lower', 'upper'],
  averaged: ['estimate', 'lower', 'upper', 'readers'],
  count: [], difference: [], ms: [], ratio: [], score: [],
  kappa: ['estimate', 'se'],
  woa: ['n', 'mean', 'median'],
  time: ['n', 'median_ms', 'q1_ms', 'q3_ms', 'iqr_ms'],
  calibration: ['ece', 'bins'],
  mcnemar: ['b', 'c', 'p', 'mid_p', 'chi_square'],
  paired_auc: ['auc1', 'auc2', 'difference', 'se', 'z', 'p'],
  fleiss: ['kappa', 'readers', 'cases'],
  or_test: ['difference', 'se', 'lower', 'upper', 'f', 'df1', 'ddf', 'p'],
  matrix: [],
  covariances: ['varE', 'cov1', 'cov2', 'cov3'],
  treatments: ['#'],
  note: [],
};

/** The key of a figure's headline number (what the page writes first and a test compares). */
export const HEADLINE_KEY: Partial<Record<FigureKind, string>> = {
  share: 'estimate', auc: 'estimate', averaged: 'estimate', kappa: 'estimate', woa: 'mean', time: 'median_ms',
  calibration: 'ece', mcnemar: 'p', paired_auc: 'difference', fleiss: 'kappa', or_test: 'difference', covariances: 'varE',
};

/** Figures of one set of reads (a reader, all readers pooled, or a subgroup): paths inside a `Sections` object. */
export const SECTION_FIGURES: readonly FigureDef[] = [
  { path: 'unaided.n', label: 'Reads without suggestion', kind: 'count', topic: 'accuracy' },
  { path: 'aided.n', label: 'Reads with suggestion', kind: 'count', topic: 'accuracy' },
  { path: 'unaided.accuracy', label: 'Accuracy without', kind: 'share', topic: 'accuracy' },
  { path: 'aided.accuracy', label: 'Accuracy with', kind: 'share', topic: 'accuracy' },
  { path: 'unaided.sensitivity', label: 'Sensitivity without', kind: 'share', topic: 'accuracy' },
  { path: 'aided.sensitivity', label: 'Sensitivity with', kind: 'share', topic: 'accuracy' },
  { path: 'unaided.specificity', label: 'Specificity without', kind: 'share', topic: 'accuracy' },
  { path: 'aided.specificity', label: 'Specificity with', kind: 'share', topic: 'accuracy' },
  { path: 'unaided.auc', label: 'AUC without', kind: 'auc', topic: 'auc' },
  { path: 'aided.auc', label: 'AUC with', kind: 'auc', topic: 'auc' },
  { path: 'crossover.n', label: 'Cases read both ways (pairs)', kind: 'count', topic: 'crossover' },
  { path: 'crossover.unaided_accuracy', label: 'Pairs: accuracy without', kind: 'share', topic: 'crossover' },
  { path: 'crossover.aided_accuracy', label: 'Pairs: accuracy with', kind: 'share', topic: 'crossover' },
  { path: 'crossover.accuracy_difference', label: 'Pairs: accuracy with − without', kind: 'difference', topic: 'crossover' },
  { path: 'crossover.mcnemar', label: 'Pairs: McNemar exact p', kind: 'mcnemar', topic: 'crossover' },
  { path: 'crossover.auc_difference', label: 'Pairs: AUC with − without (DeLong)', kind: 'paired_auc', topic: 'crossover' },
  { path: 'crossover.wrong_suggestion.n', label: 'Pairs with a wrong suggestion', kind: 'count', topic: 'crossover' },
  { path: 'crossover.wrong_suggestion.unaided_accuracy', label: 'Wrong-suggestion pairs: accuracy without', kind: 'share', topic: 'crossover' },
  { path: 'crossover.wrong_suggestion.aided_accuracy', label: 'Wrong-suggestion pairs: accuracy with', kind: 'share', topic: 'crossover' },
  { path: 'crossover.wrong_suggestion.accuracy_difference', label: 'Wrong-suggestion pairs: with − without', kind: 'difference', topic: 'crossover' },
  { path: 'crossover.wrong_suggestion.mcnemar', label: 'Wrong-suggestion pairs: McNemar exact p', kind: 'mcnemar', topic: 'crossover' },
  { path: 'aided.agreement', label: 'Agreed with the suggestion', kind: 'share', topic: 'reliance' },
  { path: 'aided.overreliance', label: 'Over-reliance: followed a wrong suggestion', kind: 'share', topic: 'reliance' },
  { path: 'aided.underreliance', label: 'Under-reliance: rejected a right suggestion', kind: 'share', topic: 'reliance' },
  { path: 'aided.accuracy_ai_right', label: 'Accuracy when the suggestion was right', kind: 'share', topic: 'reliance' },
  { path: 'aided.accuracy_ai_wrong', label: 'Accuracy when the suggestion was wrong', kind: 'share', topic: 'reliance' },
  { path: 'aided.ai_accuracy', label: 'Accuracy of the suggestion itself', kind: 'share', topic: 'reliance' },
  { path: 'aided.kappa', label: "Agreement with the suggestion beyond chance (Cohen's kappa)", kind: 'kappa', topic: 'reliance' },
  { path: 'sequential.n', label: 'Reads with a first call', kind: 'count', topic: 'switching' },
  { path: 'sequential.changed', label: 'Changed the call', kind: 'share', topic: 'switching' },
  { path: 'sequential.toward_ai', label: 'Changed toward the suggestion', kind: 'share', topic: 'switching' },
  { path: 'sequential.beneficial', label: 'Changed wrong to right', kind: 'share', topic: 'switching' },
  { path: 'sequential.detrimental', label: 'Changed right to wrong', kind: 'share', topic: 'switching' },
  { path: 'sequential.rair', label: 'RAIR: took a right suggestion when first wrong', kind: 'share', topic: 'switching' },
  { path: 'sequential.rsr', label: 'RSR: kept a right call against a wrong suggestion', kind: 'share', topic: 'switching' },
  { path: 'sequential.overreliance_given_first_right', label: 'Over-reliance when first right (1 − RSR)', kind: 'share', topic: 'switching' },
  { path: 'sequential.underreliance_given_first_wrong', label: 'Under-reliance when first wrong (1 − RAIR)', kind: 'share', topic: 'switching' },
  { path: 'sequential.woa', label: 'Weight of advice (mean; median; reads used)', kind: 'woa', topic: 'switching' },
  { path: 'sequential.woa_signed', label: 'Weight of advice, signed form (Harvey & Fischer)', kind: 'woa', topic: 'switching' },
  { path: 'sequential.woa_absolute', label: 'Weight of advice, absolute form (Yaniv)', kind: 'woa', topic: 'switching' },
  { path: 'aided.caution.shown', label: 'Over-reliance with the caution notice', kind: 'share', topic: 'caution' },
  { path: 'aided.caution.not_shown', label: 'Over-reliance without the caution notice', kind: 'share', topic: 'caution' },
  { path: 'unaided.time', label: 'Reading time without (median, quartiles)', kind: 'time', topic: 'time' },
  { path: 'aided.time', label: 'Reading time with (median, quartiles)', kind: 'time', topic: 'time' },
  { path: 'unaided.median_ms', label: 'Median time without', kind: 'ms', topic: 'time' },
  { path: 'aided.median_ms', label: 'Median time with', kind: 'ms', topic: 'time' },
  { path: 'time_ratio', label: 'Time with ÷ time without', kind: 'ratio', topic: 'time' },
  { path: 'unaided.brier', label: 'Brier score without', kind: 'score', topic: 'calibration' },
  { path: 'aided.brier', label: 'Brier score with', kind: 'score', topic: 'calibration' },
  { path: 'unaided.calibration', label: 'Calibration error without (ECE)', kind: 'calibration', topic: 'calibration' },
  { path: 'aided.calibration', label: 'Calibration error with (ECE)', kind: 'calibration', topic: 'calibration' },
];

/** Figures of the whole group for one finding: paths inside a `GroupFinding`. */
export const GROUP_FIGURES: readonly FigureDef[] = [
  { path: 'readers', label: 'Readers', kind: 'count', topic: 'design' },
  { path: 'cases', label: 'Cases', kind: 'count', topic: 'design' },
  { path: 'reader_averaged.unaided_accuracy', label: 'Accuracy without', kind: 'averaged', topic: 'accuracy' },
  { path: 'reader_averaged.aided_accuracy', label: 'Accuracy with', kind: 'averaged', topic: 'accuracy' },
  { path: 'reader_averaged.accuracy_difference', label: 'Accuracy with − without', kind: 'averaged', topic: 'accuracy' },
  { path: 'reader_averaged.unaided_sensitivity', label: 'Sensitivity without', kind: 'averaged', topic: 'accuracy' },
  { path: 'reader_averaged.aided_sensitivity', label: 'Sensitivity with', kind: 'averaged', topic: 'accuracy' },
  { path: 'reader_averaged.unaided_specificity', label: 'Specificity without', kind: 'averaged', topic: 'accuracy' },
  { path: 'reader_averaged.aided_specificity', label: 'Specificity with', kind: 'averaged', topic: 'accuracy' },
  { path: 'reader_averaged.unaided_auc', label: 'AUC without', kind: 'averaged', topic: 'auc' },
  { path: 'reader_averaged.aided_auc', label: 'AUC with', kind: 'averaged', topic: 'auc' },
  { path: 'reader_averaged.auc_difference', label: 'AUC with − without', kind: 'averaged', topic: 'auc' },
  { path: 'reader_averaged.agreement', label: 'Agreed with the suggestion', kind: 'averaged', topic: 'reliance' },
  { path: 'reader_averaged.overreliance', label: 'Over-reliance', kind: 'averaged', topic: 'reliance' },
  { path: 'reader_averaged.underreliance', label: 'Under-reliance', kind: 'averaged', topic: 'reliance' },
  { path: 'reader_averaged.boot', label: 'Bootstrap resamples', kind: 'count', topic: 'design' },
  { path: 'reader_averaged.seed', label: 'Bootstrap seed', kind: 'count', topic: 'design' },
  { path: 'fleiss_kappa.unaided', label: "Agreement between readers without (Fleiss' kappa)", kind: 'fleiss', topic: 'agreement' },
  { path: 'fleiss_kappa.aided', label: "Agreement between readers with (Fleiss' kappa)", kind: 'fleiss', topic: 'agreement' },
  { path: 'mrmc.random', label: 'Other readers and other cases', kind: 'or_test', topic: 'mrmc' },
  { path: 'mrmc.fixedReaders', label: 'These readers, other cases', kind: 'or_test', topic: 'mrmc' },
  { path: 'mrmc.fixedCases', label: 'These cases, other readers', kind: 'or_test', topic: 'mrmc' },
  { path: 'mrmc.auc', label: 'Each reader’s AUC (without; with)', kind: 'matrix', topic: 'mrmc' },
  { path: 'mrmc.covariances', label: 'Error variance and covariances', kind: 'covariances', topic: 'mrmc' },
  { path: 'mrmc.treatments', label: 'Each condition on its own: reader-averaged AUC (other readers and cases)', kind: 'treatments', topic: 'mrmc' },
  { path: 'mrmc.warning', label: 'Warning', kind: 'note', topic: 'mrmc' },
  { path: 'mrmc.msT', label: 'Mean square, condition', kind: 'score', topic: 'mrmc' },
  { path: 'mrmc.msTR', label: 'Mean square, condition × reader', kind: 'score', topic: 'mrmc' },
];

/** Figures of a subgroup beyond its `Sections`: paths inside a `SubgroupEntry`. */
export const SUBGROUP_FIGURES: readonly FigureDef[] = [
  { path: 'n', label: 'Reads', kind: 'count', topic: 'design' },
  { path: 'ai_accuracy', label: 'Accuracy of the suggestion', kind: 'share', topic: 'reliance' },
  { path: 'overreliance', label: 'Over-reliance', kind: 'share', topic: 'reliance' },
];

/** Figures of the whole log: paths inside `group`. */
export const LOG_FIGURES: readonly FigureDef[] = [
  { path: 'reads', label: 'Reads analysed', kind: 'count', topic: 'design' },
  { path: 'practice_excluded', label: 'Practice reads left out', kind: 'count', topic: 'design' },
  { path: 'training_excluded', label: 'Training reads left out', kind: 'count', topic: 'design' },
  { path: 'withdrawn_excluded', label: 'Reads of withdrawn readers left out', kind: 'count', topic: 'design' },
  { path: 'note', label: 'Note on the log', kind: 'note', topic: 'design' },
  { path: 'seed', label: 'Bootstrap seed', kind: 'count', topic: 'design' },
  { path: 'boot', label: 'Bootstrap resamples', kind: 'count', topic: 'design' },
];

export const figuresOf = (list: readonly FigureDef[], topic: Topic): FigureDef[] => list.filter((f) => f.topic === topic);

/** The value at a dotted path ("aided.overreliance") of a JSON-like object; undefined when absent. */
export const valueAt = (root: unknown, path: string): unknown => {
  let node: unknown = root;
  for (const part of path.split('.')) {
    if (node === null || typeof node !== 'object') return undefined;
    node = (node as Record<string, unknown>)[part];
  }
  return node;
};
