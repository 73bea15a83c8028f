// A very wide cases.csv header: refused at once with the column count, and duplicates found in
// linear time (a 200,000-column header once hung the import for minutes).
import { MAX_COLUMNS } from '../../../../src/io/case-set/columns';
import { firstProblem, readWith } from './fixtures';

const wideHeader = (extra: number, duplicate = false): string => {
  const names = ['case_id', 'finding', 'truth', 'image'];
  for (let i = 0; i < extra; i += 1) names.push(`case_x${i}`);
  if (duplicate) names.push('case_x0');
  const row = ['C1', 'target', '1', 'img/c1.png'];
  for (let i = 0; i < names.length - 4; i += 1) row.push('v');
  return `${names.join(',')}\n${row.join(',')}\n`;
};

describe('wide cases.csv headers', () => {
  it('refuses a header of 200,000 columns, naming the count and the limit', async () => {
    const problem = firstProblem(await readWith(wideHeader(200_000)));
    expect(problem).toMatchObject({ file: 'cases.csv', row: 1 });
    expect(problem.message).toBe(`the header has 200,004 columns; the limit is ${MAX_COLUMNS.toLocaleString('en')}`);
  });

  it('still finds a repeated column in a header just under the limit', async () => {
    const problem = firstProblem(await readWith(wideHeader(MAX_COLUMNS - 5, true)));
    expect(problem).toMatchObject({ row: 1, column: 'case_x0' });
    expect(problem.message).toBe(`column case_x0 appears twice (columns 5 and ${MAX_COLUMNS})`);
  });
});
