import { checkFileName, fileNameProblem } from '../../../src/host/file-name';

describe('checkFileName', () => {
  it.each(['reads.csv', 'feedback R1 2025-03-01.pdf', 'bundle.heed.zip', 'é.txt'])('accepts %s', (name) => {
    expect(checkFileName(name)).toBe(name);
  });

  it.each([
    ['', 'the suggested file name is empty'],
    ['   ', 'the suggested file name is empty'],
    ['a/b.csv', 'the suggested file name "a/b.csv" holds a folder separator'],
    ['..\\b.csv', 'the suggested file name "..\\b.csv" holds a folder separator'],
    ['a\u0000.csv', 'the suggested file name holds a control character'],
    ['a\n.csv', 'the suggested file name holds a control character'],
    ['..', 'the suggested file name ".." is not a file name'],
    ['x'.repeat(201), 'the suggested file name is longer than 200 characters'],
  ])('refuses %j', (name, message) => {
    expect(fileNameProblem(name)).toBe(message);
    expect(() => checkFileName(name)).toThrow(message);
  });
});
