// cases.csv text that a spreadsheet could run as a formula is refused, naming row and column
// (OWASP CSV Injection: cells starting with =, +, -, @, tab or CR); plain numbers stay.
import { casesCsv } from '../../../../src/io/case-set/write-cases-csv';
import { firstProblem, readWith } from './fixtures';

const HEAD = 'case_id,finding,truth,image,case_site';
const csvWith = (row: string): string => `${HEAD}\nC1,target,1,img/c1.png,North\n${row}\n`;

describe('formula-looking cells in cases.csv', () => {
  it.each([
    ['a finding', 'C2,"=HYPERLINK(""http://x"",""click"")",0,img/c2.jpg,South', 'finding', /^finding "=HYPERLINK.*starts with "="/],
    ['a case id starting with -', '-C2,target,0,img/c2.jpg,South', 'case_id', /^case_id "-C2" starts with "-"/],
    ['an attribute value', 'C2,target,0,img/c2.jpg,@SUM(A1)', 'case_site', /^case_site "@SUM\(A1\)" starts with "@"/],
    ['a tab before =', 'C2,target,0,img/c2.jpg,"\t=1+1"', 'case_site', /starts with a tab/],
    ['a CR before =', 'C2,target,0,img/c2.jpg,"\r=1+1"', 'case_site', /starts with a carriage return/],
    ['spaces before +', 'C2,target,0,img/c2.jpg,"  +1+cmd"', 'case_site', /starts with "\+"/],
  ])('refuses %s, naming line 3 and the column', async (_what, row, column, message) => {
    const problem = firstProblem(await readWith(csvWith(row)));
    expect(problem).toMatchObject({ file: 'cases.csv', row: 3, column });
    expect(problem.message).toMatch(message);
  });

  it('refuses an attribute name that looks like a formula', async () => {
    const problem = firstProblem(await readWith('case_id,finding,truth,image,case_=cmd\nC1,target,1,img/c1.png,x\n'));
    expect(problem).toMatchObject({ row: 1, column: 'case_=cmd' });
    expect(problem.message).toMatch(/starts with "="/);
  });

  it('keeps a plain negative number', async () => {
    const result = await readWith(csvWith('C2,target,0,img/c2.jpg,-3.5'));
    if (!result.ok) throw new Error(JSON.stringify(result.problems));
    expect(result.manifest.cases[1]?.attributes.site).toBe('-3.5');
  });

  it('writes cases.csv with no cell starting a formula, even from a manifest that holds one', () => {
    const text = casesCsv({
      name: 'x', findings: ['=cmd'], attributeNames: ['site'],
      cases: [{ caseId: '-C1', images: ['a.png'], practice: false, attributes: { site: '@x' }, findings: [{ finding: '=cmd', truth: 1, modelScore: null, modelCall: null }] }],
    });
    const cells = text.trim().split('\n').flatMap((line) => line.split(','));
    expect(cells.filter((c) => /^[=+\-@\t\r]/.test(c))).toEqual([]);
    expect(text).toContain("'-C1,'=cmd");
  });
});
