import { designCheck, designCheckForReader, plannedHalfWidth } from '../../../src/core/design-check';
import { buildSuggestions } from '../../../src/core/planting';
import type { StudyDesign } from '../../../src/core/design';
import { makeDesign, makeManifest } from './design-fixture';

// Hand computation of the formula, step by step (each step evaluated with Python 3 math), p = 0.3, z = 1.959963984540054,
// z² = 3.841458820694124:
//   n = 16: p(1-p)/n = 0.21/16 = 0.013125; z²/(4n²) = 3.8414588/1024 = 0.0037514246;
//           sqrt(0.0168764246) = 0.1299093; × z = 0.2546175; / (1 + z²/16 = 1.2400912) = 0.205322
//   n = 32: 0.21/32 = 0.0065625; z²/4096 = 0.00093785616; sqrt(0.0075003562) = 0.0866046;
//           × z = 0.1697419; / (1 + z²/32 = 1.1200456) = 0.151549  -> wider than 0.15: warning
//   n = 40: 0.21/40 = 0.00525; z²/6400 = 0.00060022794; sqrt(0.0058502279) = 0.0764868;
//           × z = 0.1499114; / (1 + z²/40 = 1.0960365) = 0.136776  -> no warning
// The whole expression in one Python 3 line gives 0.2053216264, 0.1515490906, 0.1367758679.

const withPlants = (fp: number, fn: number, patch: Partial<StudyDesign> = {}): StudyDesign =>
  makeDesign({ planted: { falsePositive: { mode: 'count', value: fp }, falseNegative: { mode: 'count', value: fn }, stratifyBy: null }, ...patch });

describe('plannedHalfWidth', () => {
  it('matches the hand computation', () => {
    expect(plannedHalfWidth(0.3, 16)).toBeCloseTo(0.205322, 5);
    expect(plannedHalfWidth(0.3, 32)).toBeCloseTo(0.151549, 5);
    expect(plannedHalfWidth(0.3, 40)).toBeCloseTo(0.136776, 5);
    expect(plannedHalfWidth(0.3, 0)).toBeNull();
  });
});

describe('designCheck', () => {
  it('counts natural and planted wrong suggestions over aided main reads (2 periods, 1 aided)', () => {
    // fixture: 4 natural FP + 4 natural FN on main cases; 5 + 3 planted -> 16 wrong, 1 aided period
    const design = withPlants(5, 3);
    const check = designCheck(design, buildSuggestions(makeManifest(), design));
    const ua = designCheckForReader(check, 'UA');
    expect(ua).toHaveLength(1);
    expect(ua[0]).toMatchObject({ finding: 'nodule', aidedReads: 40, naturalErrorReads: 8, plantedReads: 8, wrongSuggestionReads: 16 });
    expect(ua[0]?.halfWidth).toBeCloseTo(0.205322, 5);
    expect(ua[0]?.warning).toMatch(/only 16 aided reads .* ±0\.21/);
    expect(check.formula).toMatch(/z²\/\(4n²\)/);
  });

  it('counts each aided period (3 periods, 2 aided) and warns just above 0.15', () => {
    const sequences: StudyDesign['sequences'] = [
      { label: 'A', periods: ['none', 'concurrent', 'sequential'] },
      { label: 'B', periods: ['sequential', 'concurrent', 'none'] },
      { label: 'C', periods: ['none', 'none', 'concurrent'] },
    ];
    const d16 = withPlants(5, 3, { sequences });
    const rows16 = designCheck(d16, buildSuggestions(makeManifest(), d16)).rows;
    expect(rows16.map((r) => r.wrongSuggestionReads)).toEqual([32, 32, 16]);
    expect(rows16[0]?.halfWidth).toBeCloseTo(0.151549, 5);
    expect(rows16[0]?.warning).not.toBeNull();
    // 8 natural + 8 FP + 4 FN = 20 wrong, x 2 aided periods = 40 reads: precise enough
    const d20 = withPlants(8, 4, { sequences });
    const rows20 = designCheck(d20, buildSuggestions(makeManifest(), d20)).rows;
    expect(rows20[0]?.wrongSuggestionReads).toBe(40);
    expect(rows20[0]?.halfWidth).toBeCloseTo(0.136776, 5);
    expect(rows20[0]?.warning).toBeNull();
  });

  it('warns that over-reliance cannot be measured when no suggestion is wrong', () => {
    // calcification: the model is always right in the fixture, and nothing is planted
    const manifest = makeManifest({ calcification: true });
    const design = withPlants(0, 0, { findings: ['calcification'] });
    const [row] = designCheck(design, buildSuggestions(manifest, design)).rows;
    expect(row?.wrongSuggestionReads).toBe(0);
    expect(row?.halfWidth).toBeNull();
    expect(row?.warning).toMatch(/cannot be measured/);
  });
});
