/**
 * Closed-form configuration factors from J. R. Howell, "A Catalog of
 * Radiation Heat Transfer Configuration Factors" (and the appendix of Howell,
 * Mengüç & Siegel, "Thermal Radiation Heat Transfer"), implemented here
 * independently of lib/viewfactor so the tests compare two separate codes.
 *
 * Provenance of each formula (not read in the catalogue itself during
 * development):
 * - B-3 (element parallel to rectangle, normal through a corner) and B-4
 *   (element in a plane at 90° to the rectangle, opposite a corner): from
 *   memory, and consistent with a public implementation that labels them with
 *   the catalogue numbers B-3 and B-4 and gives the check values
 *   F(1,1,1) = 0.13853160599489298 and 0.05573419700255351.
 * - Sphere to rectangle with a corner opposite: F = (1/4π)·atan(ab/(c·√(a²+b²+c²)))
 *   (solid angle of the rectangle / 4π), from memory.
 * - Directly opposed parallel rectangles: from memory, consistent with public
 *   implementations citing "Thermal Radiation Heat Transfer", 5th ed., appendix.
 * - Perpendicular rectangles with a common edge: from memory; the tests check
 *   it independently through the unit-cube closure 4·F_adjacent + F_opposite = 1.
 */

/**
 * B-3: differential planar element to a parallel rectangle a × b whose corner
 * lies on the element's normal, at distance c.
 */
export function elementParallelCorner(a: number, b: number, c: number): number {
  const X = a / c;
  const Y = b / c;
  const sx = Math.sqrt(1 + X * X);
  const sy = Math.sqrt(1 + Y * Y);
  return ((X / sx) * Math.atan(Y / sx) + (Y / sy) * Math.atan(X / sy)) / (2 * Math.PI);
}

/**
 * B-4: differential planar element in a plane at 90° to a rectangle; the
 * element lies on the line through a corner normal to the rectangle, at
 * distance c; the rectangle's side b runs along the intersection of the two
 * planes (width) and side a away from it (height).
 */
export function elementPerpendicularCorner(a: number, b: number, c: number): number {
  const X = a / b;
  const Y = c / b;
  const s = Math.sqrt(X * X + Y * Y);
  return (Math.atan(1 / Y) - (Y / s) * Math.atan(1 / s)) / (2 * Math.PI);
}

/** Small sphere to a rectangle a × b with a corner opposite the centre, at distance c. */
export function sphereRectangleCorner(a: number, b: number, c: number): number {
  return Math.atan((a * b) / (c * Math.sqrt(a * a + b * b + c * c))) / (4 * Math.PI);
}

/** Directly opposed parallel rectangles a × b at distance c. */
export function parallelRectangles(a: number, b: number, c: number): number {
  const X = a / c;
  const Y = b / c;
  const x1 = 1 + X * X;
  const y1 = 1 + Y * Y;
  return (
    (2 / (Math.PI * X * Y)) *
    (Math.log(Math.sqrt((x1 * y1) / (x1 + y1 - 1))) +
      X * Math.sqrt(y1) * Math.atan(X / Math.sqrt(y1)) +
      Y * Math.sqrt(x1) * Math.atan(Y / Math.sqrt(x1)) -
      X * Math.atan(X) -
      Y * Math.atan(Y))
  );
}

/**
 * Perpendicular rectangles with a common edge of length l: F from the
 * rectangle of width w (perpendicular to the edge) to the one of height h.
 */
export function perpendicularCommonEdge(l: number, w: number, h: number): number {
  const H = h / l;
  const W = w / l;
  const H2 = H * H;
  const W2 = W * W;
  const S = H2 + W2;
  const t1 = W * Math.atan(1 / W) + H * Math.atan(1 / H) - Math.sqrt(S) * Math.atan(1 / Math.sqrt(S));
  const t2 =
    0.25 *
    Math.log(
      (((1 + W2) * (1 + H2)) / (1 + S)) *
        Math.pow((W2 * (1 + S)) / ((1 + W2) * S), W2) *
        Math.pow((H2 * (1 + S)) / ((1 + H2) * S), H2),
    );
  return (t1 + t2) / (Math.PI * W);
}

/**
 * Perpendicular rectangles sharing only part of an edge: the emitter spans
 * 0…l along the edge (width w), the receiver 0…s with s < l (height h).
 * View-factor algebra (decomposition and reciprocity, e.g. Howell's
 * catalogue introduction; common practice) on the common-edge form: with the
 * emitter split into A1 (0…s) and A2 (s…l) and the receiver extended by R2
 * (s…l), A2·F(A2→R1) = A1·F(A1→R2) by symmetry, so
 *   A·F(A→R1) = ½ [A·F(A→R1+R2) + A1·F(A1→R1) − A2·F(A2→R2)].
 */
export function perpendicularPartEdge(l: number, s: number, w: number, h: number): number {
  const [A, A1, A2] = [l * w, s * w, (l - s) * w];
  return (A * perpendicularCommonEdge(l, w, h) + A1 * perpendicularCommonEdge(s, w, h) - A2 * perpendicularCommonEdge(l - s, w, h)) / (2 * A);
}
