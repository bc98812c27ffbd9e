/**
 * Angle factor between a person (orientation unknown, rotating about the
 * vertical axis) and a vertical or horizontal rectangle, by the analytical
 * relation of ISO 7726:1998 Annex C (Fanger's diagrams fitted in closed form).
 */
import type { Vec3 } from "./vec3";

/** Body posture for the angle-factor and projected-area tables. */
export type Posture = "seated" | "standing";

/** Orientation of a rectangle for the angle-factor table. */
export type SurfaceOrientation = "vertical" | "horizontal";

/** A person for the angle-factor relation: centre of the body (m; ≈ 0.6 m above the floor seated, ≈ 1.0 m standing) and posture. */
export interface PersonPlacement {
  /** Centre of the body, m. */
  position: Vec3;
  /** Posture: selects the constants of the relation. */
  posture: Posture;
}

/** Constants of the relation F = Fmax·(1 − e^{−(a/c)/τ})·(1 − e^{−(b/c)/γ}), τ = A + B·a/c, γ = C + D·b/c + E·a/c. */
export interface AngleFactorConstants {
  /** Limit of F for an infinitely large rectangle with a corner opposite the person (dimensionless). */
  readonly fMax: number;
  readonly A: number;
  readonly B: number;
  readonly C: number;
  readonly D: number;
  readonly E: number;
}

/**
 * Constants of the ISO 7726:1998 Annex C relation [4], [5] (seated/standing ×
 * vertical/horizontal rectangle).
 *
 * Provenance: FROM MEMORY. These values could not be read in a copy of
 * ISO 7726 or of the original paper during development (searches of the
 * available public material did not turn them up); they should be checked
 * against the printed table before the product relies on them.
 */
export const ISO7726_ANGLE_FACTOR_CONSTANTS: Readonly<
  Record<Posture, Readonly<Record<SurfaceOrientation, AngleFactorConstants>>>
> = {
  seated: {
    vertical: { fMax: 0.118, A: 1.216, B: 0.169, C: 0.717, D: 0.087, E: 0.052 },
    horizontal: { fMax: 0.116, A: 1.396, B: 0.13, C: 0.951, D: 0.08, E: 0.055 },
  },
  standing: {
    vertical: { fMax: 0.12, A: 1.242, B: 0.167, C: 0.616, D: 0.082, E: 0.051 },
    horizontal: { fMax: 0.116, A: 1.595, B: 0.128, C: 1.226, D: 0.046, E: 0.044 },
  },
};

/** Tolerance on sin(tilt) for classifying a rectangle as vertical or horizontal, and on right angles. */
const ORIENTATION_TOLERANCE = 1e-4;

/**
 * Angle factor between a person and a rectangle one corner of which is
 * opposite the person (the corner is the foot of the perpendicular from the
 * body centre to the rectangle's plane): ISO 7726:1998 Annex C relation [4], [5]
 *
 *   F = Fmax·(1 − exp(−(a/c)/τ))·(1 − exp(−(b/c)/γ)),
 *   τ = A + B·(a/c),   γ = C + D·(b/c) + E·(a/c).
 *
 * @param aOverC      a/c, dimensionless, ≥ 0 (vertical rectangle: horizontal side a over distance c).
 * @param bOverC      b/c, dimensionless, ≥ 0 (vertical rectangle: vertical side b over distance c).
 * @param posture     'seated' or 'standing'.
 * @param orientation 'vertical' (wall) or 'horizontal' (floor, ceiling).
 * @returns angle factor, dimensionless, in [0, Fmax].
 * @throws RangeError for negative or non-finite ratios or an unknown posture/orientation.
 */
