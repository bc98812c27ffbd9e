/**
 * Deterministic radiosity solver for the apparent emissivity of an
 * isothermal, grey, infinitely long V-groove with DIFFUSE walls.
 *
 * Method: each wall is cut into strips (graded finer toward the vertex and
 * the rim, see {@link gradedStripEdges}); 2-D view factors between strips
 * and from a strip to the opening come from Hottel's crossed-string method
 * [G5], [G1]; the net-radiation
 * (radiosity) equations of the grey diffuse enclosure [G1], [G3]
 *   J_i = ε·σT⁴ + (1 − ε)·Σ_j F_ij·J_j
 * (the surroundings beyond the opening are black at 0 K) are solved directly
 * [G10]. By symmetry the radiosity of strip i is the same on both walls, so
 * only one wall's unknowns are kept. The apparent emissivity is the power
 * leaving through the opening over σT⁴ times the opening width:
 *   ε_a = Σ_walls Σ_i J_i·L_i·F_i→opening / (σT⁴·W).
 * With piecewise-constant radiosity and exact strip-averaged view factors this
 * is the Galerkin discretisation of the radiosity integral equation; the
 * error of ε_a falls as N⁻² on the graded mesh, so the result at N and 2N
 * strips is Richardson-extrapolated [G11] (both values are returned).
 *
 * Directional output: by reciprocity, the apparent directional emissivity
 * for in-plane exit angle θ is (1/W)·∫ J(hit(x, θ)) dx over the opening,
 * where hit(x, θ) is the wall point seen from opening point x along θ; with
 * piecewise-constant J this integral is exact (each strip maps to an interval
 * of x). The bin shares integrate it against cos θ dθ = d(sin θ) by
 * composite Gauss–Legendre quadrature [G12]; the bin averages are
 * Richardson-extrapolated like the hemispherical value.
 */

import {
  GROOVE_BIN_SIN_EDGES,
  GROOVE_DIRECTIONAL_BINS,
  assertIntegerInRange,
  assertOpeningAngle,
  assertWallEmissivity,
  halfAngleSinCos,
  lambertBinShares,
} from "./groove-bins";
import { solveDenseInPlace } from "./groove-linsolve";
import { gaussLegendre } from "./gaussLegendre";

/** Input of the diffuse V-groove radiosity solver. */
export interface GrooveRadiosityInput {
  /** Full opening angle, degrees, (0, 180]. */
  openingAngleDeg: number;
  /** Grey wall emissivity, dimensionless, (0, 1]. */
  wallEmissivity: number;
  /** Strips per wall of the finer mesh, even integer in [4, 2000]; default 256 (coarse mesh = half). */
  strips?: number;
}

/** Output of the diffuse V-groove radiosity solver. */
export interface GrooveRadiosityResult {
  /** Apparent hemispherical emissivity, Richardson-extrapolated from N/2 and N strips, dimensionless. */
  hemispherical: number;
  /** Share of the emitted power per folded 10° in-plane exit-angle bin; sums to 1. */
  directional: number[];
  /** Apparent directional emissivity averaged (cos-weighted) over each bin, Richardson-extrapolated, dimensionless. */
  binEmissivity: number[];
  /** Apparent hemispherical emissivity with N strips per wall (no extrapolation). */
  hemisphericalFine: number;
  /** Apparent hemispherical emissivity with N/2 strips per wall. */
  hemisphericalCoarse: number;
  /** Strips per wall of the fine mesh (N). */
  strips: number;
}

/** Default strips per wall of the fine mesh. */
export const GROOVE_RADIOSITY_DEFAULT_STRIPS = 256;

const GL_POINTS = 8;
const GL_PANELS_PER_BIN = 8;

/**
 * Strip edges on a wall of unit length, graded toward the vertex and the rim.
 * A cosine (Chebyshev–Gauss–Lobatto) map c(u) = (1 − cos πu)/2 of uniform
 * u = j/n is composed with an exponential stretch of the distance from the
 * rim, r = expm1(κ(1 − c)) / expm1(κ), κ = ln(1 + 1/W), which makes the strips
 * at the rim a small fraction of the opening width W even for nearly closed
 * grooves (where the radiosity varies on the scale of W near the rim). The
 * map is smooth, so the error keeps its N⁻² expansion (Richardson) [G11].
 * @param n number of strips, integer ≥ 1
 * @param openingWidth opening width W in wall lengths, (0, 2]
 * @returns n + 1 edges from 0 (vertex) to 1 (rim), in wall lengths
 */
