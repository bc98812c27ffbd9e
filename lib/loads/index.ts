/**
 * Room loads: design heat loss (winter, EN 12831:2003 simplified method), steady-state
 * sensible cooling load (summer: conduction, outdoor air, internal and solar gains) and the
 * coverage of a load by the panels of the room. References [n] are listed in
 * lib/loads/REFERENCES.md.
 *
 * Sign convention: heat loss results are positive when heat leaves the room, cooling load
 * results positive when heat enters it; a reversed temperature difference gives negative
 * parts, returned as computed.
 *
 * Invalid-input policy (all functions of this folder): a programmer error — NaN or
 * ±Infinity, a negative area/U-value/volume/air-change rate/gain, a g-value or shading factor
 * outside 0…1, a temperature at or below absolute zero, an unknown element kind, adjacency or
 * activity — throws `RangeError`. A physically valid input outside a method's range is
 * computed anyway and flagged: `loadCoverage` reports `noLoad` (coverage NaN) for a load ≤ 0;
 * a b-factor from a given neighbour temperature is NaN when indoor = outdoor.
 */
export { AIR_VOLUMETRIC_HEAT_CAPACITY_WH_M3K, SECONDS_PER_HOUR } from "./constants";
export type { EnvelopeSurface, SurfaceAdjacency, SurfaceKind, SurfaceTransmission } from "./types";
export {
  HEATING_ADJUSTMENT_FACTORS,
  COOLING_ADJUSTMENT_FACTORS,
  adjustmentFactorForTemperature,
  surfaceAdjustmentFactor,
} from "./temperatureAdjustment";
export { surfaceTransmissions, type TransmissionDirection } from "./transmission";
export { ventilationFlowM3S, ventilationHeatTransferCoefficientWK, ventilationHeatLossW } from "./ventilation";
export { roomDesignHeatLoss, type RoomDesignHeatLoss, type RoomDesignHeatLossInput } from "./designHeatLoss";
export {
  internalSensibleGains,
  PEOPLE_SENSIBLE_GAIN_W,
  type InternalGains,
  type InternalGainsInput,
  type OccupantActivity,
  type OccupantGainInput,
} from "./internalGains";
export { solarGainW, type GlazingSolarInput } from "./solarGain";
export {
  roomSensibleCoolingLoad,
  type RoomSensibleCoolingLoad,
  type RoomSensibleCoolingLoadInput,
} from "./sensibleCoolingLoad";
export { loadCoverage, type LoadCoverage, type LoadCoverageInput } from "./loadCoverage";
