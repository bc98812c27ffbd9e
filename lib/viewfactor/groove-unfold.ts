/**
 * Apparent emissivity of an isothermal grey V-groove with SPECULAR walls by
 * the unfolding (image) construction — a deterministic reference independent
 * of the ray tracer.
 *
 * Method (images of a specular enclosure, [G2], [G3], [G4]): mirroring the
 * groove about its walls again and again gives a fan of wedges of angle α
 * around the vertex; in that fan every specularly reflected ray is a straight
 * line. The rim images lie on the unit circle at polar angles −β + jα
 * (wall length 1, β = α/2, polar angle measured from the bisector), and the
 * opening images are the chords between consecutive rim images. A ray that
 * enters through the opening and leaves through the m-th opening image has
 * crossed |m| wall images, i.e. it was reflected |m| times, and its
 * absorptance is 1 − (1 − ε)^|m|.
 *
 * For a fixed entry direction θ all rays are parallel. A ray passing on one
 * side of the vertex sweeps less than 180° around it; where it meets the
 * circle through the rim images again fixes the opening image it leaves
 * through, hence its number of reflections, in closed form. The reflection
 * count is piecewise constant in the entry position x with breaks at the
 * projections of the rim images, which gives the x-integral exactly.
 * The θ-integral (weight cos θ dθ = d(sin θ), reciprocity [G1]) is split at
 * every direction where a projected rim image meets a rim or the vertex
 * projection (the only places where the integrand is not smooth) and each
 * piece is integrated by 8-point Gauss–Legendre quadrature [G12] (at
 * α = 180°/n it matches the closed crossed-string form of the image polygon
 * to about 1e-10, see the reference tests). Cost grows as 1/α (a cost guard
 * rejects α < 0.01°).
 */

import {
  GROOVE_BIN_SIN_EDGES,
  GROOVE_DIRECTIONAL_BINS,
  assertOpeningAngle,
  assertWallEmissivity,
  halfAngleSinCos,
  lambertBinShares,
} from "./groove-bins";
import { gaussLegendre } from "./gaussLegendre";

/** Input of the specular V-groove unfolding construction. */
export interface GrooveUnfoldInput {
  /** Full opening angle, degrees, [0.01, 180] (cost grows as 1/α). */
  openingAngleDeg: number;
  /** Grey wall emissivity, dimensionless, (0, 1]. */
  wallEmissivity: number;
}

/** Output of the specular V-groove unfolding construction. */
export interface GrooveUnfoldResult {
  /** Apparent hemispherical emissivity, dimensionless. */
  hemispherical: number;
  /** Share of the emitted power per folded 10° in-plane exit-angle bin; sums to 1. */
  directional: number[];
  /** Apparent directional emissivity averaged (cos-weighted) over each bin, dimensionless. */
  binEmissivity: number[];
}

const GL_POINTS = 8;
const MIN_OPENING_ANGLE_DEG = 0.01;

/**
 * Apparent directional emissivity for in-plane entry angle θ (given by
 * sin θ): exact x-integral of 1 − ρ^N over the opening, over its width.
 */
function specularDirectionalEmissivity(sinTheta: number, alphaRad: number, sinBeta: number, cosBeta: number, rho: number): number {
  const cosTheta = Math.sqrt(Math.max(0, 1 - sinTheta * sinTheta));
  if (cosTheta === 0) return 0;
  const theta = Math.asin(sinTheta);
  const a = oneSide(theta, sinTheta, cosTheta, alphaRad, sinBeta, cosBeta, rho);
  const b = oneSide(-theta, -sinTheta, cosTheta, alphaRad, sinBeta, cosBeta, rho);
  return (a + b) / (2 * sinBeta);
}

/** Polar angle (rad) where the ray entering at x along θ meets the rim-image circle again (far branch). */
function exitAngle(x: number, theta: number, sinTheta: number, cosTheta: number, cosBeta: number): number {
  const q = x * cosTheta + cosBeta * sinTheta;
  return Math.PI - theta - Math.asin(q > 1 ? 1 : q < -1 ? -1 : q);
}

/** Entry position whose ray meets the rim-image circle again at polar angle φ (φ clipped to the far branch). */
function entryAt(phi: number, theta: number, sinTheta: number, cosTheta: number, cosBeta: number): number {
  const lo = 0.5 * Math.PI - theta; // tangent line
  const hi = Math.PI - theta; // line through the vertex
  const p = phi < lo ? lo : phi > hi ? hi : phi;
  return (Math.sin(theta + p) - cosBeta * sinTheta) / cosTheta;
}

/**
 * ∫ (1 − ρ^N(x)) dx over the entry positions x whose rays (direction
 * (sin θ, −cos θ)) pass the vertex on the +x side. In the unfolded fan such a
 * ray meets the circle through the rim images (radius 1) again at polar
 * angle φ_c(x) = π − θ − asin(x·cos θ + cos β·sin θ), decreasing in x; it
 * leaves through the opening image of the wedge containing φ_c (a line that
 * crosses a chord continues into that chord's circular segment and leaves
 * it through the chord's own arc), i.e. after N = round(φ_c / α)
 * reflections. The x-interval of each N follows by inverting φ_c at the rim
 * images ±β + Nα. The opposite side is the mirror image (θ → −θ).
 */
