/**
 * Reads and validates a whole case set (docs/formats.md, "The case set") from an abstract source: all or
 * nothing. On success, the manifest, every image's bytes (type read from the bytes) and a
 * summary; otherwise every problem found (up to limits.problems, in file then row order; the
 * first is the one to show in a one-line message) and their total count. It never throws for bad
 * input and has no side effects, so a refused set leaves nothing behind.
 * Limits (DEFAULT_LIMITS): cases.csv <= 20 MB and 20,000 data rows; each image <= 25 MB; at most
 * 20,000 images and 4 GB in all; each image's structure and size are checked (image-header.ts).
 * Example: await readCaseSet(memorySource({ 'cases.csv': csv, 'a.png': png }, 'demo'))
 *   -> { ok: true, manifest: { name: 'demo', cases: [...] }, images: [...], summary: {...} }.
 */
import type { CaseImage, CaseSetManifest } from '../../core/case-set';
import { readColumns } from './columns';
import { parseCsvRows } from './csv-rows';
import { imageHeader } from './image-header';
import { describeBytes, sniffImage } from './magic';
import { collectProblems } from './problems';
import type { Problems } from './problems';
import { readRows } from './rows';
import { SetSourceError } from './source-error';
import { summarizeCaseSet } from './summarize';
import { decodeUtf8 } from './text';
import { DEFAULT_LIMITS } from './types';
import type { CaseSetLimits, CaseSetProblem, CaseSetSummary, SetSource } from './types';

export type ReadCaseSetResult =
  | { ok: true; manifest: CaseSetManifest; images: CaseImage[]; summary: CaseSetSummary }
  | { ok: false; problems: CaseSetProblem[]; total: number };

export const CASES_FILE = 'cases.csv';
const READ_AHEAD = 8;

const mb = (bytes: number): string => `${Math.round(bytes / (1024 * 1024))} MB`;
const errorText = (error: unknown): string => (error instanceof Error ? error.message : String(error));

const setName = (label: string): string => {
  const last = label.replace(/[\\/]+$/, '').split(/[\\/]/).pop() ?? label;
  return last.replace(/\.zip$/i, '') || label;
};

const refuse = (problems: Problems): ReadCaseSetResult => ({ ok: false, problems: problems.list(), total: problems.count });

