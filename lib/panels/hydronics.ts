/**
 * Water side of hydronic panels: mass and volume flow from output and temperature drop,
 * flow/return temperatures, and the link mean water temperature ↔ output ↔ surface temperature.
 */
import { assertFinite, assertMode, assertOrientation, assertPositive, assertTemperatureC } from "./assert";
import {
  characteristicOutput,
  meanWaterTemperatureForOutput,
  type CharacteristicCurve,
} from "./characteristicOutput";
import { STANDARD_SURFACE_EXCHANGE } from "./standardSpecificOutput";
import type { PanelMode, PanelOrientation } from "./types";

/**
 * Specific heat capacity of water used by default, J/(kg·K): 4186, the common engineering
 * value for 20–40 °C (tables give 4182–4179 J/(kg·K) there, within 0.2 %) [10].
 */
export const WATER_SPECIFIC_HEAT_J_KGK = 4186;

/** Default density of water for volume flows, kg/m³ (≈ 30–40 °C, table value 995.7–992.2) [11]. */
export const WATER_DENSITY_KG_M3 = 995;

/**
 * Isobaric specific heat of saturated liquid water, J/(kg·K), against temperature, °C —
 * the saturated-water property table of heat-transfer textbooks (Incropera et al., Table A.6,
 * attribution from memory; values read from a reproduction of the table) [10].
 */
const WATER_CP_TABLE: ReadonlyArray<readonly [number, number]> = [
  [0, 4217],
  [1.85, 4211],
  [6.85, 4198],
  [11.85, 4189],
  [16.85, 4184],
  [21.85, 4181],
  [26.85, 4179],
  [31.85, 4178],
  [36.85, 4178],
  [41.85, 4179],
  [46.85, 4180],
  [51.85, 4182],
  [56.85, 4184],
  [61.85, 4186],
  [66.85, 4188],
  [71.85, 4191],
  [76.85, 4195],
  [81.85, 4199],
  [86.85, 4203],
  [91.85, 4209],
  [96.85, 4214],
  [100, 4217],
];

/** Density of liquid water at 1 atm, kg/m³, against temperature, °C (handbook table) [11]. */
const WATER_DENSITY_TABLE: ReadonlyArray<readonly [number, number]> = [
  [0, 999.8395],
  [4, 999.972],
  [10, 999.7026],
  [15, 999.1026],
  [20, 998.2071],
  [22, 997.7735],
  [25, 997.0479],
  [30, 995.6502],
  [40, 992.2],
  [60, 983.2],
  [80, 971.8],
  [100, 958.4],
];

function interpolate(table: ReadonlyArray<readonly [number, number]>, x: number): number {
  const first = table[0] as readonly [number, number];
  if (x <= first[0]) {
    return first[1];
  }
  for (let i = 1; i < table.length; i++) {
    const [x1, y1] = table[i] as readonly [number, number];
    if (x <= x1) {
      const [x0, y0] = table[i - 1] as readonly [number, number];
      return y0 + ((y1 - y0) * (x - x0)) / (x1 - x0);
    }
  }
  return (table[table.length - 1] as readonly [number, number])[1];
}

/** A table-interpolated water property with its range flag. */
export interface WaterProperty {
  /** Value (J/(kg·K) or kg/m³). */
  value: number;
  /** False when the temperature lies outside the table (0…100 °C); the end value is then used. */
  withinRange: boolean;
}

/**
 * Isobaric specific heat of liquid water at a temperature, linear interpolation in the
 * saturated-water property table (0…100 °C) [10].
 *
 * @param temperatureC water temperature, °C, finite (table range 0…100 °C; clamped outside, flagged).
 * @returns c_p, J/(kg·K), with a range flag.
 * @throws RangeError for a non-finite temperature.
 */
export function waterSpecificHeat(temperatureC: number): WaterProperty {
  assertFinite(temperatureC, "temperatureC");
  return { value: interpolate(WATER_CP_TABLE, temperatureC), withinRange: temperatureC >= 0 && temperatureC <= 100 };
}

