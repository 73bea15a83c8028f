import { quantile } from '../quantile';

/** Below this many other readers no peer range is shown: with one or two, a range names them. */
export const MIN_PEERS = 3;

export type PeerRange = {
  /** other readers with a value */
  count: number;
  /** their values, sorted ascending so their order says nothing about who they are; empty when hidden */
  values: number[];
  median: number | null;
  min: number | null;
  max: number | null;
  /** why there is no range, else null */
  note: string | null;
};

/**
 * The anonymous peer range of one figure: median (Hyndman & Fan definition 7, as quantile.ts),
 * lowest and highest of the other readers' values. Fewer than MIN_PEERS values give no range
 * and a note saying why. Readers are never named or coded: only sorted values leave here.
 * Example: peerRange([0.5, 0.34, 0.97]) → median 0.5, min 0.34, max 0.97.
 */
export const peerRange = (others: readonly number[], what = 'figure'): PeerRange => {
  const values = [...others].sort((a, b) => a - b);
  if (values.length < MIN_PEERS) {
    const have = values.length === 0 ? 'no other reader has' : values.length === 1 ? 'only 1 other reader has' : `only ${values.length} other readers have`;
    return {
      count: values.length, values: [], median: null, min: null, max: null,
      note: `No comparison with other readers: ${have} this ${what}, and a range of fewer than ${MIN_PEERS} would let you work out who they are.`,
    };
  }
  return { count: values.length, values, median: quantile(values, 0.5), min: values[0] ?? null, max: values[values.length - 1] ?? null, note: null };
};
