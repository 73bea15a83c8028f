import Papa from 'papaparse';
import { READ_LOG_COLUMNS, READ_LOG_OPTIONAL_COLUMNS, type ReadRow } from '../../../src/core/read-log';
import { neutraliseCell } from '../../../src/core/formula-text';
import { csvCell, csvLine } from '../../../src/io/csv-line';
import { readLogCsv, type ExtraColumns } from '../../../src/io/read-log-export';
import { goldenLogs } from '../analysis/golden/golden-logs';

const row: ReadRow = {
  study_id: 'st', reader_id: 'R1', reader_role: 'radiologist, senior', reader_years: null, sequence: 'UA', period: 1,
  assistance: 'sequential', case_id: 'c1', finding: 'target', practice: 0, order: 3, truth: 1, ai_call: 0, ai_score: 0.25,
  ai_planted: 1, caution_shown: 0, initial_call: 1, initial_confidence: 70, initial_ms: 812.5, final_call: 0,
  final_confidence: 55, total_ms: 2040.1, shown_at: '2026-12-01T10:00:00.000Z',
  scale: 'call-confidence', initial_rating: null, final_rating: null, training: 0, withdrawn: 0, case_attributes: { scanner: 'Korvik "B"' },
};

describe('readLogCsv (docs/formats.md, "The read log")', () => {
  it('writes the required columns in order, then the optional ones, then case attributes, with \\n line ends and RFC 4180 quoting', () => {
    const csv = readLogCsv([row], ['scanner']);
    expect(csv.includes('\r')).toBe(false);
    const lines = csv.split('\n');
    expect(lines[0]).toBe([...READ_LOG_COLUMNS, 'scale', 'initial_rating', 'final_rating', 'training', 'withdrawn', 'case_scanner'].join(','));
    expect(READ_LOG_OPTIONAL_COLUMNS.join(',')).toBe('scale,initial_rating,final_rating,training,withdrawn');
    expect(lines[2]).toBe('');
    expect(lines[1]).toContain('"radiologist, senior"');
    expect(lines[1]).toContain('"Korvik ""B"""');
    const parsed = Papa.parse<Record<string, string>>(csv, { header: true, skipEmptyLines: true });
    const back = parsed.data[0]!;
    expect(back.reader_years).toBe('');
    expect(back.ai_planted).toBe('1');
    expect(back.initial_ms).toBe('812.5');
    expect(back.case_scanner).toBe('Korvik "B"');
  });
});

// Every cell written on its own, the way the writer did before it wrote bytes (cells from
// csv-line.ts and core/formula-text): the fast writer must give this text exactly.
const plainCsv = (rows: readonly ReadRow[], attributeNames: readonly string[], extra?: ExtraColumns): string => {
  const columns = [...READ_LOG_COLUMNS, ...READ_LOG_OPTIONAL_COLUMNS];
  const cell = (value: string | number | null): string => (value === null ? '' : typeof value === 'number' ? String(value) : csvCell(neutraliseCell(value)));
  const lines = [csvLine([...columns, ...attributeNames.map((name) => `case_${name}`), ...(extra?.names ?? [])])];
  rows.forEach((r, i) => {
    const cells = columns.map((c) => cell(r[c]));
    for (const name of attributeNames) cells.push(csvCell(neutraliseCell(r.case_attributes[name] ?? '')));
    if (extra) for (const value of extra.cells(i)) cells.push(csvCell(value));
    lines.push(cells.join(','));
  });
  return `${lines.join('\n')}\n`;
};

describe('readLogCsv writes the text of every cell written on its own', () => {
  for (const log of goldenLogs()) {
    it(`${log.name}`, () => {
      expect(readLogCsv(log.rows, log.attributes)).toBe(plainCsv(log.rows, log.attributes));
    });
  }

  it('on awkward text: quotes, commas, newlines, formulas, non-ASCII, shared and unshared attribute objects, odd numbers, extra columns', () => {
    const shared = { scanner: 'Korvik, "B"\nline two', site: '=SUM(A1)', note: ' lead space' };
    const awkward: ReadRow[] = [
      row,
      { ...row, case_attributes: shared },
      { ...row, case_id: 'c,2', reader_id: 'Ré "x"', case_attributes: shared, ai_score: 1e-7, initial_ms: -3.5, total_ms: 2 ** 31, order: 2147483647 },
      { ...row, case_id: '-c3', finding: '+f', sequence: null, reader_years: 0, case_attributes: { scanner: 'Øster ✓', site: '', note: "'@x" }, ai_score: Number.NaN, final_confidence: 0 },
      { ...row, reader_id: 'R2', period: 2, assistance: 'concurrent', shown_at: '2026-12-01T10:00:00.000Z\r', case_attributes: {}, initial_call: null, initial_ms: 12345678.25, total_ms: 10, order: 1000000 },
      { ...row, reader_id: 'R2', period: 3, assistance: 'concurrent', case_attributes: shared },
      { ...row, reader_id: 'R2', period: 3, assistance: 'concurrent', reader_years: 4, case_attributes: shared },
      { ...row, reader_id: 'R2', period: 3, assistance: 'concurrent', reader_years: 4, reader_role: 'resident', case_attributes: shared },
      { ...row, reader_id: 'R2', period: 3, assistance: 'concurrent', reader_years: 4, reader_role: 'resident', sequence: 'AU', case_attributes: shared },
      { ...row, study_id: 'st2', reader_id: 'R2', period: 3, assistance: 'concurrent', reader_years: 4, reader_role: 'resident', sequence: 'AU', case_attributes: shared },
      { ...row, reader_id: 'R2', period: 2, assistance: 'concurrent', scale: 'percent', initial_rating: 49.5, final_rating: 100, case_attributes: { scanner: '日本', site: 'x'.repeat(300), note: '\ufeffbom' } },
    ];
    const names = ['scanner', 'site', 'note'];
    expect(readLogCsv(awkward, names)).toBe(plainCsv(awkward, names));
    const extra: ExtraColumns = { names: ['read_id', 'hash'], cells: (i) => [`r${i}`, i % 2 === 0 ? 'a,b' : 'ü'] };
    expect(readLogCsv(awkward, names, extra)).toBe(plainCsv(awkward, names, extra));
    expect(readLogCsv([], names)).toBe(plainCsv([], names));
  });

  it('grows its buffer past the first guess (long non-ASCII text in attributes, times and extra columns)', () => {
    const long = Array.from({ length: 50 }, (_, i) => ({ ...row, order: i, shown_at: `${'é'.repeat(300)}${i}`, case_attributes: { scanner: `${'ü'.repeat(400)}${i}` } }));
    const extra: ExtraColumns = { names: ['note'], cells: (i) => [`${'✓'.repeat(500)}${i}`] };
    expect(readLogCsv(long, ['scanner'], extra)).toBe(plainCsv(long, ['scanner'], extra));
  });
});
