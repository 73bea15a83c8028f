import { GOOD_ROWS, HEADER, readWith } from './fixtures';

const resaved = (separator: string) => `${[HEADER, ...GOOD_ROWS].map((line) => line.replaceAll(',', separator)).join('\n')}\n`;

describe('a cases.csv saved with another separator', () => {
  it.each([[';', 'semicolons'], ['\t', 'tabs']])('gives one message naming the separator (%j)', async (separator, words) => {
    const result = await readWith(resaved(separator));
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.total).toBe(1);
    expect(result.problems[0]).toMatchObject({ file: 'cases.csv', row: 1, column: null });
    expect(result.problems[0]?.message).toMatch(new RegExp(`separated by ${words}, not commas`));
  });

  it('still names a missing column in a comma file', async () => {
    const result = await readWith(`${[HEADER.replace('truth', 'truth_value'), ...GOOD_ROWS].join('\n')}\n`);
    expect(!result.ok && result.problems.map((p) => p.message).join(' ')).toMatch(/required column truth is missing/);
  });
});
