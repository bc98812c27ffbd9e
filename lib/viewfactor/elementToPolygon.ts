/**
 * View factor from a differential planar element to a planar convex polygon,
 * exact, by contour integration.
 */
import type { Vec3 } from "./vec3";

const INV_TWO_PI = 1 / (2 * Math.PI);

/** Scratch storage for the clipped polygon (relative coordinates, xyz interleaved); grown on demand. */
let clipScratch = new Float64Array(3 * 16);

/**
 * View factor F_{dA→P} from a differential planar element at `origin` with
 * normal `normal` to the polygon `polygon` (dimensionless, 0…1).
 *
 * Method: the contour-integral (Stokes) form of the configuration factor for a
 * differential element to a polygon (Hottel & Sarofim; see [1], [2]):
 *
 *   F = (1/2π) · |Σ_i γ_i · n̂·(R_i × R_{i+1}) / |R_i × R_{i+1}||,
 *
 * where R_i is the vector from the element to vertex i and γ_i the angle
 * between R_i and R_{i+1} (computed as atan2(|R_i×R_{i+1}|, R_i·R_{i+1}) for
 * accuracy at small and large angles). The absolute value makes the result
 * independent of the winding.
 *
 * Only the part of the polygon in front of the element (n̂·(x − origin) ≥ 0)
 * is seen: a polygon that straddles the element's plane is clipped to that
 * half-space by Sutherland–Hodgman [6]; a polygon wholly behind (or in) the
 * plane gives 0. No allocation in the common (unclipped) path.
 *
 * @param origin  element position, m (finite).
 * @param normal  element normal (any non-zero length; it is normalised), the element sees the side it points to.
 * @param polygon planar convex polygon, ≥ 3 finite vertices in m, either winding.
 * @returns view factor, dimensionless, in [0, 1].
 * @throws RangeError for fewer than 3 vertices, a zero or non-finite normal, or non-finite coordinates.
 */
export function elementToPolygon(
  origin: Readonly<Vec3>,
  normal: Readonly<Vec3>,
  polygon: ReadonlyArray<Readonly<Vec3>>,
): number {
  const n = polygon.length;
  if (!(n >= 3)) {
    throw new RangeError("elementToPolygon: a polygon needs at least 3 vertices");
  }
  const ox = origin[0];
  const oy = origin[1];
  const oz = origin[2];
  let nx = normal[0];
  let ny = normal[1];
  let nz = normal[2];
  const nLen = Math.sqrt(nx * nx + ny * ny + nz * nz);
  if (!(nLen > 0) || !Number.isFinite(nLen)) {
    throw new RangeError("elementToPolygon: normal must be finite and non-zero");
  }
  nx /= nLen;
  ny /= nLen;
  nz /= nLen;

  // Signed heights of the vertices above the element's plane.
  let minH = Infinity;
  let maxH = -Infinity;
  for (let i = 0; i < n; i++) {
    const p = polygon[i] as Readonly<Vec3>;
    const h = nx * (p[0] - ox) + ny * (p[1] - oy) + nz * (p[2] - oz);
    if (h < minH) minH = h;
    if (h > maxH) maxH = h;
  }
  if (Number.isNaN(minH) || Number.isNaN(maxH) || !Number.isFinite(ox + oy + oz)) {
    throw new RangeError("elementToPolygon: non-finite coordinates");
  }
  if (maxH <= 0) {
    return 0; // wholly behind, or in, the element's plane
  }

  let sum = 0;
  if (minH >= 0) {
    // Common path: whole polygon in front, no clipping, no allocation.
    const last = polygon[n - 1] as Readonly<Vec3>;
    let ax = last[0] - ox;
    let ay = last[1] - oy;
    let az = last[2] - oz;
    for (let i = 0; i < n; i++) {
      const p = polygon[i] as Readonly<Vec3>;
      const bx = p[0] - ox;
      const by = p[1] - oy;
      const bz = p[2] - oz;
      sum += edgeTerm(ax, ay, az, bx, by, bz, nx, ny, nz);
      ax = bx;
      ay = by;
      az = bz;
    }
  } else {
    const m = clipToFrontHalfSpace(polygon, ox, oy, oz, nx, ny, nz);
    const s = clipScratch;
    let ax = s[3 * (m - 1)] as number;
    let ay = s[3 * (m - 1) + 1] as number;
    let az = s[3 * (m - 1) + 2] as number;
    for (let i = 0; i < m; i++) {
      const bx = s[3 * i] as number;
      const by = s[3 * i + 1] as number;
      const bz = s[3 * i + 2] as number;
      sum += edgeTerm(ax, ay, az, bx, by, bz, nx, ny, nz);
      ax = bx;
      ay = by;
      az = bz;
    }
  }
  const f = Math.abs(sum) * INV_TWO_PI;
  if (!Number.isFinite(f)) {
    throw new RangeError("elementToPolygon: non-finite coordinates");
  }
  return f;
}

/** γ · n̂·(a×b)/|a×b| for one polygon edge seen from the element (vectors relative to the element). */
function edgeTerm(
  ax: number,
  ay: number,
  az: number,
  bx: number,
  by: number,
  bz: number,
  nx: number,
  ny: number,
  nz: number,
): number {
  const cx = ay * bz - az * by;
  const cy = az * bx - ax * bz;
  const cz = ax * by - ay * bx;
  const cLen = Math.sqrt(cx * cx + cy * cy + cz * cz);
  if (cLen === 0) return 0; // edge collinear with the element: no contribution
  const gamma = Math.atan2(cLen, ax * bx + ay * by + az * bz);
  return (gamma * (nx * cx + ny * cy + nz * cz)) / cLen;
}

/**
 * Sutherland–Hodgman clip [6] of `polygon` to the half-space n̂·(x − o) ≥ 0.
 * Writes the clipped vertices, relative to o, to `clipScratch`; returns their count.
 */
function clipToFrontHalfSpace(
  polygon: ReadonlyArray<Readonly<Vec3>>,
  ox: number,
  oy: number,
  oz: number,
  nx: number,
  ny: number,
  nz: number,
): number {
  const n = polygon.length;
  // Output ≤ (vertices in front) + (crossings) ≤ 2n, even for a non-convex input.
  if (clipScratch.length < 6 * n) {
    clipScratch = new Float64Array(6 * n);
  }
  const s = clipScratch;
  let m = 0;
  const last = polygon[n - 1] as Readonly<Vec3>;
  let px = last[0] - ox;
  let py = last[1] - oy;
  let pz = last[2] - oz;
  let ph = nx * px + ny * py + nz * pz;
  for (let i = 0; i < n; i++) {
    const q = polygon[i] as Readonly<Vec3>;
    const qx = q[0] - ox;
    const qy = q[1] - oy;
    const qz = q[2] - oz;
    const qh = nx * qx + ny * qy + nz * qz;
    if ((ph >= 0) !== (qh >= 0)) {
      // Edge crosses the plane: emit the intersection point.
      const t = ph / (ph - qh);
      s[3 * m] = px + t * (qx - px);
      s[3 * m + 1] = py + t * (qy - py);
      s[3 * m + 2] = pz + t * (qz - pz);
      m++;
    }
    if (qh >= 0) {
      s[3 * m] = qx;
      s[3 * m + 1] = qy;
      s[3 * m + 2] = qz;
      m++;
    }
    px = qx;
    py = qy;
    pz = qz;
    ph = qh;
  }
  return m;
}
