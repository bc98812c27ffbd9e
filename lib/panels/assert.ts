/**
 * Programmer-error guards of the panel functions (see the policy in index.ts).
 * Internal module: not re-exported.
 */

/** Offset between the Celsius and kelvin scales, K (ISO 80000-5) [7]. */
const ABSOLUTE_ZERO_C = -273.15;

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

/**
 * Throws a RangeError for a mode other than "heating"/"cooling".
 *
 * @param mode checked mode.
 */
export function assertMode(mode: string): void {
  if (mode !== "heating" && mode !== "cooling") {
    throw new RangeError(`mode must be "heating" or "cooling", got ${String(mode)}`);
  }
}

/**
 * Throws a RangeError for an orientation other than "ceiling"/"wall"/"floor".
 *
 * @param orientation checked orientation.
 */
export function assertOrientation(orientation: string): void {
  if (orientation !== "ceiling" && orientation !== "wall" && orientation !== "floor") {
    throw new RangeError(`orientation must be "ceiling", "wall" or "floor", got ${String(orientation)}`);
  }
}
