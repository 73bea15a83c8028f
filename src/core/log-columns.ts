/**
 * A checked read log held as typed columns instead of one ReadRow per read (issue 10): what the
 * read-log parse hands to the analysis engine for a large log. Row i of every array is the log's
 * i-th read, in file order. It keeps only the cells the statistics use; the others (study_id,
 * reader_years, sequence, order, ai_planted, initial_ms, shown_at) are checked by the parse and
 * dropped. Ids are numbered in order of first appearance (readerIds[reader[i]] is read i's
 * reader_id, as the ReadRow would hold it); an empty call is −1 and an empty number NaN.
 * Example: for a log whose first read is R1's, readerIds[0] === 'R1' and reader[0] === 0.
 */
export type LogColumns = {
  n: number;
  reader: Int32Array;
  readerIds: string[];
  case: Int32Array;
  caseIds: string[];
  finding: Int32Array;
  findingIds: string[];
  role: Int32Array;
  roleIds: string[];
  /** index into ASSISTANCE (src/core/design.ts) */
  assistance: Uint8Array;
  /** index into ANSWER_SCALES (src/core/answer-scale.ts) */
  scale: Uint8Array;
  practice: Uint8Array;
  truth: Uint8Array;
  caution: Uint8Array;
  finalCall: Uint8Array;
  training: Uint8Array;
  withdrawn: Uint8Array;
  aiCall: Int8Array;
  initialCall: Int8Array;
  period: Float64Array;
  totalMs: Float64Array;
  aiScore: Float64Array;
  initialConfidence: Float64Array;
  finalConfidence: Float64Array;
  initialRating: Float64Array;
  finalRating: Float64Array;
  /**
   * The case_<name> columns, in the order a parsed read's case_attributes object lists its keys
   * (Object.keys), each read's value as a number into `values` (first appearance order); none
   * when the log has no reads.
   */
  attributes: { name: string; code: Int32Array; values: string[] }[];
};
