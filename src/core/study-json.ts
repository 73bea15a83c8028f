/**
 * The exported study.json: the full design (seeds included), the case set it was made for
 * (name and fingerprint) and the planted suggestions, so another workstation, or a reader of the
 * methods section, can see and reproduce exactly what was run.
 *
 * `studyJson` writes it (2-space indented, stable key order); `parseStudyJson` reads it back and
 * returns { ok: false, problems } for bad input, each problem naming where it is (line and
 * column for broken JSON, the field path otherwise). Nothing throws for bad input.
 * Example: parseStudyJson(studyJson(design, extra)) gives back the same design and extra.
 */
import { z } from 'zod';
import { RESEARCH_CAUTION } from './research-caution';
import type { StudyDesign } from './design';
import { issuesToProblems, studyDesignSchema } from './design-schema';
import type { SuggestionRow } from './suggestions';

export const STUDY_FORMAT = 'heed-study';
export const STUDY_VERSION = 1;
export const STUDY_NOTICE = RESEARCH_CAUTION;

export type StudyExtra = {
  studyId: string;
  caseSet: { name: string; fingerprint: string };
  planted: SuggestionRow[];
};

export type StudyFile = StudyExtra & { format: typeof STUDY_FORMAT; version: number; notice: string; design: StudyDesign };

const bit = z.union([z.literal(0), z.literal(1)], { error: 'must be 0 or 1' });

const plantedRow = z
  .object({
    caseId: z.string().min(1, { error: 'a case id cannot be empty' }),
    finding: z.string().min(1, { error: 'a finding cannot be empty' }),
    practice: z.literal(false, { error: 'practice cases are never planted' }),
    truth: bit,
    call: bit,
    score: z.number().min(0).max(1, { error: 'a score must be from 0 to 1' }).nullable(),
    planted: z.literal(true, { error: 'only planted suggestions belong in this list' }),
    naturalCall: bit,
    naturalScore: z.number().min(0).max(1, { error: 'a score must be from 0 to 1' }).nullable(),
  })
  .refine((r) => r.call !== r.truth, { error: 'a planted suggestion must disagree with the truth', path: ['call'] });

const studyFileSchema = z.object({
  format: z.literal(STUDY_FORMAT, { error: `this is not a Heed study file (format must be "${STUDY_FORMAT}")` }),
  version: z.literal(STUDY_VERSION, { error: `this study file version is not supported (expected ${STUDY_VERSION})` }),
  notice: z.string(),
  studyId: z.string().min(1, { error: 'the study id cannot be empty' }),
  design: studyDesignSchema,
  caseSet: z.object({
    name: z.string({ error: 'the case set needs a name' }),
    fingerprint: z.string().min(1, { error: 'the case set fingerprint cannot be empty' }),
  }),
  planted: z.array(plantedRow, { error: 'planted must be a list' }),
});

export const studyJson = (design: StudyDesign, extra: StudyExtra): string => {
  const file: StudyFile = {
    format: STUDY_FORMAT,
    version: STUDY_VERSION,
    notice: STUDY_NOTICE,
    studyId: extra.studyId,
    design,
    caseSet: { name: extra.caseSet.name, fingerprint: extra.caseSet.fingerprint },
    planted: extra.planted,
  };
  return `${JSON.stringify(file, null, 2)}\n`;
};

/** Line and column (1-based) of a character offset. */
const lineColumn = (text: string, offset: number): { line: number; column: number } => {
  const before = text.slice(0, offset).split('\n');
  return { line: before.length, column: (before.at(-1)?.length ?? 0) + 1 };
};

export type StudyParse = { ok: true; study: StudyFile } | { ok: false; problems: string[] };

export const parseStudyJson = (text: string, fileName = 'study.json'): StudyParse => {
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    const at = /position (\d+)/.exec(message);
    const where = at?.[1] === undefined ? '' : (({ line, column }) => ` at line ${line}, column ${column}`)(lineColumn(text, Number(at[1])));
    return { ok: false, problems: [`${fileName} is not valid JSON${where}: ${message}`] };
  }
  const result = studyFileSchema.safeParse(value);
  if (!result.success) return { ok: false, problems: issuesToProblems(result.error.issues).map((p) => `${fileName}: ${p}`) };
  return { ok: true, study: result.data };
};
