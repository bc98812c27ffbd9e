/**
 * Operative temperature from air and mean radiant temperature.
 */
import { assertFinite, assertNonNegative } from "./assert";

/** Operative temperature with the weighting used and a range flag. */
export interface OperativeTemperatureResult {
  /** Operative temperature t_o, °C. */
  operativeC: number;
  /** Air-temperature weight A of t_o = A·t_a + (1 − A)·t̄_r, dimensionless (0.5, 0.6 or 0.7). */
  airWeight: number;
  /** False for relative air speed above 1 m/s, where the table of A ends (A = 0.7 is then kept). */
  withinRange: boolean;
}

/**
 * Weight A of the air temperature in the operative temperature, from the relative air
 * speed: 0.5 below 0.2 m/s, 0.6 from 0.2 to 0.6 m/s, 0.7 above 0.6 up to 1.0 m/s —
 * ASHRAE 55-2017 Normative Appendix A [3] and the same table in ISO 7730:2005 [1] /
 * ISO 7726:1998 [2]. Boundary reading: "< 0.2 | 0.2 to 0.6 | 0.6 to 1.0", so 0.2 m/s and
 * 0.6 m/s both take A = 0.6. Above 1.0 m/s the table gives nothing; 0.7 is kept.
 *
 * @param vrMs relative air speed, m/s, ≥ 0.
 * @returns A, dimensionless.
 * @throws RangeError if vrMs is negative or non-finite.
 */
export function operativeAirWeight(vrMs: number): number {
  assertNonNegative(vrMs, "vrMs");
  if (vrMs < 0.2) {
    return 0.5;
  }
  return vrMs <= 0.6 ? 0.6 : 0.7;
}

/**
 * Operative temperature with the weighting and a range flag: t_o = A·t_a + (1 − A)·t̄_r
 * (ASHRAE 55-2017 Normative Appendix A [3]; ISO 7730:2005 [1], ISO 7726:1998 [2]).
 *
 * @param taC  air temperature, °C, finite.
 * @param trC  mean radiant temperature, °C, finite.
 * @param vrMs relative air speed, m/s, ≥ 0 (the table covers 0…1 m/s).
 * @returns t_o (°C), A and whether vrMs ≤ 1 m/s.
 * @throws RangeError for non-finite temperatures or a negative/non-finite speed.
 */
export function operativeTemperatureDetailed(taC: number, trC: number, vrMs: number): OperativeTemperatureResult {
  assertFinite(taC, "taC");
  assertFinite(trC, "trC");
  const a = operativeAirWeight(vrMs);
  return { operativeC: a * taC + (1 - a) * trC, airWeight: a, withinRange: vrMs <= 1 };
}

/**
 * Operative temperature, °C: t_o = A·t_a + (1 − A)·t̄_r with A from {@link operativeAirWeight}
 * (ASHRAE 55-2017 Normative Appendix A [3]; ISO 7730:2005 [1], ISO 7726:1998 [2]).
 * Above 1 m/s A = 0.7 is kept; see {@link operativeTemperatureDetailed} for the flag.
 *
 * @param taC  air temperature, °C, finite.
 * @param trC  mean radiant temperature, °C, finite.
 * @param vrMs relative air speed, m/s, ≥ 0.
 * @returns operative temperature, °C.
 * @throws RangeError for non-finite temperatures or a negative/non-finite speed.
 */
export function operativeTemperature(taC: number, trC: number, vrMs: number): number {
  return operativeTemperatureDetailed(taC, trC, vrMs).operativeC;
}
