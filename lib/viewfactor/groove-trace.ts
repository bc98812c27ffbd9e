/**
 * Monte Carlo ray tracer for the apparent emissivity of an isothermal, grey,
 * infinitely long V-groove (diffusely or specularly reflecting walls).
 *
 * Method (Monte Carlo ray tracing with energy partitioning [G2], [G1]):
 * - Infinite length makes the problem 2-D in the cross-section plane. A 3-D
 *   Lambertian direction projected on that plane has in-plane angle density
 *   cos θ / 2; a specular reflection off a wall parallel to the groove axis
 *   mirrors the in-plane component and keeps the axial one. The 2-D tracer is
 *   therefore exact for the infinitely long groove.
 * - Reciprocity (Kirchhoff's law for the opening as a whole, [G1], [G3]):
 *   the apparent emissivity of the opening equals its absorptance for
 *   diffuse irradiation, and the apparent directional emissivity for in-plane
 *   exit angle θ equals the absorptance of rays entering along θ. Rays enter
 *   the opening at a uniform position and a cosine-weighted in-plane angle.
 * - Each ray carries an energy weight (initially 1): at each wall hit the
 *   share ε of the weight is absorbed and the ray goes on with (1 − ε); it
 *   ends when it leaves through the opening, or by Russian roulette once its
 *   weight is below {@link GROOVE_ROULETTE_WEIGHT} (survivors carry 1/p times
 *   their weight, which keeps the estimator unbiased [G8]).
 * - Variance reduction: the entry angle is stratified by the 9 folded 10°
 *   exit bins with proportional allocation (stratified sampling, [G9]).
 *   With n_k rays in bin k of probability w_k (the Lambert share) and per-ray
 *   absorbed weights A_i, the hemispherical apparent emissivity is
 *   Σ w_k·mean_k(A), its standard error sqrt(Σ w_k²·s_k²/n_k), and the
 *   directional share of bin k is w_k·mean_k(A) / Σ_j w_j·mean_j(A) (by
 *   reciprocity, the share of the power emitted out of the opening into that
 *   exit bin). Sums are accumulated as deviations from ε, so a flat surface
 *   (every ray absorbs exactly ε) gives exactly ε with zero standard error.
 */

import { createRng } from "./rng";
import {
  GROOVE_BIN_SIN_EDGES,
  GROOVE_DIRECTIONAL_BINS,
  assertIntegerInRange,
  assertOpeningAngle,
  assertWallEmissivity,
  halfAngleSinCos,
  lambertBinShares,
} from "./groove-bins";

/** Wall reflection law of the V-groove walls. */
export type GrooveReflection = "diffuse" | "specular";

/** Input of the V-groove Monte Carlo tracer. */
export interface GrooveTraceInput {
  /** Full opening angle, degrees, (0, 180]; 180 = flat surface. */
  openingAngleDeg: number;
  /** Grey wall emissivity, dimensionless, (0, 1]. */
  wallEmissivity: number;
  /** Wall reflection law. */
  reflection: GrooveReflection;
  /** Number of rays, integer in [1, 1e9]; each 10° bin gets at least 2 rays. Default 200 000. */
  rays?: number;
  /** Generator seed, safe integer. Default 1. */
  seed?: number;
}

/** Output of the V-groove Monte Carlo tracer. */
export interface GrooveTrace {
  /** Apparent hemispherical emissivity of the opening, dimensionless, in [ε, 1]. */
  hemispherical: number;
  /** Standard error of `hemispherical` (stratified per-ray estimator), dimensionless. */
  standardError: number;
  /** Share of the emitted power per folded 10° in-plane exit-angle bin (0–10°, …, 80–90°); sums to 1. */
  directional: number[];
  /** Apparent directional emissivity averaged over each bin (cos-weighted), dimensionless. */
  binEmissivity: number[];
  /** Standard error of each `binEmissivity` entry, dimensionless. */
  binStandardError: number[];
  /** Rays actually traced (≥ requested; more only when a bin needed its minimum of 2). */
  rays: number;
  /** Total ray–wall hits. */
  bounces: number;
}

