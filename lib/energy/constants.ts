/**
 * Calendar and unit constants of the energy functions.
 */

/** Days in a (common) year, d [4]. */
export const DAYS_PER_YEAR = 365;

/** Days in a week, d (ISO 8601) [1]. */
export const DAYS_PER_WEEK = 7;

/**
 * Weeks per year used for annual energy: 365/7 ≈ 52.143 (a common Gregorian year; leap days
 * ignored), so that each weekday counts 365/7 times a year [4].
 */
export const WEEKS_PER_YEAR = DAYS_PER_YEAR / DAYS_PER_WEEK;

/** Watt-hours per kilowatt-hour (exact) [2]. */
export const WH_PER_KWH = 1000;
