/** Writes a small case-set folder (docs/formats.md) of invented placeholder images, for import tests. */
import { mkdirSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { encode } from 'fast-png';

const grayPng = (seed: number): Uint8Array => {
  const size = 64;
  const data = new Uint8Array(size * size);
  for (let i = 0; i < data.length; i++) data[i] = (i * 31 + seed * 17) % 200;
  return encode({ width: size, height: size, data, channels: 1, depth: 8 });
};

/** `cases` main cases and `practice` practice cases, two findings each, a site attribute. */
export const writeCaseFolder = (cases: number, practice: number): { dir: string; name: string } => {
  const root = mkdtempSync(join(tmpdir(), 'heed-e2e-set-'));
  const name = 'harbour-clinic-set';
  const dir = join(root, name);
  mkdirSync(join(dir, 'img'), { recursive: true });
  const rows = ['case_id,finding,truth,image,model_score,practice,case_site'];
  for (let i = 0; i < practice + cases; i++) {
    const id = `HC-${String(i + 1).padStart(3, '0')}`;
    writeFileSync(join(dir, 'img', `${id}.png`), grayPng(i));
    const site = i % 2 === 0 ? 'Quayside' : 'Lighthouse';
    const isPractice = i < practice ? 1 : 0;
    const truthMass = i % 3 === 0 ? 1 : 0;
    const truthCalc = i % 4 === 1 ? 1 : 0;
    // scores that mostly agree with truth, a few that do not: a plausible model of our own invention
    const score = (t: number, k: number) => (((i * k) % 10) === 0 ? 1 - t : t) * 0.7 + 0.15;
    rows.push(`${id},mass,${truthMass},img/${id}.png,${score(truthMass, 7).toFixed(2)},${isPractice},${site}`);
    rows.push(`${id},calcification,${truthCalc},img/${id}.png,${score(truthCalc, 3).toFixed(2)},${isPractice},${site}`);
  }
  writeFileSync(join(dir, 'cases.csv'), `${rows.join('\n')}\n`);
  return { dir, name };
};
