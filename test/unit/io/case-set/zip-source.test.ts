// Zip sets: unsafe entries refuse the whole zip; a good zip (with or without a top folder) reads.
import { zipSync } from 'fflate';
import type { Zippable } from 'fflate';
import { readCaseSet } from '../../../../src/io/case-set/read-case-set';
import { zipSource } from '../../../../src/io/case-set/zip-source';
import { goodCsv, goodFiles, png } from './fixtures';

const enc = new TextEncoder();
const setFiles = (prefix = ''): Zippable => {
  const files: Zippable = { [`${prefix}cases.csv`]: enc.encode(goodCsv()) };
  for (const [path, bytes] of Object.entries(goodFiles())) files[prefix + path] = typeof bytes === 'string' ? enc.encode(bytes) : bytes;
  return files;
};

const refusal = async (zip: Uint8Array, limits = {}) => {
  const result = await readCaseSet(zipSource(zip, 'set.zip', limits));
  if (result.ok) throw new Error('expected the zip to be refused');
  return result.problems;
};

describe('zipSource', () => {
  it('reads a good zip whose files sit at the top', async () => {
    const result = await readCaseSet(zipSource(zipSync(setFiles()), 'set.zip'));
    if (!result.ok) throw new Error(JSON.stringify(result.problems));
    expect(result.manifest.name).toBe('set');
    expect(result.images).toHaveLength(3);
    expect(result.images[0]?.bytes).toEqual(png());
  });

  it('treats a single top folder holding cases.csv as the root, and ignores __MACOSX', async () => {
    const zip = zipSync({ ...setFiles('study-a/'), '__MACOSX/study-a/._cases.csv': enc.encode('junk') });
    const source = zipSource(zip, 'set.zip');
    expect((await source.list()).sort()).toEqual(['cases.csv', 'img/c1.png', 'img/c2.jpg', 'img/p1.png']);
    const result = await readCaseSet(source);
    if (!result.ok) throw new Error(JSON.stringify(result.problems));
    expect(result.manifest.name).toBe('study-a');
  });

  it('reads stored (uncompressed) entries and returns copies, not views of the zip', async () => {
    const zip = zipSync(setFiles(), { level: 0 });
    const bytes = await zipSource(zip, 'set.zip').read('img/c1.png');
    expect(bytes).toEqual(png());
    expect(bytes.buffer).not.toBe(zip.buffer);
  });

  it('refuses an entry that climbs out with ../', async () => {
    const problems = await refusal(zipSync({ ...setFiles(), '../evil.png': png() }));
    expect(problems[0]).toMatchObject({ file: '../evil.png' });
    expect(problems[0]?.message).toMatch(/climbs out/);
  });

  it('refuses an entry that climbs out from inside a folder', async () => {
    const problems = await refusal(zipSync({ ...setFiles(), 'img/../../evil.png': png() }));
    expect(problems[0]?.message).toMatch(/climbs out/);
  });

  it('refuses an absolute entry', async () => {
    const problems = await refusal(zipSync({ ...setFiles(), '/etc/evil.png': png() }));
    expect(problems[0]).toMatchObject({ file: '/etc/evil.png' });
    expect(problems[0]?.message).toMatch(/absolute path/);
  });

  it('refuses a backslash entry', async () => {
    const problems = await refusal(zipSync({ ...setFiles(), 'img\\evil.png': png() }));
    expect(problems[0]?.message).toMatch(/backslash/);
  });

  it('refuses a symbolic link entry (unix mode 0120777)', async () => {
    // Unix host (os 3) and mode S_IFLNK | 0777 in the high 16 bits of the external attributes.
    const link: Zippable = { 'img/link.png': [enc.encode('/etc/passwd'), { os: 3, attrs: 0o120777 * 65536 }] };
    const problems = await refusal(zipSync({ ...setFiles(), ...link }));
    expect(problems[0]).toMatchObject({ file: 'img/link.png' });
    expect(problems[0]?.message).toMatch(/symbolic link/);
  });

  it('accepts a plain unix file entry (mode 0100644)', async () => {
    const files = setFiles();
    files['img/c1.png'] = [png(), { os: 3, attrs: 0o100644 * 65536 }];
    expect((await readCaseSet(zipSource(zipSync(files), 'set.zip'))).ok).toBe(true);
  });

  it('refuses a zip bomb by its declared size', async () => {
    const zip = zipSync({ ...setFiles(), 'img/bomb.png': new Uint8Array(3_000_000) });
    const problems = await refusal(zip, { imageBytes: 1_000_000, csvBytes: 1_000_000 });
    expect(problems[0]).toMatchObject({ file: 'img/bomb.png' });
    expect(problems[0]?.message).toMatch(/would unpack to 3 MB/);
  });

  it('refuses an entry that inflates past the size its header declares', async () => {
    const zip = zipSync({ 'cases.csv': enc.encode(goodCsv()), 'img/c1.png': new Uint8Array(200_000) });
    // Rewrite the declared size of img/c1.png in the central directory to 1000 bytes.
    const view = new DataView(zip.buffer, zip.byteOffset, zip.byteLength);
    const name = enc.encode('img/c1.png');
    let patched = false;
    for (let i = 0; i + 46 < zip.length; i += 1) {
      if (view.getUint32(i, true) !== 0x02014b50) continue;
      const n = view.getUint16(i + 28, true);
      if (n === name.length && name.every((b, k) => zip[i + 46 + k] === b)) {
        view.setUint32(i + 24, 1000, true);
        patched = true;
      }
    }
    expect(patched).toBe(true);
    await expect(zipSource(zip, 'set.zip').read('img/c1.png')).rejects.toThrow(/damaged or does not match its declared size/);
  });

  it('refuses a file that is not a zip', async () => {
    const problems = await refusal(enc.encode('hello, not a zip at all, just some text'));
    expect(problems[0]?.message).toMatch(/not a zip file/);
  });

  it('refuses two entries with the same name', async () => {
    // fflate will not write a repeated name, so rename img/c9.png to img/c1.png in the directory.
    const zip = zipSync({ ...setFiles(), 'img/c9.png': png() });
    const from = enc.encode('img/c9.png');
    let patched = 0;
    for (let i = 0; i + from.length < zip.length; i += 1) {
      if (from.every((b, k) => zip[i + k] === b)) {
        zip[i + 5] = 0x31; // '9' -> '1'
        patched += 1;
      }
    }
    expect(patched).toBe(2); // local header and central directory
    const problems = await refusal(zip);
    expect(problems[0]).toMatchObject({ file: 'img/c1.png' });
    expect(problems[0]?.message).toMatch(/two entries with this name/);
  });
});
