/**
 * A small invented case set for the design tests (no real data). Main cases m00..m39, practice
 * cases p0..p3. Finding "nodule": truth 1 when i % 5 is 0 or 1 (16 positives, 24 negatives).
 * The model is right (score 0.8 on positives, 0.2 on negatives) except at i % 10 == 7 (truth 0,
 * score 0.7: a natural false positive; i = 7, 17, 27, 37) and at i % 10 == 0 (truth 1, score
 * 0.3: a natural false negative; i = 0, 10, 20, 30). So, at threshold 0.5:
 *   eligible for a planted false positive: 24 - 4 = 20; for a planted false negative: 16 - 4 = 12.
 * Attribute site: North for i < 10, East for 10..24, West for 25..39. Eligible false positives
 * per site (negatives minus natural errors): North 6-1 = 5, East 9-1 = 8, West 9-2 = 7.
 * Optional second finding "calcification": truth i % 2, model always right (0.9 / 0.1).
 * Practice cases: truth alternating 0, 1, 0, 1, model right, site North.
 */
import type { CaseFinding, CaseRecord, CaseSetManifest } from '../../../src/core/case-set';
import { defaultDesign, type StudyDesign } from '../../../src/core/design';

const nodule = (i: number): CaseFinding => {
  const truth = i % 5 < 2 ? 1 : 0;
  let score = truth === 1 ? 0.8 : 0.2;
  if (i % 10 === 7) score = 0.7;
  if (i % 10 === 0) score = 0.3;
  return { finding: 'nodule', truth, modelScore: score, modelCall: null };
};

const site = (i: number): string => (i < 10 ? 'North' : i < 25 ? 'East' : 'West');

export const mainId = (i: number): string => `m${String(i).padStart(2, '0')}`;

export const makeManifest = (opts: { calcification?: boolean; main?: number } = {}): CaseSetManifest => {
  const count = opts.main ?? 40;
  const findingsOf = (i: number, truthPractice?: 0 | 1): CaseFinding[] => {
    const first: CaseFinding =
      truthPractice === undefined ? nodule(i) : { finding: 'nodule', truth: truthPractice, modelScore: truthPractice === 1 ? 0.8 : 0.2, modelCall: null };
    if (opts.calcification !== true) return [first];
    const t = i % 2 === 0 ? 0 : 1;
    return [first, { finding: 'calcification', truth: t, modelScore: t === 1 ? 0.9 : 0.1, modelCall: null }];
  };
  const practice: CaseRecord[] = [0, 1, 2, 3].map((i) => ({
    caseId: `p${i}`,
    images: [`p${i}.png`],
    practice: true,
    attributes: { site: 'North' },
    findings: findingsOf(i, i % 2 === 0 ? 0 : 1),
  }));
  const main: CaseRecord[] = Array.from({ length: count }, (_, i) => ({
    caseId: mainId(i),
    images: [`${mainId(i)}.png`],
    practice: false,
    attributes: { site: site(i) },
    findings: findingsOf(i),
  }));
  return {
    name: 'Test set (invented)',
    // practice cases listed in the middle on purpose: the schedule must still put them first
    cases: [...main.slice(0, 5), ...practice, ...main.slice(5)],
    findings: opts.calcification === true ? ['nodule', 'calcification'] : ['nodule'],
    attributeNames: ['site'],
  };
};

export const makeDesign = (patch: Partial<StudyDesign> = {}): StudyDesign => ({ ...defaultDesign(['nodule']), ...patch });
