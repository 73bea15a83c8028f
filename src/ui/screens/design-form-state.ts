/** The new-study form's values, and how they become a StudyDesign. */
import { DEFAULT_FIVE_POINT_LABELS, defaultAnswerScale, type AnswerScaleKind } from '../../core/answer-scale';
import { defaultDesign, type Assistance, type CautionMode, type Sequence, type StudyDesign } from '../../core/design';

export type DesignFormValues = {
  name: string;
  caseSetId: string;
  findings: string[];
  aidedMode: Exclude<Assistance, 'none'>;
  /** optional: one sequence per line, "LABEL: none, sequential, concurrent"; empty for the two standard ones */
  customSequences: string;
  washoutDays: string;
  threshold: string;
  showScore: boolean;
  askConfidence: boolean;
  plantedFalsePositive: string;
  plantedFalseNegative: string;
  plantMode: 'count' | 'rate';
  stratifyBy: string;
  cautionMode: CautionMode;
  cautionText: string;
  blocks: string;
  breakEvery: string;
  seed: string;
  /** answer scale, its five-point labels and the rating from which the call is "present" */
  scaleKind: AnswerScaleKind;
  scaleLabels: string[];
  presentFrom: string;
  /** a training study: the truth is shown after each case */
  training: boolean;
};

export const initialFormValues = (caseSetId: string, findings: string[]): DesignFormValues => {
  const d = defaultDesign(findings);
  return {
    name: '', caseSetId, findings, aidedMode: 'sequential', customSequences: '', washoutDays: String(d.washoutDays), threshold: String(d.threshold),
    showScore: d.showScore, askConfidence: d.askConfidence, plantedFalsePositive: '0', plantedFalseNegative: '0', plantMode: 'count',
    stratifyBy: '', cautionMode: d.caution.mode, cautionText: d.caution.text, blocks: '1', breakEvery: '', seed: String(d.seed),
    scaleKind: 'call-confidence', scaleLabels: [...DEFAULT_FIVE_POINT_LABELS], presentFrom: '', training: false,
  };
};

/** The form's values for a stored design, so a draft can be edited with the same fields. */
export const formValuesFromDesign = (name: string, caseSetId: string, d: StudyDesign): DesignFormValues => {
  const aided = d.sequences.flatMap((s) => s.periods).find((a) => a !== 'none') ?? 'sequential';
  const standard = d.sequences.length === 2 && d.sequences[0]?.label === 'UA' && d.sequences[1]?.label === 'AU'
    && d.sequences[0].periods.join() === `none,${aided}` && d.sequences[1].periods.join() === `${aided},none`;
  return {
    ...initialFormValues(caseSetId, d.findings),
    name, aidedMode: aided, customSequences: standard ? '' : d.sequences.map((s) => `${s.label}: ${s.periods.join(', ')}`).join('\n'),
    washoutDays: String(d.washoutDays), threshold: String(d.threshold), showScore: d.showScore, askConfidence: d.askConfidence,
    plantedFalsePositive: String(d.planted.falsePositive.value), plantedFalseNegative: String(d.planted.falseNegative.value),
    plantMode: d.planted.falsePositive.mode, stratifyBy: d.planted.stratifyBy ?? '', cautionMode: d.caution.mode, cautionText: d.caution.text,
    blocks: String(d.blocks), breakEvery: d.breakEvery === null ? '' : String(d.breakEvery), seed: String(d.seed),
    scaleKind: d.answerScale.kind, scaleLabels: [...d.answerScale.labels],
    presentFrom: d.answerScale.kind === 'call-confidence' ? '' : String(d.answerScale.presentFrom), training: d.training,
  };
};

const ASSISTANCE_WORDS: Record<string, Assistance> = { none: 'none', unaided: 'none', concurrent: 'concurrent', sequential: 'sequential' };

