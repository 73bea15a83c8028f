/**
 * Helper for study-bundle work (not a benchmark): times one bundle operation in this process,
 * several times, so a profile (`node --cpu-prof --import tsx`) or CPU time shows where it goes.
 * usage: tsx bench/support/bundle-phases.ts ZIP OPERATION [TIMES]
 * OPERATION: verify (@noble/hashes) | verify-native | write | save (gather + the app's write) | gather | merge-split | verify-split (the 10 workstation bundles only)
 * (the CLI's path: native SHA-256). Prints wall and CPU time (process.cpuUsage) per run, and the load.
 */
import 'fake-indexeddb/auto';
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { useSha256 } from '../../src/core/chain';
import { mergeSnapshots } from '../../src/io/bundle/merge';
import { readBundle } from '../../src/io/bundle/read';
import { splitSnapshot } from '../../src/io/bundle/simulate-study';
import type { StudySnapshot } from '../../src/io/bundle/snapshot';
import * as writer from '../../src/io/bundle/write';

const { writeBundle } = writer;
// the app's save: writeBundleAsync where this build has it (file hashes by WebCrypto), else writeBundle
const appWrite = (s: StudySnapshot): Promise<Uint8Array> | Uint8Array => ('writeBundleAsync' in writer ? (writer as { writeBundleAsync: (s: StudySnapshot) => Promise<Uint8Array> }).writeBundleAsync(s) : writeBundle(s));
import { gatherStudySnapshot, restoreStudy } from '../../src/store/bundle';
import { openHeedDb } from '../../src/store/db';

const [zipPath, op = 'verify', timesText = '3'] = process.argv.slice(2);
if (!zipPath) throw new Error('usage: bundle-phases.ts ZIP OPERATION [TIMES]');
const zip = new Uint8Array(readFileSync(zipPath));
const verified = (bytes: Uint8Array): StudySnapshot => {
  const read = readBundle(bytes);
  if (!read.ok) throw new Error(read.fault.message);
  return read.snapshot;
};
const native = () => useSha256((data) => createHash('sha256').update(data).digest('hex'));

const run = async (): Promise<() => Promise<unknown> | unknown> => {
  switch (op) {
    case 'verify': return () => verified(zip);
    case 'verify-native': native(); return () => verified(zip);
    case 'write': { const s = verified(zip); return () => writeBundle(s); }
    case 'save': {
      const s = verified(zip);
      const db = openHeedDb('heed-bundle-phases');
      const { study } = await restoreStudy(db, { ...s, images: [] });
      return async () => appWrite(await gatherStudySnapshot(db, study.id));
    }
    case 'gather': {
      const s = verified(zip);
      const db = openHeedDb('heed-bundle-phases');
      const { study } = await restoreStudy(db, { ...s, images: [] });
      return () => gatherStudySnapshot(db, study.id);
    }
    case 'merge-split': {
      native();
      const stations = splitSnapshot(verified(zip), 10).map((s) => writeBundle(s));
      return () => writeBundle(mergeSnapshots(stations.map((z, i) => ({ label: `w${i}`, snapshot: verified(z) }))));
    }
    case 'verify-split': {
      native();
      const stations = splitSnapshot(verified(zip), 10).map((s) => writeBundle(s));
      return () => stations.map((z) => verified(z));
    }
    default: throw new Error(`unknown operation ${op}`);
  }
};

const body = await run();
for (let i = 0; i < Number(timesText); i++) {
  const cpu0 = process.cpuUsage();
  const t0 = performance.now();
  await body();
  const wall = performance.now() - t0;
  const cpu = process.cpuUsage(cpu0);
  console.log(`${op} #${i + 1}: wall ${wall.toFixed(0)} ms, cpu ${((cpu.user + cpu.system) / 1000).toFixed(0)} ms, load ${readFileSync('/proc/loadavg', 'utf8').split(' ')[0]}`);
}
