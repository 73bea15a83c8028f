import { buildSchedule, type ReaderSchedule } from '../../../src/core/schedule';
import { caseBlocks } from '../../../src/core/case-blocks';
import { deriveSeed } from '../../../src/core/rng';
import type { Sequence, StudyDesign } from '../../../src/core/design';
import { makeDesign, makeManifest } from './design-fixture';

const UA: Sequence = { label: 'UA', periods: ['none', 'sequential'] };
const AU: Sequence = { label: 'AU', periods: ['sequential', 'none'] };

const schedule = (design: StudyDesign, id = 'R1', sequence: Sequence = UA): ReaderSchedule =>
  buildSchedule(design, makeManifest(), { id, index: 0, sequence });

const mainOrder = (s: ReaderSchedule, period: number): string[] =>
  (s.periods[period - 1]?.items ?? []).filter((it) => !it.practice).map((it) => it.caseId);

describe('schedule: order', () => {
  it('puts the practice cases first, in case-set order, in every period', () => {
    const s = schedule(makeDesign());
    for (const p of s.periods) {
      expect(p.items.slice(0, 4).map((it) => [it.caseId, it.practice])).toEqual([
        ['p0', true],
        ['p1', true],
        ['p2', true],
        ['p3', true],
      ]);
      expect(p.items.slice(4).every((it) => !it.practice)).toBe(true);
      expect(p.items).toHaveLength(44);
      expect(p.items.map((it) => it.order)).toEqual(Array.from({ length: 44 }, (_, i) => i + 1));
    }
  });

  it('holds every main case exactly once per period', () => {
    const s = schedule(makeDesign());
    const expected = Array.from({ length: 40 }, (_, i) => `m${String(i).padStart(2, '0')}`);
    for (const period of [1, 2]) expect([...mainOrder(s, period)].sort()).toEqual(expected);
  });

  it('shuffles per reader and per period, reproducibly, and records the seed', () => {
    const design = makeDesign();
    const r1 = schedule(design, 'R1');
    expect(mainOrder(schedule(design, 'R1'), 1)).toEqual(mainOrder(r1, 1));
    expect(mainOrder(r1, 1)).not.toEqual(mainOrder(r1, 2));
    expect(mainOrder(schedule(design, 'R2'), 1)).not.toEqual(mainOrder(r1, 1));
    expect(mainOrder(schedule({ ...design, seed: 5 }, 'R1'), 1)).not.toEqual(mainOrder(r1, 1));
    expect(r1.periods[0]?.orderSeed).toBe(deriveSeed(design.seed, 'order/R1/p1'));
    expect(r1.periods[1]?.orderSeed).toBe(deriveSeed(design.seed, 'order/R1/p2'));
  });
});

describe('schedule: assistance', () => {
  it('follows the reader sequence period by period when there is one block', () => {
    const ua = schedule(makeDesign(), 'R1', UA);
    expect(ua.periods[0]?.items.every((it) => it.assistance === 'none')).toBe(true);
    expect(ua.periods[1]?.items.every((it) => it.assistance === 'sequential')).toBe(true);
    const au = schedule(makeDesign(), 'R2', AU);
    expect(au.periods[0]?.items.every((it) => it.assistance === 'sequential')).toBe(true);
    expect(au.sequence).toBe('AU');
  });

  it('with blocks, gives each block each condition exactly once (2 and 3 periods)', () => {
    const seq3: Sequence = { label: 'A', periods: ['none', 'concurrent', 'sequential'] };
    const cases: [StudyDesign, Sequence][] = [
      [makeDesign({ blocks: 2 }), UA],
      [makeDesign({ blocks: 3, sequences: [seq3, { label: 'B', periods: ['sequential', 'concurrent', 'none'] }] }), seq3],
    ];
    for (const [design, sequence] of cases) {
      const s = buildSchedule(design, makeManifest(), { id: 'R7', index: 3, sequence });
      const blocks = caseBlocks(makeManifest(), design);
      const seen = new Map<string, string[]>();
      for (const p of s.periods) {
        for (const it of p.items.filter((x) => !x.practice)) seen.set(it.caseId, [...(seen.get(it.caseId) ?? []), it.assistance]);
        // every period mixes the conditions (one per block)
        expect(new Set(p.items.filter((x) => !x.practice).map((x) => x.assistance)).size).toBe(design.blocks);
      }
      for (const [caseId, modes] of seen) {
        expect([...modes].sort()).toEqual([...sequence.periods].sort());
        // and the one rule: block b in period p gets entry (p + b) mod P
        const b = blocks.get(caseId) ?? -1;
        modes.forEach((m, p) => expect(m).toBe(sequence.periods[(p + b) % sequence.periods.length]));
      }
    }
  });

  it('splits blocks evenly and with similar prevalence (first finding)', () => {
    // fixture: 40 main cases, 16 positive -> 2 blocks of 20 with 8 positives each
    const blocks = caseBlocks(makeManifest(), makeDesign({ blocks: 2 }));
    const manifest = makeManifest();
    const truth = new Map(manifest.cases.map((c) => [c.caseId, c.findings[0]?.truth]));
    for (const b of [0, 1]) {
      const ids = [...blocks].filter(([, x]) => x === b).map(([id]) => id);
      expect(ids).toHaveLength(20);
      expect(ids.filter((id) => truth.get(id) === 1)).toHaveLength(8);
    }
    expect(blocks.has('p0')).toBe(false);
  });
});

describe('schedule: breaks', () => {
  it('sets a break before main items 11, 21, 31 with breakEvery 10, never on practice', () => {
    const s = schedule(makeDesign({ breakEvery: 10 }));
    const items = s.periods[0]?.items ?? [];
    const mainPositions = items.filter((it) => !it.practice).flatMap((it, i) => (it.breakBefore ? [i + 1] : []));
    expect(mainPositions).toEqual([11, 21, 31]);
    expect(items.filter((it) => it.practice).some((it) => it.breakBefore)).toBe(false);
  });

  it('sets no break without breakEvery', () => {
    expect(schedule(makeDesign()).periods.flatMap((p) => p.items).some((it) => it.breakBefore)).toBe(false);
  });

  it('refuses a sequence of the wrong length', () => {
    expect(() => schedule(makeDesign(), 'R1', { label: 'X', periods: ['none'] })).toThrow(/has 1 periods; the design has 2/);
  });
});
