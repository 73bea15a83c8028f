// Numbers for the ids of a read log (reader, case, finding, role, attribute values), in order of
// first appearance, looked up straight from the file's bytes: a cell whose bytes were seen before
// gets its number without a string being made (a log repeats a few thousand ids 100,000 times).
// Distinct byte sequences may share a number (the text is what counts: see ofBytes).

const EMPTY = -1;

/** UTF-8 text of bytes[from, to); the caller has checked the bytes are UTF-8. */
export const textOf = (bytes: Uint8Array, from: number, to: number): string => {
  let ascii = true;
  for (let i = from; i < to; i++) {
    if ((bytes[i] as number) >= 0x80) {
      ascii = false;
      break;
    }
  }
  if (!ascii) return utf8.decode(bytes.subarray(from, to));
  let s = '';
  for (let i = from; i < to; i++) s += String.fromCharCode(bytes[i] as number);
  return s;
};

const utf8 = new TextDecoder('utf-8', { ignoreBOM: true });

export type IdTable = {
  /** the texts, by number */
  ids: string[];
  /** the number of a text (a new one when first seen) */
  ofText: (text: string) => number;
  /**
   * The number of the text `textOf(bytes, from, to)` would give after `restore` (the caller's
   * rule, a function of the text alone), so bytes that give the same text share a number.
   */
  ofBytes: (bytes: Uint8Array, from: number, to: number) => number;
};

/** An empty table; `restore` maps a cell's raw text to the id it stands for. */
export const idTable = (restore: (raw: string) => string): IdTable => {
  const ids: string[] = [];
  const byText = new Map<string, number>();
  const ofText = (text: string): number => {
    let k = byText.get(text);
    if (k === undefined) {
      k = ids.length;
      byText.set(text, k);
      ids.push(text);
    }
    return k;
  };
  // open addressing over byte sequences: slot → entry, entry → (start in pool, length, number)
  let slots: Int32Array = new Int32Array(64).fill(EMPTY);
  let mask = 63;
  let hashes: Int32Array = new Int32Array(32);
  let starts: Int32Array = new Int32Array(32);
  let lengths: Int32Array = new Int32Array(32);
  let numbers: Int32Array = new Int32Array(32);
  let entries = 0;
  let pool: Uint8Array = new Uint8Array(256);
  let used = 0;
  const grow = (): void => {
    const size = hashes.length * 2;
    const more = (a: Int32Array): Int32Array => {
      const b = new Int32Array(size);
      b.set(a);
      return b;
    };
    hashes = more(hashes);
    starts = more(starts);
    lengths = more(lengths);
    numbers = more(numbers);
    slots = new Int32Array(size * 2).fill(EMPTY);
    mask = size * 2 - 1;
    for (let e = 0; e < entries; e++) {
      let s = (hashes[e] as number) & mask;
      while (slots[s] !== EMPTY) s = (s + 1) & mask;
      slots[s] = e;
    }
  };
  // the last cell looked up (reader, finding and role ids come in long runs): compared first
  let lastBytes: Uint8Array | null = null;
  let lastFrom = 0;
  let lastLength = -1;
  let lastNumber = 0;
  const ofBytes = (bytes: Uint8Array, from: number, to: number): number => {
    const len = to - from;
    if (len === lastLength && bytes === lastBytes) {
      let j = 0;
      while (j < len && bytes[from + j] === bytes[lastFrom + j]) j++;
      if (j === len) {
        lastFrom = from;
        return lastNumber;
      }
    }
    const k = lookUp(bytes, from, to);
    lastBytes = bytes;
    lastFrom = from;
    lastLength = len;
    lastNumber = k;
    return k;
  };
  const lookUp = (bytes: Uint8Array, from: number, to: number): number => {
    // FNV-1a
    let h = 0x811c9dc5;
    for (let i = from; i < to; i++) h = Math.imul(h ^ (bytes[i] as number), 0x01000193);
    const len = to - from;
    let s = h & mask;
    for (;;) {
      const e = slots[s] as number;
      if (e === EMPTY) break;
      if (hashes[e] === h && lengths[e] === len) {
        const at = starts[e] as number;
        let same = true;
        for (let j = 0; j < len; j++) {
          if (pool[at + j] !== bytes[from + j]) {
            same = false;
            break;
          }
        }
        if (same) return numbers[e] as number;
      }
      s = (s + 1) & mask;
    }
    const k = ofText(restore(textOf(bytes, from, to)));
    if (used + len > pool.length) {
      const bigger = new Uint8Array(Math.max(pool.length * 2, used + len));
      bigger.set(pool.subarray(0, used));
      pool = bigger;
    }
    pool.set(bytes.subarray(from, to), used);
    if (entries === hashes.length) {
      grow();
      s = h & mask;
      while (slots[s] !== EMPTY) s = (s + 1) & mask;
    }
    hashes[entries] = h;
    starts[entries] = used;
    lengths[entries] = len;
    numbers[entries] = k;
    slots[s] = entries;
    entries++;
    used += len;
    return k;
  };
  return { ids, ofText, ofBytes };
};
