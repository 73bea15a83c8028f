/** Runtime shapes of what a bundle carries, checked when a bundle is read (it comes from outside). */
import { z } from 'zod';

const bit = z.union([z.literal(0), z.literal(1)]);
const hex64 = z.string().regex(/^[0-9a-f]{64}$/, { error: 'must be 64 lower-case hex digits' });

const readerSchema = z.looseObject({
  id: z.string().min(1), studyId: z.string().min(1), code: z.string().min(1), role: z.string(), years: z.number().nullable(),
  sequenceIndex: z.number().int().min(0), slot: z.number().int().min(0), enrolledAt: z.string(),
});

const itemSchema = z.object({
  caseId: z.string(), practice: z.boolean(), assistance: z.enum(['none', 'concurrent', 'sequential']),
  order: z.number().int().min(1), caution: z.boolean(), breakBefore: z.boolean(),
});

const sessionSchema = z.looseObject({
  id: z.string().min(1), studyId: z.string().min(1), readerId: z.string().min(1), period: z.number().int().min(1),
  items: z.array(itemSchema), orderSeed: z.string(), startedAt: z.string(), completedAt: z.string().nullable(),
  override: z.object({ reason: z.string(), by: z.string(), at: z.string() }).nullable(),
});

const suggestionSchema = z.object({
  caseId: z.string(), finding: z.string(), practice: z.boolean(), truth: bit, call: bit, score: z.number().nullable(),
  planted: z.boolean(), naturalCall: bit, naturalScore: z.number().nullable(),
});

const manifestSchema = z.object({
  name: z.string(),
  cases: z.array(z.object({
    caseId: z.string(), images: z.array(z.string()), practice: z.boolean(), attributes: z.record(z.string(), z.string()),
    findings: z.array(z.object({ finding: z.string(), truth: bit, modelScore: z.number().nullable(), modelCall: bit.nullable() })),
  })),
  findings: z.array(z.string()),
  attributeNames: z.array(z.string()),
});

export const studyBundlePartSchema = z.object({
  name: z.string().min(1),
  createdAt: z.string(),
  lockedAt: z.string().nullable(),
  readers: z.array(readerSchema),
  sessions: z.array(sessionSchema),
  suggestions: z.array(suggestionSchema),
  caseSetManifest: manifestSchema,
  imageSha256: z.record(z.string(), hex64),
});

export const manifestFileSchema = z.object({
  format: z.string(),
  version: z.number(),
  heed_version: z.string(),
  notice: z.string(),
  study_id: z.string().min(1),
  design_fingerprint: hex64,
  case_set_fingerprint: hex64,
  images_included: z.boolean(),
  chain: z.object({ genesis: hex64, head: hex64, events: z.number().int().min(0), reads: z.number().int().min(0) }),
  files: z.array(z.object({ path: z.string().min(1), bytes: z.number().int().min(0), sha256: hex64 })),
});

export type StudyBundlePart = z.infer<typeof studyBundlePartSchema>;
