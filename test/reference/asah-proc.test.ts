// DeLong AUC, variance and the paired DeLong test on pROC's bundled aSAH data (Turck et al.
// 2010, Intensive Care Med 36:107-115; shipped with pROC, Robin et al. 2011, BMC Bioinformatics
// 12:77), exported with test/reference/scripts/asah_export.R. Reference values from R 4.2.2,
// pROC 1.18.0 (calls recorded in fixtures/asah-proc.json):
//   r <- roc(outcome, marker, levels = c(0, 1), direction = "<"); auc(r); var(r, method = "delong")
//   roc.test(r1, r2, method = "delong", paired = TRUE)   # Z = (auc1 − auc2)/se
import { delongAuc } from '../../src/analysis/delong';
import { delongPairedTest, type ConditionScores } from '../../src/analysis/delong-paired';
import { near, readFixture } from './support/fixtures';

type Marker = 's100b' | 'ndka' | 'wfns';
type AsahRef = {
  single: { marker: Marker; auc: number; var: number }[];
  paired: { first: Marker; second: Marker; z: number; p: number }[];
};

const lines = readFixture('asah.csv').trim().split('\n');
const header = (lines[0] ?? '').split(',');
const rows = lines.slice(1).map((l) => l.split(',').map(Number));
const column = (name: string) => {
  const i = header.indexOf(name);
  if (i < 0) throw new Error(`asah.csv has no column ${name}`);
  return rows.map((r) => r[i] as number);
};
const outcome = column('outcome');
const split = (marker: Marker): ConditionScores => {
  const v = column(marker);
  return { positives: v.filter((_, k) => outcome[k] === 1), negatives: v.filter((_, k) => outcome[k] === 0) };
};
const ref: AsahRef = JSON.parse(readFixture('asah-proc.json'));

describe('aSAH (pROC 1.18.0) DeLong checks', () => {
  it('has the 113 patients, 41 with a poor outcome', () => {
    expect(rows.length).toBe(113);
    expect(outcome.filter((y) => y === 1).length).toBe(41);
  });

  it.each(ref.single)('$marker: AUC and DeLong variance', ({ marker, auc, var: variance }) => {
    const s = split(marker);
    const got = delongAuc(s.positives, s.negatives);
    near(got.auc, auc, 1e-12, `${marker} auc`);
    near(got.variance, variance, 1e-12, `${marker} DeLong variance`);
  });

  it.each(ref.paired)('$first vs $second: paired DeLong z and p', ({ first, second, z, p }) => {
    const got = delongPairedTest(split(first), split(second));
    near(got.z, -z, 1e-9, `${first} vs ${second} z`);
    near(got.p, p, 1e-9, `${first} vs ${second} p`);
  });
});
