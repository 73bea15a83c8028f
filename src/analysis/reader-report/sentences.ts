// The plain-words sentence beside each figure of the reader's report: what it means first, how
// sure it is second. Numbers come from the engine's sections (or the report's own small
// summaries), never recomputed here.
import type { AidedSection, ConditionSection } from '../condition-section';
import type { CrossoverSection } from '../crossover';
import type { SequentialSection } from '../sequential';
import type { Proportion } from '../wilson';
import type { FollowedConfidence } from './followed-confidence';
import type { PeerRange } from './peer-range';
import { MIN_READS, tooFew } from './small-count';
import type { SwitchingSplit } from './switching-split';
import { pct, reads, seconds, shareText, sureText } from './words';

const share = (p: Proportion): string => `${pct(p.estimate)} (95% CI ${Math.round((p.lower ?? 0) * 100)}–${pct(p.upper)})`;

/** The headline: following wrong suggestions, and the anonymous peers. */
export const headline = (aided: AidedSection | null, peers: PeerRange): string => {
  if (aided === null) return 'You read no case with the suggestion shown, so this report cannot say how you relied on it.';
  const o = aided.overreliance;
  if (o.n === 0) return `The suggestion was never wrong in your ${reads(aided.n)} with it, so following a wrong suggestion could not be measured.`;
  const times = o.k === 1 ? 'once' : `${o.k} times`;
  const own = `When the suggestion was wrong (${reads(o.n)}) you followed it ${times}: ${share(o)}.`;
  const others = peers.note ?? `Other readers in this study: median ${pct(peers.median)}, range ${Math.round((peers.min ?? 0) * 100)}–${pct(peers.max)}.`;
  return `${own} ${others}`;
};

export const underText = (aided: AidedSection | null): string => {
  if (aided === null || aided.underreliance.n === 0) return '';
  const u = aided.underreliance;
  return `When the suggestion was right (${reads(u.n)}) you went against it ${u.k === 1 ? 'once' : `${u.k} times`}: ${share(u)}.${tooFew(u.n) ? ` ${sureText(u)}` : ''}`;
};

export const headlineSure = (aided: AidedSection | null): string =>
  aided === null || aided.overreliance.n === 0 ? '' : sureText(aided.overreliance);

/** Unaided against aided accuracy, with the paired comparison when the design has one. */
export const conditionsText = (unaided: ConditionSection | null, aided: ConditionSection | null, crossover: CrossoverSection | null): string => {
  if (unaided === null && aided === null) return 'No reads.';
  const parts: string[] = [];
  if (unaided !== null) parts.push(`without the suggestion you were right in ${shareText(unaided.accuracy)}`);
  if (aided !== null) parts.push(`with it in ${shareText(aided.accuracy)}`);
  let text = `${parts.join('; ')}.`;
  text = text.charAt(0).toUpperCase() + text.slice(1);
  if (crossover !== null && crossover.n > 0 && crossover.accuracy_difference !== null) {
    const d = Math.round(crossover.accuracy_difference * 100);
    const p = crossover.mcnemar.p;
    const judged = tooFew(crossover.n)
      ? `only ${crossover.n} cases, too few to judge`
      : p < 0.05 ? `McNemar exact p = ${p.toFixed(3)}: unlikely to be chance alone` : `McNemar exact p = ${p.toFixed(2)}: this could well be chance`;
    text += ` On the ${crossover.n} cases you read both ways, your accuracy was ${Math.abs(d)} points ${d >= 0 ? 'higher' : 'lower'} with the suggestion (${judged}).`;
  } else if (unaided !== null && aided !== null) {
    text += ' No case was read both ways, so the two columns are different cases and differ partly by chance.';
  }
  return `${text} AUC says how well your calls and confidence separated cases with the finding from those without (0.5 is chance, 1 is perfect).`;
};

export const switchingText = (seq: SequentialSection, split: SwitchingSplit): string => {
  const changed = seq.changed.k;
  const better = split.suggestion_right.better + split.suggestion_wrong.better;
  const worse = split.suggestion_right.worse + split.suggestion_wrong.worse;
  return `After seeing the suggestion you changed your first call on ${changed} of ${reads(seq.n)}: ${better} for the better, ${worse} for the worse.${tooFew(seq.n) ? ` ${seq.n} reads are too few to judge (fewer than ${MIN_READS}).` : ''}`;
};

