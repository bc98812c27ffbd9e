/**
 * Programmer-error guards of the load functions (see the policy in index.ts).
 * Internal module: not re-exported.
 */

/**
 * Throws a RangeError unless `value` is finite.
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

/**
 * Throws a RangeError unless `value` is finite and > 0.
 *
 * @param value checked value, any unit.
 * @param name  parameter name used in the message.
 */
export function assertPositive(value: number, name: string): void {
  if (!Number.isFinite(value) || value <= 0) {
    throw new RangeError(`${name} must be a finite number > 0, got ${String(value)}`);
  }
}

/**
 * Throws a RangeError unless `value` is finite and in [0, 1].
 *
 * @param value checked value, dimensionless.
 * @param name  parameter name used in the message.
 */
export function assertUnitInterval(value: number, name: string): void {
  if (!Number.isFinite(value) || value < 0 || value > 1) {
    throw new RangeError(`${name} must be a finite number in [0, 1], got ${String(value)}`);
  }
}

/** Lowest temperature accepted, °C (absolute zero, ISO 80000-5). */
const ABSOLUTE_ZERO_C = -273.15;

/**
 * Throws a RangeError unless `value` is a finite temperature above absolute zero.
 *
 * @param value temperature, °C.
 * @param name  parameter name used in the message.
 */
export function assertTemperatureC(value: number, name: string): void {
  if (!Number.isFinite(value) || value <= ABSOLUTE_ZERO_C) {
    throw new RangeError(`${name} must be a finite temperature > −273.15 °C, got ${String(value)}`);
  }
}
