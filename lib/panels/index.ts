/**
 * Radiant heating/cooling panels: standard specific output (EN 1264-5 / ISO 11855-2),
 * radiant and convective parts, product characteristic curves (EN 442-2 / EN 14037 /
 * EN 14240 style), louvered panels, turndown and condensation margin. References [n] are
 * listed in lib/panels/REFERENCES.md.
 *
 * Sign convention: outputs are positive heat delivered to the room in "heating" mode and
 * positive cooling capacity (heat removed from the room) in "cooling" mode; a negative value
 * means the surface works against the chosen mode.
 *
 * Invalid-input policy (all functions of this folder): a programmer error — NaN or
 * ±Infinity, an unknown orientation/mode, a non-positive area/length/coefficient, an
 * emissivity outside 0…1, a temperature at or below absolute zero, relative humidity
 * outside 0…100 %, an empty list — throws `RangeError`. A physically valid input outside a
 * correlation's published range is computed anyway; where a range is known it is reported
 * by a `withinRange` flag (condensation margin's dew point).
 */
export { STEFAN_BOLTZMANN_W_M2K4 } from "./constants";
export type { PanelMode, PanelOrientation } from "./types";
export {
  standardSpecificOutput,
  STANDARD_SURFACE_EXCHANGE,
  type StandardSpecificOutputInput,
  type SurfaceExchangeLaw,
} from "./standardSpecificOutput";
export {
  panelOutput,
  panelRadiantFlux,
  panelConvectiveFlux,
  panelConvectionLengthM,
  type PanelOutput,
  type PanelOutputInput,
} from "./panelOutput";
export {
  characteristicOutput,
  characteristicTemperatureDifference,
  meanWaterTemperatureForOutput,
  arithmeticMeanTemperatureDifference,
  logarithmicMeanTemperatureDifference,
  type CharacteristicCurve,
  type CharacteristicMeanInput,
  type CharacteristicFlowReturnInput,
  type MeanTemperatureMethod,
} from "./characteristicOutput";
export {
  louveredPanelOutput,
  type LouveredPanelOutput,
  type LouveredPanelOutputInput,
} from "./louveredPanelOutput";
export { turndownRatio } from "./turndownRatio";
export {
  condensationMargin,
  DEFAULT_CONDENSATION_SAFETY_MARGIN_K,
  type CondensationMarginInput,
  type CondensationMarginResult,
} from "./condensationMargin";
export {
  WATER_SPECIFIC_HEAT_J_KGK,
  WATER_DENSITY_KG_M3,
  waterSpecificHeat,
  waterDensity,
  waterFlow,
  outputFromWaterFlow,
  flowReturnTemperatures,
  waterSideForOutput,
  waterSideForMeanWaterTemperature,
  surfaceTemperatureForSpecificOutput,
  type WaterProperty,
  type WaterFlow,
  type WaterFlowInput,
  type FlowReturnTemperatures,
  type WaterSideCommonInput,
  type WaterSideOperatingPoint,
  type SurfaceTemperatureForOutputInput,
} from "./hydronics";
// Louvered panels (issue 5): cavity table, lookup, aperture model, directional emission, output curve.
// Out-of-table angles are clamped and flagged (`withinTable`); a target behind the face gives NaN exit angle / `visible: false`.
export {
  buildLouverTable,
  louverTableKey,
  LOUVER_DEFAULT_STEP_DEG,
  LOUVER_DEFAULT_MIN_DEG,
  LOUVER_DEFAULT_MAX_DEG,
  LOUVER_INTERPOLATION_TOLERANCE,
  LOUVER_DEFAULT_RAYS,
  LOUVER_DEFAULT_SEED,
  LOUVER_TABLE_VERSION,
  type LouverFinish,
  type LouverTable,
  type LouverTableParams,
  type LouverTableSolver,
} from "./louverTable";
export { louverEmissivityAt, louverFaceEmissivityAt, type LouverEmissivity } from "./louverLookup";
export { louverApertureShare, LOUVER_DEFAULT_APERTURE, type LouverAperture } from "./louverAperture";
export {
  louverExitAngleDeg,
  louverDirectionalEmissivity,
  louverEffectiveTemperatureC,
  louverEmissivityToward,
  type LouverEffectiveTemperatureInput,
  type LouverToward,
  type LouverTowardInput,
} from "./louverDirection";
export {
  louverOutputCurve,
  louverTurndownRatio,
  zoneTurndownRatio,
  type LouverOutputCurveInput,
  type LouverOutputPoint,
} from "./louverPerformance";