/** Default number of rays of the tracer. */
export const GROOVE_DEFAULT_RAYS = 200_000;

/** Default generator seed of the tracer. */
export const GROOVE_DEFAULT_SEED = 1;

/** Weight below which Russian roulette is played (dimensionless). */
export const GROOVE_ROULETTE_WEIGHT = 1e-3;

/** Survival probability of Russian roulette. */
const ROULETTE_SURVIVAL = 0.5;

const MAX_RAYS = 1e9;
const MIN_RAYS_PER_BIN = 2;

/**
 * Number of rays per bin: proportional to the Lambert share, rounded by the
 * largest-remainder method so the total is `rays`, then raised to at least 2
 * per bin (so a per-bin variance exists).
 */
function allocateRays(rays: number, shares: readonly number[]): number[] {
  const n = new Array<number>(GROOVE_DIRECTIONAL_BINS);
  const rem = new Array<number>(GROOVE_DIRECTIONAL_BINS);
  let used = 0;
  for (let k = 0; k < GROOVE_DIRECTIONAL_BINS; k++) {
    const exact = rays * (shares[k] as number);
    const f = Math.floor(exact);
    n[k] = f;
    rem[k] = exact - f;
    used += f;
  }
  const order = rem.map((r, k) => [r, k] as const).sort((a, b) => b[0] - a[0] || a[1] - b[1]);
  for (let i = 0; used < rays; i++, used++) {
    const k = (order[i % GROOVE_DIRECTIONAL_BINS] as readonly [number, number])[1];
    n[k] = (n[k] as number) + 1;
  }
  for (let k = 0; k < GROOVE_DIRECTIONAL_BINS; k++) {
    if ((n[k] as number) < MIN_RAYS_PER_BIN) n[k] = MIN_RAYS_PER_BIN;
  }
  return n;
}

/**
 * Traces rays into an isothermal grey V-groove and returns the apparent
 * hemispherical emissivity, its standard error, the directional output
 * shares and the number of ray–wall hits (Monte Carlo with energy
 * partitioning and reciprocity [G2], [G1]; stratified sampling [G9];
 * Russian roulette [G8]; generator xoshiro128** [G6]).
 *
 * Geometry: vertex at the origin, bisector along +y, walls of unit length at
 * ±β from the bisector, opening the chord y = cos β, |x| ≤ sin β.
 *
 * @param input.openingAngleDeg full opening angle, degrees, (0, 180]
 * @param input.wallEmissivity grey wall emissivity, (0, 1]
 * @param input.reflection "diffuse" or "specular"
 * @param input.rays number of rays, integer in [1, 1e9], default 200 000
 * @param input.seed generator seed, safe integer, default 1
 * @throws RangeError for inputs outside these ranges
 */
