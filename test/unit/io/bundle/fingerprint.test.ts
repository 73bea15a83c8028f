import { canonicalJson, sha256Hex } from '../../../../src/core/chain';
import { caseSetFingerprint } from '../../../../src/io/bundle/texts';
import { tinyManifest } from '../../support/tiny-study';

describe('case-set fingerprints (remembered per manifest)', () => {
  it('is each manifest\'s own SHA-256 of its canonical content, however often and in whatever order asked', () => {
    const a = tinyManifest(4);
    const b = tinyManifest(5);
    const flipped = { ...a, cases: a.cases.map((c, i) => (i === 0 ? { ...c, findings: c.findings.map((f) => ({ ...f, truth: (1 - f.truth) as 0 | 1 })) } : c)) };
    const own = (m: typeof a) => sha256Hex(canonicalJson({ cases: m.cases, findings: m.findings, attributeNames: m.attributeNames }));
    for (let round = 0; round < 3; round++) {
      for (const m of [a, b, flipped]) expect(caseSetFingerprint(m)).toBe(own(m));
    }
    expect(new Set([a, b, flipped].map(caseSetFingerprint)).size).toBe(3);
    // a copy with the same content has the same fingerprint
    expect(caseSetFingerprint(structuredClone(a))).toBe(caseSetFingerprint(a));
  });
});
