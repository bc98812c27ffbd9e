/**
 * Louver cavities: apparent emissivity of an isothermal, grey, infinitely
 * long V-groove (full opening angle α, 180° = flat surface) with diffusely or
 * specularly reflecting walls.
 *
 * Public entry {@link grooveEmissivity} runs the seeded Monte Carlo tracer
 * ({@link traceGroove}, [G1], [G2]). Deterministic companions, used as
 * arbiters in the tests and available to callers:
 * - {@link grooveEmissivityDiffuseRadiosity}: diffuse walls, radiosity method
 *   with crossed-string view factors [G5], Richardson-extrapolated [G11];
 * - {@link grooveEmissivitySpecularUnfolded}: specular walls, unfolding
 *   (image) construction [G2], [G4];
 * - {@link parallelPlateChannelEmissivity}: the deep parallel-plate channel,
 *   the limit of the diffuse groove as it closes.
 *
 * Definitions. `hemispherical` = power emitted out of the opening / (σT⁴ ×
 * opening width). `directional[k]` = share of that power leaving in the
 * folded in-plane exit-angle bin [10°·k, 10°·(k+1)], the angle of the exit
 * direction projected on the cross-section plane, measured from the groove
 * bisector; a flat diffuse surface gives sin(10°(k+1)) − sin(10°k).
 *
 * Input policy (see the folder index): NaN, non-finite or out-of-range
 * arguments (opening angle outside (0, 180], emissivity outside (0, 1],
 * non-integer or non-positive ray counts, non-integer seeds, unknown
 * reflection law) throw RangeError.
 */

import { GROOVE_DEFAULT_RAYS, GROOVE_DEFAULT_SEED, traceGroove, type GrooveReflection } from "./groove-trace";

export type { GrooveReflection, GrooveTrace, GrooveTraceInput } from "./groove-trace";
export { GROOVE_DEFAULT_RAYS, GROOVE_DEFAULT_SEED, GROOVE_ROULETTE_WEIGHT, traceGroove } from "./groove-trace";
export type { GrooveRadiosityInput, GrooveRadiosityResult } from "./groove-radiosity";
export { GROOVE_RADIOSITY_DEFAULT_STRIPS, grooveEmissivityDiffuseRadiosity } from "./groove-radiosity";
export type { GrooveUnfoldInput, GrooveUnfoldResult } from "./groove-unfold";
export { grooveEmissivitySpecularUnfolded } from "./groove-unfold";
export type { ChannelInput, ChannelResult } from "./groove-channel";
export { parallelPlateChannelEmissivity } from "./groove-channel";
export { GROOVE_BIN_WIDTH_DEG, GROOVE_DIRECTIONAL_BINS, lambertBinShares } from "./groove-bins";

/** Input of {@link grooveEmissivity}. */
export interface GrooveInput {
  /** Full opening angle, degrees, (0, 180]; 180 = flat surface. */
  openingAngleDeg: number;
  /** Grey wall emissivity, dimensionless, (0, 1]. */
  wallEmissivity: number;
  /** Wall reflection law. */
  reflection: GrooveReflection;
  /** Number of Monte Carlo rays, positive integer ≤ 1e9; default 200 000. */
  rays?: number;
  /** Generator seed, safe integer; default 1. Same seed → identical result. */
  seed?: number;
}

/** Result of {@link grooveEmissivity}. */
export interface GrooveResult {
  /** Apparent hemispherical emissivity of the opening, dimensionless, in [ε, 1]. */
  hemispherical: number;
  /** Standard error of `hemispherical`, dimensionless (0 for a flat surface, whose estimator has no variance). */
  standardError: number;
  /** 9 shares of the emitted power per folded 10° in-plane exit-angle bin (0–10°, …, 80–90°); sum 1. */
  directional: number[];
}

/**
 * Apparent (hemispherical and directional) emissivity of an isothermal grey
 * infinitely long V-groove by seeded Monte Carlo ray tracing with energy
 * partitioning and reciprocity [G1], [G2] (see {@link traceGroove}).
 * The default 200 000 rays give a standard error below 0.001 in tens of
 * milliseconds.
 *
 * @param input.openingAngleDeg full opening angle, degrees, (0, 180]
 * @param input.wallEmissivity grey wall emissivity, (0, 1]
 * @param input.reflection "diffuse" or "specular"
 * @param input.rays number of rays, positive integer ≤ 1e9, default 200 000
 * @param input.seed generator seed, safe integer, default 1
 * @returns apparent hemispherical emissivity, its standard error and the 9 directional shares
 * @throws RangeError for inputs outside these ranges
 */
export function grooveEmissivity(input: Readonly<GrooveInput>): GrooveResult {
  const r = traceGroove({
    openingAngleDeg: input.openingAngleDeg,
    wallEmissivity: input.wallEmissivity,
    reflection: input.reflection,
    rays: input.rays ?? GROOVE_DEFAULT_RAYS,
    seed: input.seed ?? GROOVE_DEFAULT_SEED,
  });
  return { hemispherical: r.hemispherical, standardError: r.standardError, directional: r.directional };
}
