import Papa from 'papaparse';
import { READ_LOG_COLUMNS, READ_LOG_OPTIONAL_COLUMNS, type ReadRow } from '../../../src/core/read-log';
import { readLogCsv } from '../../../src/io/read-log-export';

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
