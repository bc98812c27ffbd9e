/**
 * Local discomfort caused by radiant temperature asymmetry, ISO 7730:2005 clause 6.5.
 */

/** Kind of radiant temperature asymmetry. */
export type RadiantAsymmetryKind = "warmCeiling" | "coolWall" | "coolCeiling" | "warmWall";

/** All asymmetry kinds, in the order of ISO 7730:2005 Figure 5 [1]. */
export const RADIANT_ASYMMETRY_KINDS: ReadonlyArray<RadiantAsymmetryKind> = [
  "warmCeiling",
  "coolWall",
  "coolCeiling",
  "warmWall",
];

/**
 * Upper end of each curve's validity range, °C (ISO 7730:2005 clause 6.5: warm ceiling
 * Δt < 23 °C, cool wall < 15 °C, cool ceiling < 15 °C, warm wall < 35 °C) [1].
 */
export const RADIANT_ASYMMETRY_MAX_DELTA_C: Readonly<Record<RadiantAsymmetryKind, number>> = {
  warmCeiling: 23,
  coolWall: 15,
  coolCeiling: 15,
  warmWall: 35,
};

/** Percentage dissatisfied with a flag for the curve's validity range. */
export interface RadiantAsymmetryResult {
  /** Percentage dissatisfied PD, %, ≥ 0. */
  percent: number;
  /** True when Δt is below the curve's upper limit ({@link RADIANT_ASYMMETRY_MAX_DELTA_C}). */
  withinRange: boolean;
}

/**
 * Percentage dissatisfied due to radiant temperature asymmetry, with a validity flag,
 * ISO 7730:2005 clause 6.5 (equations of Figure 5; the same curves as ASHRAE 55) [1][3]:
 *
 * - warm ceiling: PD = 100/(1 + exp(2.84 − 0.174·Δt)) − 5.5   (Δt < 23 °C)
 * - cool wall:    PD = 100/(1 + exp(6.61 − 0.345·Δt))         (Δt < 15 °C)
 * - cool ceiling: PD = 100/(1 + exp(9.93 − 0.50·Δt))          (Δt < 15 °C)
 * - warm wall:    PD = 100/(1 + exp(3.72 − 0.052·Δt)) − 3.5   (Δt < 35 °C)
 *
 * Negative results (small Δt on the two curves with an offset) are clamped to 0. Beyond
 * the curve's limit the formula value is returned and `withinRange` is false.
 *
 * @param kind   kind of asymmetry.
 * @param deltaC radiant temperature asymmetry Δt_pr, °C (K), finite and ≥ 0.
 * @returns PD (%) and the validity flag.
 * @throws RangeError for an unknown kind or a negative/non-finite deltaC.
 */
export function radiantAsymmetryDissatisfiedDetailed(
  kind: RadiantAsymmetryKind,
  deltaC: number,
): RadiantAsymmetryResult {
  if (!Number.isFinite(deltaC) || deltaC < 0) {
    throw new RangeError(`deltaC must be a finite radiant temperature asymmetry ≥ 0 °C, got ${String(deltaC)}`);
  }
  let pd: number;
  switch (kind) {
    case "warmCeiling":
      pd = 100 / (1 + Math.exp(2.84 - 0.174 * deltaC)) - 5.5;
      break;
    case "coolWall":
      pd = 100 / (1 + Math.exp(6.61 - 0.345 * deltaC));
      break;
    case "coolCeiling":
      pd = 100 / (1 + Math.exp(9.93 - 0.5 * deltaC));
      break;
    case "warmWall":
      pd = 100 / (1 + Math.exp(3.72 - 0.052 * deltaC)) - 3.5;
      break;
    default:
      throw new RangeError(`unknown radiant asymmetry kind: ${String(kind)}`);
  }
  return { percent: pd > 0 ? pd : 0, withinRange: deltaC < RADIANT_ASYMMETRY_MAX_DELTA_C[kind] };
}

/**
 * Percentage dissatisfied, %, due to radiant temperature asymmetry, ISO 7730:2005
 * clause 6.5 [1]; see {@link radiantAsymmetryDissatisfiedDetailed} for the curves,
 * clamping and the validity flag.
 *
 * @param kind   kind of asymmetry.
 * @param deltaC radiant temperature asymmetry, °C (K), finite and ≥ 0.
 * @returns PD, %, ≥ 0.
 * @throws RangeError for an unknown kind or a negative/non-finite deltaC.
 */
export function radiantAsymmetryDissatisfied(kind: RadiantAsymmetryKind, deltaC: number): number {
  return radiantAsymmetryDissatisfiedDetailed(kind, deltaC).percent;
}