/**
 * Density of liquid water at a temperature, linear interpolation in a handbook table
 * (0…100 °C) [11].
 *
 * @param temperatureC water temperature, °C, finite (table range 0…100 °C; clamped outside, flagged).
 * @returns ρ, kg/m³, with a range flag.
 * @throws RangeError for a non-finite temperature.
 */
export function waterDensity(temperatureC: number): WaterProperty {
  assertFinite(temperatureC, "temperatureC");
  return { value: interpolate(WATER_DENSITY_TABLE, temperatureC), withinRange: temperatureC >= 0 && temperatureC <= 100 };
}

/** Input of {@link waterFlow}. */
export interface WaterFlowInput {
  /** Heat the water delivers (heating) or takes up (cooling), W, ≥ 0. */
  outputW: number;
  /** Design temperature drop |t_flow − t_return|, K, > 0. */
  temperatureDropK: number;
  /** Specific heat of water, J/(kg·K), > 0; default {@link WATER_SPECIFIC_HEAT_J_KGK}. */
  specificHeatJkgK?: number;
  /** Water density for the volume flow, kg/m³, > 0; default {@link WATER_DENSITY_KG_M3}. */
  densityKgM3?: number;
}

/** Water flow of a panel circuit. */
export interface WaterFlow {
  /** Mass flow ṁ, kg/s. */
  massFlowKgS: number;
  /** Mass flow, kg/h. */
  massFlowKgH: number;
  /** Volume flow, m³/s. */
  volumeFlowM3S: number;
  /** Volume flow, l/s. */
  litresPerSecond: number;
  /** Volume flow, l/h. */
  litresPerHour: number;
}

/**
 * Water flow from the steady-flow energy balance Q = ṁ·c_p·ΔT (the design-flow relation of
 * EN 1264-3 / EN 442 practice, from memory [1][4]): ṁ = Q / (c_p·ΔT), V̇ = ṁ/ρ.
 *
 * @param input outputW W ≥ 0, temperatureDropK K > 0, specificHeatJkgK J/(kg·K) > 0, densityKgM3 kg/m³ > 0.
 * @returns mass flow (kg/s, kg/h) and volume flow (m³/s, l/s, l/h).
 * @throws RangeError for a negative/non-finite output or a non-positive drop, c_p or density.
 */
export function waterFlow(input: Readonly<WaterFlowInput>): WaterFlow {
  assertFinite(input.outputW, "outputW");
  if (input.outputW < 0) {
    throw new RangeError(`outputW must be ≥ 0, got ${String(input.outputW)}`);
  }
  assertPositive(input.temperatureDropK, "temperatureDropK");
  const cp = input.specificHeatJkgK ?? WATER_SPECIFIC_HEAT_J_KGK;
  assertPositive(cp, "specificHeatJkgK");
  const rho = input.densityKgM3 ?? WATER_DENSITY_KG_M3;
  assertPositive(rho, "densityKgM3");
  const m = input.outputW / (cp * input.temperatureDropK);
  const v = m / rho;
  return { massFlowKgS: m, massFlowKgH: m * 3600, volumeFlowM3S: v, litresPerSecond: v * 1000, litresPerHour: v * 3.6e6 };
}

/**
 * Output carried by a water flow, Q = ṁ·c_p·ΔT (inverse of {@link waterFlow}).
 *
 * @param massFlowKgS      mass flow, kg/s, ≥ 0.
 * @param temperatureDropK temperature drop, K, finite.
 * @param specificHeatJkgK c_p, J/(kg·K), > 0; default {@link WATER_SPECIFIC_HEAT_J_KGK}.
 * @returns Q, W.
 * @throws RangeError for non-finite values, a negative flow or non-positive c_p.
 */
