/**
 * Energy saving of a strategy against a baseline.
 */

/** Saving against a baseline. */
export interface EnergySaving {
  /** Baseline − strategy, in the unit of the inputs (e.g. kWh). */
  saving: number;
  /** Saving / baseline × 100, %; NaN when the baseline is 0. */
  savingPercent: number;
}

/**
 * Absolute and relative saving of a strategy against a baseline: ΔE = E_base − E,
 * ΔE/E_base × 100 % (definition; common practice).
 *
 * @param strategy energy with the strategy, any energy unit, finite.
 * @param baseline energy of the baseline, same unit, finite.
 * @returns saving (same unit) and percent (NaN for a zero baseline).
 * @throws RangeError for non-finite inputs.
 */
export function energySaving(strategy: number, baseline: number): EnergySaving {
  if (!Number.isFinite(strategy) || !Number.isFinite(baseline)) {
    throw new RangeError(`energies must be finite, got ${String(strategy)} and ${String(baseline)}`);
  }
  const saving = baseline - strategy;
  return { saving, savingPercent: baseline === 0 ? Number.NaN : (saving / baseline) * 100 };
}
