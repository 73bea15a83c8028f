// Seeded random faults in a bundle's chained files and manifest: each must be found by the verify
// function (heed verify) and by the app's import, at the file and line where it was made.
import { unzipSync, zipSync } from 'fflate';
import { createRng, type Rng } from '../../../../src/core/rng';
import { readBundle } from '../../../../src/io/bundle/read';
import { writeBundle } from '../../../../src/io/bundle/write';
import { gatherStudySnapshot, openStudyBundle } from '../../../../src/store/bundle';
import { freshDb, readTinyStudy } from '../../support/bundle-study';

type Fault = { kind: string; file: string; line: number; bytes: Uint8Array };

const enc = new TextEncoder();
const dec = new TextDecoder();

const lineStarts = (bytes: Uint8Array): number[] => {
  const starts = [0];
  for (let i = 0; i < bytes.length - 1; i++) if (bytes[i] === 10) starts.push(i + 1);
  return starts;
};
const lineAt = (starts: number[], offset: number): number => {
  let line = 0;
  while (line + 1 < starts.length && (starts[line + 1] as number) <= offset) line++;
  return line + 1;
};

/** One random fault in a chained file, and the line where it was made. */
const fileFault = (rng: Rng, file: string, body: Uint8Array): Fault => {
  const lines = dec.decode(body).split('\n').slice(0, -1);
  const first = file === 'reads.csv' ? 2 : 1; // the header of reads.csv is checked too, but a row is the interesting case
  const pick = () => rng.int(first, lines.length);
  const rebuild = (ls: string[]) => enc.encode(`${ls.join('\n')}\n`);
  switch (rng.int(0, 3)) {
    case 0: {
      const at = rng.int(0, body.length - 1);
      const copy = new Uint8Array(body);
      copy[at] = ((body[at] as number) + rng.int(1, 255)) % 256;
      return { kind: 'byte', file, line: lineAt(lineStarts(body), at), bytes: copy };
    }
    case 1: {
      const line = pick();
      return { kind: 'removed', file, line, bytes: rebuild(lines.filter((_, i) => i !== line - 1)) };
    }
    case 2: {
      const a = pick();
      let b = pick();
      while (b === a || lines[a - 1] === lines[b - 1]) b = pick();
      const ls = [...lines];
      [ls[a - 1], ls[b - 1]] = [ls[b - 1] as string, ls[a - 1] as string];
      return { kind: 'swapped', file, line: Math.min(a, b), bytes: rebuild(ls) };
    }
    default: {
      const line = rng.int(first, lines.length + 1);
      // A copy of a line next to the gap could not be told from the original (either is "the
      // inserted one"), so copies come from elsewhere.
      let copy = pick();
      while (Math.abs(copy - line) <= 1 && lines.length > 4) copy = pick();
      const ls = [...lines];
      ls.splice(line - 1, 0, rng.int(0, 1) === 0 ? (lines[copy - 1] as string) : 'an inserted line');
      return { kind: 'inserted', file, line, bytes: rebuild(ls) };
    }
  }
};

const manifestFault = (rng: Rng, manifest: string): Fault => {
  const lines = manifest.split('\n');
  const targets = lines.map((l, i) => [l, i + 1] as const).filter(([l]) => /"path":"(reads\.csv|events\.jsonl)"|"head"/.test(l));
  const [text, line] = targets[rng.int(0, targets.length - 1)] as readonly [string, number];
  const changed = rng.int(0, 1) === 0 && text.includes('"bytes"')
    ? text.replace(/"bytes":(\d+)/, (_, n: string) => `"bytes":${Number(n) + rng.int(1, 9)}`)
    : text.replace(/([0-9a-f]{64})/, (hex: string) => { const k = rng.int(0, 63); return `${hex.slice(0, k)}${hex[k] === '0' ? '1' : '0'}${hex.slice(k + 1)}`; });
  lines[line - 1] = changed;
  return { kind: 'manifest', file: 'manifest.json', line, bytes: enc.encode(lines.join('\n')) };
};

describe('tamper evidence', () => {
  it('finds at least 100 seeded faults in reads.csv, events.jsonl and the manifest, each at its file and line', async () => {
    const db = freshDb();
    const { study } = await readTinyStudy(db);
    const zip = writeBundle(await gatherStudySnapshot(db, study.id));
    expect(readBundle(zip).ok).toBe(true);
    const files = unzipSync(zip);
    const rng = createRng(20261202, 'test/tamper');
    const faults: Fault[] = [];
    for (let i = 0; i < 60; i++) faults.push(fileFault(rng, 'reads.csv', files['reads.csv'] as Uint8Array));
    for (let i = 0; i < 60; i++) faults.push(fileFault(rng, 'events.jsonl', files['events.jsonl'] as Uint8Array));
    for (let i = 0; i < 20; i++) faults.push(manifestFault(rng, dec.decode(files['manifest.json'])));
    const kinds = new Set(faults.map((f) => f.kind));
    expect([...kinds].sort()).toEqual(['byte', 'inserted', 'manifest', 'removed', 'swapped']);

    const importDb = freshDb();
    for (const fault of faults) {
      const tampered = zipSync({ ...files, [fault.file]: fault.bytes });
      const verdict = readBundle(tampered);
      const where = `${fault.kind} in ${fault.file} at line ${fault.line}`;
      expect(verdict.ok, where).toBe(false);
      if (verdict.ok) continue;
      expect({ file: verdict.fault.file, line: verdict.fault.line }, `${where}: ${verdict.fault.message}`).toEqual({ file: fault.file, line: fault.line });
      const opened = await openStudyBundle(importDb, 'tampered.zip', tampered);
      expect(opened.ok, where).toBe(false);
      if (!opened.ok) expect(opened.message).toContain(`${fault.file} line ${fault.line}:`);
    }
    expect(await importDb.studies.count()).toBe(0);
  });
});
