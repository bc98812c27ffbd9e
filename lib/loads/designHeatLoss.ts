/**
 * Design heat loss of a room (winter), EN 12831:2003 simplified method.
 */
import { assertNonNegative, assertPositive } from "./assert";
import { AIR_VOLUMETRIC_HEAT_CAPACITY_WH_M3K, SECONDS_PER_HOUR } from "./constants";
import { HEATING_ADJUSTMENT_FACTORS } from "./temperatureAdjustment";
import { surfaceTransmissions } from "./transmission";
import type { EnvelopeSurface, SurfaceTransmission } from "./types";
import { ventilationHeatTransferCoefficientWK } from "./ventilation";

/** Input of {@link roomDesignHeatLoss}. */
export interface RoomDesignHeatLossInput {
  /** Envelope elements of the room (net areas). */
  surfaces: ReadonlyArray<Readonly<EnvelopeSurface>>;
  /** Room air volume V_i, m³, ≥ 0. */
  volumeM3: number;
  /** Air-change rate n (minimum hygienic or infiltration), 1/h, ≥ 0. */
  airChangesPerHour: number;
  /** Design indoor temperature θ_int, °C. */
  indoorC: number;
  /** Design outdoor temperature θ_e, °C. */
  outdoorC: number;
  /** Volumetric heat capacity of air ρ·c_p, Wh/(m³·K), > 0; default 0.34 [1]. */
  volumetricHeatCapacityWhM3K?: number;
  /**
   * Optional heating-up (reheat) capacity Φ_RH = A·f_RH: floor area m² (≥ 0) and reheat
   * factor W/m² (≥ 0, from the method's tables for the set-back and heat-up time) [1].
   */
  reheat?: Readonly<{ floorAreaM2: number; reheatFactorWm2: number }>;
}

/** Result of {@link roomDesignHeatLoss}; positive = heat the room loses. */
export interface RoomDesignHeatLoss {
  /** Transmission heat loss Φ_T = Σ f_k·A_k·U_k·(θ_int − θ_e), W. */
  transmissionW: number;
  /** Ventilation heat loss Φ_V = ρc_p·n·V·(θ_int − θ_e), W. */
  ventilationW: number;
  /** Heating-up capacity Φ_RH, W (0 without `reheat`). */
  reheatW: number;
  /** Total design heat load Φ = Φ_T + Φ_V + Φ_RH, W. */
  totalW: number;
  /** Transmission heat transfer coefficient H_T = Σ f_k·A_k·U_k, W/K. */
  transmissionCoefficientWK: number;
  /** Ventilation heat transfer coefficient H_V = ρc_p·n·V, W/K. */
  ventilationCoefficientWK: number;
  /** Ventilation air flow n·V/3600, m³/s. */
  ventilationFlowM3S: number;
  /** Per element, in input order (heatFlowW = loss through it, W). */
  bySurface: SurfaceTransmission[];
}

/**
 * Design heat loss of a room by the simplified method of EN 12831:2003, clause 9 [1]
 * (clause numbers from memory):
 * - transmission Φ_T,i = Σ_k f_k·A_k·U_k·(θ_int,i − θ_e) with the default temperature
 *   correction factors f_k of the method ({@link HEATING_ADJUSTMENT_FACTORS}: exterior 1.00,
 *   unheated space 0.80, ground 0.30; an adjoining heated room 0 unless its temperature is
 *   given, b = (θ_int − θ_adj)/(θ_int − θ_e) as in EN ISO 13789 [2]); the thermal-bridge
 *   surcharges of the method are left to the element U-values (a documented subset);
 * - ventilation Φ_V,i = 0.34·V_min,i·(θ_int,i − θ_e), V_min,i = n_min·V_i in m³/h;
 * - optional heating-up capacity Φ_RH,i = A_i·f_RH;
 * - total Φ_HL,i = Φ_T,i + Φ_V,i + Φ_RH,i (the method's factor f_ΔΘ for rooms kept warmer than
 *   their neighbours is not applied: give adjacentC for such boundaries instead).
 * Outdoor warmer than indoor gives negative losses (no heating load); they are returned as is.
 *
 * @param input surfaces (areaM2 ≥ 0, uValueWm2K ≥ 0), volumeM3 ≥ 0, airChangesPerHour ≥ 0 1/h,
 *              indoorC/outdoorC °C, optional ρc_p Wh/(m³K) > 0 and reheat (m² ≥ 0, W/m² ≥ 0).
 * @returns transmission, ventilation, reheat and total W, the coefficients W/K and per-element losses.
 * @throws RangeError for non-finite or negative inputs, an unknown element kind or adjacency.
 */
export function roomDesignHeatLoss(input: Readonly<RoomDesignHeatLossInput>): RoomDesignHeatLoss {
  const bySurface = surfaceTransmissions(input.surfaces, input.indoorC, input.outdoorC, HEATING_ADJUSTMENT_FACTORS, "loss");
  const rhoCp = input.volumetricHeatCapacityWhM3K ?? AIR_VOLUMETRIC_HEAT_CAPACITY_WH_M3K;
  assertPositive(rhoCp, "volumetricHeatCapacityWhM3K");
  const hv = ventilationHeatTransferCoefficientWK(input.volumeM3, input.airChangesPerHour, rhoCp);
  const dT = input.indoorC - input.outdoorC;
  let transmissionW = 0;
  let ht = 0;
  for (const s of bySurface) {
    transmissionW += s.heatFlowW;
    ht += s.heatTransferCoefficientWK;
  }
  let reheatW = 0;
  if (input.reheat !== undefined) {
    assertNonNegative(input.reheat.floorAreaM2, "reheat.floorAreaM2");
    assertNonNegative(input.reheat.reheatFactorWm2, "reheat.reheatFactorWm2");
    reheatW = input.reheat.floorAreaM2 * input.reheat.reheatFactorWm2;
  }
  const ventilationW = hv * dT;
  return {
    transmissionW,
    ventilationW,
    reheatW,
    totalW: transmissionW + ventilationW + reheatW,
    transmissionCoefficientWK: ht,
    ventilationCoefficientWK: hv,
    ventilationFlowM3S: (input.airChangesPerHour * input.volumeM3) / SECONDS_PER_HOUR,
    bySurface,
  };
}
