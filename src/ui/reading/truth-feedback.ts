/**
 * What a reader is told after a case in a training study, or after a practice case of any study:
 * per finding, the truth, their final answer and whether it was right, and (when a suggestion
 * was shown) whether the suggestion was right and whether they followed it. Measurement reads
 * never get this: the caller decides (shouldShowTruth).
 */
import type { CaseRecord } from '../../core/case-set';
import type { Bit } from '../../core/read-log';
import type { StoredRead } from '../../store/records';

export type TruthLine = {
  finding: string;
  truth: Bit;
  finalCall: Bit;
  rating: number | null;
  right: boolean;
  suggestion: { call: Bit; right: boolean; followed: boolean } | null;
};

/** The truth is shown after each case of a training study and after each practice case; never otherwise. */
export const shouldShowTruth = (training: boolean, practice: boolean): boolean => training || practice;

/** One line per finding of the case that has a committed final answer, in the study's finding order. */
export const truthLines = (caseRecord: CaseRecord, reads: readonly StoredRead[], findings: readonly string[]): TruthLine[] =>
  findings.flatMap((finding) => {
    const read = reads.find((r) => r.caseId === caseRecord.caseId && r.finding === finding);
    const truth = caseRecord.findings.find((f) => f.finding === finding)?.truth;
    if (!read?.final || truth === undefined) return [];
    const finalCall = read.final.call;
    return [{
      finding,
      truth,
      finalCall,
      rating: read.final.rating ?? null,
      right: finalCall === truth,
      suggestion: read.aiCall === null ? null : { call: read.aiCall, right: read.aiCall === truth, followed: finalCall === read.aiCall },
    }];
  });
