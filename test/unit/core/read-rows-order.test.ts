import { generateDemoCaseSet } from '../../../demo-cases/generator/generate';
import { sha256Hex } from '../../../src/core/chain';
import { joinReadRows } from '../../../src/core/read-rows';
import type { ReadRow } from '../../../src/core/read-log';
import { simulateStudy } from '../../../src/io/bundle/simulate-study';
import { readsOfChain } from '../../../src/io/bundle/snapshot';

// The documented order of the read log (docs/formats.md): reader code, period, order, then the
// design's finding order; checked here field by field on shuffled reads with unusual reader codes.
const demo = generateDemoCaseSet({ cases: 12 });
const caseSet = { name: demo.manifest.name, manifest: demo.manifest, imageSha256: new Map(demo.images.map((i) => [i.path, sha256Hex(i.bytes)])), images: null };

describe('joinReadRows row order', () => {
  it('sorts shuffled reads by reader code, period, order and finding, as a field-by-field comparison does', () => {
    const s = simulateStudy(caseSet, { readers: 12, seed: 5, assistance: 'sequential' });
    // reader codes whose text order differs from their enrolment order
    const readers = s.readers.map((r, i) => ({ ...r, code: ['b10', 'B2', 'a', 'b1', 'Z', 'b', 'a-2', 'a10', 'é', '_x', 'b9', 'A'][i] ?? r.code }));
    const reads = [...readsOfChain(s.events).values()].map((r) => r.read);
    let state = 3;
    for (let i = reads.length - 1; i > 0; i--) {
      state = (state * 1103515245 + 12345) % 2147483648;
      const j = state % (i + 1);
      [reads[i], reads[j]] = [reads[j] as (typeof reads)[number], reads[i] as (typeof reads)[number]];
    }
    const rows = joinReadRows(s.study, s.caseSet.manifest, readers, s.sessions, reads).map((j) => j.row);
    const findingIndex = (r: ReadRow) => s.study.design.findings.indexOf(r.finding);
    const expected = [...rows].sort((a, b) => (a.reader_id < b.reader_id ? -1 : a.reader_id > b.reader_id ? 1 : 0)
      || a.period - b.period || a.order - b.order || findingIndex(a) - findingIndex(b));
    expect(rows.length).toBeGreaterThan(200);
    expect(rows.map((r) => `${r.reader_id}/${r.period}/${r.order}/${r.finding}`)).toEqual(expected.map((r) => `${r.reader_id}/${r.period}/${r.order}/${r.finding}`));
    expect(rows[0]?.reader_id).toBe('A');
  });
});
