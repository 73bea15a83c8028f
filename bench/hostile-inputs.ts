// Benchmark: hostile case sets are refused quickly and within bounded memory (issue 12).
// Run: npx tsx bench/hostile-inputs.ts   (prints figures; not a test)
// Targets: the 200,000-column header and the overlapping-entry zip each refused in under 2 s;
// importing a zip that would unpack to 1 GB never takes the process past 300 MB (peak RSS,
// which also counts generating the zip).
import { deflateSync } from 'fflate';
import { crc32 } from '../src/io/case-set/crc32';
import { memorySource } from '../src/io/case-set/memory-source';
import { readCaseSet } from '../src/io/case-set/read-case-set';
import { zipSource } from '../src/io/case-set/zip-source';
import { casesFor, deflatedEntry, overlappingBomb, rawZip, zeroPng } from '../test/unit/io/case-set/hostile-zips';
import type { RawEntry } from '../test/unit/io/case-set/hostile-zips';
import { analyzeReads } from '../src/analysis/engine';
import type { ReadRow } from '../src/core/read-log';
import { makeRead } from '../test/unit/analysis/make-read';
import { atMost, plain, printResult } from './support/figures';

const timed = async (run: () => Promise<unknown>): Promise<number> => {
  const start = performance.now();
  await run();
  return (performance.now() - start) / 1000;
};
const refused = async (result: Promise<{ ok: boolean }>): Promise<void> => {
  if ((await result).ok) throw new Error('expected a refusal');
};

const header = ['case_id', 'finding', 'truth', 'image'];
for (let i = 0; i < 200_000; i += 1) header.push(`case_x${i}`);
const wide = `${header.join(',')}\n`;
const wideSeconds = await timed(() => refused(readCaseSet(memorySource({ 'cases.csv': wide }, 'wide'))));

const bomb = overlappingBomb(150, 20 * 1024 * 1024);
const bombSeconds = await timed(() => refused(readCaseSet(zipSource(bomb, 'bomb.zip'))));

// 40 distinct (not overlapping) entries of 25 MB each, honest sizes: 1 GB if unpacked.
const IMAGES = 40;
const SIZE = 25 * 1024 * 1024;
const one = zeroPng(SIZE);
const stored = deflateSync(one, { level: 1 });
const crc = crc32(one);
const entries: RawEntry[] = [deflatedEntry('cases.csv', casesFor(IMAGES))];
for (let i = 0; i < IMAGES; i += 1) entries.push({ name: `img/${i}.png`, stored, method: 8, crc, size: SIZE });
const gigabyte = rawZip(entries);
const gigabyteSeconds = await timed(() => refused(readCaseSet(zipSource(gigabyte, 'gigabyte.zip'))));
const peakMb = process.resourceUsage().maxRSS / 1024;

// 100,000 readers with one read each: once "Maximum call stack size exceeded" (a spread of one
// value per reader into Math.max).
const manyReaders: ReadRow[] = [];
for (let i = 0; i < 100_000; i += 1) manyReaders.push(makeRead({ reader_id: `R${i}`, case_id: `C${i % 50}`, truth: i % 2 === 0 ? 1 : 0 }));
const analyseStart = performance.now();
const analysed = analyzeReads(manyReaders, { boot: 0 }).readers.length;
const analyseSeconds = (performance.now() - analyseStart) / 1000;

printResult({
  bench: 'hostile-inputs',
  figures: [
    atMost('200,000-column cases.csv refused', wideSeconds, 's', 2),
    atMost('overlapping-entry zip (150 x 20 MB from one entry) refused', bombSeconds, 's', 2),
    atMost('1 GB-unpacking zip refused', gigabyteSeconds, 's', 10),
    atMost('peak RSS before the 100,000-reader analysis', peakMb, 'MB', 300),
    plain('analyzeReads on 100,000 readers (boot 0), no stack overflow', analyseSeconds, 's'),
  ],
  notes: [`overlapping zip ${bomb.length} bytes; 1 GB zip ${gigabyte.length} bytes; ${analysed} readers analysed`],
});
