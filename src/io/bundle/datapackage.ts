/**
 * datapackage.json: a Frictionless Data Package (v1) describing the bundle's tables with Table
 * Schema, so R, Python or any Frictionless tool can load them with types. Checked in the tests
 * against the published Data Package and Table Schema JSON Schemas.
 */
import { READ_LOG_COLUMNS, READ_LOG_OPTIONAL_COLUMNS, type ReadLogColumn, type ReadLogOptionalColumn } from '../../core/read-log';
import { RESEARCH_CAUTION } from '../../core/research-caution';
import type { CaseSetManifest } from '../../core/case-set';
import { CHAIN_COLUMNS } from './texts';

type Field = { name: string; type: string; description?: string; format?: string; trueValues?: string[]; falseValues?: string[]; constraints?: Record<string, unknown> };

const BOOLEAN: Omit<Field, 'name'> = { type: 'boolean', trueValues: ['1'], falseValues: ['0'] };

const READ_TYPES: Record<ReadLogColumn | ReadLogOptionalColumn, Omit<Field, 'name'>> = {
  study_id: { type: 'string', constraints: { required: true } },
  reader_id: { type: 'string', constraints: { required: true } },
  reader_role: { type: 'string' },
  reader_years: { type: 'number', constraints: { minimum: 0 } },
  sequence: { type: 'string' },
  period: { type: 'integer', constraints: { required: true, minimum: 1 } },
  assistance: { type: 'string', constraints: { required: true, enum: ['none', 'concurrent', 'sequential'] } },
  case_id: { type: 'string', constraints: { required: true } },
  finding: { type: 'string', constraints: { required: true } },
  practice: { ...BOOLEAN, constraints: { required: true } },
  order: { type: 'integer', constraints: { required: true, minimum: 1 } },
  truth: { ...BOOLEAN, constraints: { required: true } },
  ai_call: { ...BOOLEAN },
  ai_score: { type: 'number', constraints: { minimum: 0, maximum: 1 } },
  ai_planted: { ...BOOLEAN },
  caution_shown: { ...BOOLEAN },
  initial_call: { ...BOOLEAN },
  initial_confidence: { type: 'number', constraints: { minimum: 0, maximum: 100 } },
  initial_ms: { type: 'number', constraints: { minimum: 0 } },
  final_call: { ...BOOLEAN, constraints: { required: true } },
  final_confidence: { type: 'number', constraints: { minimum: 0, maximum: 100 } },
  total_ms: { type: 'number', constraints: { required: true, minimum: 0 } },
  shown_at: { type: 'datetime', format: 'any', constraints: { required: true } },
  scale: { type: 'string', constraints: { enum: ['call-confidence', 'five-point', 'percent'] }, description: 'answer scale; empty means call-confidence' },
  initial_rating: { type: 'number', constraints: { minimum: 0, maximum: 100 }, description: '1..5 on five-point, 0..100 on percent' },
  final_rating: { type: 'number', constraints: { minimum: 0, maximum: 100 }, description: '1..5 on five-point, 0..100 on percent' },
  training: { ...BOOLEAN, description: 'read in a training study that showed the truth after each case' },
  withdrawn: { ...BOOLEAN, description: 'the reader was withdrawn from the study' },
};

const attributeFields = (manifest: CaseSetManifest): Field[] =>
  manifest.attributeNames.map((a) => ({ name: `case_${a}`, type: 'string', description: `case attribute "${a}" from the case set` }));

const readsFields = (manifest: CaseSetManifest): Field[] => [
  ...[...READ_LOG_COLUMNS, ...READ_LOG_OPTIONAL_COLUMNS].map((name) => ({ name, ...READ_TYPES[name] })),
  ...attributeFields(manifest),
  { name: CHAIN_COLUMNS[0], type: 'string', constraints: { required: true, unique: true }, description: 'read identifier' },
  { name: CHAIN_COLUMNS[1], type: 'string', constraints: { required: true, pattern: '[0-9a-f]{64}' }, description: 'SHA-256 of the event that committed the answer' },
];

const casesFields = (manifest: CaseSetManifest): Field[] => {
  const all = manifest.cases.flatMap((c) => c.findings);
  return [
    { name: 'case_id', type: 'string', constraints: { required: true } },
    { name: 'finding', type: 'string', constraints: { required: true } },
    { name: 'truth', ...BOOLEAN, constraints: { required: true } },
    { name: 'image', type: 'string', description: 'image paths relative to the case set, ;-joined' },
    ...(all.some((f) => f.modelScore !== null) ? [{ name: 'model_score', type: 'number', constraints: { minimum: 0, maximum: 1 } }] : []),
    ...(all.some((f) => f.modelCall !== null) ? [{ name: 'model_call', ...BOOLEAN }] : []),
    { name: 'practice', ...BOOLEAN },
    ...attributeFields(manifest),
    { name: 'image_sha256', type: 'string', description: 'SHA-256 (hex) of each image, ;-joined in the order of image' },
  ];
};

/** The package name: lower case letters, digits and -._ as the Data Package spec asks. */
const packageName = (studyId: string): string => `heed-study-${studyId.toLowerCase().replace(/[^a-z0-9._-]+/g, '-')}`;

export const dataPackageJson = (studyId: string, title: string, manifest: CaseSetManifest): string => `${JSON.stringify({
  profile: 'data-package',
  name: packageName(studyId),
  title,
  description: `A Heed study bundle. ${RESEARCH_CAUTION}`,
  resources: [
    {
      profile: 'tabular-data-resource', name: 'reads', path: 'reads.csv', format: 'csv', mediatype: 'text/csv', encoding: 'utf-8',
      description: 'one row per read (see data-dictionary.md)',
      dialect: { delimiter: ',', lineTerminator: '\n', quoteChar: '"', doubleQuote: true, header: true },
      schema: { fields: readsFields(manifest), missingValues: [''], primaryKey: [CHAIN_COLUMNS[0]] },
    },
    {
      profile: 'tabular-data-resource', name: 'cases', path: 'cases.csv', format: 'csv', mediatype: 'text/csv', encoding: 'utf-8',
      description: 'the case set: one row per case and finding, with the SHA-256 of each image',
      dialect: { delimiter: ',', lineTerminator: '\n', quoteChar: '"', doubleQuote: true, header: true },
      schema: { fields: casesFields(manifest), missingValues: [''], primaryKey: ['case_id', 'finding'] },
    },
    {
      profile: 'data-resource', name: 'events', path: 'events.jsonl', format: 'jsonl', mediatype: 'application/jsonl', encoding: 'utf-8',
      description: 'every event of the study in order, one JSON object a line, hash-chained',
    },
  ],
}, null, 2)}\n`;