export function personAngleFactorCorner(
  aOverC: number,
  bOverC: number,
  posture: Posture,
  orientation: SurfaceOrientation,
): number {
  if (!(aOverC >= 0) || !(bOverC >= 0) || !Number.isFinite(aOverC) || !Number.isFinite(bOverC)) {
    throw new RangeError("personAngleFactorCorner: a/c and b/c must be finite and ≥ 0");
  }
  const k = constantsFor(posture, orientation);
  return cornerFactor(aOverC, bOverC, k);
}

function constantsFor(posture: Posture, orientation: SurfaceOrientation): AngleFactorConstants {
  const byPosture = ISO7726_ANGLE_FACTOR_CONSTANTS[posture];
  if (byPosture === undefined || (posture !== "seated" && posture !== "standing")) {
    throw new RangeError(`unknown posture: ${String(posture)}`);
  }
  const k = byPosture[orientation];
  if (k === undefined || (orientation !== "vertical" && orientation !== "horizontal")) {
    throw new RangeError(`unknown surface orientation: ${String(orientation)}`);
  }
  return k;
}

function cornerFactor(x: number, y: number, k: AngleFactorConstants): number {
  if (x === 0 || y === 0) return 0;
  const tau = k.A + k.B * x;
  const gamma = k.C + k.D * y + k.E * x;
  return k.fMax * (1 - Math.exp(-x / tau)) * (1 - Math.exp(-y / gamma));
}

/** Signed sum over the four corner rectangles of [x0, x1] × [y0, y1] (plane coordinates centred on the foot, m). */
function decomposed(x0: number, x1: number, y0: number, y1: number, c: number, k: AngleFactorConstants): number {
  return signedCornerFactor(x1, y1, c, k) - signedCornerFactor(x0, y1, c, k) - signedCornerFactor(x1, y0, c, k) + signedCornerFactor(x0, y0, c, k);
}

/** Signed corner factor: the factor of the rectangle from the foot (0,0) to (x, y) in plane coordinates, with the sign of x·y. */
function signedCornerFactor(x: number, y: number, c: number, k: AngleFactorConstants): number {
  const f = cornerFactor(Math.abs(x) / c, Math.abs(y) / c, k);
  return (x < 0) !== (y < 0) ? -f : f;
}

/** Geometry of a rectangle in the frame of the angle-factor relation. */
export interface RectangleFrame {
  /** 'vertical' or 'horizontal'. */
  orientation: SurfaceOrientation;
  /** Corner the sides start from, m. */
  corner: Vec3;
  /** Unit vector along side a (vertical rectangle: the horizontal side; horizontal rectangle: vertex 0 → vertex 1). */
  aAxis: Vec3;
  /** Unit vector along side b (vertical rectangle: the vertical side; horizontal rectangle: vertex 1 → vertex 2). */
  bAxis: Vec3;
  /** Length of side a, m. */
  aLength: number;
  /** Length of side b, m. */
  bLength: number;
  /** Unit normal (aAxis × bAxis). */
  normal: Vec3;
}

/**
 * Describes a 4-vertex rectangle for the angle-factor relation: checks that it
 * is a rectangle (parallelogram with a right angle, relative tolerance 1e-4)
 * and that it is vertical with two horizontal and two vertical edges, or
 * horizontal (tilt tolerance: sin(tilt) ≤ 1e-4).
 *
 * Side a: for a vertical rectangle the horizontal side; for a horizontal
 * rectangle the edge from vertex 0 to vertex 1 (b: vertex 1 to vertex 2).
 *
 * @param rectangle 4 finite vertices in order (either winding), m.
 * @throws RangeError if it is not a rectangle, or is neither vertical (with vertical edges) nor horizontal.
 */
