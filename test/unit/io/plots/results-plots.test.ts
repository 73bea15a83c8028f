/**
 * The results page's plot builders draw in Node too (the CLI's linkedom document), so the CLI's
 * reports can use the same figures: each gives one SVG with the marks its data asks for.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { analyzeReads } from '../../../../src/analysis/engine';
import { rocCurves } from '../../../../src/analysis/roc-curves';
import { plotDocument } from '../../../../src/cli/plot-document';
import { calibrationPlot } from '../../../../src/io/plots/calibration-plot';
import { forestPlot } from '../../../../src/io/plots/forest-plot';
import { mrmcPlot } from '../../../../src/io/plots/mrmc-plot';
import { plotMarkup } from '../../../../src/io/plots/render';
import { rocPlot, rocSmallMultiples } from '../../../../src/io/plots/roc-plot';
import { subgroupPlot } from '../../../../src/io/plots/subgroup-plot';
import { parseReadLog } from '../../../../src/io/read-log-parse';
import { calibrationPoints, differenceRows, mrmcRows, readersOf, relianceRows, subgroupPoints } from '../../../../src/ui/results/figure-data';

const rows = parseReadLog(readFileSync(join(import.meta.dirname, '..', '..', '..', 'reference', 'fixtures', 'log-crossover.csv'), 'utf8'));
const report = analyzeReads(rows, { boot: 50 });
const g = report.group.findings[0];
const roc = rocCurves(rows)[0];

const count = (svg: string, pattern: RegExp) => (svg.match(pattern) ?? []).length;

describe('results plots drawn in Node', () => {
  it('has a fully crossed finding to draw', () => {
    expect(g?.mrmc).not.toBeNull();
    expect(roc?.averaged.aided).not.toBeNull();
  });

  it('ROC: one path per condition and the AUCs written on it', () => {
    if (!g || !roc) throw new Error('no finding');
    const svg = plotMarkup(rocPlot({ lines: [{ condition: 'unaided', points: roc.averaged.unaided ?? [] }, { condition: 'aided', points: roc.averaged.aided ?? [] }], auc: { unaided: g.reader_averaged.unaided_auc.estimate, aided: g.reader_averaged.aided_auc.estimate } }), plotDocument());
    expect(svg).toMatch(/^<svg[^>]*xmlns="http:\/\/www\.w3\.org\/2000\/svg"/);
    expect(svg).toContain(`AUC ${(g.reader_averaged.aided_auc.estimate ?? 0).toFixed(3)}`);
    const multiples = plotMarkup(rocSmallMultiples({ readers: roc.readers.map((r) => ({ reader: r.reader_id, lines: [{ condition: 'aided', points: r.aided ?? [] }] })), columns: 3 }), plotDocument());
    for (const r of roc.readers) expect(multiples).toContain(`>${r.reader_id}<`);
  });

  it('forest plots, the multi-reader plot, subgroups and calibration draw, each row labelled', () => {
    if (!g) throw new Error('no finding');
    const readers = readersOf(report, g.finding);
    const reliance = relianceRows(readers, g);
    const svg = plotMarkup(forestPlot({ rows: reliance, reference: null, domain: [0, 1], percent: true, xLabel: 'share', width: 800 }), plotDocument());
    expect(count(svg, /<path[^>]*d="M[^"]*"[^>]*>/g)).toBeGreaterThan(0);
    for (const r of readers) expect(svg).toContain(`>${r.entry.reader_id}<`);
    expect(plotMarkup(forestPlot({ rows: differenceRows(readers, g), reference: 0, xLabel: 'diff', width: 800 }), plotDocument())).toContain('Multi-reader result');
    const m = plotMarkup(mrmcPlot({ rows: mrmcRows(g), width: 800 }), plotDocument());
    expect(m).toContain('Other readers, other cases');
    expect(plotMarkup(subgroupPlot({ points: subgroupPoints(g), width: 600 }), plotDocument())).toContain('site:');
    expect(plotMarkup(calibrationPlot({ points: calibrationPoints(g), size: 300 }), plotDocument())).toContain('<svg');
  });
});
