// Images that cannot be shown are refused at validation, naming the file: junk after the PNG
// signature, a cut or damaged PNG, a valid but enormous PNG or JPEG (the probe's 60000 x 60000
// PNG). The hostile images are generated here. PNG layout: PNG specification, 3rd edition,
// 5.3 (chunks with CRC-32 over type and data) and 11.2.1 (IHDR); JPEG: ITU-T T.81, B.2.2 (SOF).
import { crc32 } from '../../../../src/io/case-set/crc32';
import { imageHeader, MAX_SIDE } from '../../../../src/io/case-set/image-header';
import { firstProblem, jpeg, png, readWith } from './fixtures';

const chunk = (type: string, data: Uint8Array): Uint8Array => {
  const out = new Uint8Array(12 + data.length);
  const view = new DataView(out.buffer);
  view.setUint32(0, data.length);
  out.set(new TextEncoder().encode(type), 4);
  out.set(data, 8);
  view.setUint32(8 + data.length, crc32(out.subarray(4, 8 + data.length)));
  return out;
};
const join = (parts: Uint8Array[]): Uint8Array => {
  const out = new Uint8Array(parts.reduce((n, p) => n + p.length, 0));
  let at = 0;
  for (const p of parts) {
    out.set(p, at);
    at += p.length;
  }
  return out;
};
const SIGNATURE = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
/** A structurally valid PNG header claiming width x height (8-bit grey), with one tiny IDAT. */
const pngOfSize = (width: number, height: number): Uint8Array => {
  const ihdr = new Uint8Array(13);
  const view = new DataView(ihdr.buffer);
  view.setUint32(0, width);
  view.setUint32(4, height);
  ihdr.set([8, 0, 0, 0, 0], 8);
  return join([SIGNATURE, chunk('IHDR', ihdr), chunk('IDAT', new Uint8Array([0x78, 0x9c, 0x03, 0x00])), chunk('IEND', new Uint8Array(0))]);
};
const jpegOfSize = (width: number, height: number): Uint8Array => {
  const bytes = jpeg();
  const sof = bytes.indexOf(0xc0) - 1;
  bytes.set([height >> 8, height & 0xff, width >> 8, width & 0xff], sof + 5);
  return bytes;
};

describe('image structure and size', () => {
  it('reads the size of a real PNG (fast-png) and of the JPEG fixture', () => {
    expect(imageHeader(png(), 'image/png')).toEqual({ ok: true, width: 2, height: 2 });
    expect(imageHeader(jpeg(), 'image/jpeg')).toEqual({ ok: true, width: 2, height: 2 });
    expect(imageHeader(pngOfSize(MAX_SIDE, 4000), 'image/png')).toEqual({ ok: true, width: MAX_SIDE, height: 4000 });
  });

  it.each([
    ['junk after the PNG signature', () => join([SIGNATURE, new TextEncoder().encode('this is not a png at all, only junk')]), /damaged \(no valid PNG chunk|cut short/],
    ['a PNG cut in half', () => png().subarray(0, Math.floor(png().length / 2)), /cut short/],
    ['a PNG with one byte changed', () => { const b = png().slice(); b[20] = (b[20] ?? 0) ^ 0xff; return b; }, /fails its CRC check/],
    ['a valid 60000 x 60000 PNG', () => pngOfSize(60_000, 60_000), /60000 x 60000 pixels; each side may be at most 16,384/],
    ['a 16000 x 16000 PNG (1 GB decoded)', () => pngOfSize(16_000, 16_000), /over 256 MB once decoded/],
  ])('refuses %s, naming the image', async (_what, make, reason) => {
    const problem = firstProblem(await readWith(`case_id,finding,truth,image\nC1,target,1,img/c1.png\n`, { 'img/c1.png': make() }));
    expect(problem).toMatchObject({ file: 'cases.csv', row: 2, column: 'image' });
    expect(problem.message).toMatch(/^image img\/c1\.png cannot be shown: /);
    expect(problem.message).toMatch(reason);
  });

  it.each([
    ['junk after the JPEG signature', () => new Uint8Array([0xff, 0xd8, 0xff, 0x00, 0x01, 0x02, 0x03, 0x04, 0x05]), /damaged/],
    ['a JPEG with no start-of-frame', () => new Uint8Array([0xff, 0xd8, 0xff, 0xd9]), /no start-of-frame/],
    ['a 60000 x 60000 JPEG', () => jpegOfSize(60_000, 60_000), /60000 x 60000 pixels/],
  ])('refuses %s', async (_what, make, reason) => {
    const problem = firstProblem(await readWith(`case_id,finding,truth,image\nC2,target,1,img/c2.jpg\n`, { 'img/c2.jpg': make() }));
    expect(problem.message).toMatch(/^image img\/c2\.jpg cannot be shown: /);
    expect(problem.message).toMatch(reason);
  });
});
