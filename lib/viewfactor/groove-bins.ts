/**
 * Exit-angle bins of the V-groove directional output and the input checks
 * shared by the V-groove solvers.
 *
 * Angles are in-plane angles (the exit direction projected on the
 * cross-section plane), measured from the groove bisector and folded to
 * 0–90°. A 3-D Lambertian (diffuse) distribution projected on a plane has the
 * in-plane density p(θ) = cos θ / 2 on (−π/2, π/2) (Lambert's cosine law
 * integrated over the axial direction, as behind the 2-D view factors of
 * infinitely long surfaces [G1], [G5]), so the share of a flat diffuse surface's output in the
 * folded bin [θ_k, θ_{k+1}] is sin θ_{k+1} − sin θ_k.
 */

/** Number of 10° exit-angle bins covering 0–90°. */
export const GROOVE_DIRECTIONAL_BINS = 9;

/** Width of one exit-angle bin, degrees. */
export const GROOVE_BIN_WIDTH_DEG = 10;

const DEG_TO_RAD = Math.PI / 180;

/**
 * sin of the lower edge of each folded exit-angle bin plus the final edge
 * (sin 90° = 1): `edges[k] = sin(10°·k)`, k = 0…9 (dimensionless).
 */
export const GROOVE_BIN_SIN_EDGES: readonly number[] = Object.freeze(
  Array.from({ length: GROOVE_DIRECTIONAL_BINS + 1 }, (_, k) =>
    k === GROOVE_DIRECTIONAL_BINS ? 1 : Math.sin(k * GROOVE_BIN_WIDTH_DEG * DEG_TO_RAD),
  ),
);

/**
 * Lambert shares of the folded 10° in-plane exit-angle bins for a flat
 * diffuse emitter: sin(10°·(k+1)) − sin(10°·k), k = 0…8 (cumulative of cos θ / 2, [G1]). They sum to 1.
 * @param out optional array of length ≥ 9 to fill (avoids allocation)
 * @returns the 9 shares (dimensionless, each in (0, 1))
 */
export function lambertBinShares(out?: number[]): number[] {
  const r = out ?? new Array<number>(GROOVE_DIRECTIONAL_BINS);
  for (let k = 0; k < GROOVE_DIRECTIONAL_BINS; k++) {
    r[k] = (GROOVE_BIN_SIN_EDGES[k + 1] as number) - (GROOVE_BIN_SIN_EDGES[k] as number);
  }
  return r;
}

/**
 * Throws RangeError unless 0 < openingAngleDeg ≤ 180 (full opening angle of
 * the V-groove, degrees; 180 = flat surface).
 * @param openingAngleDeg full opening angle, degrees, (0, 180]
 */
export function assertOpeningAngle(openingAngleDeg: number): void {
  if (typeof openingAngleDeg !== "number" || !Number.isFinite(openingAngleDeg) || openingAngleDeg <= 0 || openingAngleDeg > 180) {
    throw new RangeError(`openingAngleDeg must be a finite number in (0, 180], got ${openingAngleDeg}`);
  }
}

/**
 * Throws RangeError unless 0 < wallEmissivity ≤ 1.
 * @param wallEmissivity grey wall emissivity, dimensionless, (0, 1]
 */
export function assertWallEmissivity(wallEmissivity: number): void {
  if (typeof wallEmissivity !== "number" || !Number.isFinite(wallEmissivity) || wallEmissivity <= 0 || wallEmissivity > 1) {
    throw new RangeError(`wallEmissivity must be a finite number in (0, 1], got ${wallEmissivity}`);
  }
}

/**
 * Throws RangeError unless `value` is an integer in [min, max].
 * @param name parameter name for the message
 * @param value the count to check
 * @param min smallest allowed value (integer)
 * @param max largest allowed value (integer)
 */
export function assertIntegerInRange(name: string, value: number, min: number, max: number): void {
  if (typeof value !== "number" || !Number.isInteger(value) || value < min || value > max) {
    throw new RangeError(`${name} must be an integer in [${min}, ${max}], got ${value}`);
  }
}

/**
 * Sine and cosine of the groove half-angle β = openingAngleDeg / 2, with the
 * flat case (180°) made exact (cos β = 0, sin β = 1).
 * @param openingAngleDeg full opening angle, degrees, (0, 180] (not checked)
 * @returns `[sinβ, cosβ]` (dimensionless)
 */
export function halfAngleSinCos(openingAngleDeg: number): [number, number] {
  if (openingAngleDeg === 180) return [1, 0];
  const beta = 0.5 * openingAngleDeg * DEG_TO_RAD;
  return [Math.sin(beta), Math.cos(beta)];
}
