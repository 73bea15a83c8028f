import { unzipSync } from 'fflate';
import { generateDemoCaseSet } from '../../../../demo-cases/generator/generate';
import { canonicalJson, chainLinks, genesisHash, sha256Hex } from '../../../../src/core/chain';
import { BundleMergeError, mergeSnapshots } from '../../../../src/io/bundle/merge';
import { readBundle } from '../../../../src/io/bundle/read';
import { simulateStudy, splitSnapshot } from '../../../../src/io/bundle/simulate-study';
import { readsOfChain, type SnapshotRead, type StudySnapshot } from '../../../../src/io/bundle/snapshot';
import { writeBundle } from '../../../../src/io/bundle/write';

const demo = generateDemoCaseSet({ cases: 16 });
const caseSet = { name: demo.manifest.name, manifest: demo.manifest, imageSha256: new Map(demo.images.map((i) => [i.path, sha256Hex(i.bytes)])), images: null };
const whole = simulateStudy(caseSet, { readers: 6, seed: 4242, assistance: 'sequential' });
const copies = splitSnapshot(whole, 3);
const dec = new TextDecoder();
const filesOf = (s: StudySnapshot): Record<string, string> =>
  Object.fromEntries(Object.entries(unzipSync(writeBundle(s))).map(([p, b]) => [p, dec.decode(b)]));
const label = (i: number) => ({ label: `workstation-${i + 1}.zip`, snapshot: copies[i] as StudySnapshot });
const readIds = (s: StudySnapshot) => [...readsOfChain(s.events).keys()].sort();

describe('merging workstation bundles', () => {
  it('simulates events whose details are already in canonical key order (canonicalJson\'s fast path: JSON.stringify gives the canonical text)', () => {
    for (const study of [whole, simulateStudy(caseSet, { readers: 2, seed: 7, assistance: 'concurrent' })]) {
      const types = new Set(study.events.map((e) => e.type));
      for (const t of ['study-created', 'reader-enrolled', 'session-started', 'final-committed']) expect(types.has(t)).toBe(true);
      for (const e of study.events) expect(JSON.stringify(e.detail)).toBe(canonicalJson(e.detail));
    }
  });

  it('three workstation copies hold disjoint reads that merge into exactly the unsplit study', () => {
    const ids = copies.map(readIds);
    expect(ids.map((x) => x.length)).toEqual([2, 2, 2].map(() => (6 / 3) * 21 * 2));
    expect(new Set(ids.flat()).size).toBe(readIds(whole).length);
    const merged = mergeSnapshots([label(0), label(1), label(2)]);
    expect(filesOf(merged)).toEqual(filesOf(whole));
    const check = readBundle(writeBundle(merged));
    expect(check.ok).toBe(true);
  });

  it('gives the same bundle in any order, and merging again changes nothing', () => {
    const expected = filesOf(mergeSnapshots([label(0), label(1), label(2)]));
    for (const order of [[2, 1, 0], [1, 0, 2], [0, 2, 1], [2, 0, 1], [1, 2, 0]]) {
      expect(filesOf(mergeSnapshots(order.map(label)))).toEqual(expected);
    }
    const once = mergeSnapshots([label(0), label(1)]);
    const twice = mergeSnapshots([{ label: 'merged', snapshot: once }, label(1), label(0)]);
    expect(filesOf(twice)).toEqual(filesOf(once));
    expect(filesOf(mergeSnapshots([label(2), label(2)]))).toEqual(filesOf(copies[2] as StudySnapshot));
  });

  it('refuses two different answers under one read id, naming both', () => {
    const copy = copies[1] as StudySnapshot;
    const index = copy.events.findIndex((e) => e.type === 'final-committed');
    const events = copy.events.map((e, i) => {
      if (i !== index) return e;
      const read = e.detail.read as SnapshotRead;
      const final = read.final ? { ...read.final, call: read.final.call === 1 ? 0 : 1 } : null;
      return { ...e, detail: { ...e.detail, call: final?.call, read: { ...read, final } } };
    });
    const changed = { ...copy, events: chainLinks(genesisHash(copy.study.id), events) };
    const read = events[index]?.detail.read as SnapshotRead;
    let message = '';
    try {
      mergeSnapshots([{ label: 'A.zip', snapshot: copy }, { label: 'B.zip', snapshot: changed }]);
    } catch (error) {
      expect(error).toBeInstanceOf(BundleMergeError);
      message = (error as Error).message;
    }
    expect(message).toContain(`read ${read.id}`);
    expect(message).toMatch(new RegExp(`A\\.zip \\(events\\.jsonl line ${index + 1}\\) has final call \\d.*; B\\.zip \\(events\\.jsonl line ${index + 1}\\) has final call \\d`));
  });

  it('refuses a bundle of another design, and of another study', () => {
    const other = { ...whole, study: { ...whole.study, design: { ...whole.study.design, washoutDays: 14 } } };
    expect(() => mergeSnapshots([{ label: 'A.zip', snapshot: whole }, { label: 'B.zip', snapshot: other }])).toThrow(/B\.zip has another design or case set than A\.zip/);
    const elsewhere = simulateStudy(caseSet, { readers: 2, seed: 7, assistance: 'concurrent' });
    expect(() => mergeSnapshots([{ label: 'A.zip', snapshot: whole }, { label: 'C.zip', snapshot: elsewhere }])).toThrow(/C\.zip is another study/);
  });
});
