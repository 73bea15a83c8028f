import type { ReadRow } from '../../core/read-log';
import type { AnalysisReport, ReaderEntry } from '../report-types';
import { isAided } from '../read-scores';
import type { Proportion } from '../wilson';
import { caseReview, type CaseReviewItem } from './case-review';
import { confidenceCalibration, type ConfidenceBin } from './confidence-calibration';
import { followedConfidence, type FollowedConfidence } from './followed-confidence';
import { peerRange, type PeerRange } from './peer-range';
import { scoreBands, type ScoreBand } from './score-bands';
import * as say from './sentences';
import { SMALL_COUNT_RULE, tooFew } from './small-count';
import { switchingSplit, type SwitchingSplit } from './switching-split';

export type SubgroupRow = {
  attribute: string;
  value: string;
  /** the suggestion's accuracy on this reader's cases with that value (engine's subgroups) */
  ai_accuracy: Proportion;
  /** this reader's over-reliance there (engine's subgroups) */
  overreliance: Proportion;
  too_few: boolean;
};

export type FindingReport = {
  finding: string;
  /** the engine's own entry for this reader and finding: every figure below that it has comes from here */
  entry: ReaderEntry;
  headline: string;
  headline_sure: string;
  under_text: string;
  peers: PeerRange;
  conditions_text: string;
  switching: { split: SwitchingSplit; text: string; rair_text: string; woa_text: string } | null;
  calibration: { unaided: ConfidenceBin[]; aided: ConfidenceBin[]; text: string };
  followed_confidence: FollowedConfidence & { text: string };
  score_bands: { bands: ScoreBand[]; text: string } | null;
  subgroups: { attribute: string; rows: SubgroupRow[]; text: string }[];
  time_text: string;
};

export type ReaderReport = {
  study_id: string;
  reader_id: string;
  reader_role: string;
  /** all of the reader's periods complete: only then is the case review included */
  complete: boolean;
  small_count_rule: string;
  findings: FindingReport[];
  /** null while any of the reader's periods is open (blinding holds) */
  case_review: CaseReviewItem[] | null;
  case_review_note: string;
};

export type ReaderReportInput = {
  /** analyzeReads over the whole study's log (the peers come from it, anonymously) */
  analysis: AnalysisReport;
  /** the study's read log, as analysed */
  rows: readonly ReadRow[];
  readerId: string;
  /** whether every period of this reader is complete (the app knows; see log-completion.ts for a log alone) */
  complete: boolean;
};

/**
 * One reader's private report for one study (docs/report.md): per finding, the engine's
 * own figures for this reader (over- and under-reliance, unaided against aided, switching,
 * calibration, subgroups, time) with a plain sentence each, plus the report's own summaries of
 * the reader's rows (confidence bands, score bands, switching split, confidence when following).
 * Peers appear only as a sorted list of values, median and range, and only with 3 or more.
 * The case review is null unless `complete`. Throws RangeError when the reader has no reads.
 * Example: readerReport({ analysis: analyzeReads(rows), rows, readerId: 'R1', complete: true }).findings[0].headline.
 */
export const readerReport = ({ analysis, rows, readerId, complete }: ReaderReportInput): ReaderReport => {
  const own = rows.filter((r) => r.reader_id === readerId && r.practice === 0);
  const entries = analysis.readers.filter((e) => e.reader_id === readerId);
  if (entries.length === 0 || own.length === 0) throw new RangeError(`reader ${readerId} has no reads in this log`);
  const findings = entries.map((entry) => findingReport(entry, analysis, own.filter((r) => r.finding === entry.finding)));
  const review = complete ? caseReview(own) : null;
  return {
    study_id: own[0]?.study_id ?? '',
    reader_id: readerId,
    reader_role: entries[0]?.reader_role ?? '',
    complete,
    small_count_rule: SMALL_COUNT_RULE,
    findings,
    case_review: review,
    case_review_note: review === null
      ? 'The case review appears once all of your periods are complete, so that no answer of a period still open is revealed.'
      : review.length === 0 ? 'No read to review: you never followed a wrong suggestion nor went against a right one.'
        : 'Each read where your final call followed a wrong suggestion or went against a right one. The truth shown here is the reference standard of the case set.',
  };
};

const findingReport = (entry: ReaderEntry, analysis: AnalysisReport, own: readonly ReadRow[]): FindingReport => {
  const others: number[] = [];
  for (const e of analysis.readers) {
    if (e.finding !== entry.finding || e.reader_id === entry.reader_id) continue;
    const v = e.aided?.overreliance.estimate;
    if (v !== null && v !== undefined) others.push(v);
  }
  const peers = peerRange(others, 'figure (wrong suggestions to follow or not)');
  const aidedRows = own.filter(isAided);
  const split = switchingSplit(aidedRows);
  const seq = entry.sequential;
  const fc = followedConfidence(aidedRows);
  return {
    finding: entry.finding,
    entry,
    headline: say.headline(entry.aided, peers),
    headline_sure: say.headlineSure(entry.aided),
    under_text: say.underText(entry.aided),
    peers,
    conditions_text: say.conditionsText(entry.unaided, entry.aided, entry.crossover),
    switching: seq === null || split === null ? null : { split, text: say.switchingText(seq, split), rair_text: say.rairText(seq), woa_text: say.woaText(seq) },
    calibration: {
      unaided: confidenceCalibration(own.filter((r) => !isAided(r))),
      aided: confidenceCalibration(aidedRows),
      text: say.calibrationText(entry.unaided, entry.aided),
    },
    followed_confidence: { ...fc, text: say.followedConfidenceText(fc) },
    score_bands: aidedRows.some((r) => r.ai_score !== null) ? { bands: scoreBands(aidedRows), text: say.scoreBandText() } : null,
    subgroups: subgroupsOf(entry),
    time_text: say.timeText(entry.unaided, entry.aided, entry.time_ratio),
  };
};

const subgroupsOf = (entry: ReaderEntry): FindingReport['subgroups'] => {
  const byAttribute = new Map<string, SubgroupRow[]>();
  for (const g of entry.subgroups) {
    if (g.aided === null) continue;
    const list = byAttribute.get(g.attribute) ?? [];
    list.push({ attribute: g.attribute, value: g.value, ai_accuracy: g.ai_accuracy, overreliance: g.overreliance, too_few: tooFew(g.overreliance.n) });
    byAttribute.set(g.attribute, list);
  }
  return [...byAttribute].map(([attribute, rows]) => ({ attribute, rows, text: say.subgroupText(attribute) }));
};
