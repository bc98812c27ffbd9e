/**
 * Apparent emissivity of the mouth of a deep parallel-plate channel with
 * diffuse grey isothermal walls — the limit of the diffuse V-groove as its
 * opening angle closes (near its mouth a very narrow V-groove is locally a
 * parallel-plate channel whose depth, in mouth widths, grows without bound).
 *
 * Method: plates of depth D (in channel widths) cut into strips graded toward
 * the mouth; crossed-string view factors [G5], [G1]; grey diffuse radiosity
 * equations [G1], [G3] solved directly [G10] (symmetric: one plate's unknowns);
 * Richardson extrapolation in the strip count [G11]. The bottom of the
 * truncated channel is closed by a black surface, once at 0 K and once at the
 * wall temperature: by the monotonicity of the radiosity equations in the
 * emitted power these two results bracket the semi-infinite channel. The
 * reported value is the hot-bottom one: deep in an isothermal channel the
 * radiation field approaches the blackbody field, so a black bottom at the
 * wall temperature stands in for the missing depth; its change from D to 2D
 * measures the truncation error (about 1e-6 at the default D = 200 for
 * ε ≥ 0.1). The cold-bottom bound is much looser (2-D view factors decay
 * only as 1/D).
 */

import { assertIntegerInRange, assertWallEmissivity } from "./groove-bins";
import { solveDenseInPlace } from "./groove-linsolve";

/** Input of the parallel-plate channel solver. */
export interface ChannelInput {
  /** Grey wall emissivity, dimensionless, (0, 1]. */
  wallEmissivity: number;
  /** Channel depth over width, dimensionless, finite in [1, 1e4]; default 200. */
  depthToWidth?: number;
  /** Strips per plate of the fine mesh, even integer in [8, 2000]; default 256. */
  strips?: number;
}

/** Output of the parallel-plate channel solver. */
export interface ChannelResult {
  /** Apparent emissivity of the mouth (hot-bottom value, = upperBound), dimensionless. */
  hemispherical: number;
  /** Bottom black at 0 K (Richardson-extrapolated): a lower bound for the infinitely deep channel. */
  lowerBound: number;
  /** Bottom black at the wall temperature (Richardson-extrapolated): an upper bound. */
  upperBound: number;
}

const CHANNEL_GRADING_POWER = 3;

function channelEdges(n: number, depth: number): Float64Array {
  const z = new Float64Array(n + 1);
  for (let j = 0; j <= n; j++) z[j] = depth * Math.pow(j / n, CHANNEL_GRADING_POWER);
  z[n] = depth;
  return z;
}

/** Distance between a point at depth a on one plate and depth b on the other (unit width). */
function across(a: number, b: number): number {
  const d = a - b;
  return Math.sqrt(1 + d * d);
}

/** Returns [ε_a with cold bottom, ε_a with hot bottom] for one mesh. */
function solveChannel(z: Float64Array, eps: number): [number, number] {
  const n = z.length - 1;
  const depth = z[n] as number;
  const rho = 1 - eps;
  const a = new Float64Array(n * n);
  const aHot = new Float64Array(n * n);
  const rhsCold = new Float64Array(n);
  const rhsHot = new Float64Array(n);
  const toMouth = new Float64Array(n); // L_i · F_i→mouth
  for (let i = 0; i < n; i++) {
    const z0 = z[i] as number;
    const z1 = z[i + 1] as number;
    const li = z1 - z0;
    for (let j = 0; j < n; j++) {
      const t0 = z[j] as number;
      const t1 = z[j + 1] as number;
      // Crossed minus uncrossed strings over 2 L_i [G5].
      const fij = (across(z0, t1) + across(z1, t0) - across(z1, t1) - across(z0, t0)) / (2 * li);
      a[i * n + j] = -rho * fij;
    }
    a[i * n + i] = (a[i * n + i] as number) + 1;
    toMouth[i] = 0.5 * (li + across(z0, 0) - across(z1, 0));
    const toBottom = 0.5 * (li + across(z1, depth) - across(z0, depth)) / li;
    rhsCold[i] = eps;
    rhsHot[i] = eps + rho * toBottom; // black bottom at wall temperature: J_bottom = σT⁴
  }
  aHot.set(a);
  solveDenseInPlace(a, rhsCold, n);
  solveDenseInPlace(aHot, rhsHot, n);
  let cold = 0;
  let hot = 0;
  for (let i = 0; i < n; i++) {
    cold += 2 * (rhsCold[i] as number) * (toMouth[i] as number);
    hot += 2 * (rhsHot[i] as number) * (toMouth[i] as number);
  }
  // Bottom-to-mouth view factor (two parallel unit segments at distance D): sqrt(1 + D²) − D.
  hot += across(depth, 0) - depth;
  return [cold, hot];
}

/**
 * Apparent emissivity of the mouth of a deep parallel-plate channel with
 * diffuse grey isothermal walls, by crossed-string view factors [G5] and the
 * grey diffuse radiosity method [G1], [G3], with Richardson extrapolation in
 * the strip count [G11] and bounds from a cold and a hot black bottom.
 *
 * @param input.wallEmissivity grey wall emissivity, (0, 1]
 * @param input.depthToWidth channel depth / width, [1, 1e4], default 200
 * @param input.strips strips per plate (fine mesh), even integer in [8, 2000], default 256
 * @throws RangeError for inputs outside these ranges
 */
export function parallelPlateChannelEmissivity(input: Readonly<ChannelInput>): ChannelResult {
  const { wallEmissivity } = input;
  const depth = input.depthToWidth ?? 200;
  const strips = input.strips ?? 256;
  assertWallEmissivity(wallEmissivity);
  if (typeof depth !== "number" || !Number.isFinite(depth) || depth < 1 || depth > 1e4) {
    throw new RangeError(`depthToWidth must be a finite number in [1, 1e4], got ${depth}`);
  }
  assertIntegerInRange("strips", strips, 8, 2000);
  if (strips % 2 !== 0) throw new RangeError(`strips must be even, got ${strips}`);
  const [c1, h1] = solveChannel(channelEdges(strips / 2, depth), wallEmissivity);
  const [c2, h2] = solveChannel(channelEdges(strips, depth), wallEmissivity);
  const lowerBound = c2 + (c2 - c1) / 3;
  const upperBound = h2 + (h2 - h1) / 3;
  return { hemispherical: upperBound, lowerBound, upperBound };
}