function oneSide(
  theta: number,
  sinTheta: number,
  cosTheta: number,
  alphaRad: number,
  sinBeta: number,
  cosBeta: number,
  rho: number,
): number {
  const x0 = (-cosBeta * sinTheta) / cosTheta; // entry position of the ray through the vertex
  const lo = Math.max(x0, -sinBeta);
  const hi = sinBeta;
  if (!(hi > lo)) return 0;
  const beta = 0.5 * alphaRad;
  const nFirst = Math.max(1, Math.round(exitAngle(hi, theta, sinTheta, cosTheta, cosBeta) / alphaRad));
  const nLast = Math.round(exitAngle(lo, theta, sinTheta, cosTheta, cosBeta) / alphaRad);
  let sum = 0;
  for (let n = nFirst; n <= nLast; n++) {
    const a = Math.max(entryAt(n * alphaRad + beta, theta, sinTheta, cosTheta, cosBeta), lo);
    const b = Math.min(entryAt(n * alphaRad - beta, theta, sinTheta, cosTheta, cosBeta), hi);
    if (b > a) sum += (b - a) * (1 - Math.pow(rho, n));
  }
  return sum;
}

/** sin|θ| of the entry directions where the integrand has a kink, in (0, 1). */
function kinkSines(alphaRad: number, sinBeta: number, cosBeta: number): number[] {
  const beta = 0.5 * alphaRad;
  const jMax = Math.ceil((Math.PI + beta) / alphaRad) + 2;
  const anchors: ReadonlyArray<readonly [number, number]> = [
    [-sinBeta, cosBeta],
    [sinBeta, cosBeta],
    [0, 0],
  ];
  const out: number[] = [];
  for (let j = -jMax; j <= jMax + 1; j++) {
    const phi = -beta + j * alphaRad;
    const rx = Math.sin(phi);
    const ry = Math.cos(phi);
    for (const [qx, qy] of anchors) {
      let vx = rx - qx;
      let vy = ry - qy;
      if (vy === 0) continue;
      if (vy > 0) {
        vx = -vx;
        vy = -vy;
      }
      const s = Math.abs(vx) / Math.hypot(vx, vy);
      if (s > 0 && s < 1) out.push(s);
    }
  }
  return out;
}

/**
 * Apparent emissivity of an isothermal grey V-groove with specular walls by
 * the unfolding (image) construction [G2], [G3], [G4] with exact integration
 * over the entry position and piecewise Gauss–Legendre integration over the
 * entry angle [G12]. Independent of the Monte Carlo tracer. At 180° it
 * returns exactly ε and the Lambert shares.
 *
 * @param input.openingAngleDeg full opening angle, degrees, [0.01, 180]
 * @param input.wallEmissivity grey wall emissivity, (0, 1]
 * @throws RangeError for inputs outside these ranges
 */
export function grooveEmissivitySpecularUnfolded(input: Readonly<GrooveUnfoldInput>): GrooveUnfoldResult {
  const { openingAngleDeg, wallEmissivity } = input;
  assertOpeningAngle(openingAngleDeg);
  assertWallEmissivity(wallEmissivity);
  if (openingAngleDeg < MIN_OPENING_ANGLE_DEG) {
    throw new RangeError(`openingAngleDeg must be ≥ ${MIN_OPENING_ANGLE_DEG} for the unfolding construction, got ${openingAngleDeg}`);
  }
  if (openingAngleDeg === 180) {
    return {
      hemispherical: wallEmissivity,
      directional: lambertBinShares(),
      binEmissivity: new Array<number>(GROOVE_DIRECTIONAL_BINS).fill(wallEmissivity),
    };
  }
  const [sinBeta, cosBeta] = halfAngleSinCos(openingAngleDeg);
  const alphaRad = (openingAngleDeg * Math.PI) / 180;
  const rho = 1 - wallEmissivity;
  const [nodes, weights] = gaussLegendre(GL_POINTS);
  const kinks = kinkSines(alphaRad, sinBeta, cosBeta).sort((p, q) => p - q);

  const directional = new Array<number>(GROOVE_DIRECTIONAL_BINS);
  const binEmissivity = new Array<number>(GROOVE_DIRECTIONAL_BINS);
  let total = 0;
  let next = 0;
  for (let k = 0; k < GROOVE_DIRECTIONAL_BINS; k++) {
    const binLo = GROOVE_BIN_SIN_EDGES[k] as number;
    const binHi = GROOVE_BIN_SIN_EDGES[k + 1] as number;
    while (next < kinks.length && (kinks[next] as number) <= binLo) next++;
    let acc = 0;
    let a = binLo;
    for (;;) {
      const b = next < kinks.length && (kinks[next] as number) < binHi ? (kinks[next] as number) : binHi;
      if (b - a > 1e-15) {
        const half = 0.5 * (b - a);
        const mid = 0.5 * (a + b);
        for (let q = 0; q < GL_POINTS; q++) {
          const u = mid + half * (nodes[q] as number);
          acc += half * (weights[q] as number) * specularDirectionalEmissivity(u, alphaRad, sinBeta, cosBeta, rho);
        }
      }
      if (b >= binHi) break;
      a = b;
      next++;
    }
    directional[k] = acc;
    binEmissivity[k] = acc / (binHi - binLo);
    total += acc;
  }
  for (let k = 0; k < GROOVE_DIRECTIONAL_BINS; k++) directional[k] = (directional[k] as number) / total;
  return { hemispherical: total, directional, binEmissivity };
}
