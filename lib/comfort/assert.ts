/**
 * Programmer-error guards shared by the comfort functions (see the policy in index.ts).
 * Internal module: not re-exported.
 */

/**
 * Throws a RangeError unless `value` is a finite number.
 *
 * @param value checked value, any unit.
 * @param name  parameter name used in the message.
 */
export function assertFinite(value: number, name: string): void {
  if (!Number.isFinite(value)) {
    throw new RangeError(`${name} must be a finite number, got ${String(value)}`);
  }
}

/**
 * Throws a RangeError unless `value` is finite and within [min, max] (inclusive).
 *
 * @param value checked value, any unit.
 * @param name  parameter name used in the message.
 * @param min   lowest allowed value, same unit as value.
 * @param max   highest allowed value, same unit as value.
 */
export function assertInClosedRange(value: number, name: string, min: number, max: number): void {
  if (!Number.isFinite(value) || value < min || value > max) {
    throw new RangeError(`${name} must be a finite number in [${min}, ${max}], got ${String(value)}`);
  }
}

/**
 * Throws a RangeError unless `value` is finite and ≥ 0.
 *
 * @param value checked value, any unit.
 * @param name  parameter name used in the message.
 */
export function assertNonNegative(value: number, name: string): void {
  if (!Number.isFinite(value) || value < 0) {
    throw new RangeError(`${name} must be a finite number ≥ 0, got ${String(value)}`);
  }
}
