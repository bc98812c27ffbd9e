/**
 * Local discomfort caused by the vertical air temperature difference, ISO 7730:2005 clause 6.3.
 */
import { assertFinite } from "./assert";

/** Percentage dissatisfied with a flag for the model's validity range. */
export interface VerticalAirTemperatureResult {
  /** Percentage dissatisfied PD, %. */
  percent: number;
  /** True for 0 ≤ Δt < 8 °C (head warmer than ankles; ISO 7730:2005 clause 6.3) [1]. */
  withinRange: boolean;
}

/**
 * Percentage dissatisfied due to the vertical air temperature difference between head and
 * ankles (1.1 m and 0.1 m for a seated person), ISO 7730:2005 clause 6.3, equation (7) [1]:
 * PD = 100 / (1 + exp(5.76 − 0.856·Δt_a,v)). The equation applies for Δt < 8 °C with the head
 * warmer; other values are computed and flagged.
 *
 * @param deltaC head-minus-ankle air temperature difference, °C, finite (model: 0…8 °C).
 * @returns PD (%) and the validity flag.
 * @throws RangeError if deltaC is non-finite.
 */
export function verticalAirTemperatureDifferenceDissatisfiedDetailed(deltaC: number): VerticalAirTemperatureResult {
  assertFinite(deltaC, "deltaC");
  return {
    percent: 100 / (1 + Math.exp(5.76 - 0.856 * deltaC)),
    withinRange: deltaC >= 0 && deltaC < 8,
  };
}

/**
 * Percentage dissatisfied, %, due to the vertical air temperature difference,
 * ISO 7730:2005 clause 6.3, equation (7) [1]; see
 * {@link verticalAirTemperatureDifferenceDissatisfiedDetailed} for the validity flag.
 *
 * @param deltaC head-minus-ankle air temperature difference, °C, finite (model: 0…8 °C).
 * @returns PD, %.
 * @throws RangeError if deltaC is non-finite.
 */
export function verticalAirTemperatureDifferenceDissatisfied(deltaC: number): number {
  return verticalAirTemperatureDifferenceDissatisfiedDetailed(deltaC).percent;
}
