/**
 * Small 3-D vector helpers (metres, right-handed, z up).
 *
 * Plain tuples, no classes. Every helper that produces a vector takes an
 * optional `out` argument so hot loops can reuse storage instead of
 * allocating.
 */

/** A point or direction in metres (or a dimensionless direction), `[x, y, z]`, z up. */
export type Vec3 = [number, number, number];

/** Creates a vector `[x, y, z]`. */
export function vec3(x: number, y: number, z: number): Vec3 {
  return [x, y, z];
}

/** `a + b`, written to `out` (new vector if omitted). */
export function addVec3(a: Readonly<Vec3>, b: Readonly<Vec3>, out: Vec3 = [0, 0, 0]): Vec3 {
  out[0] = a[0] + b[0];
  out[1] = a[1] + b[1];
  out[2] = a[2] + b[2];
  return out;
}

/** `a − b`, written to `out` (new vector if omitted). */
export function subVec3(a: Readonly<Vec3>, b: Readonly<Vec3>, out: Vec3 = [0, 0, 0]): Vec3 {
  out[0] = a[0] - b[0];
  out[1] = a[1] - b[1];
  out[2] = a[2] - b[2];
  return out;
}

/** `s · a`, written to `out` (new vector if omitted). */
export function scaleVec3(a: Readonly<Vec3>, s: number, out: Vec3 = [0, 0, 0]): Vec3 {
  out[0] = a[0] * s;
  out[1] = a[1] * s;
  out[2] = a[2] * s;
  return out;
}

/** Dot product `a · b`. */
export function dotVec3(a: Readonly<Vec3>, b: Readonly<Vec3>): number {
  return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
}

/** Cross product `a × b`, written to `out` (new vector if omitted; `out` may alias neither input). */
export function crossVec3(a: Readonly<Vec3>, b: Readonly<Vec3>, out: Vec3 = [0, 0, 0]): Vec3 {
  const x = a[1] * b[2] - a[2] * b[1];
  const y = a[2] * b[0] - a[0] * b[2];
  const z = a[0] * b[1] - a[1] * b[0];
  out[0] = x;
  out[1] = y;
  out[2] = z;
  return out;
}

/** Euclidean length `|a|`. */
export function lengthVec3(a: Readonly<Vec3>): number {
  return Math.sqrt(a[0] * a[0] + a[1] * a[1] + a[2] * a[2]);
}

/** Distance `|a − b|` in the units of the inputs. */
export function distanceVec3(a: Readonly<Vec3>, b: Readonly<Vec3>): number {
  const dx = a[0] - b[0];
  const dy = a[1] - b[1];
  const dz = a[2] - b[2];
  return Math.sqrt(dx * dx + dy * dy + dz * dz);
}

/**
 * Unit vector along `a`, written to `out` (new vector if omitted).
 * @throws RangeError if `a` has zero or non-finite length.
 */
export function normalizeVec3(a: Readonly<Vec3>, out: Vec3 = [0, 0, 0]): Vec3 {
  const len = lengthVec3(a);
  if (!(len > 0) || !Number.isFinite(len)) {
    throw new RangeError("normalizeVec3: vector has zero or non-finite length");
  }
  return scaleVec3(a, 1 / len, out);
}

/** True when all three components are finite numbers. */
export function isFiniteVec3(a: Readonly<Vec3>): boolean {
  return Number.isFinite(a[0]) && Number.isFinite(a[1]) && Number.isFinite(a[2]);
}
