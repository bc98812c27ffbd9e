/**
 * Planar polygon helpers: area, unit normal, centroid, validation.
 *
 * A polygon is `ReadonlyArray<Vec3>`: the vertices (m) of a planar convex
 * polygon, in order, either winding.
 */
import { crossVec3, dotVec3, lengthVec3, subVec3, type Vec3 } from "./vec3";

/** Scratch vectors of the triangle helpers (no allocation per call). */
const edgeU: Vec3 = [0, 0, 0];
const edgeV: Vec3 = [0, 0, 0];
const cross: Vec3 = [0, 0, 0];

/** (p1 − p0) × (p2 − p0): twice the triangle's vector area (m²), into `out`. */
function triangleVectorArea2(p0: Readonly<Vec3>, p1: Readonly<Vec3>, p2: Readonly<Vec3>, out: Vec3): Vec3 {
  return crossVec3(subVec3(p1, p0, edgeU), subVec3(p2, p0, edgeV), out);
}

/**
 * Throws `RangeError` unless `polygon` has at least 3 vertices, each of length
 * 3 with finite coordinates. Programmer-error guard (see the folder policy in
 * `index.ts`); not used inside the hot view-factor kernels, which check their
 * result instead.
 * @param polygon vertices in m.
 * @param name    argument name for the error message.
 */
export function assertPolygon(polygon: ReadonlyArray<Readonly<Vec3>>, name = "polygon"): void {
  if (!Array.isArray(polygon) || polygon.length < 3) {
    throw new RangeError(`${name}: a polygon needs at least 3 vertices`);
  }
  for (let i = 0; i < polygon.length; i++) {
    const v = polygon[i];
    if (
      !Array.isArray(v) ||
      v.length !== 3 ||
      !Number.isFinite(v[0]) ||
      !Number.isFinite(v[1]) ||
      !Number.isFinite(v[2])
    ) {
      throw new RangeError(`${name}: vertex ${i} is not a finite [x, y, z]`);
    }
  }
}

/**
 * Newell's vector of a polygon (twice the vector area; direction follows the
 * winding by the right-hand rule), written to `out`.
 * Newell's method for the plane of a polygon, see e.g. [8].
 * @param polygon planar polygon, ≥ 3 vertices, m.
 * @param out     optional output vector (m²).
 */
export function polygonVectorArea2(polygon: ReadonlyArray<Readonly<Vec3>>, out: Vec3 = [0, 0, 0]): Vec3 {
  let nx = 0;
  let ny = 0;
  let nz = 0;
  const n = polygon.length;
  for (let i = 0; i < n; i++) {
    const p = polygon[i] as Readonly<Vec3>;
    const q = polygon[i + 1 === n ? 0 : i + 1] as Readonly<Vec3>;
    nx += (p[1] - q[1]) * (p[2] + q[2]);
    ny += (p[2] - q[2]) * (p[0] + q[0]);
    nz += (p[0] - q[0]) * (p[1] + q[1]);
  }
  out[0] = nx;
  out[1] = ny;
  out[2] = nz;
  return out;
}

/**
 * Area of a planar polygon (m²), half the length of Newell's vector [8].
 * @param polygon planar polygon, ≥ 3 finite vertices (m), either winding.
 * @returns area in m² (≥ 0).
 * @throws RangeError for fewer than 3 vertices or non-finite coordinates.
 */
export function polygonArea(polygon: ReadonlyArray<Readonly<Vec3>>): number {
  assertPolygon(polygon);
  const v = polygonVectorArea2(polygon);
  return 0.5 * Math.sqrt(v[0] * v[0] + v[1] * v[1] + v[2] * v[2]);
}

/**
 * Area of the triangle p0 p1 p2 (m²), half the length of the cross product of two edges.
 * No checks and no allocation: for inner loops (the caller validates the points).
 */
export function triangleArea(p0: Readonly<Vec3>, p1: Readonly<Vec3>, p2: Readonly<Vec3>): number {
  return 0.5 * lengthVec3(triangleVectorArea2(p0, p1, p2, cross));
}

/**
 * Unit normal of a planar polygon by Newell's method [8]; it points to the
 * side from which the vertices are seen counter-clockwise (right-hand rule).
 * @param polygon planar polygon, ≥ 3 finite vertices (m).
 * @param out     optional output vector.
 * @throws RangeError for fewer than 3 vertices, non-finite coordinates or zero area.
 */
export function polygonNormal(polygon: ReadonlyArray<Readonly<Vec3>>, out: Vec3 = [0, 0, 0]): Vec3 {
  assertPolygon(polygon);
  polygonVectorArea2(polygon, out);
  const len = Math.sqrt(out[0] * out[0] + out[1] * out[1] + out[2] * out[2]);
  if (!(len > 0)) {
    throw new RangeError("polygonNormal: polygon has zero area");
  }
  out[0] /= len;
  out[1] /= len;
  out[2] /= len;
  return out;
}

/**
 * Area centroid of a planar convex polygon (m): area-weighted mean of the
 * centroids of the fan triangles from vertex 0. For a zero-area polygon the
 * vertex mean is returned.
 * @param polygon planar convex polygon, ≥ 3 finite vertices (m).
 * @param out     optional output vector.
 * @throws RangeError for fewer than 3 vertices or non-finite coordinates.
 */
export function polygonCentroid(polygon: ReadonlyArray<Readonly<Vec3>>, out: Vec3 = [0, 0, 0]): Vec3 {
  assertPolygon(polygon);
  const normal = polygonVectorArea2(polygon);
  const p0 = polygon[0] as Readonly<Vec3>;
  let cx = 0;
  let cy = 0;
  let cz = 0;
  let wSum = 0;
  for (let i = 1; i + 1 < polygon.length; i++) {
    const p1 = polygon[i] as Readonly<Vec3>;
    const p2 = polygon[i + 1] as Readonly<Vec3>;
    // Signed (twice) triangle area projected on the polygon normal.
    const w = dotVec3(normal, triangleVectorArea2(p0, p1, p2, cross));
    cx += w * (p0[0] + p1[0] + p2[0]);
    cy += w * (p0[1] + p1[1] + p2[1]);
    cz += w * (p0[2] + p1[2] + p2[2]);
    wSum += w;
  }
  if (wSum === 0) {
    let sx = 0;
    let sy = 0;
    let sz = 0;
    for (const p of polygon) {
      sx += p[0];
      sy += p[1];
      sz += p[2];
    }
    out[0] = sx / polygon.length;
    out[1] = sy / polygon.length;
    out[2] = sz / polygon.length;
    return out;
  }
  out[0] = cx / (3 * wSum);
  out[1] = cy / (3 * wSum);
  out[2] = cz / (3 * wSum);
  return out;
}
