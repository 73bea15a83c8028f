// Small in-memory sets for the case-set tests: real PNG bytes, a JPEG signature, a CSV.
import { encode } from 'fast-png';
import { memorySource } from '../../../../src/io/case-set/memory-source';
import { readCaseSet } from '../../../../src/io/case-set/read-case-set';
import type { ReadCaseSetResult } from '../../../../src/io/case-set/read-case-set';
import type { CaseSetLimits } from '../../../../src/io/case-set/types';

export const png = (): Uint8Array => encode({ width: 2, height: 2, data: new Uint8Array([0, 80, 160, 255]), depth: 8, channels: 1 });
// A JPEG's structure as validation reads it (ITU-T T.81 B.2): start of image, a JFIF APP0
// segment, a start-of-frame giving 2 x 2 pixels and one component, a start of scan, two scan
// bytes, end of image. (No tables, so a real decoder would refuse it; the tests need no more.)
export const jpeg = (): Uint8Array => new Uint8Array([
  0xff, 0xd8,
  0xff, 0xe0, 0x00, 0x10, 0x4a, 0x46, 0x49, 0x46, 0x00, 0x01, 0x01, 0x00, 0x00, 0x01, 0x00, 0x01, 0x00, 0x00,
  0xff, 0xc0, 0x00, 0x0b, 0x08, 0x00, 0x02, 0x00, 0x02, 0x01, 0x01, 0x11, 0x00,
  0xff, 0xda, 0x00, 0x08, 0x01, 0x01, 0x00, 0x00, 0x3f, 0x00, 0x12, 0x34,
  0xff, 0xd9,
]);

export const HEADER = 'case_id,finding,truth,image,model_score,model_call,practice,case_site';
export const GOOD_ROWS = [
  'C1,target,1,img/c1.png,0.9,1,0,North',
  'C1,mass,0,img/c1.png,0.2,0,0,North',
  'C2,target,0,img/c2.jpg,0.7,,0,South',
  'P1,target,1,img/p1.png,,,1,North',
];
export const goodCsv = (): string => `${[HEADER, ...GOOD_ROWS].join('\n')}\n`;

export const goodFiles = (): Record<string, Uint8Array | string> => ({
  'img/c1.png': png(), 'img/c2.jpg': jpeg(), 'img/p1.png': png(),
});

/** Reads a set made of `csv` (string or bytes) and the good images, with any file overridden or removed (undefined). */
export const readWith = (csv: string | Uint8Array, files: Record<string, Uint8Array | string | undefined> = {}, limits: Partial<CaseSetLimits> = {}): Promise<ReadCaseSetResult> => {
  const all: Record<string, Uint8Array | string> = { 'cases.csv': csv };
  for (const [path, bytes] of Object.entries({ ...goodFiles(), ...files })) if (bytes !== undefined) all[path] = bytes;
  return readCaseSet(memorySource(all, 'sets/example'), limits);
};

/** The first problem of a refused read; fails the test if the read was accepted. */
export const firstProblem = (result: ReadCaseSetResult) => {
  if (result.ok) throw new Error('expected the set to be refused, but it was accepted');
  const [first] = result.problems;
  if (!first) throw new Error('refused with no problems');
  return first;
};

/** The CSV with one data row (1-based among data rows, so line = index + 1) replaced. */
export const withRow = (index: number, row: string): string => {
  const rows = [...GOOD_ROWS];
  rows[index - 1] = row;
  return `${[HEADER, ...rows].join('\n')}\n`;
};
