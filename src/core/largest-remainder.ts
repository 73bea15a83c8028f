/**
 * Proportional allocation by the largest-remainder (Hamilton) method: share `total` whole units
 * among groups in proportion to their sizes. Each group first gets floor(total * size / sum);
 * the units left go one each to the groups with the largest fractional parts, ties to the
 * earlier group. Every group gets at most its size, and the shares add up to `total` exactly.
 *
 * Throws RangeError when total or a size is not a whole number >= 0, or total > sum of sizes.
 * Example: allocateLargestRemainder(5, [6, 3, 1]) -> [3, 2, 0]  (quotas 3.0, 1.5, 0.5; the tie
 * between 1.5 and 0.5's remainders (both .5) goes to the earlier group).
 */
export const allocateLargestRemainder = (total: number, sizes: readonly number[]): number[] => {
  const whole = (v: number): boolean => Number.isInteger(v) && v >= 0;
  if (!whole(total) || !sizes.every(whole)) {
    throw new RangeError(`allocation needs whole numbers >= 0, got total ${total} and sizes ${sizes.join(', ')}`);
  }
  const sum = sizes.reduce((a, b) => a + b, 0);
  if (total > sum) throw new RangeError(`cannot allocate ${total} among groups of ${sum} in all`);
  if (total === 0) return sizes.map(() => 0);
  // Work in integers (total * size and its remainder mod sum) so no rounding slips in.
  const shares = sizes.map((s) => Math.floor((total * s) / sum));
  const remainders = sizes.map((s, i) => ({ i, r: (total * s) % sum }));
  let left = total - shares.reduce((a, b) => a + b, 0);
  remainders.sort((a, b) => b.r - a.r || a.i - b.i);
  for (const { i } of remainders) {
    if (left === 0) break;
    shares[i] = (shares[i] ?? 0) + 1;
    left -= 1;
  }
  return shares;
};