export function outputFromWaterFlow(
  massFlowKgS: number,
  temperatureDropK: number,
  specificHeatJkgK: number = WATER_SPECIFIC_HEAT_J_KGK,
): number {
  assertFinite(massFlowKgS, "massFlowKgS");
  if (massFlowKgS < 0) {
    throw new RangeError(`massFlowKgS must be ≥ 0, got ${String(massFlowKgS)}`);
  }
  assertFinite(temperatureDropK, "temperatureDropK");
  assertPositive(specificHeatJkgK, "specificHeatJkgK");
  return massFlowKgS * specificHeatJkgK * temperatureDropK;
}

/** Flow and return water temperatures. */
export interface FlowReturnTemperatures {
  /** Flow (supply) temperature, °C. */
  flowC: number;
  /** Return temperature, °C. */
  returnC: number;
}

/**
 * Flow and return temperatures about an arithmetic mean water temperature (the EN 442-2
 * rating convention t_m = (t_flow + t_return)/2 [4]): heating t_flow = t_m + ΔT/2,
 * t_return = t_m − ΔT/2; cooling t_flow = t_m − ΔT/2, t_return = t_m + ΔT/2.
 *
 * @param meanWaterC       mean water temperature, °C (> −273.15).
 * @param temperatureDropK design drop |t_flow − t_return|, K, ≥ 0.
 * @param mode             "heating" (default) or "cooling".
 * @returns flow and return temperatures, °C.
 * @throws RangeError for a non-finite temperature, a negative drop or an unknown mode.
 */
export function flowReturnTemperatures(
  meanWaterC: number,
  temperatureDropK: number,
  mode: PanelMode = "heating",
): FlowReturnTemperatures {
  assertTemperatureC(meanWaterC, "meanWaterC");
  assertFinite(temperatureDropK, "temperatureDropK");
  if (temperatureDropK < 0) {
    throw new RangeError(`temperatureDropK must be ≥ 0, got ${String(temperatureDropK)}`);
  }
  assertMode(mode);
  const half = 0.5 * temperatureDropK;
  return mode === "heating"
    ? { flowC: meanWaterC + half, returnC: meanWaterC - half }
    : { flowC: meanWaterC - half, returnC: meanWaterC + half };
}

/** Input shared by the two water-side operating-point functions. */
export interface WaterSideCommonInput {
  /** Product characteristic Q = K_M·ΔT^n of the panel (per unit, as K_M is given). */
  curve: Readonly<CharacteristicCurve>;
  /** Room temperature of the characteristic, °C. */
  roomC: number;
  /** Design temperature drop, K, > 0. */
  temperatureDropK: number;
  /** Operating mode; default "heating". */
  mode?: PanelMode;
  /** c_p of water, J/(kg·K); default: the table value at the mean water temperature ({@link waterSpecificHeat}). */
  specificHeatJkgK?: number;
  /** Density of water, kg/m³; default: the table value at the mean water temperature ({@link waterDensity}). */
  densityKgM3?: number;
}

/** Water-side operating point of a panel. */
export interface WaterSideOperatingPoint extends FlowReturnTemperatures, WaterFlow {
  /** Output, W (positive in the mode's direction). */
  outputW: number;
  /** Arithmetic mean water temperature, °C. */
  meanWaterC: number;
}

function operatingPoint(
  input: Readonly<WaterSideCommonInput>,
  outputW: number,
  meanWaterC: number,
  mode: PanelMode,
): WaterSideOperatingPoint {
  const temps = flowReturnTemperatures(meanWaterC, input.temperatureDropK, mode);
  const flow = waterFlow({
    outputW: Math.max(0, outputW),
    temperatureDropK: input.temperatureDropK,
    specificHeatJkgK: input.specificHeatJkgK ?? waterSpecificHeat(meanWaterC).value,
    densityKgM3: input.densityKgM3 ?? waterDensity(meanWaterC).value,
  });
  return { outputW, meanWaterC, ...temps, ...flow };
}

