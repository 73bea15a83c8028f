/** Below this many readers the random-reader result carries a warning (common practice, no source). */
export const MIN_READERS_RANDOM = 4;

/**
 * The caution shown with an Obuchowski-Rockette result of fewer than 4 readers. With t = 2
 * modalities, MS(TR) (the reader-by-modality spread the random-reader test leans on) has only
 * r − 1 degrees of freedom, so with 2 or 3 readers the random-reader interval is wide and unstable.
 * The threshold of 4 is common practice with no published source that we can cite; it is a rule
 * of thumb, not a result.
 * Example: readerCountWarning(3) → 'Only 3 readers: ...'; readerCountWarning(4) → null.
 */
export const readerCountWarning = (readers: number): string | null =>
  readers >= MIN_READERS_RANDOM
    ? null
    : `Only ${readers} readers: the random-reader result (generalising to other readers) rests on ${readers - 1} degree${readers - 1 === 1 ? '' : 's'} of freedom for reader variation and is unreliable; read it with caution. Fewer than ${MIN_READERS_RANDOM} readers is a common-practice threshold with no published source.`;
