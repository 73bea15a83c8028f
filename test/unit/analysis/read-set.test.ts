import { describe, expect, it } from 'vitest';
import { attributeCodes, attributeNames } from '../../../src/analysis/attribute-codes';
import { allRows, checkScores, logColumns, readColumns } from '../../../src/analysis/read-columns';
import { partition, partitionReads, sectionReads } from '../../../src/analysis/read-set';
import { aided, makeRead } from './make-read';

describe('partition', () => {
  it('splits rows by key and keeps their order', () => {
    const key = Int32Array.of(0, 1, 0, 2, 1);
    expect(partition(Int32Array.of(4, 3, 2, 1, 0), key, 3).map((p) => [...p])).toEqual([[2, 0], [4, 1], [3]]);
  });

  it('partitionReads gives each order of each part exactly as filtering that order by key would', () => {
    // 600 rows, a pseudo-random key of 7 values (one never used) and aided flag; orders shuffled by hand
    const n = 600;
    const key = Int32Array.from({ length: n }, (_, i) => ((i * 7919) % 13) % 6);
    const isAided = Int32Array.from({ length: n }, (_, i) => ((i * 104729) % 11) % 2);
    const all = Int32Array.from({ length: n }, (_, i) => (i * 37) % n);
    const order = (salt: number, flag: number) => all.filter((r) => isAided[r] === flag).sort((a, b) => ((a * salt) % 101) - ((b * salt) % 101) || a - b);
    const set = (flag: number) => ({ rows: all.filter((r) => isAided[r] === flag), byScore: order(31, flag), byTime: order(57, flag) });
    const reads = { all, unaided: set(0), aided: set(1) };
    const parts = partitionReads(reads, key, 7);
    const only = (rows: Int32Array, v: number) => [...rows].filter((r) => key[r] === v);
    for (let v = 0; v < 7; v++) {
      if (only(all, v).length === 0) {
        expect(parts[v]).toBeNull();
        continue;
      }
      expect([...(parts[v]?.all ?? [])]).toEqual(only(all, v));
      for (const cond of ['unaided', 'aided'] as const) {
        for (const o of ['rows', 'byScore', 'byTime'] as const) expect([...(parts[v]?.[cond][o] ?? [])]).toEqual(only(reads[cond][o], v));
      }
    }
    expect(parts[6]).toBeNull();
  });
});

describe('sectionReads and partitionReads', () => {
  const rows = [
    makeRead({ reader_id: 'R2', case_id: 'C1', total_ms: 900, final_confidence: 10 }),
    aided(1, 1, 1, { reader_id: 'R1', case_id: 'C1', total_ms: 100, case_attributes: { scanner: 'B' } }),
    makeRead({ reader_id: 'R1', case_id: 'C2', total_ms: 500, final_confidence: 90, case_attributes: { scanner: 'A' } }),
    makeRead({ reader_id: 'R1', case_id: 'C3', total_ms: 300, final_confidence: 50, case_attributes: { scanner: 'B' } }),
  ];
  const cols = readColumns(rows);
  const reads = sectionReads(cols, allRows(cols));

  it('split by condition and sort each by score and by time', () => {
    expect([...reads.aided.rows]).toEqual([1]);
    expect([...reads.unaided.rows]).toEqual([0, 2, 3]);
    expect([...reads.unaided.byScore]).toEqual([0, 3, 2]);
    expect([...reads.unaided.byTime]).toEqual([3, 2, 0]);
  });

  it('a reader keeps its share of both sorted orders; a reader with no read is null', () => {
    const parts = partitionReads(reads, cols.reader, 3);
    expect(cols.readerIds).toEqual(['R2', 'R1']);
    expect([...(parts[1]?.unaided.byTime ?? [])]).toEqual([3, 2]);
    expect([...(parts[1]?.all ?? [])]).toEqual([1, 2, 3]);
    expect(parts[2]).toBeNull();
  });

  it('attribute values are coded in sorted order, an absent value as the empty one', () => {
    const [scanner] = attributeCodes(cols, ['scanner']);
    expect(scanner?.values).toEqual(['', 'A', 'B']);
    expect([...(scanner?.code ?? [])]).toEqual([0, 2, 1, 2]);
  });
});

describe('log columns', () => {
  it('a left-out read with an unusable score is no error; an analysed one is, with finalScore\'s message', () => {
    const bad = makeRead({ case_id: 'C9', final_confidence: 150, practice: 1 });
    const cols = logColumns([makeRead(), bad]);
    expect(() => checkScores(cols, Int32Array.of(0))).not.toThrow();
    expect(() => checkScores(cols, Int32Array.of(0, 1))).toThrow(RangeError);
    expect(() => readColumns([makeRead(), bad])).toThrow(RangeError);
  });

  it('attribute names come in order of first appearance among the given reads only', () => {
    const rows = [
      makeRead({ case_attributes: { site: 'X' } }),
      makeRead({ case_id: 'C2', case_attributes: { scanner: 'A', site: 'Y' } }),
      makeRead({ case_id: 'C3', case_attributes: { zone: 'Z' } }),
    ];
    const cols = logColumns(rows);
    expect(attributeNames(cols, Int32Array.of(0, 1))).toEqual(['site', 'scanner']);
    expect(attributeNames(cols, Int32Array.of(2, 1))).toEqual(['zone', 'scanner', 'site']);
  });
});