export function gradedStripEdges(n: number, openingWidth: number): Float64Array {
  const kappa = Math.log1p(1 / openingWidth);
  const scale = Math.expm1(kappa);
  const s = new Float64Array(n + 1);
  for (let j = 0; j <= n; j++) {
    const c = 0.5 * (1 - Math.cos((Math.PI * j) / n));
    s[j] = 1 - Math.expm1(kappa * (1 - c)) / scale;
  }
  s[0] = 0;
  s[n] = 1;
  return s;
}

interface WedgeSolution {
  hemispherical: number;
  edges: Float64Array;
  radiosity: Float64Array;
}

/**
 * Solves the symmetric wedge radiosity system on the given strip edges.
 * Distances between a point at s on one wall and t on the other (both from
 * the vertex, wall lengths) follow the law of cosines, d² = s² + t² − 2st·cos α.
 */
function solveWedge(edges: Float64Array, cosAlpha: number, sinBeta: number, eps: number): WedgeSolution {
  const n = edges.length - 1;
  const m = n + 1;
  // dist[a*m + b] = distance between edge a on the left wall and edge b on the right wall.
  const dist = new Float64Array(m * m);
  for (let a = 0; a < m; a++) {
    const s = edges[a] as number;
    for (let b = a; b < m; b++) {
      const t = edges[b] as number;
      const d = Math.sqrt(Math.max(0, s * s + t * t - 2 * s * t * cosAlpha));
      dist[a * m + b] = d;
      dist[b * m + a] = d;
    }
  }
  const rho = 1 - eps;
  const a = new Float64Array(n * n);
  const rhs = new Float64Array(n);
  const outFactorTimesLength = new Float64Array(n); // L_i · F_i→opening
  for (let i = 0; i < n; i++) {
    const li = (edges[i + 1] as number) - (edges[i] as number);
    const r0 = i * m;
    const r1 = (i + 1) * m;
    for (let j = 0; j < n; j++) {
      // Crossed strings minus uncrossed strings, over 2 L_i [G5].
      const fij =
        ((dist[r0 + j + 1] as number) + (dist[r1 + j] as number) - (dist[r1 + j + 1] as number) - (dist[r0 + j] as number)) /
        (2 * li);
      a[i * n + j] = -rho * fij;
    }
    a[i * n + i] = (a[i * n + i] as number) + 1;
    rhs[i] = eps;
    // Strip to opening (rims at s = 1 on both walls): [L_i + d(s_{i+1}, rim') − d(s_i, rim')] / 2.
    outFactorTimesLength[i] = 0.5 * (li + (dist[r1 + n] as number) - (dist[r0 + n] as number));
  }
  solveDenseInPlace(a, rhs, n);
  let power = 0;
  for (let i = 0; i < n; i++) power += (rhs[i] as number) * (outFactorTimesLength[i] as number);
  // Two walls, opening width W = 2 sin β.
  return { hemispherical: power / sinBeta, edges, radiosity: rhs };
}

/**
 * (1/W)·∫ J(hit(x, θ)) dx over the opening for entry angle θ ≥ 0 (direction
 * (sin θ, −cos θ)), exact for piecewise-constant J.
 */
function directionalEmissivity(sol: WedgeSolution, sinTheta: number, sinBeta: number, cosBeta: number): number {
  const { edges, radiosity } = sol;
  const n = edges.length - 1;
  const cosTheta = Math.sqrt(Math.max(0, 1 - sinTheta * sinTheta));
  if (cosTheta === 0) return 0;
  const tanTheta = sinTheta / cosTheta;
  const x0 = -cosBeta * tanTheta; // opening point whose ray passes through the vertex
  let sum = 0;
  // Left wall point s: x(s) = −s·sinβ − cosβ·(1 − s)·tanθ, visible for x ≤ sinβ when θ < β.
  if (sinTheta * cosBeta - cosTheta * sinBeta < 0) {
    for (let i = 0; i < n; i++) {
      const sA = edges[i] as number;
      const sB = edges[i + 1] as number;
      const xA = -sA * sinBeta - cosBeta * (1 - sA) * tanTheta;
      const xB = -sB * sinBeta - cosBeta * (1 - sB) * tanTheta;
      const hi = Math.min(xA, sinBeta);
      const lo = Math.max(xB, -sinBeta);
      if (hi > lo) sum += (radiosity[i] as number) * (hi - lo);
    }
  }
  // Right wall point t: x(t) = t·sinβ − cosβ·(1 − t)·tanθ, increasing from x0 to sinβ; visible for x ≥ −sinβ.
  if (x0 < sinBeta) {
    for (let j = 0; j < n; j++) {
      const tA = edges[j] as number;
      const tB = edges[j + 1] as number;
      const xA = tA * sinBeta - cosBeta * (1 - tA) * tanTheta;
      const xB = tB * sinBeta - cosBeta * (1 - tB) * tanTheta;
      const lo = Math.max(xA, -sinBeta);
      const hi = Math.min(xB, sinBeta);
      if (hi > lo) sum += (radiosity[j] as number) * (hi - lo);
    }
  }
  return sum / (2 * sinBeta);
}