export function traceGroove(input: Readonly<GrooveTraceInput>): GrooveTrace {
  const { openingAngleDeg, wallEmissivity, reflection } = input;
  const rays = input.rays ?? GROOVE_DEFAULT_RAYS;
  const seed = input.seed ?? GROOVE_DEFAULT_SEED;
  assertOpeningAngle(openingAngleDeg);
  assertWallEmissivity(wallEmissivity);
  assertIntegerInRange("rays", rays, 1, MAX_RAYS);
  if (reflection !== "diffuse" && reflection !== "specular") {
    throw new RangeError(`reflection must be "diffuse" or "specular", got ${String(reflection)}`);
  }
  const rng = createRng(seed); // validates seed

  const [sb, cb] = halfAngleSinCos(openingAngleDeg);
  const eps = wallEmissivity;
  const rho = 1 - eps;
  const specular = reflection === "specular";
  const shares = lambertBinShares();
  const perBin = allocateRays(rays, shares);

  // Inward unit normals: left wall (cb, sb), right wall (−cb, sb);
  // unit tangents (vertex → rim): left (−sb, cb), right (sb, cb).
  const h = cb; // opening chord y = cos β
  const width = 2 * sb;

  let bounces = 0;
  let traced = 0;
  const dev = new Float64Array(GROOVE_DIRECTIONAL_BINS); // Σ (A − ε)
  const dev2 = new Float64Array(GROOVE_DIRECTIONAL_BINS); // Σ (A − ε)²

  for (let k = 0; k < GROOVE_DIRECTIONAL_BINS; k++) {
    const nk = perBin[k] as number;
    const sLo = GROOVE_BIN_SIN_EDGES[k] as number;
    const sSpan = (GROOVE_BIN_SIN_EDGES[k + 1] as number) - sLo;
    let sumDev = 0;
    let sumDev2 = 0;
    for (let j = 0; j < nk; j++) {
      // Entry: uniform across the opening, in-plane angle with sin|θ| uniform in the bin.
      let px = -sb + width * rng.next();
      let py = h;
      let st = sLo + sSpan * rng.next();
      if (rng.next() < 0.5) st = -st;
      let dx = st;
      let dy = -Math.sqrt(1 - st * st);
      let cur = 2; // 0 = left wall, 1 = right wall, 2 = opening
      let w = 1;
      let absorbed = 0;
      for (;;) {
        let t = Infinity;
        let hit = -1;
        if (cur !== 0) {
          const nd = cb * dx + sb * dy;
          if (nd < 0) {
            const tt = -(cb * px + sb * py) / nd;
            t = tt > 0 ? tt : 0;
            hit = 0;
          }
        }
        if (cur !== 1) {
          const nd = sb * dy - cb * dx;
          if (nd < 0) {
            let tt = -(sb * py - cb * px) / nd;
            if (tt < 0) tt = 0;
            if (tt < t) {
              t = tt;
              hit = 1;
            }
          }
        }
        if (dy > 0) {
          const tt = (h - py) / dy;
          if (tt < t) hit = 2;
        }
        if (hit < 0 || hit === 2) break; // leaves through the opening
        px += t * dx;
        py += t * dy;
        bounces++;
        absorbed += w * eps;
        w *= rho;
        if (w < GROOVE_ROULETTE_WEIGHT) {
          if (w === 0 || rng.next() >= ROULETTE_SURVIVAL) break;
          w /= ROULETTE_SURVIVAL;
        }
        // Wall frame: inward normal (nx, ny), tangent (tx, ty).
        const nx = hit === 0 ? cb : -cb;
        const ny = sb;
        if (specular) {
          const dn = 2 * (dx * nx + dy * ny);
          dx -= dn * nx;
          dy -= dn * ny;
        } else {
          const s = 2 * rng.next() - 1;
          const c = Math.sqrt(1 - s * s);
          const tx = hit === 0 ? -sb : sb;
          const ty = cb;
          dx = c * nx + s * tx;
          dy = c * ny + s * ty;
        }
        cur = hit;
      }
      const d = absorbed - eps;
      sumDev += d;
      sumDev2 += d * d;
    }
    dev[k] = sumDev;
    dev2[k] = sumDev2;
    traced += nk;
  }

  const binEmissivity = new Array<number>(GROOVE_DIRECTIONAL_BINS);
  const binStandardError = new Array<number>(GROOVE_DIRECTIONAL_BINS);
  const directional = new Array<number>(GROOVE_DIRECTIONAL_BINS);
  let meanDev = 0;
  let variance = 0;
  let total = 0;
  for (let k = 0; k < GROOVE_DIRECTIONAL_BINS; k++) {
    const nk = perBin[k] as number;
    const wk = shares[k] as number;
    const dk = (dev[k] as number) / nk;
    const sk2 = Math.max(0, ((dev2[k] as number) - (dev[k] as number) * dk) / (nk - 1));
    binEmissivity[k] = eps + dk;
    binStandardError[k] = Math.sqrt(sk2 / nk);
    meanDev += wk * dk;
    variance += (wk * wk * sk2) / nk;
    const e = wk * (eps + dk);
    directional[k] = e;
    total += e;
  }
  for (let k = 0; k < GROOVE_DIRECTIONAL_BINS; k++) directional[k] = (directional[k] as number) / total;

  return {
    hemispherical: eps + meanDev,
    standardError: Math.sqrt(variance),
    directional,
    binEmissivity,
    binStandardError,
    rays: traced,
    bounces,
  };
}
