import { designSummary } from '../../../src/core/design-summary';
import { buildSuggestions } from '../../../src/core/planting';
import { makeDesign, makeManifest } from './design-fixture';

describe('designSummary', () => {
  it('lists every setting, the seed and the counts of the case set', () => {
    const design = makeDesign({
      seed: 4242,
      breakEvery: 15,
      caution: { mode: 'random-half', text: 'Weaker on the Korvik scanner.' },
      planted: { falsePositive: { mode: 'rate', value: 0.25 }, falseNegative: { mode: 'count', value: 3 }, stratifyBy: 'site' },
    });
    const lines = designSummary(design, { manifest: makeManifest(), table: buildSuggestions(makeManifest(), design) });
    const value = (label: string): string | undefined => lines.find((l) => l.label === label)?.value;
    expect(value('Findings')).toBe('nodule');
    expect(value('Sequence UA')).toBe('period 1: unaided; period 2: own call first, then suggestion');
    expect(value('Washout')).toBe('28 days between periods');
    expect(value('Seed')).toBe('4242');
    expect(value('Planted false positives')).toBe('25% of eligible case-findings');
    expect(value('Planted false negatives')).toBe('3 per finding');
    expect(value('Planting stratified by')).toBe('site');
    expect(value('Caution notice')).toContain('Weaker on the Korvik scanner.');
    expect(value('Rest breaks')).toBe('after every 15 cases');
    expect(value('Case set')).toBe('Test set (invented): 40 main cases, 4 practice');
    // 0.25 x 20 eligible = 5 false positives; 3 false negatives
    expect(value('Planted for nodule')).toBe('5 false positive, 3 false negative');
    expect(value('Note')).toMatch(/not a medical device/);
  });
});