export function rectangleFrame(rectangle: ReadonlyArray<Readonly<Vec3>>): RectangleFrame {
  if (!Array.isArray(rectangle) || rectangle.length !== 4) {
    throw new RangeError("rectangle: exactly 4 vertices are required");
  }
  for (const v of rectangle) {
    if (!Array.isArray(v) || v.length !== 3 || !Number.isFinite(v[0]) || !Number.isFinite(v[1]) || !Number.isFinite(v[2])) {
      throw new RangeError("rectangle: vertices must be finite [x, y, z]");
    }
  }
  const p0 = rectangle[0] as Readonly<Vec3>;
  const p1 = rectangle[1] as Readonly<Vec3>;
  const p2 = rectangle[2] as Readonly<Vec3>;
  const p3 = rectangle[3] as Readonly<Vec3>;
  const e0: Vec3 = [p1[0] - p0[0], p1[1] - p0[1], p1[2] - p0[2]];
  const e1: Vec3 = [p2[0] - p1[0], p2[1] - p1[1], p2[2] - p1[2]];
  const l0 = Math.hypot(e0[0], e0[1], e0[2]);
  const l1 = Math.hypot(e1[0], e1[1], e1[2]);
  if (!(l0 > 0) || !(l1 > 0)) {
    throw new RangeError("rectangle: degenerate (zero-length side)");
  }
  const size = Math.max(l0, l1);
  // Parallelogram: p3 = p0 + e1; right angle: e0 ⟂ e1.
  const gap = Math.hypot(p0[0] + e1[0] - p3[0], p0[1] + e1[1] - p3[1], p0[2] + e1[2] - p3[2]);
  const cosAngle = (e0[0] * e1[0] + e0[1] * e1[1] + e0[2] * e1[2]) / (l0 * l1);
  if (gap > ORIENTATION_TOLERANCE * size || Math.abs(cosAngle) > ORIENTATION_TOLERANCE) {
    throw new RangeError("rectangle: vertices do not form a rectangle");
  }
  const u0: Vec3 = [e0[0] / l0, e0[1] / l0, e0[2] / l0];
  const u1: Vec3 = [e1[0] / l1, e1[1] / l1, e1[2] / l1];
  const nz = u0[0] * u1[1] - u0[1] * u1[0];
  const corner: Vec3 = [p0[0], p0[1], p0[2]];
  if (Math.abs(nz) >= Math.sqrt(1 - ORIENTATION_TOLERANCE * ORIENTATION_TOLERANCE)) {
    return frame("horizontal", corner, u0, u1, l0, l1);
  }
  if (Math.abs(nz) <= ORIENTATION_TOLERANCE) {
    if (Math.abs(u0[2]) <= ORIENTATION_TOLERANCE) return frame("vertical", corner, u0, u1, l0, l1);
    if (Math.abs(u1[2]) <= ORIENTATION_TOLERANCE) return frame("vertical", corner, u1, u0, l1, l0);
    throw new RangeError("rectangle: a vertical rectangle must have horizontal and vertical edges");
  }
  throw new RangeError("rectangle: neither vertical nor horizontal");
}

function frame(
  orientation: SurfaceOrientation,
  corner: Vec3,
  aAxis: Vec3,
  bAxis: Vec3,
  aLength: number,
  bLength: number,
): RectangleFrame {
  const normal: Vec3 = [
    aAxis[1] * bAxis[2] - aAxis[2] * bAxis[1],
    aAxis[2] * bAxis[0] - aAxis[0] * bAxis[2],
    aAxis[0] * bAxis[1] - aAxis[1] * bAxis[0],
  ];
  return { orientation, corner, aAxis, bAxis, aLength, bLength, normal };
}

