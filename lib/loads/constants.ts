/**
 * Constants of the load functions.
 */

/**
 * Volumetric heat capacity of air used by the simplified design heat load method,
 * ρ·c_p = 0.34 Wh/(m³·K) (≈ 1.2 kg/m³ × 1005 J/(kg·K) / 3600 s/h), EN 12831:2003 clause 9
 * (from memory) [1].
 */
export const AIR_VOLUMETRIC_HEAT_CAPACITY_WH_M3K = 0.34;

/** Seconds per hour, s/h (exact). */
export const SECONDS_PER_HOUR = 3600;
