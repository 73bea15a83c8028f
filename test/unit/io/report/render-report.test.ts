// The report page from the data model: case review only when complete, images only as data:
// URLs of PNG/JPEG, the cautions, and the peers shown only as unnamed values.
import { describe, expect, it } from 'vitest';
import { analyzeReads } from '../../../../src/analysis/engine';
import { readerReport } from '../../../../src/analysis/reader-report/reader-report';
import { plotDocument } from '../../../../src/cli/plot-document';
import { reportBody, reportPage } from '../../../../src/io/report/render-report';
import { simulateReadRows } from '../../../../bench/simulate-log';

const rows = simulateReadRows({ seed: 11, readers: 4, cases: 40 });
const analysis = analyzeReads(rows, { boot: 0 });
const make = (complete: boolean, images: Map<string, string> | null = null) =>
  reportPage(readerReport({ analysis, rows, readerId: 'R3', complete }), { document: plotDocument(), images });

describe('reportPage', () => {
  it('leaves the case review out while a period is open', () => {
    const open = make(false);
    expect(open).not.toMatch(/data-review-case=/);
    expect(open).toContain('The case review appears once all of your periods are complete');
    expect(make(true)).toMatch(/data-review-case=/);
  });
  it('takes case images only as data: URLs of PNG or JPEG', () => {
    const report = readerReport({ analysis, rows, readerId: 'R3', complete: true });
    const [first, second] = report.case_review ?? [];
    expect(first && second).toBeTruthy();
    const html = make(true, new Map([[first?.case_id ?? '', 'data:image/png;base64,iVBORw0KGgo='], [second?.case_id ?? '', 'https://example.org/x.png']]));
    expect(html).toContain('<img src="data:image/png;base64,iVBORw0KGgo="');
    expect(html).not.toContain('example.org');
  });
  it('carries the cautions and names only this reader', () => {
    const html = make(true);
    expect(html).toContain('not a medical device');
    expect(html).toContain('must not be used for credentialing');
    expect(html).toMatch(/Reader R3/);
    for (const other of ['R1', 'R2', 'R4']) expect(html).not.toMatch(new RegExp(`\\b${other}\\b`));
    expect(html).toMatch(/Other readers \(3, not named\)/);
  });
  it('leaves the styles out of the markup for the app, handing each plot to the page first', () => {
    const report = readerReport({ analysis, rows, readerId: 'R3', complete: true });
    const inline = reportBody(report, { document: plotDocument() });
    expect(inline).toContain('<style>');
    const handed: string[] = [];
    const outside = reportBody(report, {
      document: plotDocument(), styles: 'outside',
      beforeMarkup: (node) => { handed.push(node.tagName.toLowerCase()); for (const style of Array.from(node.querySelectorAll('style'))) style.remove(); },
    });
    expect(outside).not.toContain('<style');
    expect(handed.length).toBe((inline.match(/<div class="plot">/g) ?? []).length);
    expect(handed.length).toBeGreaterThan(2);
    expect(outside).toContain('class="heed-plot"');
  });
});