/**
 * Angle factor between a person whose orientation is unknown (rotating about
 * the vertical axis) and a vertical or horizontal rectangle, by the
 * ISO 7726:1998 Annex C method [4] (analytical relation [5], constants in
 * {@link ISO7726_ANGLE_FACTOR_CONSTANTS}, from memory).
 *
 * The relation holds for a rectangle with a corner opposite the person (at the
 * foot of the perpendicular from the body centre to the plane). Any other
 * rectangle is decomposed into rectangles that each have a corner at the foot,
 * with signed sums, as the standard prescribes (foot inside: sum of the four
 * quadrant rectangles; foot outside: larger rectangles minus the ones that
 * overhang):
 *
 *   F = G(x1, y1) − G(x0, y1) − G(x1, y0) + G(x0, y0),
 *
 * where the rectangle spans [x0, x1] × [y0, y1] in plane coordinates centred
 * on the foot and G(x, y) = sign(x·y)·F_corner(|x|/c, |y|/c).
 *
 * Sides: a is the HORIZONTAL side of a vertical rectangle and b its vertical
 * side (ISO 7726 figures). For a horizontal rectangle (floor/ceiling) both
 * sides are horizontal and, for a person turning about the vertical axis,
 * physically equivalent; the fitted relation is not exactly symmetric in a
 * and b (|F(a,b) − F(b,a)| ≤ 0.003 over a/c, b/c ≤ 10), so the result is the
 * mean of both labellings and does not depend on the vertex order.
 *
 * c is the distance from the body centre to the rectangle's plane (either
 * side). The same relation is used above and below the body centre (the
 * standard's simplification). The fitted corner factor decreases very
 * slightly with a beyond a/c ≈ 3.6 (γ grows with a/c), so a signed sum for a
 * far, thin rectangle can be marginally negative; the result is clamped at 0.
 *
 * @param person    body centre position (m; ≈ 0.6 m above the floor seated, ≈ 1.0 m standing) and posture.
 * @param rectangle 4 vertices in order (either winding), m; vertical (two horizontal and two vertical edges, any direction in plan) or horizontal (may be rotated in plan).
 * @returns angle factor, dimensionless (≈ 0…0.12 for one rectangle; the six faces of a room sum to ≈ 1).
 * @throws RangeError if the person is in the rectangle's plane (c ≈ 0), the rectangle is not a rectangle or is neither vertical nor horizontal, or for non-finite input or an unknown posture.
 */
export function personToRectangle(
  person: Readonly<PersonPlacement>,
  rectangle: ReadonlyArray<Readonly<Vec3>>,
): number {
  const pos = person.position;
  if (!Array.isArray(pos) || pos.length !== 3 || !Number.isFinite(pos[0]) || !Number.isFinite(pos[1]) || !Number.isFinite(pos[2])) {
    throw new RangeError("personToRectangle: position must be a finite [x, y, z]");
  }
  const f = rectangleFrame(rectangle);
  const k = constantsFor(person.posture, f.orientation);
  const dx = pos[0] - f.corner[0];
  const dy = pos[1] - f.corner[1];
  const dz = pos[2] - f.corner[2];
  const s = dx * f.aAxis[0] + dy * f.aAxis[1] + dz * f.aAxis[2];
  const t = dx * f.bAxis[0] + dy * f.bAxis[1] + dz * f.bAxis[2];
  const c = Math.abs(dx * f.normal[0] + dy * f.normal[1] + dz * f.normal[2]);
  const scaleM = Math.max(f.aLength, f.bLength, Math.abs(s), Math.abs(t));
  if (!(c > 1e-9 * scaleM)) {
    throw new RangeError("personToRectangle: the person is in the plane of the rectangle (c ≈ 0)");
  }
  const x0 = -s;
  const x1 = f.aLength - s;
  const y0 = -t;
  const y1 = f.bLength - t;
  const factor =
    f.orientation === "vertical"
      ? decomposed(x0, x1, y0, y1, c, k)
      : // A horizontal rectangle has no preferred side for a person turning about the vertical
        // axis: average both labellings so the result does not depend on the vertex order.
        0.5 * (decomposed(x0, x1, y0, y1, c, k) + decomposed(y0, y1, x0, x1, c, k));
  // The fit is not monotonic in a beyond a/c ≈ 3.6 (γ grows with a/c), so a
  // far, thin rectangle can come out very slightly negative: clamp at 0.
  return factor > 0 ? factor : 0;
}