export const readCaseSet = async (source: SetSource, limits: Partial<CaseSetLimits> = {}): Promise<ReadCaseSetResult> => {
  const bounds: CaseSetLimits = { ...DEFAULT_LIMITS, ...limits };
  const problems = collectProblems(bounds.problems);
  const file = CASES_FILE;

  let listed: string[];
  try {
    listed = await source.list();
  } catch (error) {
    if (error instanceof SetSourceError) {
      for (const p of error.problems) problems.add(p.file, p.row, p.column, p.message);
    } else {
      problems.add('', null, null, `cannot list the set's files: ${errorText(error)}`);
    }
    return refuse(problems);
  }
  const files = new Set(listed);
  if (!files.has(file)) {
    const near = listed.find((p) => p.split('/').pop()?.toLowerCase() === file);
    const hint = near ? ` (found "${near}"; it must be named ${file} and sit at the top of the set)` : '';
    problems.add(file, null, null, `the set has no ${file} at its top level${hint}`);
    return refuse(problems);
  }

  const csvLimit = `the limit is ${mb(bounds.csvBytes)}`;
  if (source.size && (await source.size(file)) > bounds.csvBytes) {
    problems.add(file, null, null, `${file} is larger than ${mb(bounds.csvBytes)} (${csvLimit})`);
    return refuse(problems);
  }
  let bytes: Uint8Array;
  try {
    bytes = await source.read(file);
  } catch (error) {
    problems.add(file, null, null, `cannot read ${file}: ${errorText(error)}`);
    return refuse(problems);
  }
  if (bytes.length > bounds.csvBytes) {
    problems.add(file, null, null, `${file} is larger than ${mb(bounds.csvBytes)} (${csvLimit})`);
    return refuse(problems);
  }
  const decoded = decodeUtf8(bytes);
  if (!decoded.ok) {
    problems.add(file, decoded.line, null, `${file} is not UTF-8 text (first bad byte on this line); save it as UTF-8 CSV`);
    return refuse(problems);
  }
  if (decoded.text.trim() === '') {
    problems.add(file, null, null, `${file} is empty; it needs a header row and one row per case and finding`);
    return refuse(problems);
  }
  const parsed = parseCsvRows(decoded.text, bounds.rows);
  if (parsed.rows.length > bounds.rows) {
    problems.add(file, null, null, `${file} has more than ${bounds.rows.toLocaleString('en')} data rows (the limit)`);
    return refuse(problems);
  }
  for (const e of parsed.errors) problems.add(file, e.line, null, `CSV cannot be read here: ${e.message}`);
  if (problems.count > 0 || !parsed.header) return refuse(problems);
  const columns = readColumns(file, parsed.header.cells, problems);
  if (!columns) return refuse(problems);
  if (parsed.rows.length === 0) {
    problems.add(file, null, null, `${file} has a header but no cases`);
    return refuse(problems);
  }
  const rows = readRows(file, columns, parsed.rows, problems);

  const paths = [...rows.imageLines.keys()];
  if (paths.length > bounds.images) {
    problems.add(file, null, 'image', `the set names ${paths.length.toLocaleString('en')} images; the limit is ${bounds.images.toLocaleString('en')}`);
    return refuse(problems);
  }
  const lowerCase = new Map(listed.map((p) => [p.toLowerCase(), p]));
  const images: CaseImage[] = [];
  let total = 0;
  let overTotal = false;
  const checkOne = async (path: string): Promise<CaseImage | null> => {
    const line = rows.imageLines.get(path) ?? null;
    if (!files.has(path)) {
      const near = lowerCase.get(path.toLowerCase());
      problems.add(file, line, 'image', `image ${path} is not in the set${near ? ` (there is "${near}": names must match exactly, including case)` : ''}`);
      return null;
    }
    const tooBig = `image ${path} is larger than ${mb(bounds.imageBytes)} (the limit for one image)`;
    if (source.size && (await source.size(path)) > bounds.imageBytes) {
      problems.add(file, line, 'image', tooBig);
      return null;
    }
    let data: Uint8Array;
    try {
      data = await source.read(path);
    } catch (error) {
      problems.add(file, line, 'image', `cannot read image ${path}: ${errorText(error)}`);
      return null;
    }
    if (data.length > bounds.imageBytes) {
      problems.add(file, line, 'image', tooBig);
      return null;
    }
    total += data.length;
    if (total > bounds.totalBytes) overTotal = true;
    const mime = sniffImage(data);
    if (!mime) {
      problems.add(file, line, 'image', `image ${path} is not really a PNG or JPEG (its bytes are ${describeBytes(data)})`);
      return null;
    }
    // read the structure and size now, so an image that cannot be shown never reaches a reader
    const header = imageHeader(data, mime);
    if (!header.ok) {
      problems.add(file, line, 'image', `image ${path} cannot be shown: ${header.reason}`);
      return null;
    }
    return { path, mime, bytes: data };
  };
  // A few reads in flight keep a disk or zip busy without holding many extra buffers.
  for (let start = 0; start < paths.length; start += READ_AHEAD) {
    const batch = await Promise.all(paths.slice(start, start + READ_AHEAD).map(checkOne));
    for (const image of batch) if (image) images.push(image);
    if (overTotal) {
      problems.add(file, null, null, `the images add up to more than ${mb(bounds.totalBytes)} (the limit for a set)`);
      return refuse(problems);
    }
    if (problems.count >= bounds.problems) break;
  }
  if (problems.count > 0) return refuse(problems);

  const manifest: CaseSetManifest = {
    name: setName(source.label),
    cases: rows.cases,
    findings: rows.findings,
    attributeNames: columns.attributes.map((a) => a.name),
  };
  return { ok: true, manifest, images, summary: { ...summarizeCaseSet(manifest), ignoredColumns: columns.ignored } };
};
