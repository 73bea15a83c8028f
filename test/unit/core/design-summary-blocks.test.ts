import { caseBlocks } from '../../../src/core/case-blocks';
import { designSummary, periodWords } from '../../../src/core/design-summary';
import { buildSchedule } from '../../../src/core/schedule';
import { makeDesign, makeManifest } from './design-fixture';

describe('labels of periods with blocks', () => {
  const design = makeDesign({ blocks: 2 });
  const manifest = makeManifest();

  it('say what each block of a period gets, matching the assistance the schedule gives its cases', () => {
    const blocks = caseBlocks(manifest, design);
    for (const [index, sequence] of design.sequences.entries()) {
      const schedule = buildSchedule(design, manifest, { id: 'R1', index, sequence });
      schedule.periods.forEach((period, p) => {
        const got = new Map<number, Set<string>>();
        for (const item of period.items.filter((i) => !i.practice)) {
          const b = blocks.get(item.caseId) ?? -1;
          got.set(b, (got.get(b) ?? new Set()).add(item.assistance));
        }
        const label = periodWords(sequence, p, design.blocks, true);
        const expected = [0, 1].map((b) => `block ${b + 1} ${[...(got.get(b) ?? [])].map((a) => (a === 'none' ? 'unaided' : a)).join('/')}`).join(', ');
        expect(label).toBe(expected);
      });
    }
  });

  it('never call a mixed period "unaided" in the design summary', () => {
    const line = designSummary(design).find((l) => l.label === 'Sequence UA')?.value;
    expect(line).toBe('period 1: block 1 unaided, block 2 own call first, then suggestion; period 2: block 1 own call first, then suggestion, block 2 unaided');
  });

  it('keep the one-block wording', () => {
    expect(designSummary(makeDesign()).find((l) => l.label === 'Sequence UA')?.value).toBe('period 1: unaided; period 2: own call first, then suggestion');
  });
});
