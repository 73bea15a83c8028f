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

const numberField = (label: string, text: string, problems: string[]): number => {
  const value = Number(text.trim());
  if (text.trim() === '' || !Number.isFinite(value)) problems.push(`${label}: "${text}" is not a number.`);
  return value;
};

/** The design the form describes, or the plain-language problems with the form. */
export const designFromForm = (v: DesignFormValues): { design: StudyDesign } | { problems: string[] } => {
  const problems: string[] = [];
  if (v.name.trim() === '') problems.push('Study name: give the study a name.');
  if (v.findings.length === 0) problems.push('Findings: choose at least one finding to ask.');
  const washoutDays = numberField('Washout days', v.washoutDays, problems);
  const threshold = numberField('Threshold', v.threshold, problems);
  const fp = numberField('Planted false-positive suggestions', v.plantedFalsePositive, problems);
  const fn = numberField('Planted false-negative suggestions', v.plantedFalseNegative, problems);
  const blocks = numberField('Blocks', v.blocks, problems);
  const seed = numberField('Seed', v.seed, problems);
  const breakEvery = v.breakEvery.trim() === '' ? null : numberField('Break every', v.breakEvery, problems);
  const custom = parseSequences(v.customSequences, problems);
  const scale = defaultAnswerScale(v.scaleKind);
  // an empty threshold takes the scale's default (4 of 5, 50%)
  const presentFrom = v.scaleKind === 'call-confidence' || v.presentFrom.trim() === '' ? scale.presentFrom : numberField('Rating counted as present from', v.presentFrom, problems);
  if (problems.length > 0) return { problems };
  return {
    design: {
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
    },
  };
};
