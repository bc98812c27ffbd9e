/**
 * Product characteristic equation Q = K_M·ΔT^n (EN 442-2, EN 14037, EN 14240 style) and its inverses.
 */
import { assertFinite, assertMode, assertPositive } from "./assert";
import type { PanelMode } from "./types";

/** Coefficients of the characteristic equation. */
export interface CharacteristicCurve {
  /** K_M, W/K^n (per unit, per metre or per m², as the catalogue states), > 0. */
  kWPerKn: number;
  /** Exponent n, dimensionless, > 0 (typically 1.0…1.4). */
  n: number;
}

/** How the water-to-room temperature difference is formed from flow and return. */
export type MeanTemperatureMethod = "arithmetic" | "logarithmic";

/** Characteristic input with the mean water temperature given directly. */
export interface CharacteristicMeanInput extends CharacteristicCurve {
  /** Mean water temperature, °C. */
  meanWaterC: number;
  /** Room (air or operative, as the test standard defines) temperature, °C. */
  roomC: number;
  /** Operating mode; default "heating". */
  mode?: PanelMode;
}

/** Characteristic input with flow and return temperatures. */
export interface CharacteristicFlowReturnInput extends CharacteristicCurve {
  /** Flow (supply) water temperature, °C. */
  flowC: number;
  /** Return water temperature, °C. */
  returnC: number;
  /** Room temperature, °C. */
  roomC: number;
  /** Arithmetic (default, EN 442-2 rating) or logarithmic mean difference. */
  meanMethod?: MeanTemperatureMethod;
  /** Operating mode; default "heating". */
  mode?: PanelMode;
}

function checkCurve(curve: Readonly<CharacteristicCurve>): void {
  assertPositive(curve.kWPerKn, "kWPerKn");
  assertPositive(curve.n, "n");
}

/**
 * Arithmetic mean temperature difference, K: ΔT = (t_flow + t_return)/2 − t_room
 * (EN 442-2 rating convention, e.g. 75/65/20 °C → 50 K; from memory) [4].
 *
 * @param flowC   flow water temperature, °C, finite.
 * @param returnC return water temperature, °C, finite.
 * @param roomC   room temperature, °C, finite.
 * @returns ΔT, K (negative when the water is colder than the room).
 * @throws RangeError for non-finite temperatures.
 */
export function arithmeticMeanTemperatureDifference(flowC: number, returnC: number, roomC: number): number {
  assertFinite(flowC, "flowC");
  assertFinite(returnC, "returnC");
  assertFinite(roomC, "roomC");
  return 0.5 * (flowC + returnC) - roomC;
}

/**
 * Logarithmic mean temperature difference, K:
 * ΔT_ln = (t_flow − t_return) / ln((t_flow − t_room)/(t_return − t_room)), the log-mean
 * of heat-exchanger theory used by EN 1264-2 and EN 14240 [1][5]; equals the common value
 * when flow = return.
 *
 * @param flowC   flow water temperature, °C, finite.
 * @param returnC return water temperature, °C, finite.
 * @param roomC   room temperature, °C, finite; both water temperatures strictly on the same side of it.
 * @returns ΔT_ln, K (negative for water colder than the room).
 * @throws RangeError for non-finite temperatures or water temperatures not strictly on one side of roomC.
 */
export function logarithmicMeanTemperatureDifference(flowC: number, returnC: number, roomC: number): number {
  assertFinite(flowC, "flowC");
  assertFinite(returnC, "returnC");
  assertFinite(roomC, "roomC");
  const a = flowC - roomC;
  const b = returnC - roomC;
  if (!(a * b > 0)) {
    throw new RangeError("flow and return temperatures must both lie strictly on the same side of the room temperature");
  }
  if (a === b) {
    return a;
  }
  return (a - b) / Math.log(a / b);
}

function signedPower(x: number, n: number): number {
  const m = Math.pow(Math.abs(x), n);
  return x < 0 ? -m : m;
}

/**
 * Output from the product characteristic equation Q = K_M·ΔT^n (EN 442-2 radiators,
 * EN 14037 ceiling panels, EN 14240 chilled ceilings) [4][5]. ΔT is the mean water-to-room
 * difference (mean water temperature given, or the arithmetic/logarithmic mean of flow and
 * return). Heating: ΔT = water − room; cooling: ΔT = room − water; the result is positive in
 * the mode's direction, negative when the water is on the wrong side of the room temperature.
 *
 * @param input kWPerKn W/K^n (> 0), n (> 0), roomC °C, and either meanWaterC °C or flowC/returnC °C
 *              (+ meanMethod); mode default "heating".
 * @returns output Q, W (in the unit basis of K_M).
 * @throws RangeError for invalid coefficients, non-finite temperatures, an unknown mode, or a
 *         log-mean with water temperatures on both sides of the room temperature.
 */
export function characteristicOutput(
  input: Readonly<CharacteristicMeanInput> | Readonly<CharacteristicFlowReturnInput>,
): number {
  checkCurve(input);
  const mode = input.mode ?? "heating";
  assertMode(mode);
  let delta: number;
  if ("meanWaterC" in input) {
    assertFinite(input.meanWaterC, "meanWaterC");
    assertFinite(input.roomC, "roomC");
    delta = input.meanWaterC - input.roomC;
  } else {
    delta =
      (input.meanMethod ?? "arithmetic") === "logarithmic"
        ? logarithmicMeanTemperatureDifference(input.flowC, input.returnC, input.roomC)
        : arithmeticMeanTemperatureDifference(input.flowC, input.returnC, input.roomC);
  }
  if (mode === "cooling") {
    delta = -delta;
  }
  return input.kWPerKn * signedPower(delta, input.n);
}

/**
 * Inverse of the characteristic equation: the temperature difference that gives an output,
 * ΔT = sign(Q)·(|Q|/K_M)^(1/n) [4][5].
 *
 * @param input kWPerKn W/K^n (> 0), n (> 0), outputW W (finite; negative gives negative ΔT).
 * @returns ΔT, K, in the mode convention of {@link characteristicOutput}.
 * @throws RangeError for invalid coefficients or a non-finite output.
 */
export function characteristicTemperatureDifference(
  input: Readonly<CharacteristicCurve & { outputW: number }>,
): number {
  checkCurve(input);
  assertFinite(input.outputW, "outputW");
  return signedPower(input.outputW / input.kWPerKn, 1 / input.n);
}

/**
 * Mean water temperature needed for an output: room + ΔT (heating) or room − ΔT (cooling),
 * with ΔT from {@link characteristicTemperatureDifference} [4][5].
 *
 * @param input kWPerKn W/K^n (> 0), n (> 0), outputW W (finite), roomC °C (finite), mode (default "heating").
 * @returns mean water temperature, °C.
 * @throws RangeError for invalid coefficients, non-finite values or an unknown mode.
 */
export function meanWaterTemperatureForOutput(
  input: Readonly<CharacteristicCurve & { outputW: number; roomC: number; mode?: PanelMode }>,
): number {
  const mode = input.mode ?? "heating";
  assertMode(mode);
  assertFinite(input.roomC, "roomC");
  const dt = characteristicTemperatureDifference(input);
  return mode === "heating" ? input.roomC + dt : input.roomC - dt;
}
