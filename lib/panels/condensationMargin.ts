/**
 * Condensation margin of a cooled surface.
 */
import { dewPointDetailed } from "../comfort";
import { assertFinite } from "./assert";

/**
 * Default safety margin above the dew point, K. Common practice for radiant cooling is to
 * keep the surface (or supply water) 1–2 K above the room dew point; 2 K is used here as
 * the conservative end (common practice, no document).
 */
export const DEFAULT_CONDENSATION_SAFETY_MARGIN_K = 2;

/** Input of {@link condensationMargin}. */
export interface CondensationMarginInput {
  /** Surface temperature, °C. */
  surfaceC: number;
  /** Room air temperature, °C. */
  airC: number;
  /** Room relative humidity, %, 0…100. */
  rhPercent: number;
  /** Required margin above the dew point, K, ≥ 0; default {@link DEFAULT_CONDENSATION_SAFETY_MARGIN_K}. */
  safetyMarginK?: number;
}

/** Result of {@link condensationMargin}. */
export interface CondensationMarginResult {
  /** Surface temperature minus dew point, K (+Infinity for dry air). */
  marginK: number;
  /** Dew point of the room air, °C (AERK Magnus form). */
  dewPointC: number;
  /** True when marginK ≤ safetyMarginK. */
  risk: boolean;
  /** False when the dew-point fit is used outside −40…50 °C. */
  withinRange: boolean;
}

/**
 * Condensation margin: surface temperature − dew point of the room air, K, with a risk
 * flag when the margin is at or below the safety margin. Dew point from the Alduchov &
 * Eskridge (1996) Magnus form ([9], via ../comfort `dewPointDetailed`).
 *
 * @param input surfaceC °C (finite), airC °C (finite), rhPercent % (0…100), safetyMarginK K (≥ 0, default 2).
 * @returns margin (K), dew point (°C), risk flag and the dew-point validity flag.
 * @throws RangeError for non-finite values, rh outside 0…100 % or a negative safety margin.
 */
export function condensationMargin(input: Readonly<CondensationMarginInput>): CondensationMarginResult {
  assertFinite(input.surfaceC, "surfaceC");
  const safety = input.safetyMarginK ?? DEFAULT_CONDENSATION_SAFETY_MARGIN_K;
  if (!Number.isFinite(safety) || safety < 0) {
    throw new RangeError(`safetyMarginK must be a finite number ≥ 0, got ${String(safety)}`);
  }
  const dp = dewPointDetailed(input.airC, input.rhPercent);
  const marginK = input.surfaceC - dp.dewPointC;
  return { marginK, dewPointC: dp.dewPointC, risk: marginK <= safety, withinRange: dp.withinRange };
}
