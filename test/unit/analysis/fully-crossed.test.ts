import { fullyCrossed } from '../../../src/analysis/fully-crossed';
import { aided, makeRead } from './make-read';

const study = (readers: string[], cases: [string, 0 | 1][]) =>
  readers.flatMap((r) => cases.flatMap(([c, t]) => [
    makeRead({ reader_id: r, case_id: c, truth: t, final_call: t }),
    aided(t, t, t, { reader_id: r, case_id: c }),
  ]));

describe('fullyCrossed', () => {
  const cases: [string, 0 | 1][] = [['A', 1], ['B', 1], ['C', 0], ['D', 0]];
  it('builds scores[modality][reader][case] for a fully crossed design', () => {
    const c = fullyCrossed(study(['R1', 'R2'], cases));
    expect(c.reason).toBeNull();
    expect(c.input?.truth).toEqual([1, 1, 0, 0]);
    expect(c.input?.scores[0]?.[1]).toEqual([90, 90, 10, 10]);
    expect(c.input?.scores).toHaveLength(2);
  });
  it('says why a design is not fully crossed', () => {
    expect(fullyCrossed(study(['R1'], cases)).reason).toMatch(/at least 2 readers/);
    const missing = study(['R1', 'R2'], cases).filter((r) => !(r.reader_id === 'R2' && r.case_id === 'C' && r.assistance !== 'none'));
    expect(fullyCrossed(missing).reason).toBe('reader R2 has no aided read of case C');
    expect(fullyCrossed(study(['R1', 'R2'], [['A', 1], ['B', 0], ['C', 0]])).reason).toMatch(/2 cases of each truth/);
  });
});