export const rairText = (seq: SequentialSection): string => {
  const a = seq.rair;
  const s = seq.rsr;
  const rair = a.n === 0 ? 'Your first call was never wrong when the suggestion was right, so switching to a right suggestion could not be measured.'
    : `When your first call was wrong and the suggestion right, you switched to the right answer in ${a.k} of ${a.n} (${pct(a.estimate)}; relative AI reliance, RAIR). ${sureText(a)}`;
  const rsr = s.n === 0 ? 'Your first call was never right when the suggestion was wrong, so holding your ground could not be measured.'
    : `When your first call was right and the suggestion wrong, you kept your right answer in ${s.k} of ${s.n} (${pct(s.estimate)}; relative self-reliance, RSR). ${sureText(s)}`;
  return `${rair} ${rsr}`;
};

export const woaText = (seq: SequentialSection): string => {
  const w = seq.woa;
  if (w.n === 0 || w.mean === null) return 'Weight of advice could not be computed: no read where the suggestion differed from your first view.';
  return `On average you moved ${pct(w.mean)} of the way from your first view toward the suggestion (weight of advice, median ${pct(w.median)}; 0% keeps your view, 100% adopts the suggestion), over ${reads(w.n)}.${tooFew(w.n) ? ' Too few to judge.' : ''}`;
};

export const calibrationText = (unaided: ConditionSection | null, aided: ConditionSection | null): string => {
  const ece = (c: ConditionSection | null, label: string) => (c === null || c.calibration === null || c.calibration.ece === null ? null : `${label} ${(c.calibration.ece * 100).toFixed(0)} points`);
  const eces = [ece(unaided, 'unaided'), ece(aided, 'aided')].filter((x): x is string => x !== null);
  return 'Each point is one band of stated confidence: how often you were right there, against how often a reader with that confidence should be (the dashed line; confidence 0 means a guess, right half the time, and 100 means certain). '
    + 'A point below the line means you were surer than your results bore out. '
    + (eces.length > 0 ? `Average gap between the likelihood you stated and how often the finding was present (calibration error): ${eces.join(', ')}; 0 is perfect. ` : '')
    + `Bands with fewer than ${MIN_READS} reads are too few to judge.`;
};

export const followedConfidenceText = (f: FollowedConfidence): string => {
  if (f.wrong.n === 0 || f.right.n === 0 || f.wrong.mean === null || f.right.mean === null) {
    return f.wrong.n === 0 ? 'You never followed a wrong suggestion with a stated confidence, so there is nothing to compare.' : 'You never followed a right suggestion with a stated confidence, so there is nothing to compare.';
  }
  const gap = f.right.mean - f.wrong.mean;
  const verdict = tooFew(f.wrong.n) ? `${reads(f.wrong.n)} following a wrong suggestion are too few to judge.`
    : Math.abs(gap) < 5 ? 'You were about as sure either way: your confidence gave no warning when the suggestion was wrong.'
      : gap > 0 ? 'You were less sure when the suggestion was wrong: a signal worth listening to.' : 'You were surer when the suggestion was wrong than when it was right.';
  return `Your mean confidence when you followed a wrong suggestion was ${f.wrong.mean.toFixed(0)} (${reads(f.wrong.n)}), and when you followed a right one ${f.right.mean.toFixed(0)} (${reads(f.right.n)}). ${verdict}`;
};

export const scoreBandText = (): string =>
  'How often you followed the suggestion at each shown score, when it was right and when it was wrong. Relying well means following right suggestions and not wrong ones at every score; '
  + `bands with fewer than ${MIN_READS} reads are marked too few to judge.`;

export const subgroupText = (attribute: string): string =>
  `For each ${attribute}: how often the suggestion was right there, beside how often you followed it when it was wrong there. Where the suggestion is weaker, following it costs more. Values with fewer than ${MIN_READS} wrong suggestions are too few to judge.`;

export const timeText = (unaided: ConditionSection | null, aided: ConditionSection | null, ratio: number | null): string => {
  const one = (c: ConditionSection | null, label: string) =>
    c === null ? null : `${label} ${seconds(c.median_ms)} (middle half of reads ${seconds(c.time.q1_ms)}–${seconds(c.time.q3_ms)}, ${reads(c.n)})`;
  const parts = [one(unaided, 'without the suggestion'), one(aided, 'with it')].filter((x): x is string => x !== null);
  const r = ratio === null ? '' : ` With the suggestion a read took ${ratio.toFixed(2)} times as long as without.`;
  return `Median time per read: ${parts.join('; ')}.${r} Times vary a lot from case to case; compare the middle halves, not only the medians.`;
};
