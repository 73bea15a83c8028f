import Papa from 'papaparse';
import { csvCell, csvLine } from '../../../src/io/csv-line';
import { readLogCsv } from '../../../src/io/read-log-export';
import type { ReadRow } from '../../../src/core/read-log';
import { neutraliseCell } from '../../../src/core/formula-text';
import { READ_LOG_COLUMNS, READ_LOG_OPTIONAL_COLUMNS } from '../../../src/core/read-log';

// Reference: papaparse 5.7.1 `Papa.unparse(data, { newline: '\n', quotes: false, quoteChar: '"', escapeChar: '"' })`,
// the call the read log was written with before io/csv-line.ts; the bytes must stay the same, since
// bundles written before are verified by writing their reads.csv again and comparing line by line.
const papa = (fields: string[], data: string[][]): string => Papa.unparse({ fields, data }, { newline: '\n', quotes: false, quoteChar: '"', escapeChar: '"' });

const AWKWARD = ['', 'plain', 'a,b', 'say "hi"', '"', '""', ' lead', 'trail ', ' ', 'two\nlines', 'cr\r', '\r\n', '\ufeffbom', 'mid\ufeffbom',
  "'quoted", '=SUM(A1)', '-3.5', '@x', 'tab\tin', 'ünïcödé ✓', 'comma, "and" quote', '  ', 'x y'];

describe('csvCell and csvLine (the same text as papaparse 5.7.1 unparse)', () => {
  it('quotes and escapes each awkward cell as unparse does', () => {
    for (const value of AWKWARD) expect(csvCell(value), JSON.stringify(value)).toBe(papa(['h'], [[value]]).split('\n').slice(1).join('\n'));
  });

  it('writes whole lines as unparse does, on random cells from the awkward ones', () => {
    let state = 7;
    const next = () => { state = (state * 1103515245 + 12345) % 2147483648; return state; };
    const rows = Array.from({ length: 200 }, () => Array.from({ length: 6 }, () => AWKWARD[next() % AWKWARD.length] ?? ''));
    const header = ['a', 'b c', 'd,e', 'f', 'g', 'h'];
    expect([csvLine(header), ...rows.map(csvLine)].join('\n')).toBe(papa(header, rows));
  });
});

describe('readLogCsv against unparse', () => {
  it('gives the bytes the former papaparse writer gave, attribute and extra columns included', () => {
    const base: ReadRow = {
      study_id: 'st', reader_id: 'R1', reader_role: 'radiologist, senior', reader_years: 12, sequence: 'UA', period: 1,
      assistance: 'sequential', case_id: 'c1', finding: 'target', practice: 0, order: 3, truth: 1, ai_call: 0, ai_score: -0.25,
      ai_planted: 1, caution_shown: 0, initial_call: 1, initial_confidence: 70, initial_ms: 812.5, final_call: 0,
      final_confidence: 55, total_ms: 2040.1, shown_at: '2026-12-01T10:00:00.000Z',
      scale: 'call-confidence', initial_rating: null, final_rating: 4, training: 0, withdrawn: 1, case_attributes: { scanner: 'Korvik "B"', 'site, west': '=1+1' },
    };
    const rows: ReadRow[] = AWKWARD.map((text, i) => ({ ...base, reader_role: text, case_id: `c${i}`, order: i, case_attributes: { scanner: text, 'site, west': AWKWARD[(i * 5) % AWKWARD.length] ?? '' } }));
    const names = ['scanner', 'site, west'];
    const extra = { names: ['read_id', 'read_hash'], cells: (i: number) => [`r/${i}`, i % 2 === 0 ? 'ab' : ' x'] };
    const columns = [...READ_LOG_COLUMNS, ...READ_LOG_OPTIONAL_COLUMNS];
    const former = `${papa([...columns, ...names.map((n) => `case_${n}`), ...extra.names], rows.map((row, i) => [
      ...columns.map((c) => (row[c] === null ? '' : neutraliseCell(String(row[c])))),
      ...names.map((n) => neutraliseCell(row.case_attributes[n] ?? '')),
      ...extra.cells(i),
    ]))}\n`;
    expect(readLogCsv(rows, names, extra)).toBe(former);
    // no rows: the header line alone (papaparse then gave the header and an empty line, which the
    // bundle verifier counted as one read, so a bundle of a study without answers was refused)
    const header = papa([...columns, ...names.map((n) => `case_${n}`)], []);
    expect(header.endsWith(',"case_site, west"\n')).toBe(true);
    expect(readLogCsv([], names)).toBe(header);
  });
});
