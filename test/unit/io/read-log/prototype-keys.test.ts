// case_<name> columns of a reads.csv named like prototype properties stay ordinary attributes.
import { analyzeReads } from '../../../../src/analysis/engine';
import { parseReadLog } from '../../../../src/io/read-log-parse';
import { SAMPLE_HEADER, sampleRows, toCsv } from '../read-log-sample';

describe('read-log case attributes named like prototype properties', () => {
  it('keeps case___proto__ and case_constructor as plain values', () => {
    const header = [...SAMPLE_HEADER, 'case___proto__', 'case_constructor'];
    const rows = sampleRows().map((r, i) => [...r, i % 2 === 0 ? 'North' : 'South', 'Halden']);
    const reads = parseReadLog(toCsv(rows, header));
    const first = reads[0]?.case_attributes;
    expect(Object.getOwnPropertyDescriptor(first, '__proto__')?.value).toBe('North');
    expect(first?.constructor).toBe('Halden');
    expect(Object.keys(first ?? {})).toEqual(['scanner', '__proto__', 'constructor']);
    const report = analyzeReads(reads, { boot: 0 });
    const names = report.readers[0]?.subgroups.map((s) => s.attribute);
    expect(names).toContain('__proto__');
  });
});
