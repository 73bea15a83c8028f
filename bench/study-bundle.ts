/**
 * Study bundles (issue 8 targets): a study of 20 simulated readers x 500 cases x 2 periods
 * (sequential aided period; 20,000 reads, about 30,000 events).
 * - simulate: `heed simulate --readers 20 --cases DIR --out F` as a user runs it (a new node
 *   process; DIR is a 500-case demo set written beforehand, untimed), target <= 3 s;
 * - save: the app's save (gather the study from the database, then writeBundleAsync: the files'
 *   SHA-256 by WebCrypto), with the study restored into fake-indexeddb (slower than Chromium's
 *   IndexedDB), target <= 2 s;
 * - verify: reading and checking the bundle (readBundle), target <= 1 s;
 * - merge of 10 bundles: the study's 10 workstation bundles (readers split 10 ways), each read
 *   and verified, merged and written, target <= 3 s; and 10 full copies of the study, the same way.
 * Wall clock, one run each, on whatever else the machine is doing (load average in the summary).
 */
import 'fake-indexeddb/auto';
import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { useSha256 } from '../src/core/chain';
import { mergeSnapshots } from '../src/io/bundle/merge';
import { readBundle } from '../src/io/bundle/read';
import { splitSnapshot } from '../src/io/bundle/simulate-study';
import type { StudySnapshot } from '../src/io/bundle/snapshot';
import { writeBundle, writeBundleAsync } from '../src/io/bundle/write';
import { gatherStudySnapshot, restoreStudy } from '../src/store/bundle';
import { openHeedDb } from '../src/store/db';
import { atMost, plain, printResult } from './support/figures';

const ROOT = join(import.meta.dirname, '..');
const dir = mkdtempSync(join(tmpdir(), 'heed-bench-bundle-'));
const heed = (...args: string[]) => {
  const r = spawnSync(process.execPath, [join(ROOT, 'bin', 'heed.js'), ...args], { encoding: 'utf8', cwd: ROOT });
  if (r.status !== 0) throw new Error(`heed ${args.join(' ')} failed: ${r.stderr}`);
};
const timed = <T>(run: () => T): { value: T; ms: number } => {
  const t0 = performance.now();
  const value = run();
  return { value, ms: performance.now() - t0 };
};
const verified = (zip: Uint8Array): StudySnapshot => {
  const read = readBundle(zip);
  if (!read.ok) throw new Error(read.fault.message);
  return read.snapshot;
};

const main = async () => {
  try {
    const cases = join(dir, 'cases');
    heed('demo', '--cases', '495', '--out', cases); // 495 main + 5 practice = 500 cases; also builds the CLI bundle if stale (untimed)
    const file = join(dir, 'study.zip');
    const simulate = timed(() => heed('simulate', '--readers', '20', '--seed', '7', '--cases', cases, '--out', file));
    const zip = new Uint8Array(readFileSync(file));
    const snapshot = verified(zip);
    const reads = snapshot.events.filter((e) => e.type === 'final-committed').length;

    // restored with an empty image list: the save reads the stored images' hashes, and there are none to read here
    const db = openHeedDb('heed-bench-bundle');
    const { study } = await restoreStudy(db, { ...snapshot, images: [] });
    const t0 = performance.now();
    const saved = await writeBundleAsync(await gatherStudySnapshot(db, study.id));
    const saveMs = performance.now() - t0;

    // verify and merge as the CLI runs them: with Node's native SHA-256 (the app's save above used @noble/hashes)
    useSha256((data) => createHash('sha256').update(data).digest('hex'));
    const verify = timed(() => verified(zip));
    const stations = splitSnapshot(snapshot, 10).map((s) => writeBundle(s));
    const mergeSplit = timed(() => writeBundle(mergeSnapshots(stations.map((z, i) => ({ label: `w${i}`, snapshot: verified(z) })))));
    const mergeCopies = timed(() => writeBundle(mergeSnapshots(Array.from({ length: 10 }, (_, i) => ({ label: `c${i}`, snapshot: verified(zip) })))));

    printResult({
      bench: 'study-bundle',
      figures: [
        plain('reads in the study', reads, 'reads'),
        plain('events in the study', snapshot.events.length, 'events'),
        plain('bundle size', zip.length / 1e6, 'MB'),
        atMost('heed simulate (new process, 20 x 500 x 2)', simulate.ms, 'ms', 3000),
        atMost('save (gather from fake-indexeddb + write zip)', saveMs, 'ms', 2000),
        atMost('verify (read + check)', verify.ms, 'ms', 1000),
        atMost('merge 10 workstation bundles (verify each, merge, write)', mergeSplit.ms, 'ms', 3000),
        plain('merge 10 full copies (verify each, merge, write)', mergeCopies.ms, 'ms'),
        plain('saved bundle size', saved.length / 1e6, 'MB'),
      ],
      notes: ['one run each; wall clock on a shared machine', 'save runs against fake-indexeddb in Node, not Chromium, as the app saves: file hashes by WebCrypto, link texts (few) by @noble/hashes', 'verify and merge use Node\'s native SHA-256, as the heed verbs do'],
    });
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
};

await main();
