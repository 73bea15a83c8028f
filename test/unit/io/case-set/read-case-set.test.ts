// Every refusal listed in docs/formats.md ("The case set"), each at the right line and column, and the accepted shape.
import { firstProblem, goodCsv, HEADER, png, readWith, withRow } from './fixtures';

describe('readCaseSet accepts a good set', () => {
  it('gives the manifest, images typed by their bytes, and a summary', async () => {
    const result = await readWith(goodCsv());
    if (!result.ok) throw new Error(JSON.stringify(result.problems));
    expect(result.manifest.name).toBe('example');
    expect(result.manifest.findings).toEqual(['target', 'mass']);
    expect(result.manifest.attributeNames).toEqual(['site']);
    expect(result.manifest.cases.map((c) => c.caseId)).toEqual(['C1', 'C2', 'P1']);
    const [c1, c2, p1] = result.manifest.cases;
    expect(c1?.findings).toEqual([
      { finding: 'target', truth: 1, modelScore: 0.9, modelCall: 1 },
      { finding: 'mass', truth: 0, modelScore: 0.2, modelCall: 0 },
    ]);
    expect(c2?.findings[0]).toEqual({ finding: 'target', truth: 0, modelScore: 0.7, modelCall: null });
    expect(p1?.practice).toBe(true);
    expect(p1?.findings[0]?.modelScore).toBeNull();
    expect(c1?.attributes).toEqual({ site: 'North' });
    expect(result.images.map((i) => [i.path, i.mime])).toEqual([
      ['img/c1.png', 'image/png'], ['img/c2.jpg', 'image/jpeg'], ['img/p1.png', 'image/png'],
    ]);
    expect(result.summary.cases).toBe(2);
    expect(result.summary.practiceCases).toBe(1);
  });

  it('drops a BOM, accepts CRLF line ends, quoted commas and normalised paths', async () => {
    const csv = `\uFEFF${HEADER}\r\n"C1",target,1,./img/x/../c1.png,0.5,1,0,"North, upper"\r\n`;
    const result = await readWith(csv);
    if (!result.ok) throw new Error(JSON.stringify(result.problems));
    expect(result.manifest.cases[0]?.images).toEqual(['img/c1.png']);
    expect(result.manifest.cases[0]?.attributes.site).toBe('North, upper');
  });

  it('reports columns it does not use', async () => {
    const result = await readWith('case_id,finding,truth,image,notes\nC1,t,1,img/c1.png,hello\n');
    if (!result.ok) throw new Error(JSON.stringify(result.problems));
    expect(result.summary.ignoredColumns).toEqual(['notes']);
  });
});

