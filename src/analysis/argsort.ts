/**
 * Stable ascending argsort of finite doubles: perm[k] is the index of the k-th smallest value.
 * Large arrays use an LSD radix sort on the IEEE-754 bits (flipped so unsigned order matches
 * numeric order; 16-bit digits, digits shared by every key skipped), O(n); small arrays a
 * comparison sort. −0 sorts before +0; callers that compare with === treat them as equal runs.
 * Example: argsort(Float64Array.of(3, 1, 2)) → [1, 2, 0].
 */
export const argsort = (values: Float64Array): Uint32Array => {
  const n = values.length;
  const perm = new Uint32Array(n);
  for (let i = 0; i < n; i++) perm[i] = i;
  if (n < RADIX_MIN) return perm.sort((a, b) => (values[a] as number) - (values[b] as number) || a - b);
  const words = new Uint32Array(values.buffer, values.byteOffset, n * 2);
  const hi = new Uint32Array(n);
  const lo = new Uint32Array(n);
  // little-endian word order is what every platform Heed runs on uses
  for (let i = 0; i < n; i++) {
    const h = words[2 * i + 1] as number;
    const l = words[2 * i] as number;
    if (h & 0x80000000) {
      hi[i] = ~h >>> 0;
      lo[i] = ~l >>> 0;
    } else {
      hi[i] = (h | 0x80000000) >>> 0;
      lo[i] = l;
    }
  }
  let src = perm;
  let dst = new Uint32Array(n);
  const count = new Uint32Array(65536);
  for (const [key, shift] of [[lo, 0], [lo, 16], [hi, 0], [hi, 16]] as const) {
    count.fill(0);
    for (let i = 0; i < n; i++) {
      const d = ((key[i] as number) >>> shift) & 0xffff;
      count[d] = (count[d] as number) + 1;
    }
    if (count[((key[0] as number) >>> shift) & 0xffff] === n) continue;
    let sum = 0;
    for (let d = 0; d < 65536; d++) {
      const c = count[d] as number;
      count[d] = sum;
      sum += c;
    }
    for (let k = 0; k < n; k++) {
      const i = src[k] as number;
      const d = ((key[i] as number) >>> shift) & 0xffff;
      dst[count[d] as number] = i;
      count[d] = (count[d] as number) + 1;
    }
    const t = src;
    src = dst;
    dst = t;
  }
  return src;
};

const RADIX_MIN = 4096;
