// A tiny hand-made case set and study for store tests (invented data, test only).
import type { CaseImage, CaseSetManifest } from '../../../src/core/case-set';
import { defaultDesign } from '../../../src/core/design';
import type { SessionItem } from '../../../src/core/session';
import type { SuggestionRow } from '../../../src/core/suggestions';

const PNG_MAGIC = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);

export const tinyManifest = (n = 4): CaseSetManifest => ({
  name: 'tiny',
  findings: ['target'],
  attributeNames: ['scanner'],
  cases: Array.from({ length: n }, (_, i) => ({
    caseId: `k${i + 1}`,
    images: [`img/k${i + 1}.png`],
    practice: i === 0,
    attributes: { scanner: i % 2 === 0 ? 'Halden' : 'Korvik' },
    findings: [{ finding: 'target', truth: (i % 2) as 0 | 1, modelScore: 0.3 + 0.1 * i, modelCall: null }],
  })),
});

export const tinyImages = (manifest: CaseSetManifest): CaseImage[] =>
  manifest.cases.map((c) => ({ path: c.images[0] ?? '', mime: 'image/png', bytes: PNG_MAGIC }));

export const tinyDesign = () => defaultDesign(['target']);

export const tinySuggestions = (manifest: CaseSetManifest): SuggestionRow[] =>
  manifest.cases.map((c, i) => {
    const call = i % 2 === 0 ? 1 : 0;
    return { caseId: c.caseId, finding: 'target', practice: c.practice, truth: (i % 2) as 0 | 1, call, score: 0.5, planted: i === 2, naturalCall: call, naturalScore: 0.5 };
  });

export const tinyItems = (manifest: CaseSetManifest, assistance: SessionItem['assistance']): SessionItem[] =>
  manifest.cases.map((c, i) => ({ caseId: c.caseId, practice: c.practice, assistance, order: i + 1, caution: i === 3, breakBefore: false }));
