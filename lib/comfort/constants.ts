/**
 * Unit and physical constants of the thermal-comfort functions.
 */

/** Metabolic rate of 1 met, W/m² (ISO 7730:2005 clause 3 and Annex D program: M = MET · 58.15) [1]. */
export const MET_W_M2 = 58.15;

/** Clothing insulation of 1 clo, m²K/W (ISO 7730:2005 clause 3 and Annex D program: Icl = 0.155 · CLO) [1]. */
export const CLO_M2K_W = 0.155;

/**
 * Celsius-to-kelvin offset used inside the PMV model, K. ISO 7730:2005 equations (1)–(2)
 * and the Annex D program write (t + 273), not 273.15; keeping it reproduces the
 * standard's Table D.1 exactly [1].
 */
export const ISO7730_KELVIN_OFFSET_K = 273;

/** Offset between the Celsius and kelvin scales, K (SI definition of the degree Celsius, ISO 80000-5) [8]. */
export const CELSIUS_TO_KELVIN_OFFSET_K = 273.15;
