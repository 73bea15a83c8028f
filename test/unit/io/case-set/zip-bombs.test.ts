// Zip bombs: overlapping entries, sizes that lie, and entries that unpack far beyond their
// compressed size are refused, each with a message naming what is wrong. The zips are made by
// the generators in hostile-zips.ts, never committed.
import { readCaseSet } from '../../../../src/io/case-set/read-case-set';
import { zipSource } from '../../../../src/io/case-set/zip-source';
import { casesFor, deflatedEntry, overlappingBomb, rawZip, zeroPng } from './hostile-zips';

const refusal = async (zip: Uint8Array) => {
  const result = await readCaseSet(zipSource(zip, 'bomb.zip'));
  if (result.ok) throw new Error('expected the zip to be refused');
  return result.problems;
};

describe('zip bombs', () => {
  it('refuses many directory entries pointing at one compressed entry, before inflating anything', async () => {
    // 150 names x 20 MB declared = 3 GB, under the 4 GB set limit, from one ~20 KB entry
    const zip = overlappingBomb(150, 20 * 1024 * 1024);
    expect(zip.length).toBeLessThan(100_000);
    const problems = await refusal(zip);
    expect(problems).toHaveLength(1);
    expect(problems[0]?.message).toMatch(/img\/0\.png and img\/1\.png overlap .*zip bomb/);
  });

  it('refuses an entry whose local header is shared with another', async () => {
    const csv = deflatedEntry('cases.csv', casesFor(2));
    const zip = rawZip([csv, deflatedEntry('img/0.png', zeroPng(100))], [{ name: 'img/1.png', of: 1 }]);
    const problems = await refusal(zip);
    expect(problems[0]?.message).toMatch(/overlap/);
  });

  it('refuses an entry that unpacks to more than its directory declares', async () => {
    const real = zeroPng(2 * 1024 * 1024);
    const zip = rawZip([deflatedEntry('cases.csv', casesFor(1)), deflatedEntry('img/0.png', real, 1000)]);
    const problems = await refusal(zip);
    expect(problems[0]?.message).toMatch(/img\/0\.png.*does not match its declared size \(it unpacks to more bytes\)/);
  });

  it('refuses an entry that unpacks more than 100 times its compressed size', async () => {
    // honest sizes, 4 MB of zeros after a PNG signature: about 1000:1
    const zip = rawZip([deflatedEntry('cases.csv', casesFor(1)), deflatedEntry('img/0.png', zeroPng(4 * 1024 * 1024))]);
    const problems = await refusal(zip);
    expect(problems[0]).toMatchObject({ file: 'cases.csv', row: 2, column: 'image' });
    expect(problems[0]?.message).toMatch(/100 times its compressed size/);
  });

  it('still reads a normal deflated entry that compresses well but under 100:1', async () => {
    const text = casesFor(60_000);
    expect(text.length).toBeGreaterThan(1024 * 1024);
    const zip = rawZip([deflatedEntry('cases.csv', text)]);
    expect((await zipSource(zip, 'ok.zip').read('cases.csv')).length).toBe(text.length);
  });
});
