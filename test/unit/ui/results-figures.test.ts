/**
 * The results page against the engine: every number of a real `heed analyze --json` report is
 * covered by an entry of the page's figure list (so nothing the CLI prints is missing from the
 * page), and the data behind each plot is exactly the report's figures.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { analyzeReads } from '../../../src/analysis/engine';
import type { GroupFinding } from '../../../src/analysis/report-types';
import { parseReadLog } from '../../../src/io/read-log-parse';
import {
  cautionRows, clipInterval, differenceRows, mrmcRows, POOLED, READER_AVERAGE, readersOf, relianceRows, switchingRows, timeRows, Z95,
} from '../../../src/ui/results/figure-data';
import { GROUP_FIGURES, KIND_KEYS, LOG_FIGURES, SECTION_FIGURES, SUBGROUP_FIGURES, type FigureDef } from '../../../src/ui/results/figure-list';

const log = (name: string) => parseReadLog(readFileSync(join(import.meta.dirname, '..', '..', 'reference', 'fixtures', name), 'utf8'));
const sequential = analyzeReads(log('log-sequential.csv'), { boot: 50 });
const crossover = analyzeReads(log('log-crossover.csv'), { boot: 50 });

// Every leaf that is a number (or a null where a number may be), with array indices as "#".
const leaves = (node: unknown, path: string, out: string[]): string[] => {
  if (Array.isArray(node)) { node.forEach((x) => leaves(x, `${path}.#`, out)); return out; }
  if (node !== null && typeof node === 'object') { for (const [k, v] of Object.entries(node)) leaves(v, path ? `${path}.${k}` : k, out); return out; }
  if (typeof node === 'number' || node === null) out.push(path);
  return out;
};

const covers = (defs: readonly FigureDef[], rest: string): boolean => defs.some((d) => {
  if (rest === d.path || d.path.startsWith(`${rest}.`)) return true; // the figure, or a section that is null here
  if (!rest.startsWith(`${d.path}.`)) return false;
  const next = rest.slice(d.path.length + 1).split('.')[0] ?? '';
  return d.kind === 'matrix' || KIND_KEYS[d.kind].includes(next);
});

const uncovered = (report: unknown): string[] => leaves(report, '', []).filter((p) => {
  const m = /^readers\.#\.subgroups\.#\.(.+)$/.exec(p) ?? /^group\.findings\.#\.subgroups\.#\.(.+)$/.exec(p);
  if (m) return !covers([...SECTION_FIGURES, ...SUBGROUP_FIGURES], m[1] as string);
  const r = /^readers\.#\.(.+)$/.exec(p);
  if (r) return !covers(SECTION_FIGURES, r[1] as string);
  const pooled = /^group\.findings\.#\.pooled\.(.+)$/.exec(p);
  if (pooled) return !covers(SECTION_FIGURES, pooled[1] as string);
  const g = /^group\.findings\.#\.(.+)$/.exec(p);
  if (g) return g[1] !== 'mrmc_note' && !covers(GROUP_FIGURES, g[1] as string);
  const top = /^group\.(.+)$/.exec(p);
  return top ? !covers(LOG_FIGURES, top[1] as string) : true;
});

describe('the figure list covers heed analyze --json', () => {
  it('leaves no number of a sequential study with caution notices and subgroups off the page', () => {
    expect(uncovered(sequential)).toEqual([]);
  });
  it('leaves no number of a fully crossed study (with the multi-reader result) off the page', () => {
    expect(crossover.group.findings[0]?.mrmc).not.toBeNull();
    expect(uncovered(crossover)).toEqual([]);
  });
  it('would notice a new figure', () => {
    expect(uncovered({ ...sequential, group: { ...sequential.group, new_figure: 1 } })).toEqual(['group.new_figure']);
  });
});

const first = (report: typeof sequential): GroupFinding => report.group.findings[0] as GroupFinding;

describe('plot data equals the engine figures', () => {
  it('reliance forest: each reader’s over- and under-reliance with its Wilson interval, then the reader average and pooled', () => {
    const g = first(sequential);
    const readers = readersOf(sequential, g.finding);
    const rows = relianceRows(readers, g);
    expect(rows).toHaveLength(2 * (readers.length + 2));
    readers.forEach(({ entry }, i) => {
      const over = rows[i];
      expect([over?.label, over?.estimate, over?.lower, over?.upper]).toEqual([entry.reader_id, entry.aided?.overreliance.estimate, entry.aided?.overreliance.lower, entry.aided?.overreliance.upper]);
      const under = rows[readers.length + 2 + i];
      expect([under?.estimate, under?.lower, under?.upper]).toEqual([entry.aided?.underreliance.estimate, entry.aided?.underreliance.lower, entry.aided?.underreliance.upper]);
    });
    const avg = rows.find((r) => r.label === READER_AVERAGE);
    expect([avg?.estimate, avg?.lower, avg?.upper]).toEqual([g.reader_averaged.overreliance.estimate, g.reader_averaged.overreliance.lower, g.reader_averaged.overreliance.upper]);
    expect(rows.find((r) => r.label === POOLED)?.estimate).toBe(g.pooled.aided?.overreliance.estimate);
  });

  it('switching: changed, toward, beneficial, detrimental per reader and pooled', () => {
    const g = first(sequential);
    const readers = readersOf(sequential, g.finding);
    const rows = switchingRows(readers, g);
    for (const [key, measure] of [['changed', 'Changed the call'], ['toward_ai', 'Changed toward the suggestion'], ['beneficial', 'Wrong → right'], ['detrimental', 'Right → wrong']] as const) {
      const mine = rows.filter((r) => r.measure === measure);
      expect(mine.map((r) => r.estimate)).toEqual([...readers.map(({ entry }) => entry.sequential?.[key].estimate), g.pooled.sequential?.[key].estimate]);
      expect(mine.map((r) => r.lower)).toEqual([...readers.map(({ entry }) => entry.sequential?.[key].lower), g.pooled.sequential?.[key].lower]);
    }
  });

  it('differences: accuracy with − without per reader, paired DeLong AUC ± z·SE, reader average, and the multi-reader result', () => {
    const g = first(crossover);
    const readers = readersOf(crossover, g.finding);
    const rows = differenceRows(readers, g);
    const acc = rows.filter((r) => r.measure === 'Accuracy');
    readers.forEach(({ entry }, i) => expect(acc[i]?.estimate).toBe((entry.aided?.accuracy.estimate ?? 0) - (entry.unaided?.accuracy.estimate ?? 0)));
    expect(acc.at(-1)?.estimate).toBe(g.reader_averaged.accuracy_difference.estimate);
    const auc = rows.filter((r) => r.measure === 'AUC');
    readers.forEach(({ entry }, i) => {
      const p = entry.crossover?.auc_difference;
      expect(p).toBeTruthy();
      expect(auc[i]?.estimate).toBe(p?.difference);
      expect(auc[i]?.lower).toBeCloseTo(Math.max(-1, (p?.difference ?? 0) - Z95 * (p?.se ?? 0)), 15);
    });
    const last = auc.at(-1);
    expect([last?.estimate, last?.lower, last?.upper]).toEqual([g.mrmc?.random.difference, g.mrmc?.random.lower, g.mrmc?.random.upper]);
  });

  it('caution notice and reading time rows are the engine figures', () => {
    const g = first(sequential);
    const readers = readersOf(sequential, g.finding);
    const c = cautionRows(readers, g);
    expect(c.filter((r) => r.series === 'with notice').map((r) => r.estimate)).toEqual([...readers.map(({ entry }) => entry.aided?.caution.shown.estimate), g.pooled.aided?.caution.shown.estimate]);
    const t = timeRows(readers, g);
    expect(t[0]?.estimate).toBe((readers[0]?.entry.unaided?.time.median_ms ?? 0) / 1000);
    expect(t[0]?.upper).toBe((readers[0]?.entry.unaided?.time.q3_ms ?? 0) / 1000);
  });

  it('multi-reader rows clip intervals to [-1, 1] and flag the clipped ends', () => {
    const g = first(crossover);
    const test = { difference: 0.1, se: 0.6, lower: -1.021, upper: 1.2, f: 1, df1: 1, ddf: 1, p: 0.5 };
    const rows = mrmcRows({ ...g, mrmc: g.mrmc && { ...g.mrmc, random: test } });
    expect(rows[0]).toEqual({ label: 'Other readers, other cases', difference: 0.1, lower: -1, upper: 1, clippedLower: true, clippedUpper: true });
    expect(rows[1]?.clippedLower).toBe(false);
    expect(clipInterval(-0.2, 0.3, -1, 1)).toEqual({ lower: -0.2, upper: 0.3, clippedEnds: [] });
    expect(mrmcRows({ ...g, mrmc: null })).toEqual([]);
  });
});
