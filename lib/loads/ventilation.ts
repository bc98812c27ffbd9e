/**
 * Ventilation (air-change) heat flow of a room.
 */
import { assertNonNegative, assertPositive, assertTemperatureC } from "./assert";
import { AIR_VOLUMETRIC_HEAT_CAPACITY_WH_M3K, SECONDS_PER_HOUR } from "./constants";

/**
 * Ventilation air flow from an air-change rate, V̇ = n·V / 3600, m³/s (EN 12831:2003
 * clause 9: V_min,i = n_min·V_i in m³/h [1]).
 *
 * @param volumeM3          room air volume, m³, ≥ 0.
 * @param airChangesPerHour air-change rate n, 1/h, ≥ 0.
 * @returns air flow, m³/s.
 * @throws RangeError for a negative or non-finite argument.
 */
export function ventilationFlowM3S(volumeM3: number, airChangesPerHour: number): number {
  assertNonNegative(volumeM3, "volumeM3");
  assertNonNegative(airChangesPerHour, "airChangesPerHour");
  return (airChangesPerHour * volumeM3) / SECONDS_PER_HOUR;
}

/**
 * Ventilation heat transfer coefficient H_V = ρc_p·n·V, W/K, with ρc_p in Wh/(m³·K) and n·V in
 * m³/h (EN 12831:2003 clause 9: H_V,i = 0.34·V_min,i [1]).
 *
 * @param volumeM3                  room air volume, m³, ≥ 0.
 * @param airChangesPerHour         air-change rate, 1/h, ≥ 0.
 * @param volumetricHeatCapacityWhM3K ρ·c_p, Wh/(m³·K), > 0; default 0.34 [1].
 * @returns H_V, W/K.
 * @throws RangeError for a negative or non-finite argument.
 */
export function ventilationHeatTransferCoefficientWK(
  volumeM3: number,
  airChangesPerHour: number,
  volumetricHeatCapacityWhM3K: number = AIR_VOLUMETRIC_HEAT_CAPACITY_WH_M3K,
): number {
  assertNonNegative(volumeM3, "volumeM3");
  assertNonNegative(airChangesPerHour, "airChangesPerHour");
  assertPositive(volumetricHeatCapacityWhM3K, "volumetricHeatCapacityWhM3K");
  return volumetricHeatCapacityWhM3K * airChangesPerHour * volumeM3;
}

/**
 * Ventilation heat loss Φ_V = ρc_p·n·V·(θ_int − θ_e), W (EN 12831:2003 clause 9 [1]); a
 * negative result is a gain (outdoor air warmer than the room). For a summer gain use the
 * negative, as ASHRAE Fundamentals ch. 18 does with q = ρc_p·V̇·(t_o − t_i) [3].
 *
 * @param volumeM3                  room air volume, m³, ≥ 0.
 * @param airChangesPerHour         air-change rate, 1/h, ≥ 0.
 * @param indoorC                   indoor temperature, °C (> −273.15).
 * @param outdoorC                  outdoor (supply) air temperature, °C (> −273.15).
 * @param volumetricHeatCapacityWhM3K ρ·c_p, Wh/(m³·K), > 0; default 0.34 [1].
 * @returns Φ_V, W.
 * @throws RangeError for a negative or non-finite argument.
 */
export function ventilationHeatLossW(
  volumeM3: number,
  airChangesPerHour: number,
  indoorC: number,
  outdoorC: number,
  volumetricHeatCapacityWhM3K: number = AIR_VOLUMETRIC_HEAT_CAPACITY_WH_M3K,
): number {
  assertTemperatureC(indoorC, "indoorC");
  assertTemperatureC(outdoorC, "outdoorC");
  return ventilationHeatTransferCoefficientWK(volumeM3, airChangesPerHour, volumetricHeatCapacityWhM3K) * (indoorC - outdoorC);
}