/** Parses custom sequences, one per line: "UAA: none, sequential, concurrent". */
export const parseSequences = (text: string, problems: string[]): Sequence[] =>
  text.split('\n').map((line, i) => ({ line: line.trim(), n: i + 1 })).filter((l) => l.line !== '').flatMap(({ line, n }) => {
    const match = /^([A-Za-z0-9_-]{1,16})\s*:\s*(.+)$/.exec(line);
    if (!match) { problems.push(`Sequences, line ${n}: write it as "LABEL: none, sequential" (got "${line}").`); return []; }
    const periods = (match[2] ?? '').split(',').map((w) => w.trim().toLowerCase());
    const unknown = periods.find((w) => !Object.hasOwn(ASSISTANCE_WORDS, w));
    if (unknown !== undefined) { problems.push(`Sequences, line ${n}: "${unknown}" is not none, concurrent or sequential.`); return []; }
    return [{ label: match[1] ?? '', periods: periods.map((w) => ASSISTANCE_WORDS[w] ?? 'none') }];
  });

type FieldProblem = { field: keyof DesignFormValues; message: string };

const numberField = (field: keyof DesignFormValues, label: string, text: string, problems: FieldProblem[]): number => {
  const value = Number(text.trim());
  if (text.trim() === '' || !Number.isFinite(value)) problems.push({ field, message: `${label}: "${text}" is not a number.` });
  return value;
};

export type FormOutcome =
  | { design: StudyDesign }
  /** `partial`: the design as far as it could be read (bad numbers are NaN), for further checks */
  | { problems: string[]; fieldProblems: FieldProblem[]; partial: StudyDesign };

/** The design the form describes, or the plain-language problems with the form, each tied to its field. */
export const designFromForm = (v: DesignFormValues): FormOutcome => {
  const problems: FieldProblem[] = [];
  if (v.name.trim() === '') problems.push({ field: 'name', message: 'Study name: give the study a name.' });
  if (v.findings.length === 0) problems.push({ field: 'findings', message: 'Findings: choose at least one finding to ask.' });
  const washoutDays = numberField('washoutDays', 'Washout days', v.washoutDays, problems);
  const threshold = numberField('threshold', 'Threshold', v.threshold, problems);
  const fp = numberField('plantedFalsePositive', 'Planted false-positive suggestions', v.plantedFalsePositive, problems);
  const fn = numberField('plantedFalseNegative', 'Planted false-negative suggestions', v.plantedFalseNegative, problems);
  const blocks = numberField('blocks', 'Blocks', v.blocks, problems);
  const seed = numberField('seed', 'Seed', v.seed, problems);
  const breakEvery = v.breakEvery.trim() === '' ? null : numberField('breakEvery', 'Break every N cases', v.breakEvery, problems);
  const sequenceProblems: string[] = [];
  const custom = parseSequences(v.customSequences, sequenceProblems);
  for (const message of sequenceProblems) problems.push({ field: 'customSequences', message });
  const scale = defaultAnswerScale(v.scaleKind);
  // an empty threshold takes the scale's default (4 of 5, 50%)
  const presentFrom = v.scaleKind === 'call-confidence' || v.presentFrom.trim() === '' ? scale.presentFrom : numberField('presentFrom', 'Rating counted as present from', v.presentFrom, problems);
  const design: StudyDesign = {
    ...defaultDesign(v.findings),
    sequences: custom.length > 0 ? custom : [
      { label: 'UA', periods: ['none', v.aidedMode] },
      { label: 'AU', periods: [v.aidedMode, 'none'] },
    ],
    washoutDays, threshold, showScore: v.showScore, askConfidence: v.askConfidence,
    caution: { mode: v.cautionMode, text: v.cautionText },
    planted: {
      falsePositive: { mode: v.plantMode, value: fp },
      falseNegative: { mode: v.plantMode, value: fn },
      stratifyBy: v.stratifyBy === '' ? null : v.stratifyBy,
    },
    blocks, breakEvery, seed,
    answerScale: { kind: v.scaleKind, labels: v.scaleLabels.map((l) => l.trim()), presentFrom },
    training: v.training,
  };
  if (problems.length > 0) return { problems: problems.map((p) => p.message), fieldProblems: problems, partial: design };
  return { design };
};
