import { buildSchedule } from '../../../src/core/schedule';
import { cautionFlags } from '../../../src/core/caution';
import type { Sequence, StudyDesign } from '../../../src/core/design';
import { makeDesign, makeManifest } from './design-fixture';

const withCaution = (mode: StudyDesign['caution']['mode'], patch: Partial<StudyDesign> = {}): StudyDesign =>
  makeDesign({ caution: { mode, text: 'The model is weaker on the Korvik scanner.' }, ...patch });

const UA: Sequence = { label: 'UA', periods: ['none', 'sequential'] };

describe('caution notice', () => {
  it('is never shown when off', () => {
    const s = buildSchedule(withCaution('off'), makeManifest(), { id: 'R1', index: 0, sequence: UA });
    expect(s.periods.flatMap((p) => p.items).some((it) => it.caution)).toBe(false);
  });

  it('is shown on every aided item, and only those, when all', () => {
    const s = buildSchedule(withCaution('all'), makeManifest(), { id: 'R1', index: 0, sequence: UA });
    for (const it of s.periods.flatMap((p) => p.items)) expect(it.caution).toBe(it.assistance !== 'none');
    expect(s.periods[1]?.items.filter((it) => it.caution)).toHaveLength(44);
  });

  it('random-half flags exactly half of the aided main items, never unaided or practice', () => {
    // 40 main cases, period 2 aided: exactly 20 flagged, for every reader
    for (const id of ['R1', 'R2', 'R3', 'R4', 'R5']) {
      const s = buildSchedule(withCaution('random-half'), makeManifest(), { id, index: 0, sequence: UA });
      expect(s.periods[0]?.items.some((it) => it.caution)).toBe(false);
      const p2 = s.periods[1]?.items ?? [];
      expect(p2.filter((it) => it.caution)).toHaveLength(20);
      expect(p2.filter((it) => it.practice).some((it) => it.caution)).toBe(false);
    }
  });

  it('random-half takes floor or ceil of half for an odd count, per reader-period, within blocks', () => {
    // 41 main cases and 2 blocks: every period has about 20 or 21 aided main items
    const manifest = makeManifest({ main: 41 });
    const counts = new Set<number>();
    for (let r = 0; r < 20; r += 1) {
      const s = buildSchedule(withCaution('random-half', { blocks: 2 }), manifest, { id: `R${r}`, index: r, sequence: UA });
      for (const p of s.periods) {
        const aided = p.items.filter((it) => !it.practice && it.assistance !== 'none');
        const flagged = p.items.filter((it) => it.caution);
        expect(flagged.every((it) => it.assistance !== 'none' && !it.practice)).toBe(true);
        expect([Math.floor(aided.length / 2), Math.ceil(aided.length / 2)]).toContain(flagged.length);
        if (aided.length % 2 === 1) counts.add(flagged.length - Math.floor(aided.length / 2));
      }
    }
    // both the floor and the ceil occur over readers (the coin is really drawn)
    expect([...counts].sort()).toEqual([0, 1]);
  });

  it('random-half is reproducible and differs between readers', () => {
    const items = Array.from({ length: 30 }, () => ({ practice: false, assistance: 'concurrent' as const }));
    const design = { seed: 3 };
    expect(cautionFlags('random-half', design, 'R1', 1, items)).toEqual(cautionFlags('random-half', design, 'R1', 1, items));
    expect(cautionFlags('random-half', design, 'R1', 1, items).flags).not.toEqual(cautionFlags('random-half', design, 'R2', 1, items).flags);
  });
});