describe('readCaseSet refuses, naming file, line and column', () => {
  const cases: [string, string, number, string | null, RegExp][] = [
    ['an empty case_id', withRow(2, ',mass,0,img/c1.png,0.2,0,0,North'), 3, 'case_id', /case_id is empty/],
    ['a case_id with a space', withRow(3, 'C 2,target,0,img/c2.jpg,0.7,,0,South'), 4, 'case_id', /1-64 characters/],
    ['a case_id over 64 characters', withRow(1, `${'A'.repeat(65)},target,1,img/c1.png,0.9,1,0,North`), 2, 'case_id', /1-64/],
    ['truth that is not 0/1', withRow(1, 'C1,target,yes,img/c1.png,0.9,1,0,North'), 2, 'truth', /truth must be 0 or 1, found "yes"/],
    ['an empty truth', withRow(3, 'C2,target,,img/c2.jpg,0.7,,0,South'), 4, 'truth', /truth must be 0 or 1, found an empty cell/],
    ['model_call of 2', withRow(1, 'C1,target,1,img/c1.png,0.9,2,0,North'), 2, 'model_call', /model_call must be 0 or 1/],
    ['practice of "true"', withRow(4, 'P1,target,1,img/p1.png,,,true,North'), 5, 'practice', /practice must be 0 or 1/],
    ['a score above 1', withRow(1, 'C1,target,1,img/c1.png,1.2,1,0,North'), 2, 'model_score', /number from 0 to 1, found "1.2"/],
    ['a negative score', withRow(1, 'C1,target,1,img/c1.png,-0.1,1,0,North'), 2, 'model_score', /number from 0 to 1/],
    ['a score that is not a number', withRow(1, 'C1,target,1,img/c1.png,0x1,1,0,North'), 2, 'model_score', /found "0x1"/],
    ['a repeated case and finding', withRow(2, 'C1,target,0,img/c1.png,0.2,0,0,North'), 3, 'finding', /case C1 already has finding target on line 2/],
    ['one case with different images', withRow(2, 'C1,mass,0,img/p1.png,0.2,0,0,North'), 3, 'image', /case C1 names "img\/p1.png" here but "img\/c1.png" on line 2/],
    ['an absolute image path', withRow(3, 'C2,target,0,/data/c2.jpg,0.7,,0,South'), 4, 'image', /is absolute/],
    ['a drive-letter image path', withRow(3, 'C2,target,0,C:/data/c2.jpg,0.7,,0,South'), 4, 'image', /is absolute/],
    ['an image path leaving the root', withRow(3, 'C2,target,0,img/../../c2.jpg,0.7,,0,South'), 4, 'image', /leaves the set's folder/],
    ['an image path with backslashes', withRow(3, 'C2,target,0,img\\c2.jpg,0.7,,0,South'), 4, 'image', /backslash/],
    ['an empty image path', withRow(3, 'C2,target,0,,0.7,,0,South'), 4, 'image', /image path is empty/],
    ['a ragged row', withRow(2, 'C1,mass,0,img/c1.png,0.2,0,0'), 3, null, /row has 7 cells but the header has 8/],
    ['an empty finding', withRow(3, 'C2,,0,img/c2.jpg,0.7,,0,South'), 4, 'finding', /finding is empty/],
    ['one case that is practice on one row only', withRow(2, 'C1,mass,0,img/c1.png,0.2,0,1,North'), 3, 'practice', /case C1 is practice here but not practice on line 2/],
    ['one case with two values of an attribute', withRow(2, 'C1,mass,0,img/c1.png,0.2,0,0,South'), 3, 'case_site', /case_site "South" here but "North" on line 2/],
  ];
  it.each(cases)('%s', async (_name, csv, line, column, message) => {
    const problem = firstProblem(await readWith(csv));
    expect(problem).toMatchObject({ file: 'cases.csv', row: line, column });
    expect(problem.message).toMatch(message);
  });

  it('a missing required column, on the header line', async () => {
    const problem = firstProblem(await readWith('case_id,finding,image\nC1,t,img/c1.png\n'));
    expect(problem).toMatchObject({ file: 'cases.csv', row: 1, column: 'truth' });
    expect(problem.message).toMatch(/required column truth is missing/);
  });

  it('a required column in the wrong case, with a hint', async () => {
    const problem = firstProblem(await readWith('Case_ID,finding,truth,image\nC1,t,1,img/c1.png\n'));
    expect(problem).toMatchObject({ row: 1, column: 'case_id' });
    expect(problem.message).toMatch(/found "Case_ID"/);
  });

  it('a column named twice', async () => {
    const problem = firstProblem(await readWith('case_id,finding,truth,image,truth\nC1,t,1,img/c1.png,1\n'));
    expect(problem).toMatchObject({ row: 1, column: 'truth' });
    expect(problem.message).toMatch(/appears twice \(columns 3 and 5\)/);
  });

  it('a missing image, on the first line naming it', async () => {
    const problem = firstProblem(await readWith(goodCsv(), { 'img/c2.jpg': undefined }));
    expect(problem).toMatchObject({ file: 'cases.csv', row: 4, column: 'image' });
    expect(problem.message).toMatch(/image img\/c2.jpg is not in the set/);
  });

  it('an image whose name differs only in case, with a hint', async () => {
    const problem = firstProblem(await readWith(goodCsv(), { 'img/c2.jpg': undefined, 'img/C2.jpg': png() }));
    expect(problem.message).toMatch(/there is "img\/C2.jpg"/);
  });

  it('an image that is not really a PNG or JPEG, whatever its name', async () => {
    const gif = new Uint8Array([0x47, 0x49, 0x46, 0x38, 0x39, 0x61, 1, 0, 1, 0]);
    const problem = firstProblem(await readWith(goodCsv(), { 'img/c1.png': gif }));
    expect(problem).toMatchObject({ row: 2, column: 'image' });
    expect(problem.message).toMatch(/not really a PNG or JPEG \(its bytes are a GIF\)/);
  });

  it('a text file named .png', async () => {
    const problem = firstProblem(await readWith(goodCsv(), { 'img/p1.png': 'hello' }));
    expect(problem).toMatchObject({ row: 5, column: 'image' });
  });

  it('a file that is not UTF-8, naming the line of the first bad byte', async () => {
    const latin1 = new Uint8Array([...new TextEncoder().encode(`${HEADER}\nC1,target,1,img/c1.png,0.9,1,0,`), 0x4d, 0xfc, 0x6e, 0x0a]);
    const problem = firstProblem(await readWith(latin1));
    expect(problem).toMatchObject({ file: 'cases.csv', row: 2, column: null });
    expect(problem.message).toMatch(/not UTF-8/);
  });

  it('an empty file', async () => {
    const problem = firstProblem(await readWith(''));
    expect(problem).toMatchObject({ file: 'cases.csv', row: null });
    expect(problem.message).toMatch(/cases.csv is empty/);
  });

  it('a header with no cases', async () => {
    expect(firstProblem(await readWith(`${HEADER}\n`)).message).toMatch(/header but no cases/);
  });

  it('an unterminated quote, on its line', async () => {
    const problem = firstProblem(await readWith(`${HEADER}\nC1,target,1,img/c1.png,0.9,1,0,North\n"C2,target,0,img/c2.jpg,0.7,,0,South\n`));
    expect(problem).toMatchObject({ row: 3 });
  });

  it('a set with no cases.csv, pointing at a nested one', async () => {
    const { memorySource } = await import('../../../../src/io/case-set/memory-source');
    const { readCaseSet } = await import('../../../../src/io/case-set/read-case-set');
    const problem = firstProblem(await readCaseSet(memorySource({ 'inner/cases.csv': goodCsv() }, 'x')));
    expect(problem.message).toMatch(/no cases.csv at its top level \(found "inner\/cases.csv"/);
  });

  it('a line number that counts quoted line breaks', async () => {
    const csv = `${HEADER}\nC1,target,1,img/c1.png,0.9,1,0,"North\nwing"\nC2,target,maybe,img/c2.jpg,0.7,,0,South\n`;
    expect(firstProblem(await readWith(csv))).toMatchObject({ row: 4, column: 'truth' });
  });

  it('returns every problem, file-level first then by line, with a total', async () => {
    const csv = `${HEADER}\nC1,target,2,img/c1.png,0.9,1,0,North\nC2,target,0,img/c2.jpg,7,,0,South\n`;
    const result = await readWith(csv);
    if (result.ok) throw new Error('accepted');
    expect(result.problems.map((p) => [p.row, p.column])).toEqual([[2, 'truth'], [3, 'model_score']]);
    expect(result.total).toBe(2);
  });

  it('keeps at most limits.problems problems but counts them all', async () => {
    const rows = Array.from({ length: 30 }, (_, i) => `X${i},t,9,img/c1.png`);
    const result = await readWith(`case_id,finding,truth,image\n${rows.join('\n')}\n`, {}, { problems: 5 });
    if (result.ok) throw new Error('accepted');
    expect(result.problems).toHaveLength(5);
    expect(result.total).toBe(30);
  });
});

describe('readCaseSet bounds sizes', () => {
  it('refuses a cases.csv over the byte limit', async () => {
    expect(firstProblem(await readWith(goodCsv(), {}, { csvBytes: 50 })).message).toMatch(/larger than/);
  });
  it('refuses more rows than the limit', async () => {
    expect(firstProblem(await readWith(goodCsv(), {}, { rows: 3 })).message).toMatch(/more than 3 data rows/);
  });
  it('refuses an image over the per-image limit, on its line', async () => {
    const problem = firstProblem(await readWith(goodCsv(), { 'img/c2.jpg': new Uint8Array([0xff, 0xd8, 0xff, ...new Uint8Array(2000)]) }, { imageBytes: 1000 }));
    expect(problem).toMatchObject({ row: 4, column: 'image' });
    expect(problem.message).toMatch(/larger than/);
  });
  it('refuses more images than the limit', async () => {
    expect(firstProblem(await readWith(goodCsv(), {}, { images: 2 })).message).toMatch(/names 3 images; the limit is 2/);
  });
  it('refuses images adding up to more than the total limit', async () => {
    const big = new Uint8Array([0xff, 0xd8, 0xff, ...new Uint8Array(600)]);
    const problem = firstProblem(await readWith(goodCsv(), { 'img/c2.jpg': big, 'img/c1.png': big }, { totalBytes: 1000 }));
    expect(problem.message).toMatch(/add up to more than/);
  });
});
