import { buildSuggestions, eligibleForPlanting, plantedList } from '../../../src/core/planting';
import { naturalSuggestions, suggestionFor } from '../../../src/core/suggestions';
import type { StudyDesign } from '../../../src/core/design';
import { makeDesign, makeManifest } from './design-fixture';

const plants = (fp: StudyDesign['planted']['falsePositive'], fn: StudyDesign['planted']['falseNegative'], extra: Partial<StudyDesign> = {}) =>
  makeDesign({ planted: { falsePositive: fp, falseNegative: fn, stratifyBy: null }, ...extra });

const plantedIds = (design: StudyDesign) =>
  plantedList(buildSuggestions(makeManifest(), design))
    .map((r) => `${r.caseId}:${r.call}`)
    .sort();

describe('natural suggestions', () => {
  it('derive the call from the threshold when the set gives no model_call', () => {
    const table = naturalSuggestions(makeManifest(), makeDesign());
    // fixture: m07 truth 0 with score 0.7 (natural false positive), m00 truth 1 with 0.3
    expect(suggestionFor(table, 'm07', 'nodule')).toMatchObject({ truth: 0, call: 1, score: 0.7, planted: false });
    expect(suggestionFor(table, 'm00', 'nodule')).toMatchObject({ truth: 1, call: 0, score: 0.3 });
    // at threshold 0.75 the 0.7 score becomes an absent call
    expect(suggestionFor(naturalSuggestions(makeManifest(), makeDesign({ threshold: 0.75 })), 'm07', 'nodule').call).toBe(0);
  });

  it('prefer the set model_call over the score', () => {
    const manifest = makeManifest();
    const c = manifest.cases.find((x) => x.caseId === 'm07');
    const f = c?.findings[0];
    if (f === undefined) throw new Error('fixture changed');
    f.modelCall = 0;
    expect(suggestionFor(naturalSuggestions(manifest, makeDesign()), 'm07', 'nodule').call).toBe(0);
  });

  it('counts the eligible case-findings as the fixture states (20 for FP, 12 for FN)', () => {
    const table = naturalSuggestions(makeManifest(), makeDesign());
    expect(eligibleForPlanting(table, 'nodule', 'falsePositive')).toHaveLength(20);
    expect(eligibleForPlanting(table, 'nodule', 'falseNegative')).toHaveLength(12);
  });

  it('name the case and finding that has no suggestion', () => {
    const manifest = makeManifest();
    const f = manifest.cases[2]?.findings[0];
    if (f === undefined) throw new Error('fixture changed');
    f.modelScore = null;
    expect(() => naturalSuggestions(manifest, makeDesign())).toThrow(/case "m02", finding "nodule": no model_call and no model_score/);
  });
});

