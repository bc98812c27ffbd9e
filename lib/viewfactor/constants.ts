/**
 * Physical and unit constants used by the radiant-field functions.
 */

/** Offset between the Celsius and kelvin scales, K (SI definition of the degree Celsius, ISO 80000-5) [9]. */
export const CELSIUS_TO_KELVIN_OFFSET_K = 273.15;
