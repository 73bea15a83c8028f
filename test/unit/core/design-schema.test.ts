import { parseDesign } from '../../../src/core/design-schema';
import { validateDesign } from '../../../src/core/design-validate';
import { defaultDesign } from '../../../src/core/design';
import { makeDesign, makeManifest } from './design-fixture';

const problemsOf = (patch: Record<string, unknown>): string[] => {
  const parsed = parseDesign({ ...defaultDesign(['nodule']), ...patch });
  return parsed.ok ? [] : parsed.problems;
};

describe('parseDesign', () => {
  it('accepts the default design', () => {
    const parsed = parseDesign(defaultDesign(['nodule']));
    expect(parsed.ok).toBe(true);
    if (parsed.ok) expect(parsed.design).toEqual(defaultDesign(['nodule']));
  });

  it('refuses fewer than 2 sequences', () => {
    expect(problemsOf({ sequences: [{ label: 'U', periods: ['none'] }] })).toContain('sequences: the study needs at least 2 sequences');
  });

  it('refuses sequences of different lengths, naming both', () => {
    const p = problemsOf({
      sequences: [
        { label: 'UA', periods: ['none', 'concurrent'] },
        { label: 'UAU', periods: ['none', 'concurrent', 'none'] },
      ],
    });
    expect(p).toContain('sequences[1].periods: every sequence needs the same number of periods: "UA" has 2, "UAU" has 3');
  });

  it('refuses an unknown assistance mode and a repeated label', () => {
    expect(problemsOf({ sequences: [{ label: 'X', periods: ['none', 'telepathy'] }, { label: 'X', periods: ['none', 'none'] }] })).toEqual([
      'sequences[0].periods[1]: assistance must be one of none, concurrent, sequential',
    ]);
    expect(problemsOf({ sequences: [{ label: 'X', periods: ['none'] }, { label: 'X', periods: ['concurrent'] }], blocks: 1 })).toEqual([
      'sequences[1].label: the sequence label "X" is used twice',
    ]);
  });

  it('refuses no finding and a repeated finding', () => {
    expect(problemsOf({ findings: [] })).toEqual(['findings: the study needs at least one finding']);
    expect(problemsOf({ findings: ['nodule', 'nodule'] })).toEqual(['findings[1]: the finding "nodule" is listed twice']);
  });

  it('refuses a negative or fractional washout', () => {
    expect(problemsOf({ washoutDays: -1 })).toEqual(['washoutDays: the washout (days) must be at least 0']);
    expect(problemsOf({ washoutDays: 2.5 })).toEqual(['washoutDays: the washout (days) must be a whole number']);
  });

  it('refuses a threshold outside [0, 1] and a text threshold', () => {
    expect(problemsOf({ threshold: 1.2 })).toEqual(['threshold: the threshold must be from 0 to 1']);
    expect(problemsOf({ threshold: '0.5' })).toEqual(['threshold: the threshold must be a number']);
  });

  it('refuses blocks below 1 or above the number of periods', () => {
    expect(problemsOf({ blocks: 0 })).toEqual(['blocks: the number of blocks must be at least 1']);
    expect(problemsOf({ blocks: 3 })).toEqual(['blocks: the number of blocks (3) cannot exceed the number of periods (2)']);
  });

  it('refuses bad planted specs', () => {
    const planted = (fp: unknown, fn: unknown) => ({ planted: { falsePositive: fp, falseNegative: fn, stratifyBy: null } });
    expect(problemsOf(planted({ mode: 'count', value: 2.5 }, { mode: 'rate', value: 1.5 }))).toEqual([
      'planted.falsePositive.value: a count of planted errors must be a whole number 0 or more, got 2.5',
      'planted.falseNegative.value: a rate of planted errors must be from 0 to 1, got 1.5',
    ]);
    expect(problemsOf(planted({ mode: 'percent', value: 1 }, { mode: 'count', value: 0 }))).toEqual([
      'planted.falsePositive.mode: mode must be "count" or "rate"',
    ]);
  });

  it('refuses a shown caution notice without text, a bad break interval and seed', () => {
    expect(problemsOf({ caution: { mode: 'all', text: ' ' } })).toEqual(['caution.text: a caution notice that is shown needs its text']);
    expect(problemsOf({ breakEvery: 0 })).toEqual(['breakEvery: the number of cases between breaks must be at least 1']);
    expect(problemsOf({ seed: -3 })).toEqual(['seed: the seed must be 0 or more']);
  });

  it('refuses something that is not a design at all', () => {
    const parsed = parseDesign('hello');
    expect(parsed.ok).toBe(false);
  });
});

describe('validateDesign against a case set', () => {
  it('finds no problem in a good design', () => {
    expect(validateDesign(makeDesign(), makeManifest())).toEqual([]);
  });

  it('names a finding the case set does not have', () => {
    expect(validateDesign(makeDesign({ findings: ['mass'] }), makeManifest())).toEqual([
      'the finding "mass" is not in the case set "Test set (invented)" (it has: nodule)',
    ]);
  });

  it('names a stratifying attribute that is missing, and impossible planted counts', () => {
    const design = makeDesign({ planted: { falsePositive: { mode: 'count', value: 25 }, falseNegative: { mode: 'count', value: 13 }, stratifyBy: 'scanner' } });
    const problems = validateDesign(design, makeManifest());
    expect(problems[0]).toBe('planted errors are stratified by "scanner", but the case set has no case_scanner column');
    expect(problems[1]).toMatch(/^25 planted false-positive suggestions asked for finding "nodule", but only 20/);
    expect(problems[2]).toMatch(/^13 planted false-negative suggestions asked .* only 12/);
  });

  it('names case-findings with no suggestion, a few at a time', () => {
    const manifest = makeManifest();
    for (const c of manifest.cases) for (const f of c.findings) f.modelScore = null;
    const problems = validateDesign(makeDesign(), manifest);
    expect(problems).toHaveLength(6);
    expect(problems[0]).toMatch(/^case "m00", finding "nodule": no model_call and no model_score/);
    expect(problems[5]).toBe('... and 39 more like these');
  });

  it('passes schema problems through first', () => {
    expect(validateDesign({ ...makeDesign(), threshold: 2 }, makeManifest())).toEqual(['threshold: the threshold must be from 0 to 1']);
  });
});
