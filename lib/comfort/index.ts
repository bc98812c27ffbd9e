/**
 * Thermal comfort: PMV/PPD (ISO 7730:2005), humidity, mean radiant and operative
 * temperature, local thermal discomfort and a per-seat classifier (ISO 7730:2005 Annex A,
 * ASHRAE 55). References [n] are listed in lib/comfort/REFERENCES.md.
 *
 * Invalid-input policy (all functions of this folder):
 * - A programmer error — NaN or ±Infinity, a wrong kind, an empty list, a value that has no
 *   physical meaning (negative clo/met/air speed, relative humidity outside 0…100 %, a
 *   temperature at or below absolute zero, a negative asymmetry) — throws `RangeError`.
 * - A physically valid input outside a model's published range is computed anyway and
 *   reported with a flag: `withinRange` on `pmvPpd` and on the `…Detailed` variants
 *   (draught rate, vertical air temperature difference, radiant asymmetry, operative
 *   temperature, dew point). The plain variants return the bare number for convenience.
 * - `pmvPpd` checks its inputs in one cheap combined test and only builds a message through
 *   `validatePmvInput` when that test fails; it allocates nothing when given `out`.
 */
export { MET_W_M2, CLO_M2K_W, ISO7730_KELVIN_OFFSET_K, CELSIUS_TO_KELVIN_OFFSET_K } from "./constants";
export { pmvPpd, validatePmvInput, PMV_APPLICABILITY_ISO7730, type PmvInput, type PmvResult } from "./pmv";
export { ppdFromPmv } from "./ppd";
export {
  saturationVaporPressure,
  dewPoint,
  dewPointDetailed,
  iso7730SaturationVaporPressureKPa,
  iso7730VaporPressurePa,
  MAGNUS_AERK_A_KPA,
  MAGNUS_AERK_B,
  MAGNUS_AERK_C_C,
  MAGNUS_AERK_MIN_C,
  MAGNUS_AERK_MAX_C,
  type DewPointResult,
} from "./humidity";
export {
  meanRadiantTemperature,
  meanRadiantTemperatureDetailed,
  meanRadiantTemperatureLinear,
  type AngleFactorPart,
  type MeanRadiantTemperatureResult,
} from "./meanRadiantTemperature";
export {
  operativeTemperature,
  operativeTemperatureDetailed,
  operativeAirWeight,
  type OperativeTemperatureResult,
} from "./operativeTemperature";
export { draughtRate, draughtRateDetailed, type DraughtRateResult } from "./draughtRate";
export {
  verticalAirTemperatureDifferenceDissatisfied,
  verticalAirTemperatureDifferenceDissatisfiedDetailed,
  type VerticalAirTemperatureResult,
} from "./verticalAirTemperature";
export { floorTemperatureDissatisfied } from "./floorTemperature";
export {
  radiantAsymmetryDissatisfied,
  radiantAsymmetryDissatisfiedDetailed,
  RADIANT_ASYMMETRY_KINDS,
  RADIANT_ASYMMETRY_MAX_DELTA_C,
  type RadiantAsymmetryKind,
  type RadiantAsymmetryResult,
} from "./radiantAsymmetry";
export {
  classifySeat,
  ISO7730_CATEGORY_LIMITS,
  ASHRAE55_LIMITS,
  type ComfortCategory,
  type ComfortLimitCode,
  type ComfortLimitFailure,
  type RadiantAsymmetryEntry,
  type SeatClassification,
  type SeatComfortResults,
} from "./classifySeat";
