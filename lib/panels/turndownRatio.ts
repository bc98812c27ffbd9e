/**
 * Turndown ratio of an adjustable (louvered) panel.
 */

/**
 * Turndown ratio over a set of outputs, e.g. the outputs at the louver's angles:
 * highest / lowest (common practice for modulating equipment).
 *
 * @param outputs outputs in one unit (W or W/m²), at least one, all finite, lowest > 0.
 * @returns ratio ≥ 1, dimensionless.
 * @throws RangeError for an empty list, a non-finite value or a lowest output ≤ 0.
 */
export function turndownRatio(outputs: ReadonlyArray<number>): number {
  if (outputs.length === 0) {
    throw new RangeError("outputs must contain at least one value");
  }
  let lo = Number.POSITIVE_INFINITY;
  let hi = Number.NEGATIVE_INFINITY;
  for (let i = 0; i < outputs.length; i++) {
    const q = outputs[i] as number;
    if (!Number.isFinite(q)) {
      throw new RangeError(`outputs[${i}] must be finite, got ${String(q)}`);
    }
    if (q < lo) lo = q;
    if (q > hi) hi = q;
  }
  if (!(lo > 0)) {
    throw new RangeError(`the lowest output must be > 0 for a turndown ratio, got ${lo}`);
  }
  return hi / lo;
}
