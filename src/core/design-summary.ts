/**
 * A readable summary of a whole design, one { label, value } line each, for the design screen,
 * the study export and a methods section: every setting, the seed and how the per-purpose seeds
 * derive from it, and (given the case set and suggestion table) the case and planted counts.
 * Throws nothing. Example: designSummary(defaultDesign(['nodule']))[0] ->
 *   { label: 'Findings', value: 'nodule' }.
 */
import type { CaseSetManifest } from './case-set';
import { thresholdWords } from './answer-scale';
import type { PlantSpec, Sequence, StudyDesign } from './design';
import type { SuggestionTable } from './suggestions';
import { blockAssistance } from './case-blocks';

export type SummaryLine = { label: string; value: string };

const ASSISTANCE_WORDS = { none: 'unaided', concurrent: 'suggestion shown from the start', sequential: 'own call first, then suggestion' } as const;
const SHORT_WORDS = { none: 'unaided', concurrent: 'concurrent', sequential: 'sequential' } as const;

/**
 * What one period (0-based) of a sequence gets, in words: its assistance, or with blocks the
 * assistance of each block ("block 1 unaided, block 2 sequential"), so a label never says
 * "unaided" for a period in which half the cases show a suggestion.
 */
export const periodWords = (sequence: Sequence, period: number, blocks: number, short = false): string => {
  const words = short ? SHORT_WORDS : ASSISTANCE_WORDS;
  const each = blockAssistance(sequence, period, blocks);
  return each.length === 1 ? words[each[0] ?? 'none'] : each.map((a, b) => `block ${b + 1} ${words[a]}`).join(', ');
};

const plantWords = (spec: PlantSpec): string =>
  spec.mode === 'count' ? `${spec.value} per finding` : `${(spec.value * 100).toFixed(1).replace(/\.0$/, '')}% of eligible case-findings`;

const SCALE_WORDS = {
  'call-confidence': () => 'present or absent, with a confidence',
  'five-point': (d: StudyDesign) => `five-point rating: ${d.answerScale.labels.map((l, i) => `${i + 1} ${l}`).join(', ')}`,
  percent: () => 'likelihood present, 0 to 100%',
} as const;

const CAUTION_WORDS = { off: 'not shown', all: 'shown on every aided read', 'random-half': 'shown on a random half of each reader’s aided reads' } as const;

export const designSummary = (
  design: StudyDesign,
  context: { manifest?: CaseSetManifest; table?: SuggestionTable } = {},
): SummaryLine[] => {
  const periods = design.sequences[0]?.periods.length ?? 0;
  const lines: SummaryLine[] = [
    { label: 'Findings', value: design.findings.join(', ') },
    { label: 'Periods', value: String(periods) },
    ...design.sequences.map((s) => ({
      label: `Sequence ${s.label}`,
      value: s.periods.map((_, i) => `period ${i + 1}: ${periodWords(s, i, design.blocks)}`).join('; '),
    })),
    { label: 'Washout', value: `${design.washoutDays} day${design.washoutDays === 1 ? '' : 's'} between periods` },
    { label: 'Model threshold', value: `score ${design.threshold} or more counts as "present" when the case set gives no call` },
    { label: 'Suggestion shows', value: design.showScore ? 'call and score' : 'call only' },
    { label: 'Answer scale', value: SCALE_WORDS[design.answerScale.kind](design) },
    ...(design.answerScale.kind === 'call-confidence'
      ? [{ label: 'Confidence', value: design.askConfidence ? 'asked with every call (0-100)' : 'not asked' }]
      : [{ label: 'Call from rating', value: thresholdWords(design.answerScale) }]),
    {
      label: 'Training',
      value: design.training
        ? 'yes: the truth is shown after each case (reads are marked training and kept out of measurement statistics)'
        : 'no: readers see no truth during reading (practice cases excepted)',
    },
    { label: 'Caution notice', value: design.caution.mode === 'off' ? CAUTION_WORDS.off : `${CAUTION_WORDS[design.caution.mode]}: "${design.caution.text}"` },
    { label: 'Planted false positives', value: plantWords(design.planted.falsePositive) },
    { label: 'Planted false negatives', value: plantWords(design.planted.falseNegative) },
    { label: 'Planting stratified by', value: design.planted.stratifyBy ?? 'not stratified' },
    {
      label: 'Blocks',
      value: design.blocks === 1 ? 'every case read under the period’s assistance' : `${design.blocks} blocks; each block meets each condition once`,
    },
    { label: 'Rest breaks', value: design.breakEvery === null ? 'none' : `after every ${design.breakEvery} cases` },
    { label: 'Case order', value: 'practice cases first, in set order; then main cases shuffled per reader and period' },
    { label: 'Seed', value: String(design.seed) },
    { label: 'Derived seeds', value: 'one per purpose, hashed from the seed and the purpose name (e.g. order/<reader>/p<period>)' },
  ];
  const { manifest, table } = context;
  if (manifest !== undefined) {
    const practice = manifest.cases.filter((c) => c.practice).length;
    lines.push({ label: 'Case set', value: `${manifest.name}: ${manifest.cases.length - practice} main cases, ${practice} practice` });
  }
  if (table !== undefined) {
    for (const finding of design.findings) {
      const rows = table.filter((r) => r.finding === finding && r.planted);
      const fp = rows.filter((r) => r.call === 1).length;
      lines.push({ label: `Planted for ${finding}`, value: `${fp} false positive, ${rows.length - fp} false negative` });
    }
  }
  lines.push({ label: 'Note', value: 'Heed is a research and training tool, not a medical device; it makes no diagnosis.' });
  return lines;
};