describe('planted errors', () => {
  it('plant exactly the counts asked, of the right kind', () => {
    const table = buildSuggestions(makeManifest(), plants({ mode: 'count', value: 5 }, { mode: 'count', value: 3 }));
    const planted = plantedList(table);
    expect(planted.filter((r) => r.truth === 0 && r.call === 1)).toHaveLength(5);
    expect(planted.filter((r) => r.truth === 1 && r.call === 0)).toHaveLength(3);
    expect(planted).toHaveLength(8);
    // only on case-findings the model had right
    expect(planted.every((r) => r.naturalCall === r.truth)).toBe(true);
  });

  it('plant round(rate x eligible) for a rate', () => {
    // FP: 0.33 x 20 = 6.6 -> 7; FN: 0.125 x 12 = 1.5 -> 2 (halves round up)
    const planted = plantedList(buildSuggestions(makeManifest(), plants({ mode: 'rate', value: 0.33 }, { mode: 'rate', value: 0.125 })));
    expect(planted.filter((r) => r.call === 1)).toHaveLength(7);
    expect(planted.filter((r) => r.call === 0)).toHaveLength(2);
  });

  it('plant per finding', () => {
    const manifest = makeManifest({ calcification: true });
    const design = plants({ mode: 'count', value: 4 }, { mode: 'count', value: 2 }, { findings: ['nodule', 'calcification'] });
    const planted = plantedList(buildSuggestions(manifest, design));
    for (const finding of ['nodule', 'calcification']) {
      expect(planted.filter((r) => r.finding === finding && r.call === 1)).toHaveLength(4);
      expect(planted.filter((r) => r.finding === finding && r.call === 0)).toHaveLength(2);
    }
  });

  it('refuse a count larger than the eligible set, naming the finding', () => {
    expect(() => buildSuggestions(makeManifest(), plants({ mode: 'count', value: 21 }, { mode: 'count', value: 0 }))).toThrow(
      /21 planted false-positive suggestions asked for finding "nodule", but only 20/,
    );
    expect(() => buildSuggestions(makeManifest(), plants({ mode: 'count', value: 0 }, { mode: 'count', value: 13 }))).toThrow(/only 12/);
    // exactly all eligible is fine
    expect(plantedList(buildSuggestions(makeManifest(), plants({ mode: 'count', value: 20 }, { mode: 'count', value: 12 })))).toHaveLength(32);
  });

  it('are reproducible from the seed and differ with another seed', () => {
    const a = plantedIds(plants({ mode: 'count', value: 6 }, { mode: 'count', value: 4 }));
    const b = plantedIds(plants({ mode: 'count', value: 6 }, { mode: 'count', value: 4 }));
    const c = plantedIds(plants({ mode: 'count', value: 6 }, { mode: 'count', value: 4 }, { seed: 99 }));
    expect(a).toEqual(b);
    expect(a).not.toEqual(c);
    // and the scores too
    const s1 = plantedList(buildSuggestions(makeManifest(), plants({ mode: 'count', value: 6 }, { mode: 'count', value: 0 }))).map((r) => r.score);
    const s2 = plantedList(buildSuggestions(makeManifest(), plants({ mode: 'count', value: 6 }, { mode: 'count', value: 0 }))).map((r) => r.score);
    expect(s1).toEqual(s2);
  });

  it('never go on practice cases, even at a rate of 1', () => {
    const table = buildSuggestions(makeManifest(), plants({ mode: 'rate', value: 1 }, { mode: 'rate', value: 1 }));
    const practice = table.filter((r) => r.practice);
    expect(practice).toHaveLength(4);
    expect(practice.every((r) => !r.planted && r.call === r.truth)).toBe(true);
    expect(plantedList(table)).toHaveLength(32);
  });

  it('get a score on the wrong side of the threshold, within the stated band', () => {
    for (const threshold of [0.5, 0.3, 0.75]) {
      const design = plants({ mode: 'rate', value: 1 }, { mode: 'rate', value: 1 }, { threshold });
      // at other thresholds the natural calls move; plant what is eligible there
      for (const r of plantedList(buildSuggestions(makeManifest(), design))) {
        const score = r.score ?? Number.NaN;
        if (r.call === 1) {
          expect(score).toBeGreaterThanOrEqual(threshold + 0.05 - 1e-9);
          expect(score).toBeLessThanOrEqual(Math.min(1, threshold + 0.35) + 1e-9);
        } else {
          expect(score).toBeLessThan(threshold);
          expect(score).toBeGreaterThanOrEqual(Math.max(0, threshold - 0.35) - 1e-9);
          expect(score).toBeLessThanOrEqual(threshold - 0.05 + 1e-9);
        }
        expect(r.naturalScore).not.toBe(r.score);
      }
    }
  });

  it('leave unplanted rows exactly as the model gave them', () => {
    const design = plants({ mode: 'count', value: 5 }, { mode: 'count', value: 3 });
    const natural = naturalSuggestions(makeManifest(), design);
    const full = buildSuggestions(makeManifest(), design);
    full.forEach((r, i) => {
      if (!r.planted) expect(r).toEqual(natural[i]);
    });
  });

  it('share a stratified count among the strata by largest remainder', () => {
    // Eligible FP per site (fixture): East 8, North 5, West 7 (sum 20). 7 planted:
    // quotas 2.8, 1.75, 2.45 -> floors 2, 1, 2, two left to East (.8) and North (.75) -> 3, 2, 2.
    const design = makeDesign({ planted: { falsePositive: { mode: 'count', value: 7 }, falseNegative: { mode: 'count', value: 0 }, stratifyBy: 'site' } });
    const manifest = makeManifest();
    const siteOf = new Map(manifest.cases.map((c) => [c.caseId, c.attributes.site]));
    for (const seed of [1, 2, 3, 20261201]) {
      const planted = plantedList(buildSuggestions(manifest, { ...design, seed }));
      const bySite = (s: string): number => planted.filter((r) => siteOf.get(r.caseId) === s).length;
      expect([bySite('East'), bySite('North'), bySite('West')]).toEqual([3, 2, 2]);
    }
  });

  it('take a rate over all strata before sharing it', () => {
    // rate 0.5 of 20 eligible = 10: quotas East 4, North 2.5, West 3.5 -> floors 4, 2, 3, one
    // left, tie .5/.5 -> the earlier in sorted order (North) -> East 4, North 3, West 3.
    const design = makeDesign({ planted: { falsePositive: { mode: 'rate', value: 0.5 }, falseNegative: { mode: 'count', value: 0 }, stratifyBy: 'site' } });
    const manifest = makeManifest();
    const siteOf = new Map(manifest.cases.map((c) => [c.caseId, c.attributes.site]));
    const planted = plantedList(buildSuggestions(manifest, design));
    const bySite = (s: string): number => planted.filter((r) => siteOf.get(r.caseId) === s).length;
    expect([bySite('East'), bySite('North'), bySite('West')]).toEqual([4, 3, 3]);
  });
});

describe('planted scores in a set without scores', () => {
  it('show no score, so a planted suggestion looks like every other one', () => {
    const manifest = makeManifest();
    for (const c of manifest.cases) for (const f of c.findings) { f.modelCall = f.modelScore !== null && f.modelScore >= 0.5 ? 1 : 0; f.modelScore = null; }
    const table = buildSuggestions(manifest, plants({ mode: 'count', value: 3 }, { mode: 'count', value: 2 }));
    expect(plantedList(table)).toHaveLength(5);
    expect(table.every((r) => r.score === null)).toBe(true);
  });
});

