/**
 * Draught rate (local discomfort caused by draught), ISO 7730:2005 clause 6.2.
 */
import { assertFinite, assertInClosedRange, assertNonNegative } from "./assert";

/** Draught rate with a flag for the model's validity range. */
export interface DraughtRateResult {
  /** Draught rate DR, %, 0…100. */
  percent: number;
  /** True for t_a 20…26 °C, v̄_a < 0.5 m/s and Tu 10…60 % (ISO 7730:2005 clause 6.2) [1]. */
  withinRange: boolean;
}

/**
 * Draught rate with a validity flag, ISO 7730:2005 clause 6.2, equation (6) [1]:
 * DR = (34 − t_a,l)(v̄_a,l − 0.05)^0.62 (0.37·v̄_a,l·Tu + 3.14); v̄ < 0.05 m/s → 0.05;
 * DR > 100 % → 100 %. For t_a ≥ 34 °C the formula gives ≤ 0; the result is clamped at 0.
 *
 * @param taC                        local air temperature, °C, finite (model: 20…26 °C).
 * @param vaMs                       local mean air speed, m/s, ≥ 0 (model: < 0.5 m/s).
 * @param turbulenceIntensityPercent local turbulence intensity, %, 0…100 (model: 10…60 %).
 * @returns DR, % (0…100), and the validity flag.
 * @throws RangeError for non-finite values, negative speed or Tu outside 0…100 %.
 */
export function draughtRateDetailed(
  taC: number,
  vaMs: number,
  turbulenceIntensityPercent: number,
): DraughtRateResult {
  assertFinite(taC, "taC");
  assertNonNegative(vaMs, "vaMs");
  assertInClosedRange(turbulenceIntensityPercent, "turbulenceIntensityPercent", 0, 100);
  const v = vaMs < 0.05 ? 0.05 : vaMs;
  let dr = (34 - taC) * Math.pow(v - 0.05, 0.62) * (0.37 * v * turbulenceIntensityPercent + 3.14);
  if (dr > 100) {
    dr = 100;
  } else if (!(dr > 0)) {
    dr = 0;
  }
  const withinRange =
    taC >= 20 && taC <= 26 && vaMs < 0.5 && turbulenceIntensityPercent >= 10 && turbulenceIntensityPercent <= 60;
  return { percent: dr, withinRange };
}

/**
 * Draught rate, %, ISO 7730:2005 clause 6.2, equation (6) [1]; see
 * {@link draughtRateDetailed} for the formula, clamping and validity flag.
 *
 * @param taC                        local air temperature, °C, finite (model: 20…26 °C).
 * @param vaMs                       local mean air speed, m/s, ≥ 0 (model: < 0.5 m/s).
 * @param turbulenceIntensityPercent local turbulence intensity, %, 0…100 (model: 10…60 %).
 * @returns DR, %, 0…100.
 * @throws RangeError for non-finite values, negative speed or Tu outside 0…100 %.
 */
export function draughtRate(taC: number, vaMs: number, turbulenceIntensityPercent: number): number {
  return draughtRateDetailed(taC, vaMs, turbulenceIntensityPercent).percent;
}
