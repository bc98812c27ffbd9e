/**
 * Water-vapour saturation pressure, dew point and the vapour pressure used by the PMV model.
 */
import { assertFinite, assertInClosedRange } from "./assert";

/** Magnus coefficient A (saturation pressure at 0 °C), kPa — Alduchov & Eskridge (1996), "AERK", over water [5]. */
export const MAGNUS_AERK_A_KPA = 0.61094;
/** Magnus coefficient B, dimensionless — Alduchov & Eskridge (1996), AERK, over water [5]. */
export const MAGNUS_AERK_B = 17.625;
/** Magnus coefficient C, °C — Alduchov & Eskridge (1996), AERK, over water [5]. */
export const MAGNUS_AERK_C_C = 243.04;
/** Lowest temperature of the AERK fit's stated validity range, °C (over water) [5]. */
export const MAGNUS_AERK_MIN_C = -40;
/** Highest temperature of the AERK fit's stated validity range, °C (over water) [5]. */
export const MAGNUS_AERK_MAX_C = 50;

/**
 * Saturation vapour pressure over liquid water, Magnus form with the Alduchov & Eskridge
 * (1996) "AERK" coefficients: e_s = 0.61094 · exp(17.625·t / (t + 243.04)) kPa [5].
 * Stated validity −40…50 °C (over water, also below 0 °C: supercooled water); outside that
 * range the value is still returned (see {@link dewPointDetailed} for a flagged variant).
 *
 * @param tC temperature, °C, finite and > −243.04 (pole of the formula).
 * @returns saturation vapour pressure, kPa.
 * @throws RangeError if tC is non-finite or ≤ −243.04 °C.
 */
export function saturationVaporPressure(tC: number): number {
  if (!Number.isFinite(tC) || tC <= -MAGNUS_AERK_C_C) {
    throw new RangeError(`tC must be a finite temperature > ${-MAGNUS_AERK_C_C} °C, got ${String(tC)}`);
  }
  return MAGNUS_AERK_A_KPA * Math.exp((MAGNUS_AERK_B * tC) / (tC + MAGNUS_AERK_C_C));
}

/** Dew point with a validity flag. */
export interface DewPointResult {
  /** Dew-point temperature, °C; −Infinity for perfectly dry air (rh = 0 %). */
  dewPointC: number;
  /** True when both the air temperature and the dew point lie in the AERK range −40…50 °C [5]. */
  withinRange: boolean;
}

/**
 * Dew point by inverting the AERK Magnus form [5]:
 * γ = ln(rh/100) + 17.625·t/(243.04 + t), t_d = 243.04·γ / (17.625 − γ).
 *
 * @param taC        air temperature, °C, finite and > −243.04.
 * @param rhPercent  relative humidity over water, %, 0…100 (0 gives −Infinity).
 * @returns dew point and whether it lies in the fit's validity range.
 * @throws RangeError for non-finite input, rh outside 0…100 %, or taC ≤ −243.04 °C.
 */
export function dewPointDetailed(taC: number, rhPercent: number): DewPointResult {
  if (!Number.isFinite(taC) || taC <= -MAGNUS_AERK_C_C) {
    throw new RangeError(`taC must be a finite temperature > ${-MAGNUS_AERK_C_C} °C, got ${String(taC)}`);
  }
  assertInClosedRange(rhPercent, "rhPercent", 0, 100);
  const taOk = taC >= MAGNUS_AERK_MIN_C && taC <= MAGNUS_AERK_MAX_C;
  if (rhPercent === 0) {
    return { dewPointC: Number.NEGATIVE_INFINITY, withinRange: false };
  }
  const gamma = Math.log(rhPercent / 100) + (MAGNUS_AERK_B * taC) / (MAGNUS_AERK_C_C + taC);
  const dewPointC = (MAGNUS_AERK_C_C * gamma) / (MAGNUS_AERK_B - gamma);
  return {
    dewPointC,
    withinRange: taOk && dewPointC >= MAGNUS_AERK_MIN_C && dewPointC <= MAGNUS_AERK_MAX_C,
  };
}

/**
 * Dew point, °C, from air temperature and relative humidity (AERK Magnus form [5]); see
 * {@link dewPointDetailed} for the validity flag.
 *
 * @param taC        air temperature, °C, finite and > −243.04.
 * @param rhPercent  relative humidity over water, %, 0…100 (0 gives −Infinity).
 * @returns dew-point temperature, °C.
 * @throws RangeError for non-finite input, rh outside 0…100 %, or taC ≤ −243.04 °C.
 */
export function dewPoint(taC: number, rhPercent: number): number {
  return dewPointDetailed(taC, rhPercent).dewPointC;
}

/**
 * Saturation vapour pressure as written in the ISO 7730:2005 Annex D program (line "FNPS"):
 * p_s = exp(16.6536 − 4030.183 / (t + 235)) kPa [1]. Used by the PMV model so that it
 * reproduces the standard's Table D.1.
 *
 * @param tC temperature, °C, finite and > −235 (pole of the formula).
 * @returns saturation vapour pressure, kPa.
 * @throws RangeError if tC is non-finite or ≤ −235 °C.
 */
export function iso7730SaturationVaporPressureKPa(tC: number): number {
  assertFinite(tC, "tC");
  if (tC <= -235) {
    throw new RangeError(`tC must be > −235 °C for the Annex D formula, got ${tC}`);
  }
  return Math.exp(16.6536 - 4030.183 / (tC + 235));
}

/**
 * Partial water-vapour pressure from relative humidity as in the ISO 7730:2005 Annex D
 * program: pa = RH · 10 · exp(16.6536 − 4030.183 / (ta + 235)) Pa [1].
 *
 * @param taC       air temperature, °C, finite and > −235.
 * @param rhPercent relative humidity, %, 0…100.
 * @returns partial water-vapour pressure, Pa.
 * @throws RangeError for non-finite input, taC ≤ −235 °C or rh outside 0…100 %.
 */
export function iso7730VaporPressurePa(taC: number, rhPercent: number): number {
  assertInClosedRange(rhPercent, "rhPercent", 0, 100);
  return rhPercent * 10 * iso7730SaturationVaporPressureKPa(taC);
}
