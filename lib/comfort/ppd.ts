/**
 * Predicted percentage of dissatisfied (PPD) from the PMV.
 */

/**
 * PPD from PMV, ISO 7730:2005 clause 4.2, equation (5) [1]:
 * PPD = 100 − 95 · exp(−0.03353·PMV⁴ − 0.2179·PMV²). Minimum 5 % at PMV = 0,
 * symmetric in PMV.
 *
 * @param pmv predicted mean vote, dimensionless, any finite value (the standard uses −3…+3).
 * @returns PPD, %, in [5, 100); NaN for NaN input.
 */
export function ppdFromPmv(pmv: number): number {
  const p2 = pmv * pmv;
  return 100 - 95 * Math.exp(-0.03353 * p2 * p2 - 0.2179 * p2);
}
