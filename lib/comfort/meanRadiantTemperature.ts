/**
 * Mean radiant temperature of a person from angle factors and surface temperatures.
 */
import { CELSIUS_TO_KELVIN_OFFSET_K } from "./constants";
// The fourth-power average itself lives in one place, beside the view factors that feed it.
import { fourthPowerMean } from "../viewfactor/meanRadiantTemperature";

/** One enclosure surface seen by the person. */
export interface AngleFactorPart {
  /** Angle factor between the person and the surface, dimensionless, ≥ 0. */
  angleFactor: number;
  /** Surface temperature, °C, > −273.15. */
  temperatureC: number;
}

/** Mean radiant temperature with the angle-factor sum it was normalised by. */
export interface MeanRadiantTemperatureResult {
  /** Mean radiant temperature, °C. */
  mrtC: number;
  /** Σ F_i before normalisation, dimensionless (1 for a complete enclosure). */
  angleFactorSum: number;
}

function checkPart(part: Readonly<AngleFactorPart>, index: number): void {
  const f = part.angleFactor;
  const t = part.temperatureC;
  if (!Number.isFinite(f) || f < 0) {
    throw new RangeError(`parts[${index}].angleFactor must be finite and ≥ 0, got ${String(f)}`);
  }
  if (!Number.isFinite(t) || t <= -CELSIUS_TO_KELVIN_OFFSET_K) {
    throw new RangeError(`parts[${index}].temperatureC must be finite and > −273.15 °C, got ${String(t)}`);
  }
}

/**
 * Mean radiant temperature, fourth-power form, ISO 7726:1998 Annex B (mean radiant
 * temperature from the angle factors of the surrounding surfaces) [2]:
 * T̄_r⁴ = Σ F_p−i · T_i⁴ (T in K). The angle factors are divided by their sum so that an
 * incomplete set (Σ F ≠ 1) is treated as if the missing part had the weighted mean
 * temperature; the sum is reported.
 *
 * @param parts surfaces: angleFactor ≥ 0 (dimensionless), temperatureC > −273.15 °C; at least one, Σ F > 0.
 * @returns MRT, °C, and the angle-factor sum.
 * @throws RangeError for an empty list, a negative or non-finite angle factor, a non-finite
 *         or sub-absolute-zero temperature, or Σ F = 0.
 */
export function meanRadiantTemperatureDetailed(
  parts: ReadonlyArray<Readonly<AngleFactorPart>>,
): MeanRadiantTemperatureResult {
  if (parts.length === 0) {
    throw new RangeError("parts must contain at least one surface");
  }
  parts.forEach(checkPart);
  const { temperatureC, weightSum } = fourthPowerMean(
    parts.map((p) => p.angleFactor),
    parts.map((p) => p.temperatureC),
  );
  if (!(weightSum > 0)) {
    throw new RangeError("the angle factors must not all be 0");
  }
  return { mrtC: temperatureC, angleFactorSum: weightSum };
}

/**
 * Mean radiant temperature, °C, fourth-power form of ISO 7726:1998 Annex B [2], angle
 * factors normalised to sum 1 (see {@link meanRadiantTemperatureDetailed}).
 *
 * @param parts surfaces: angleFactor ≥ 0 (dimensionless), temperatureC > −273.15 °C; at least one, Σ F > 0.
 * @returns MRT, °C.
 * @throws RangeError as {@link meanRadiantTemperatureDetailed}.
 */
export function meanRadiantTemperature(parts: ReadonlyArray<Readonly<AngleFactorPart>>): number {
  return meanRadiantTemperatureDetailed(parts).mrtC;
}

/**
 * Linear approximation of the mean radiant temperature, ISO 7726:1998 Annex B [2]:
 * t̄_r = Σ F_p−i · t_i (t in °C), acceptable when the surface temperatures differ little.
 * Angle factors are normalised to sum 1, as in {@link meanRadiantTemperatureDetailed}.
 * Always ≤ the fourth-power value (power-mean inequality), for comparison only.
 *
 * @param parts surfaces: angleFactor ≥ 0 (dimensionless), temperatureC > −273.15 °C; at least one, Σ F > 0.
 * @returns linear-average radiant temperature, °C.
 * @throws RangeError as {@link meanRadiantTemperatureDetailed}.
 */
export function meanRadiantTemperatureLinear(parts: ReadonlyArray<Readonly<AngleFactorPart>>): number {
  if (parts.length === 0) {
    throw new RangeError("parts must contain at least one surface");
  }
  let sum = 0;
  let tSum = 0;
  for (let i = 0; i < parts.length; i++) {
    const part = parts[i] as Readonly<AngleFactorPart>;
    checkPart(part, i);
    sum += part.angleFactor;
    tSum += part.angleFactor * part.temperatureC;
  }
  if (!(sum > 0)) {
    throw new RangeError("the angle factors must not all be 0");
  }
  return tSum / sum;
}
