/** The data dictionary written beside reads.csv: one line per column, and the standing caution. */
import { READ_LOG_COLUMNS, READ_LOG_OPTIONAL_COLUMNS, type ReadLogColumn, type ReadLogOptionalColumn } from '../core/read-log';
import { RESEARCH_CAUTION } from '../core/research-caution';

const MEANING: Record<ReadLogColumn, string> = {
  study_id: 'text: study identifier',
  reader_id: 'text: pseudonymous reader code',
  reader_role: 'text: e.g. radiologist, resident, surgeon',
  reader_years: 'number: years of reading experience; empty when not given',
  sequence: 'text: crossover sequence label (UA = unaided then aided, AU = aided then unaided); may be empty',
  period: 'integer: 1-based period',
  assistance: 'none / concurrent / sequential: how the suggestion was shown for this read',
  case_id: 'text: case identifier',
  finding: 'text: finding key',
  practice: '0/1: practice read, excluded from every statistic',
  order: "integer: 1-based position of the case in this reader's period",
  truth: '0/1: ground truth',
  ai_call: "0/1: shown suggestion's call; empty when assistance is none",
  ai_score: "number in [0,1]: shown suggestion's score; empty when not shown",
  ai_planted: '0/1: 1 when the shown suggestion is a planted error',
  caution_shown: '0/1: caution notice shown for this read',
  initial_call: '0/1: sequential only, the call before the suggestion was revealed',
  initial_confidence: '0..100: sequential only, confidence in the initial call',
  initial_ms: 'number: sequential only, ms from the animation frame that first showed the case image to the key press (its event time; or the click) that committed the initial call (monotonic clock, paused time excluded)',
  final_call: "0/1: the reader's final call",
  final_confidence: '0..100: certainty in the final call (0 guessing, 100 certain); empty when the study asked none',
  total_ms: 'number: ms from the animation frame that first showed the case image to the key press (its event time; or the click) that committed the final call (monotonic clock, paused time excluded; the durable save after it is not counted)',
  shown_at: 'ISO 8601 UTC: when the case was shown',
};

const OPTIONAL_MEANING: Record<ReadLogOptionalColumn, string> = {
  scale: 'call-confidence / five-point / percent: the answer scale of the read; empty means call-confidence',
  initial_rating: 'number: sequential only, the rating before the suggestion (1..5 on five-point, 0..100 on percent); empty on call-confidence',
  final_rating: 'number: the final rating (1 definitely absent ... 5 definitely present on five-point; 0..100 likelihood present on percent); empty on call-confidence',
  training: '0/1: 1 when read in a training study that showed the truth after each case (kept out of measurement statistics)',
  withdrawn: '0/1: 1 when the reader was withdrawn from the study (left out of statistics by default)',
};

export const dataDictionary = (attributeNames: readonly string[]): string => [
  '# reads.csv: data dictionary',
  '',
  RESEARCH_CAUTION,
  '',
  'UTF-8, comma-separated, header row, \\n line ends, RFC 4180 quoting. Booleans are 0/1; a value that does not apply is empty.',
  'Derived score (0..100, likelihood the finding is present): final_call = 1 ? 50 + final_confidence/2 : 50 - final_confidence/2.',
  "Full description: docs/formats.md (this file's format) and docs/methods.md (the statistics) in Heed's repository.",
  '',
  'On a rating scale the rating is the ROC score, and the call follows from the study threshold (call = 1 when rating >= threshold); see docs/scales-and-training.md.',
  "Spreadsheet safety: a text cell that starts with =, +, -, @, a tab or a carriage return (and is not a plain number) is written with a single quote (') before it, so a spreadsheet shows it as text instead of running it as a formula (OWASP CSV Injection guidance). Numbers are never quoted. Heed's own reader (heed analyze, import) takes that one quote off again; in other tools, remove a leading ' from such text cells.",
  '',
  ...READ_LOG_COLUMNS.map((c) => `${c}: ${MEANING[c]}`),
  ...READ_LOG_OPTIONAL_COLUMNS.map((c) => `${c}: ${OPTIONAL_MEANING[c]}`),
  ...attributeNames.map((a) => `case_${a}: text, case attribute "${a}" from the case set`),
  '',
].join('\n');
