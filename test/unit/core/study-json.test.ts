import { parseStudyJson, studyJson, STUDY_NOTICE } from '../../../src/core/study-json';
import { buildSuggestions, plantedList } from '../../../src/core/planting';
import { makeDesign, makeManifest } from './design-fixture';

const design = makeDesign({ planted: { falsePositive: { mode: 'count', value: 3 }, falseNegative: { mode: 'count', value: 2 }, stratifyBy: 'site' }, seed: 777 });
const extra = {
  studyId: 'vesper-pilot',
  caseSet: { name: 'Test set (invented)', fingerprint: 'sha256:abc123' },
  planted: plantedList(buildSuggestions(makeManifest(), design)),
};

describe('study.json', () => {
  it('round-trips the design, seeds, case set and planted list', () => {
    const text = studyJson(design, extra);
    const parsed = parseStudyJson(text);
    expect(parsed.ok).toBe(true);
    if (!parsed.ok) return;
    expect(parsed.study.design).toEqual(design);
    expect(parsed.study.design.seed).toBe(777);
    expect(parsed.study.caseSet).toEqual(extra.caseSet);
    expect(parsed.study.planted).toEqual(extra.planted);
    expect(parsed.study.planted).toHaveLength(5);
    expect(parsed.study.notice).toBe(STUDY_NOTICE);
    expect(text).toMatch(/not a medical device/);
  });

  it('names the line and column of broken JSON', () => {
    const parsed = parseStudyJson('{\n  "format": "heed-study",\n  oops\n}', 'my-study.json');
    expect(parsed.ok).toBe(false);
    if (!parsed.ok) expect(parsed.problems[0]).toMatch(/^my-study\.json is not valid JSON at line 3, column 3/);
  });

  it('names the field that is wrong', () => {
    const value: { design: object } = JSON.parse(studyJson(design, extra));
    const bad = { ...value, design: { ...value.design, washoutDays: -2 } };
    const parsed = parseStudyJson(JSON.stringify(bad));
    expect(parsed.ok).toBe(false);
    if (!parsed.ok) expect(parsed.problems).toEqual(['study.json: design.washoutDays: the washout (days) must be at least 0']);
  });

  it('refuses another kind of file and a planted row that agrees with the truth', () => {
    const other = parseStudyJson('{"format":"something-else"}');
    expect(other.ok).toBe(false);
    if (!other.ok) expect(other.problems[0]).toMatch(/format: this is not a Heed study file/);
    const value: { planted: { truth: number; call: number }[] } = JSON.parse(studyJson(design, extra));
    const first = value.planted[0];
    if (first === undefined) throw new Error('no planted row');
    first.call = first.truth;
    const parsed = parseStudyJson(JSON.stringify(value));
    expect(parsed.ok).toBe(false);
    if (!parsed.ok) expect(parsed.problems).toEqual(['study.json: planted[0].call: a planted suggestion must disagree with the truth']);
  });
});