/**
 * Water side for a required output: mean water temperature from the inverse product
 * characteristic ({@link meanWaterTemperatureForOutput}, EN 442-2 / EN 14037 / EN 14240 [4][5]),
 * flow/return temperatures about it and the water flow Q = ṁ·c_p·ΔT.
 *
 * @param input curve (K_M > 0, n > 0), outputW W ≥ 0, roomC °C, temperatureDropK K > 0, mode,
 *              optional c_p J/(kg·K) > 0 and density kg/m³ > 0.
 * @returns output, mean/flow/return temperatures °C and flows.
 * @throws RangeError for invalid coefficients, a negative output or invalid temperatures.
 */
export function waterSideForOutput(input: Readonly<WaterSideCommonInput & { outputW: number }>): WaterSideOperatingPoint {
  const mode = input.mode ?? "heating";
  assertFinite(input.outputW, "outputW");
  if (input.outputW < 0) {
    throw new RangeError(`outputW must be ≥ 0, got ${String(input.outputW)}`);
  }
  const meanWaterC = meanWaterTemperatureForOutput({ ...input.curve, outputW: input.outputW, roomC: input.roomC, mode });
  return operatingPoint(input, input.outputW, meanWaterC, mode);
}

/**
 * Water side for a given mean water temperature: output from the product characteristic
 * ({@link characteristicOutput} [4][5]), flow/return temperatures and the water flow. A mean
 * water temperature on the wrong side of the room gives a negative output and zero flow.
 *
 * @param input curve (K_M > 0, n > 0), meanWaterC °C, roomC °C, temperatureDropK K > 0, mode,
 *              optional c_p J/(kg·K) > 0 and density kg/m³ > 0.
 * @returns output W, mean/flow/return temperatures °C and flows.
 * @throws RangeError for invalid coefficients or temperatures.
 */
export function waterSideForMeanWaterTemperature(
  input: Readonly<WaterSideCommonInput & { meanWaterC: number }>,
): WaterSideOperatingPoint {
  const mode = input.mode ?? "heating";
  const outputW = characteristicOutput({ ...input.curve, meanWaterC: input.meanWaterC, roomC: input.roomC, mode });
  return operatingPoint(input, outputW, input.meanWaterC, mode);
}

/** Input of {@link surfaceTemperatureForSpecificOutput}. */
export interface SurfaceTemperatureForOutputInput {
  /** Surface the system is embedded in. */
  orientation: PanelOrientation;
  /** Operating mode. */
  mode: PanelMode;
  /** Specific output in the mode's direction, W/m², finite (negative: surface on the wrong side). */
  specificOutputWm2: number;
  /** Room (design operative) temperature, °C. */
  roomC: number;
}

/**
 * Mean surface temperature that gives a specific output — the inverse of
 * {@link standardSpecificOutput} (EN 1264-5 / ISO 11855-2 laws q = a·Δθ^n [1][2]):
 * Δθ = sign(q)·(|q|/a)^(1/n), θ_S,m = θ_i + Δθ (heating) or θ_i − Δθ (cooling).
 *
 * @param input orientation, mode, specificOutputWm2 W/m² (finite), roomC °C (finite).
 * @returns mean surface temperature, °C.
 * @throws RangeError for an unknown orientation/mode or non-finite values.
 */
export function surfaceTemperatureForSpecificOutput(input: Readonly<SurfaceTemperatureForOutputInput>): number {
  assertOrientation(input.orientation);
  assertMode(input.mode);
  assertFinite(input.specificOutputWm2, "specificOutputWm2");
  assertFinite(input.roomC, "roomC");
  const law = STANDARD_SURFACE_EXCHANGE[input.mode][input.orientation];
  const q = input.specificOutputWm2;
  const m = Math.pow(Math.abs(q) / law.coefficient, 1 / law.exponent);
  const delta = q < 0 ? -m : m;
  return input.mode === "heating" ? input.roomC + delta : input.roomC - delta;
}
