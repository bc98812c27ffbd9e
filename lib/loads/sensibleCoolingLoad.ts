/**
 * Steady-state sensible cooling load of a room (summer).
 */
import { assertPositive } from "./assert";
import { AIR_VOLUMETRIC_HEAT_CAPACITY_WH_M3K } from "./constants";
import { internalSensibleGains, type InternalGains, type InternalGainsInput } from "./internalGains";
import { solarGainW, type GlazingSolarInput } from "./solarGain";
import { COOLING_ADJUSTMENT_FACTORS } from "./temperatureAdjustment";
import { surfaceTransmissions } from "./transmission";
import type { EnvelopeSurface, SurfaceTransmission } from "./types";
import { ventilationHeatTransferCoefficientWK } from "./ventilation";

/** Input of {@link roomSensibleCoolingLoad}. */
export interface RoomSensibleCoolingLoadInput extends InternalGainsInput {
  /** Envelope elements (net areas). */
  surfaces: ReadonlyArray<Readonly<EnvelopeSurface>>;
  /** Room air volume, m³, ≥ 0. */
  volumeM3: number;
  /** Air-change rate with outdoor air, 1/h, ≥ 0. */
  airChangesPerHour: number;
  /** Indoor design temperature, °C. */
  indoorC: number;
  /** Outdoor design (dry-bulb) temperature, °C. */
  outdoorC: number;
  /** Volumetric heat capacity of air ρ·c_p, Wh/(m³·K), > 0; default 0.34 [1]. */
  volumetricHeatCapacityWhM3K?: number;
  /** Sunlit glazing (optional). */
  glazing?: ReadonlyArray<Readonly<GlazingSolarInput>>;
}

/** Result of {@link roomSensibleCoolingLoad}; positive = heat entering the room. */
export interface RoomSensibleCoolingLoad {
  /** Conduction through the envelope Σ f·U·A·(θ_e − θ_int), W. */
  transmissionW: number;
  /** Outdoor air ρc_p·n·V·(θ_e − θ_int), W. */
  ventilationW: number;
  /** People + equipment + lighting, W. */
  internalW: number;
  /** Solar gain through glazing, W. */
  solarW: number;
  /** Sensible cooling load, W (sum of the above). */
  totalW: number;
  /** Split of the internal gains, W. */
  internal: InternalGains;
  /** Per element, in input order (heatFlowW = gain through it, W). */
  bySurface: SurfaceTransmission[];
}

/**
 * Sensible cooling load of a room by a steady-state sensible heat balance (no thermal storage,
 * no sol-air/CLTD terms — a design peak estimate, not ASHRAE's heat balance or RTS methods):
 * - conduction q = f·U·A·(θ_e − θ_int) per element (ASHRAE Fundamentals ch. 18 [3]; adjustment
 *   factors of EN ISO 13789 [2], ground gain neglected: {@link COOLING_ADJUSTMENT_FACTORS});
 * - outdoor air q = ρc_p·n·V·(θ_e − θ_int) with ρc_p = 0.34 Wh/(m³K) [1][3];
 * - internal gains: people at ASHRAE ch. 18 Table 1 sensible rates, equipment and lighting W/m² [3];
 * - solar gain Σ F_sh·g·A·I through glazing [5].
 * Transmission and ventilation turn negative when the outdoor air is cooler than the room.
 *
 * @param input surfaces (m² ≥ 0, W/(m²K) ≥ 0), volumeM3 ≥ 0, airChangesPerHour 1/h ≥ 0,
 *              indoorC/outdoorC °C, people/equipment/lighting (see {@link internalSensibleGains}),
 *              glazing (see {@link solarGainW}), optional ρc_p Wh/(m³K) > 0.
 * @returns transmission, ventilation, internal, solar and total W.
 * @throws RangeError for non-finite or negative inputs, unknown kinds/adjacencies/activities.
 */
export function roomSensibleCoolingLoad(input: Readonly<RoomSensibleCoolingLoadInput>): RoomSensibleCoolingLoad {
  const bySurface = surfaceTransmissions(input.surfaces, input.indoorC, input.outdoorC, COOLING_ADJUSTMENT_FACTORS, "gain");
  const rhoCp = input.volumetricHeatCapacityWhM3K ?? AIR_VOLUMETRIC_HEAT_CAPACITY_WH_M3K;
  assertPositive(rhoCp, "volumetricHeatCapacityWhM3K");
  const hv = ventilationHeatTransferCoefficientWK(input.volumeM3, input.airChangesPerHour, rhoCp);
  let transmissionW = 0;
  for (const s of bySurface) {
    transmissionW += s.heatFlowW;
  }
  const ventilationW = hv * (input.outdoorC - input.indoorC);
  const internal = internalSensibleGains(input);
  const solarW = input.glazing === undefined ? 0 : solarGainW(input.glazing);
  return {
    transmissionW,
    ventilationW,
    internalW: internal.totalW,
    solarW,
    totalW: transmissionW + ventilationW + internal.totalW + solarW,
    internal,
    bySurface,
  };
}
