/**
 * The report's rule for small counts: a share built on fewer than MIN_READS reads is shown but
 * called too few to judge. Common practice, no source: with 10 reads and half of them one way,
 * the 95% Wilson interval runs from 24% to 76%, wider than half of the whole scale, so one more
 * read either way moves the share by ten points; below that, a share says almost nothing.
 */
export const MIN_READS = 10;

export const SMALL_COUNT_RULE =
  `A share built on fewer than ${MIN_READS} reads is called too few to judge: with 10 reads split evenly, the 95% interval already runs from 24% to 76%, and one read more or less moves the share by 10 points.`;

/** True when n reads are too few to judge a share by (see MIN_READS). */
export const tooFew = (n: number): boolean => n < MIN_READS;
