// summarizeCaseSet counts, worked by hand on a small manifest; and the CSV writer's round trip.
import type { CaseSetManifest } from '../../../../src/core/case-set';
import { memorySource } from '../../../../src/io/case-set/memory-source';
import { readCaseSet } from '../../../../src/io/case-set/read-case-set';
import { summarizeCaseSet } from '../../../../src/io/case-set/summarize';
import { casesCsv } from '../../../../src/io/case-set/write-cases-csv';
import { png } from './fixtures';

const f = (truth: 0 | 1, modelScore: number | null, modelCall: 0 | 1 | null = null) => ({ finding: 't', truth, modelScore, modelCall });
const manifest: CaseSetManifest = {
  name: 'hand',
  findings: ['t'],
  attributeNames: ['site'],
  cases: [
    { caseId: 'A', images: ['a.png'], practice: false, attributes: { site: 'N' }, findings: [f(1, 0.8)] }, // right
    { caseId: 'B', images: ['b.png'], practice: false, attributes: { site: 'N' }, findings: [f(0, 0.5)] }, // score 0.5 -> call 1: wrong
    { caseId: 'C', images: ['c.png'], practice: false, attributes: { site: 'S' }, findings: [f(0, 0.9, 0)] }, // call given: right
    { caseId: 'D', images: ['d.png'], practice: false, attributes: { site: 'S' }, findings: [f(1, null)] }, // no suggestion
    { caseId: 'P', images: ['a.png'], practice: true, attributes: { site: 'N' }, findings: [f(1, 0.1)] }, // practice: left out
  ],
};

describe('summarizeCaseSet', () => {
  it('counts main cases, prevalence and suggestion accuracy, leaving practice out', () => {
    const s = summarizeCaseSet(manifest);
    expect(s).toMatchObject({ cases: 4, practiceCases: 1, images: 4 });
    expect(s.findings).toEqual([{
      finding: 't', cases: 4, positives: 2, prevalence: 0.5, suggestionAccuracy: { k: 2, n: 3, estimate: 2 / 3 },
    }]);
    expect(s.subgroups).toEqual([{ attribute: 'site', values: [
      { value: 'N', cases: 2, suggestionAccuracy: { k: 1, n: 2, estimate: 0.5 } },
      { value: 'S', cases: 2, suggestionAccuracy: { k: 1, n: 1, estimate: 1 } },
    ] }]);
  });
});

describe('casesCsv', () => {
  it('writes a CSV that reads back to the same manifest', async () => {
    const files: Record<string, Uint8Array | string> = { 'cases.csv': casesCsv(manifest) };
    for (const c of manifest.cases) for (const path of c.images) files[path] = png();
    const result = await readCaseSet(memorySource(files, 'hand'));
    if (!result.ok) throw new Error(JSON.stringify(result.problems));
    expect(result.manifest).toEqual(manifest);
  });
  it('quotes values with commas and quotes', () => {
    const m: CaseSetManifest = { ...manifest, cases: [{ ...manifest.cases[0]!, attributes: { site: 'N, "upper"' } }] };
    // No case has a model call, so the model_call column is left out.
    const [header, row] = casesCsv(m).split('\n');
    expect(header).toBe('case_id,finding,truth,image,model_score,practice,case_site');
    expect(row).toBe('A,t,1,a.png,0.8,0,"N, ""upper"""');
  });
});