/**
 * Bin-averaged apparent directional emissivity of a wedge solution:
 * ∫ ε_a(θ) d(sin θ) over each folded 10° bin by composite Gauss–Legendre
 * [G12], divided by the bin's width in sin θ (its Lambert share).
 */
function binEmissivities(sol: WedgeSolution, sinBeta: number, cosBeta: number): number[] {
  const [nodes, weights] = gaussLegendre(GL_POINTS);
  const out = new Array<number>(GROOVE_DIRECTIONAL_BINS);
  for (let k = 0; k < GROOVE_DIRECTIONAL_BINS; k++) {
    const lo = GROOVE_BIN_SIN_EDGES[k] as number;
    const hi = GROOVE_BIN_SIN_EDGES[k + 1] as number;
    const panel = (hi - lo) / GL_PANELS_PER_BIN;
    let acc = 0;
    for (let p = 0; p < GL_PANELS_PER_BIN; p++) {
      const mid = lo + (p + 0.5) * panel;
      for (let q = 0; q < GL_POINTS; q++) {
        const u = mid + 0.5 * panel * (nodes[q] as number);
        acc += 0.5 * panel * (weights[q] as number) * directionalEmissivity(sol, u, sinBeta, cosBeta);
      }
    }
    out[k] = acc / (hi - lo);
  }
  return out;
}

/**
 * Apparent emissivity of an isothermal grey V-groove with diffuse walls by
 * the radiosity method with crossed-string view factors [G5], [G1], [G3],
 * Richardson-extrapolated in the strip count [G11]. At 180° (flat surface)
 * it returns exactly ε and the Lambert shares.
 *
 * @param input.openingAngleDeg full opening angle, degrees, (0, 180]
 * @param input.wallEmissivity grey wall emissivity, (0, 1]
 * @param input.strips strips per wall of the fine mesh, even integer in [4, 2000], default 256
 * @throws RangeError for inputs outside these ranges
 */
export function grooveEmissivityDiffuseRadiosity(input: Readonly<GrooveRadiosityInput>): GrooveRadiosityResult {
  const { openingAngleDeg, wallEmissivity } = input;
  const strips = input.strips ?? GROOVE_RADIOSITY_DEFAULT_STRIPS;
  assertOpeningAngle(openingAngleDeg);
  assertWallEmissivity(wallEmissivity);
  assertIntegerInRange("strips", strips, 4, 2000);
  if (strips % 2 !== 0) throw new RangeError(`strips must be even, got ${strips}`);

  if (openingAngleDeg === 180) {
    // Flat surface: no wall sees the other, J = ε·σT⁴ everywhere.
    return {
      hemispherical: wallEmissivity,
      directional: lambertBinShares(),
      binEmissivity: new Array<number>(GROOVE_DIRECTIONAL_BINS).fill(wallEmissivity),
      hemisphericalFine: wallEmissivity,
      hemisphericalCoarse: wallEmissivity,
      strips,
    };
  }
  const [sinBeta, cosBeta] = halfAngleSinCos(openingAngleDeg);
  const cosAlpha = cosBeta * cosBeta - sinBeta * sinBeta;
  const width = 2 * sinBeta;
  const coarse = solveWedge(gradedStripEdges(strips / 2, width), cosAlpha, sinBeta, wallEmissivity);
  const fine = solveWedge(gradedStripEdges(strips, width), cosAlpha, sinBeta, wallEmissivity);
  const extrapolated = fine.hemispherical + (fine.hemispherical - coarse.hemispherical) / 3;
  const binFine = binEmissivities(fine, sinBeta, cosBeta);
  const binCoarse = binEmissivities(coarse, sinBeta, cosBeta);
  const lambert = lambertBinShares();
  const binEmissivity = new Array<number>(GROOVE_DIRECTIONAL_BINS);
  const directional = new Array<number>(GROOVE_DIRECTIONAL_BINS);
  let total = 0;
  for (let k = 0; k < GROOVE_DIRECTIONAL_BINS; k++) {
    const f = binFine[k] as number;
    const e = f + (f - (binCoarse[k] as number)) / 3;
    binEmissivity[k] = e;
    directional[k] = (lambert[k] as number) * e;
    total += directional[k] as number;
  }
  for (let k = 0; k < GROOVE_DIRECTIONAL_BINS; k++) directional[k] = (directional[k] as number) / total;
  return {
    hemispherical: extrapolated,
    directional,
    binEmissivity,
    hemisphericalFine: fine.hemispherical,
    hemisphericalCoarse: coarse.hemispherical,
    strips,
  };
}
