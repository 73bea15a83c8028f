/** Branded units that are easy to mix up. Construct them with the helpers, which check the range. */
export type Ms = number & { readonly __unit: 'ms' };
/** A probability in [0, 1], such as a model score. */
export type Probability = number & { readonly __unit: 'probability' };
/** A 0..100 value: a confidence, or the derived likelihood score (docs/formats.md, "The derived score"). */
export type Score100 = number & { readonly __unit: 'score100' };

export const ms = (value: number): Ms => {
  if (!Number.isFinite(value) || value < 0) throw new RangeError(`not a duration in ms: ${value}`);
  return value as Ms;
};

export const probability = (value: number): Probability => {
  if (!(value >= 0 && value <= 1)) throw new RangeError(`not a probability in [0,1]: ${value}`);
  return value as Probability;
};

export const score100 = (value: number): Score100 => {
  if (!(value >= 0 && value <= 100)) throw new RangeError(`not a 0..100 value: ${value}`);
  return value as Score100;
};
