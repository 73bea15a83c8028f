/**
 * Runtime schema of a StudyDesign (src/core/design.ts), with plain-language messages, so a
 * design typed in a form or read back from a study.json is checked before anything uses it.
 *
 * `parseDesign(value)` returns `{ ok: true, design }` or `{ ok: false, problems }`, each problem
 * naming where it is (e.g. "sequences[1].periods: ..."). Nothing throws for bad input.
 * Example: parseDesign(defaultDesign(['nodule'])).ok === true.
 */
import { z } from 'zod';
import { ANSWER_SCALES, defaultAnswerScale } from './answer-scale';
import { ASSISTANCE, type StudyDesign } from './design';

const wholeAtLeast = (min: number, what: string) =>
  z
    .number({ error: `${what} must be a number` })
    .int({ error: `${what} must be a whole number` })
    .min(min, { error: `${what} must be at least ${min}` });

const plantSpec = z
  .object({
    mode: z.enum(['count', 'rate'], { error: 'mode must be "count" or "rate"' }),
    value: z.number({ error: 'value must be a number' }),
  })
  .superRefine((spec, ctx) => {
    if (spec.mode === 'count' && !(Number.isInteger(spec.value) && spec.value >= 0)) {
      ctx.addIssue({ code: 'custom', path: ['value'], message: `a count of planted errors must be a whole number 0 or more, got ${spec.value}` });
    }
    if (spec.mode === 'rate' && !(spec.value >= 0 && spec.value <= 1)) {
      ctx.addIssue({ code: 'custom', path: ['value'], message: `a rate of planted errors must be from 0 to 1, got ${spec.value}` });
    }
  });

// A stored design or study.json from before answer scales existed reads as call-confidence.
const answerScale = z
  .object({
    kind: z.enum(ANSWER_SCALES, { error: `the answer scale must be one of ${ANSWER_SCALES.join(', ')}` }),
    labels: z
      .array(z.string().trim().min(1, { error: 'a rating label cannot be empty' }), { error: 'the rating labels must be a list' })
      .length(5, { error: 'the five-point scale needs exactly 5 labels' }),
    presentFrom: z.number({ error: 'the rating threshold must be a number' }),
  })
  .superRefine((s, ctx) => {
    if (s.kind === 'five-point' && !(Number.isInteger(s.presentFrom) && s.presentFrom >= 2 && s.presentFrom <= 5)) {
      ctx.addIssue({ code: 'custom', path: ['presentFrom'], message: `on the five-point scale the "present" threshold must be a whole number 2 to 5, got ${s.presentFrom}` });
    }
    if (s.kind === 'percent' && !(s.presentFrom >= 1 && s.presentFrom <= 100)) {
      ctx.addIssue({ code: 'custom', path: ['presentFrom'], message: `on the percent scale the "present" threshold must be 1 to 100, got ${s.presentFrom}` });
    }
  })
  .default(defaultAnswerScale);

const sequence = z.object({
  label: z.string({ error: 'a sequence needs a label' }).trim().min(1, { error: 'a sequence label cannot be empty' }),
  periods: z
    .array(z.enum(ASSISTANCE, { error: `assistance must be one of ${ASSISTANCE.join(', ')}` }), {
      error: 'periods must be a list of assistance modes',
    })
    .min(1, { error: 'a sequence needs at least one period' }),
});

export const studyDesignSchema = z
  .object({
    findings: z
      .array(z.string().trim().min(1, { error: 'a finding key cannot be empty' }), { error: 'findings must be a list' })
      .min(1, { error: 'the study needs at least one finding' }),
    sequences: z.array(sequence, { error: 'sequences must be a list' }).min(2, { error: 'the study needs at least 2 sequences' }),
    washoutDays: wholeAtLeast(0, 'the washout (days)'),
    threshold: z
      .number({ error: 'the threshold must be a number' })
      .min(0, { error: 'the threshold must be from 0 to 1' })
      .max(1, { error: 'the threshold must be from 0 to 1' }),
    showScore: z.boolean({ error: 'showScore must be true or false' }),
    askConfidence: z.boolean({ error: 'askConfidence must be true or false' }),
    caution: z.object({
      mode: z.enum(['off', 'all', 'random-half'], { error: 'the caution mode must be off, all or random-half' }),
      text: z.string({ error: 'the caution text must be text' }),
    }),
    planted: z.object({
      falsePositive: plantSpec,
      falseNegative: plantSpec,
      stratifyBy: z.string().trim().min(1, { error: 'stratifyBy cannot be empty (use null for none)' }).nullable(),
    }),
    blocks: wholeAtLeast(1, 'the number of blocks'),
    breakEvery: wholeAtLeast(1, 'the number of cases between breaks').nullable(),
    seed: z
      .number({ error: 'the seed must be a number' })
      .int({ error: 'the seed must be a whole number' })
      .min(0, { error: 'the seed must be 0 or more' }),
    answerScale,
    training: z.boolean({ error: 'training must be true or false' }).default(false),
  })
  .superRefine((d, ctx) => {
    const seen = new Set<string>();
    d.findings.forEach((f, i) => {
      if (seen.has(f)) ctx.addIssue({ code: 'custom', path: ['findings', i], message: `the finding "${f}" is listed twice` });
      seen.add(f);
    });
    const first = d.sequences[0];
    const periods = first?.periods.length ?? 0;
    const labels = new Set<string>();
    d.sequences.forEach((s, i) => {
      if (s.periods.length !== periods) {
        ctx.addIssue({
          code: 'custom',
          path: ['sequences', i, 'periods'],
          message: `every sequence needs the same number of periods: "${first?.label}" has ${periods}, "${s.label}" has ${s.periods.length}`,
        });
      }
      if (labels.has(s.label)) ctx.addIssue({ code: 'custom', path: ['sequences', i, 'label'], message: `the sequence label "${s.label}" is used twice` });
      labels.add(s.label);
    });
    if (d.blocks > periods) {
      ctx.addIssue({
        code: 'custom',
        path: ['blocks'],
        message: `the number of blocks (${d.blocks}) cannot exceed the number of periods (${periods})`,
      });
    }
    if (d.caution.mode !== 'off' && d.caution.text.trim() === '') {
      ctx.addIssue({ code: 'custom', path: ['caution', 'text'], message: 'a caution notice that is shown needs its text' });
    }
  }) satisfies z.ZodType<StudyDesign>;

/** "sequences[1].periods" from a zod path. */
export const formatPath = (path: readonly PropertyKey[]): string =>
  path.reduce<string>((acc, key) => (typeof key === 'number' ? `${acc}[${key}]` : acc === '' ? String(key) : `${acc}.${String(key)}`), '');

export const issuesToProblems = (issues: readonly z.core.$ZodIssue[], prefix = ''): string[] =>
  issues.map((issue) => {
    const where = formatPath([...(prefix === '' ? [] : [prefix]), ...issue.path]);
    return where === '' ? issue.message : `${where}: ${issue.message}`;
  });

/** Each problem with its path, for forms that show a problem beside its own field. */
export const designIssues = (value: unknown): { path: PropertyKey[]; message: string }[] => {
  const result = studyDesignSchema.safeParse(value);
  return result.success ? [] : result.error.issues.map((issue) => ({ path: [...issue.path], message: issue.message }));
};

export type DesignParse = { ok: true; design: StudyDesign } | { ok: false; problems: string[] };

export const parseDesign = (value: unknown): DesignParse => {
  const result = studyDesignSchema.safeParse(value);
  return result.success ? { ok: true, design: result.data } : { ok: false, problems: issuesToProblems(result.error.issues) };
};
