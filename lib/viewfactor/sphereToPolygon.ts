/**
 * View factor from a small sphere to a planar convex polygon (solid angle / 4π).
 */
import type { Vec3 } from "./vec3";

const INV_FOUR_PI = 1 / (4 * Math.PI);

/**
 * Solid angle Ω (sr, 0…2π) subtended by a planar convex polygon at `point`.
 *
 * Method: Van Oosterom & Strackee's closed form for a plane triangle [3],
 *   tan(Ω/2) = R1·(R2×R3) / (r1 r2 r3 + (R1·R2) r3 + (R1·R3) r2 + (R2·R3) r1),
 * evaluated with atan2 (valid for Ω/2 > π/2) on the fan triangles from
 * vertex 0; the signed contributions are summed and the absolute value taken,
 * so either winding gives the same result. No allocation.
 *
 * @param point   observation point, m (finite).
 * @param polygon planar convex polygon, ≥ 3 finite vertices in m, either winding.
 * @returns solid angle in sr, in [0, 2π].
 * @throws RangeError for fewer than 3 vertices or non-finite coordinates.
 */
export function polygonSolidAngle(point: Readonly<Vec3>, polygon: ReadonlyArray<Readonly<Vec3>>): number {
  const n = polygon.length;
  if (!(n >= 3)) {
    throw new RangeError("polygonSolidAngle: a polygon needs at least 3 vertices");
  }
  const cx = point[0];
  const cy = point[1];
  const cz = point[2];
  const p0 = polygon[0] as Readonly<Vec3>;
  const ax = p0[0] - cx;
  const ay = p0[1] - cy;
  const az = p0[2] - cz;
  const ra = Math.sqrt(ax * ax + ay * ay + az * az);
  const p1 = polygon[1] as Readonly<Vec3>;
  let bx = p1[0] - cx;
  let by = p1[1] - cy;
  let bz = p1[2] - cz;
  let rb = Math.sqrt(bx * bx + by * by + bz * bz);
  let halfSum = 0;
  for (let i = 2; i < n; i++) {
    const p = polygon[i] as Readonly<Vec3>;
    const qx = p[0] - cx;
    const qy = p[1] - cy;
    const qz = p[2] - cz;
    const rq = Math.sqrt(qx * qx + qy * qy + qz * qz);
    const triple = ax * (by * qz - bz * qy) + ay * (bz * qx - bx * qz) + az * (bx * qy - by * qx);
    const den =
      ra * rb * rq + (ax * bx + ay * by + az * bz) * rq + (ax * qx + ay * qy + az * qz) * rb + (bx * qx + by * qy + bz * qz) * ra;
    halfSum += Math.atan2(triple, den);
    bx = qx;
    by = qy;
    bz = qz;
    rb = rq;
  }
  const omega = 2 * Math.abs(halfSum);
  if (!Number.isFinite(omega)) {
    throw new RangeError("polygonSolidAngle: non-finite coordinates");
  }
  return omega;
}

/**
 * View factor from a small sphere centred at `center` to a planar convex
 * polygon: F = Ω / 4π, Ω the solid angle of the polygon at the centre
 * (Van Oosterom & Strackee [3]; the sphere-to-surface relation is the
 * catalogue's small-sphere limit [2]). Dimensionless, 0…0.5. No allocation.
 *
 * @param center  sphere centre, m (finite); the sphere is assumed small compared with the distances to the polygon.
 * @param polygon planar convex polygon, ≥ 3 finite vertices in m, either winding.
 * @returns view factor, dimensionless, in [0, 0.5].
 * @throws RangeError for fewer than 3 vertices or non-finite coordinates.
 */
export function sphereToPolygon(center: Readonly<Vec3>, polygon: ReadonlyArray<Readonly<Vec3>>): number {
  return polygonSolidAngle(center, polygon) * INV_FOUR_PI;
}
