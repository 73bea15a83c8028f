// The merge rule for one reader held by several copies (docs/bundle.md, Merge): a withdrawal on
// any copy wins and keeps its reason; a code corrected on one copy only is refused, naming both.
import { generateDemoCaseSet } from '../../../../demo-cases/generator/generate';
import { sha256Hex } from '../../../../src/core/chain';
import { BundleMergeError, mergeSnapshots } from '../../../../src/io/bundle/merge';
import { simulateStudy, splitSnapshot } from '../../../../src/io/bundle/simulate-study';
import type { SnapshotReader, StudySnapshot } from '../../../../src/io/bundle/snapshot';

const demo = generateDemoCaseSet({ cases: 8 });
const caseSet = { name: demo.manifest.name, manifest: demo.manifest, imageSha256: new Map(demo.images.map((i) => [i.path, sha256Hex(i.bytes)])), images: null };
const whole = simulateStudy(caseSet, { readers: 4, seed: 77, assistance: 'concurrent' });
const [first, second] = splitSnapshot(whole, 2) as [StudySnapshot, StudySnapshot];
// the reader both copies hold: each workstation copy carries every enrolled reader
const shared = first.readers[0] as SnapshotReader;

const withReader = (s: StudySnapshot, change: (r: SnapshotReader) => SnapshotReader): StudySnapshot =>
  ({ ...s, readers: s.readers.map((r) => (r.id === shared.id ? change(r) : r)) });
const readerOf = (s: StudySnapshot) => s.readers.find((r) => r.id === shared.id);
const withdrawal = (at: string, reason: string) => ({ at, reason, by: 'QO-1' });

describe('merging one reader held by several copies', () => {
  it('both copies hold the shared reader (the premise of these tests)', () => {
    expect(second.readers.map((r) => r.id)).toContain(shared.id);
  });

  it('keeps a withdrawal recorded on one copy only, with its reason, in either order', () => {
    const gone = withReader(first, (r) => ({ ...r, withdrawn: withdrawal('2026-12-01T09:00:00.000Z', 'moved to another site') }));
    for (const inputs of [[gone, second], [second, gone]]) {
      const merged = mergeSnapshots(inputs.map((snapshot, i) => ({ label: `copy-${i}.zip`, snapshot })));
      expect(readerOf(merged)?.withdrawn).toEqual(withdrawal('2026-12-01T09:00:00.000Z', 'moved to another site'));
    }
  });

  it('keeps the earlier withdrawal when both copies withdrew the reader, whatever the order', () => {
    const early = withReader(first, (r) => ({ ...r, withdrawn: withdrawal('2026-12-01T09:00:00.000Z', 'left the study') }));
    const late = withReader(second, (r) => ({ ...r, withdrawn: withdrawal('2026-12-02T09:00:00.000Z', 'asked to stop') }));
    const ab = mergeSnapshots([{ label: 'a', snapshot: early }, { label: 'b', snapshot: late }]);
    const ba = mergeSnapshots([{ label: 'b', snapshot: late }, { label: 'a', snapshot: early }]);
    expect(readerOf(ab)?.withdrawn?.reason).toBe('left the study');
    expect(readerOf(ba)).toEqual(readerOf(ab));
  });

  it('refuses a code corrected on one copy only, naming both codes and both copies', () => {
    const corrected = withReader(second, (r) => ({ ...r, code: `${r.code}X` }));
    const merge = () => mergeSnapshots([{ label: 'desk-1.zip', snapshot: first }, { label: 'desk-2.zip', snapshot: corrected }]);
    expect(merge).toThrow(BundleMergeError);
    expect(merge).toThrow(`desk-1.zip and desk-2.zip hold two different codes for one reader (id ${shared.id}): ${shared.code} and ${shared.code}X`);
  });

  it('merges a code corrected the same way on both copies', () => {
    const fix = (r: SnapshotReader) => ({ ...r, code: `${r.code}X` });
    const merged = mergeSnapshots([{ label: 'a', snapshot: withReader(first, fix) }, { label: 'b', snapshot: withReader(second, fix) }]);
    expect(readerOf(merged)?.code).toBe(`${shared.code}X`);
  });

  it('still refuses any other difference in a reader', () => {
    const other = withReader(second, (r) => ({ ...r, role: r.role === 'resident' ? 'radiologist' : 'resident' }));
    expect(() => mergeSnapshots([{ label: 'a', snapshot: first }, { label: 'b', snapshot: other }])).toThrow(`a and b hold two different versions of reader ${shared.code}`);
  });
});
