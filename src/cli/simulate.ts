// `heed simulate [--readers N] [--seed S] [--assistance sequential|concurrent] [--cases PATH]
// [--split K] [--images] --out PATH`: a study read by simulated readers, written as the app writes
// a bundle; with --split K, PATH is a folder that receives K workstation bundles.
import { mkdir, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { generateDemoCaseSet } from '../../demo-cases/generator/generate';
import { sha256Hex } from '../core/chain';
import type { CaseImage, CaseSetManifest } from '../core/case-set';
import { readCaseSet } from '../io/case-set/read-case-set';
import { simulateStudy, splitSnapshot } from '../io/bundle/simulate-study';
import { writeBundle } from '../io/bundle/write';
import { cannotWrite, CliError } from './cli-error';
import { problemLine } from './format-case-set';
import { nodeSetSource } from './node-set-source';
import { useNativeSha256 } from './bundle-file';

const USAGE = 'usage: heed simulate [--readers N] [--seed S] [--assistance sequential|concurrent] [--cases PATH] [--split K] [--images] --out PATH';

export type SimulateArgs = { readers: number; seed: number; assistance: 'sequential' | 'concurrent'; cases: string | null; split: number | null; images: boolean; out: string };

const whole = (flag: string, value: string | undefined, min: number, max: number): number => {
  if (value === undefined || !/^\d+$/.test(value) || Number(value) < min || Number(value) > max) {
    throw new CliError(`${flag} needs a whole number from ${min} to ${max}, got ${value === undefined ? 'nothing' : JSON.stringify(value)}`);
  }
  return Number(value);
};

export const parseSimulateArgs = (args: string[]): SimulateArgs => {
  const parsed: Omit<SimulateArgs, 'out'> & { out: string | null } = { readers: 6, seed: 20261201, assistance: 'sequential', cases: null, split: null, images: false, out: null };
  for (let i = 0; i < args.length; i++) {
    const flag = args[i] as string;
    if (flag === '--images') { parsed.images = true; continue; }
    const value = args[++i];
    if (flag === '--readers') parsed.readers = whole(flag, value, 1, 500);
    else if (flag === '--seed') parsed.seed = whole(flag, value, 0, 0x7fffffff);
    else if (flag === '--split') parsed.split = whole(flag, value, 1, 100);
    else if (flag === '--assistance') {
      if (value !== 'sequential' && value !== 'concurrent') throw new CliError(`--assistance must be sequential or concurrent, got ${JSON.stringify(value ?? '')}`);
      parsed.assistance = value;
    } else if (flag === '--cases' || flag === '--out') {
      if (value === undefined || value.startsWith('--')) throw new CliError(`${flag} needs a path; ${USAGE}`);
      if (flag === '--cases') parsed.cases = value;
      else parsed.out = value;
    } else throw new CliError(`simulate: unknown option ${flag}; ${USAGE}`);
  }
  if (parsed.out === null) throw new CliError(`simulate needs --out PATH; ${USAGE}`);
  if (parsed.split !== null && parsed.split > parsed.readers) throw new CliError(`--split ${parsed.split} needs at least as many readers (--readers ${parsed.readers})`);
  return { ...parsed, out: parsed.out };
};

const loadCases = async (path: string | null): Promise<{ name: string; manifest: CaseSetManifest; images: CaseImage[] }> => {
  if (path === null) {
    const demo = generateDemoCaseSet();
    return { name: demo.manifest.name, manifest: demo.manifest, images: demo.images };
  }
  const source = await nodeSetSource(path).catch((error: unknown) => { throw new CliError(error instanceof Error ? error.message : String(error)); });
  const result = await readCaseSet(source);
  if (!result.ok) throw new CliError(result.problems[0] ? problemLine(source.label, result.problems[0]) : `${path}: the case set was refused`);
  return { name: result.manifest.name, manifest: result.manifest, images: result.images };
};

export const runSimulate = async (args: string[]): Promise<number> => {
  useNativeSha256();
  const options = parseSimulateArgs(args);
  const set = await loadCases(options.cases);
  let snapshot;
  try {
    snapshot = simulateStudy(
      { name: set.name, manifest: set.manifest, imageSha256: new Map(set.images.map((i) => [i.path, sha256Hex(i.bytes)])), images: options.images ? set.images : null },
      { readers: options.readers, seed: options.seed, assistance: options.assistance },
    );
  } catch (error) {
    if (error instanceof RangeError) throw new CliError(error.message);
    throw error;
  }
  try {
    if (options.split === null) {
      await writeFile(options.out, writeBundle(snapshot));
      console.log(`wrote ${options.out}: ${options.readers} simulated readers, ${set.manifest.cases.length} cases, seed ${options.seed}`);
    } else {
      await mkdir(options.out, { recursive: true });
      const copies = splitSnapshot(snapshot, options.split);
      for (const [w, copy] of copies.entries()) await writeFile(join(options.out, `workstation-${w + 1}.zip`), writeBundle(copy));
      console.log(`wrote ${copies.length} workstation bundles to ${options.out}: ${options.readers} simulated readers, seed ${options.seed}`);
    }
  } catch (error) {
    throw cannotWrite(options.out, error);
  }
  console.log('Simulated readers, invented data: for trying designs and tools. Heed is a research and training tool, not a medical device.');
  return 0;
};
