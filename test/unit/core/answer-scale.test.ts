// The threshold rule of each answer scale and the design field's defaults and checks.
import { callFromRating, defaultAnswerScale, ratingProblem, thresholdWords } from '../../../src/core/answer-scale';
import { defaultDesign, withDesignDefaults, type StudyDesign } from '../../../src/core/design';
import { parseDesign } from '../../../src/core/design-schema';
import { designSummary } from '../../../src/core/design-summary';

describe('callFromRating (call = rating >= threshold)', () => {
  it('five-point with threshold 4: 1-3 absent, 4-5 present', () => {
    const scale = defaultAnswerScale('five-point');
    expect([1, 2, 3, 4, 5].map((r) => callFromRating(scale, r))).toEqual([0, 0, 0, 1, 1]);
    expect([1, 2, 3, 4, 5].map((r) => callFromRating({ ...scale, presentFrom: 3 }, r))).toEqual([0, 0, 1, 1, 1]);
  });
  it('percent with threshold 50: 49.9 absent, 50 present', () => {
    const scale = defaultAnswerScale('percent');
    expect(callFromRating(scale, 0)).toBe(0);
    expect(callFromRating(scale, 49.9)).toBe(0);
    expect(callFromRating(scale, 50)).toBe(1);
    expect(callFromRating(scale, 100)).toBe(1);
  });
  it('refuses ratings off the scale', () => {
    expect(() => callFromRating(defaultAnswerScale('five-point'), 6)).toThrow(RangeError);
    expect(() => callFromRating(defaultAnswerScale('five-point'), 2.5)).toThrow(/whole number/);
    expect(() => callFromRating(defaultAnswerScale('percent'), -1)).toThrow(RangeError);
    expect(ratingProblem('call-confidence', 50)).toMatch(/not a rating/);
  });
  it('states the rule in words', () => {
    expect(thresholdWords(defaultAnswerScale('five-point'))).toBe('rating 4 (“Probably present”) or more counts as a “present” call');
    expect(thresholdWords(defaultAnswerScale('percent'))).toBe('50% or more counts as a “present” call');
  });
});

describe('answerScale and training in the design', () => {
  it('a design without them (stored before they existed) reads as call-confidence, not training', () => {
    const old: Partial<StudyDesign> = { ...defaultDesign(['target']) };
    delete old.answerScale;
    delete old.training;
    const parsed = parseDesign(old);
    expect(parsed.ok && parsed.design.answerScale.kind).toBe('call-confidence');
    expect(parsed.ok && parsed.design.training).toBe(false);
    expect(withDesignDefaults(old as StudyDesign)).toMatchObject({ answerScale: { kind: 'call-confidence' }, training: false });
  });
  it('refuses a threshold off the scale and labels that are not five', () => {
    const bad = (answerScale: unknown) => parseDesign({ ...defaultDesign(['target']), answerScale });
    expect(bad({ ...defaultAnswerScale('five-point'), presentFrom: 6 })).toMatchObject({ ok: false, problems: [expect.stringMatching(/^answerScale.presentFrom: .*2 to 5/)] });
    expect(bad({ ...defaultAnswerScale('percent'), presentFrom: 0 })).toMatchObject({ ok: false, problems: [expect.stringMatching(/1 to 100/)] });
    expect(bad({ ...defaultAnswerScale('five-point'), labels: ['a', 'b'] })).toMatchObject({ ok: false, problems: [expect.stringMatching(/exactly 5 labels/)] });
    expect(bad({ ...defaultAnswerScale('call-confidence'), presentFrom: 999 }).ok).toBe(true);
  });
  it('the summary names the scale, the threshold rule and training', () => {
    const design = { ...defaultDesign(['target']), answerScale: defaultAnswerScale('five-point'), training: true };
    const lines = new Map(designSummary(design).map((l) => [l.label, l.value]));
    expect(lines.get('Answer scale')).toMatch(/^five-point rating: 1 Definitely absent, .*5 Definitely present$/);
    expect(lines.get('Call from rating')).toMatch(/rating 4/);
    expect(lines.get('Training')).toMatch(/^yes: the truth is shown after each case/);
    expect(lines.has('Confidence')).toBe(false);
  });
});
