// Data rows of cases.csv to case records, checking every value (docs/formats.md, "The case set").
import type { CaseFinding, CaseRecord } from '../../core/case-set';
import { formulaProblem } from '../../core/formula-text';
import { ATTRIBUTE_PREFIX } from './columns';
import type { Columns } from './columns';
import type { CsvRow } from './csv-rows';
import { checkImagePath } from './paths';
import type { Problems } from './problems';

const CASE_ID = /^[A-Za-z0-9._-]{1,64}$/;
const DECIMAL = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;
const MAX_FINDING = 64;

export type RowsResult = {
  cases: CaseRecord[];
  findings: string[];
  /** each image path (normalised) and the first line naming it, in first-seen order */
  imageLines: Map<string, number>;
};

type Seen = { record: CaseRecord; line: number; imagesText: string };

const show = (value: string): string => (value === '' ? 'an empty cell' : `"${value.length > 40 ? `${value.slice(0, 40)}...` : value}"`);

export const readRows = (file: string, columns: Columns, rows: CsvRow[], problems: Problems): RowsResult => {
  const byId = new Map<string, Seen>();
  const pairs = new Map<string, number>();
  const findings: string[] = [];
  const imageLines = new Map<string, number>();
  const cases: CaseRecord[] = [];
  const col = (name: string): number | undefined => columns.index[name];

  for (const { line, cells } of rows) {
    if (cells.length !== columns.width) {
      problems.add(file, line, null, `row has ${cells.length} cells but the header has ${columns.width}; check for a stray or missing comma, or an unquoted comma in a value`);
      continue;
    }
    const cell = (name: string): string | null => {
      const i = col(name);
      return i === undefined ? null : cells[i] ?? null;
    };
    // required columns were checked in the header, and the row is as wide as the header
    const textOf = (name: string): string => cell(name) ?? '';
    const before = problems.count;
    const bit = (name: string, required: boolean): 0 | 1 | null => {
      const raw = cell(name);
      if (raw === null) return null;
      const value = raw.trim();
      if (value === '' && !required) return null;
      if (value === '0' || value === '1') return value === '1' ? 1 : 0;
      problems.add(file, line, name, `${name} must be 0 or 1, found ${show(value)}`);
      return null;
    };

    // Text a spreadsheet could run as a formula never enters (checked before trimming too, as a
    // leading tab or CR is one of the signs).
    const formula = (name: string, raw: string): boolean => {
      const problem = formulaProblem(raw) ?? formulaProblem(raw.trim());
      if (problem) problems.add(file, line, name, `${name} ${show(raw.trim())} ${problem}`);
      return problem !== null;
    };
    const caseId = textOf('case_id');
    if (formula('case_id', caseId)) {
      // reported
    } else if (!CASE_ID.test(caseId)) {
      problems.add(file, line, 'case_id', caseId === ''
        ? 'case_id is empty'
        : `case_id ${show(caseId)} must be 1-64 characters of letters, digits, '.', '_' or '-'`);
    }
    const finding = textOf('finding').trim();
    if (formula('finding', textOf('finding'))) {
      // reported
    } else if (finding === '') problems.add(file, line, 'finding', 'finding is empty');
    else if (finding.length > MAX_FINDING || [...finding].some((ch) => ch.charCodeAt(0) < 0x20)) {
      problems.add(file, line, 'finding', `finding ${show(finding)} must be at most ${MAX_FINDING} characters with no control characters`);
    }
    const truth = bit('truth', true);
    const modelCall = bit('model_call', false);
    const practice = bit('practice', false) === 1;
    let modelScore: number | null = null;
    const rawScore = cell('model_score');
    if (rawScore !== null && rawScore.trim() !== '') {
      const text = rawScore.trim();
      const value = DECIMAL.test(text) ? Number(text) : Number.NaN;
      if (!(value >= 0 && value <= 1)) problems.add(file, line, 'model_score', `model_score must be a number from 0 to 1, found ${show(text)}`);
      else modelScore = value;
    }
    const imagesText = textOf('image');
    const images: string[] = [];
    for (const part of imagesText.split(';')) {
      const checked = checkImagePath(part);
      if (checked.ok) images.push(checked.path);
      else problems.add(file, line, 'image', checked.message);
    }
    // null prototype: a case___proto__ or case_constructor column is an ordinary key, not the prototype
    const attributes: Record<string, string> = Object.create(null);
    for (const { name, index } of columns.attributes) {
      const raw = cells[index] ?? '';
      if (!formula(`${ATTRIBUTE_PREFIX}${name}`, raw)) attributes[name] = raw.trim();
    }
    if (problems.count > before || truth === null) continue;

    const pairKey = `${caseId}\u0000${finding}`;
    const firstPair = pairs.get(pairKey);
    if (firstPair !== undefined) {
      problems.add(file, line, 'finding', `case ${caseId} already has finding ${finding} on line ${firstPair}`);
      continue;
    }
    pairs.set(pairKey, line);
    const entry: CaseFinding = { finding, truth, modelScore, modelCall };
    const seen = byId.get(caseId);
    if (seen) {
      if (images.join(';') !== seen.record.images.join(';')) {
        problems.add(file, line, 'image', `case ${caseId} names ${show(imagesText.trim())} here but ${show(seen.imagesText.trim())} on line ${seen.line}; give every row of a case the same images`);
        continue;
      }
      if (practice !== seen.record.practice) {
        problems.add(file, line, 'practice', `case ${caseId} is ${practice ? '' : 'not '}practice here but ${seen.record.practice ? '' : 'not '}practice on line ${seen.line}`);
        continue;
      }
      const differing = columns.attributes.find(({ name }) => attributes[name] !== seen.record.attributes[name]);
      if (differing) {
        const name = differing.name;
        problems.add(file, line, `case_${name}`, `case ${caseId} has case_${name} ${show(attributes[name] ?? '')} here but ${show(seen.record.attributes[name] ?? '')} on line ${seen.line}`);
        continue;
      }
      seen.record.findings.push(entry);
    } else {
      const record: CaseRecord = { caseId, images, practice, attributes, findings: [entry] };
      byId.set(caseId, { record, line, imagesText });
      cases.push(record);
    }
    if (!findings.includes(finding)) findings.push(finding);
    for (const path of images) if (!imageLines.has(path)) imageLines.set(path, line);
  }
  return { cases, findings, imageLines };
};
