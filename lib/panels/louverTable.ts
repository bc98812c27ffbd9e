/**
 * Louver cavity table: the apparent emissivity of the louver's V-groove cavity tabulated
 * once per (opening-angle grid, wall emissivity, wall finish), as a plain serialisable
 * record that a server can cache under {@link louverTableKey} and warm at start.
 *
 * Solvers (deterministic by default, both from lib/viewfactor):
 * - diffuse walls: the radiosity method with crossed-string view factors, Richardson-
 *   extrapolated in the strip count ([12], [13]; `grooveEmissivityDiffuseRadiosity`). It
 *   gives the hemispherical value and the cos-weighted bin averages of the directional
 *   apparent emissivity directly, in about 10 ms per angle;
 * - specular walls: the unfolding (image) construction ([8], [14];
 *   `grooveEmissivitySpecularUnfolded`), exact in the entry position and Gauss–Legendre in
 *   the entry angle, a few ms per angle down to 1°.
 * Both are cheaper and more accurate than the Monte Carlo tracer at table resolution; the
 * tracer ([8], [14]; `grooveEmissivity`) is available with `solver: "montecarlo"` and then
 * supplies the standard errors.
 *
 * Accuracy of the tabulated values (stated here, asserted in tests/reference/panels):
 * - radiosity: `solverError[i]` = |Richardson value − fine-mesh value|, the size of the
 *   extrapolation step, a conservative bound of the error of the extrapolated value while
 *   the N⁻² error expansion holds [13]; below 1e-4 over 5°–180° for ε ≥ 0.05 at the
 *   default 256 strips (largest, 3.5e-5, at 5° and ε = 0.05; the value differs from a
 *   512-strip solve by < 1e-7 there);
 * - unfolding: 0 is stored — the construction matches the closed crossed-string form at
 *   α = 180°/n to about 1e-10 (viewfactor reference tests), far below the interpolation
 *   error;
 * - Monte Carlo: `standardError[i]` is the tracer's standard error of the hemispherical
 *   value; every angle uses the same seed (common random numbers, so the tabulated curve is
 *   smooth in angle and its errors are correlated, not independent).
 *
 * Interpolation error (linear in angle, {@link louverEmissivityAt}): the default steps
 * ({@link LOUVER_DEFAULT_STEP_DEG}: 5° diffuse, 1° specular) keep the error of the
 * hemispherical value at mid-steps ≤ {@link LOUVER_INTERPOLATION_TOLERANCE} = 0.005 over
 * 5°–180° for wall emissivities 0.05…1. Measured maxima (mid-step value from the solver vs
 * interpolated): diffuse 5° step 0.0017 (ε = 0.05, at 5°–10°), specular 1° step 0.0013
 * (ε = 0.05, at 5°–6°); specular 5° steps would give 0.022 near 5° (the specular curve has
 * kinks at α = 180°/n, dense at small angles), hence the finer default.
 */
import {
  GROOVE_DIRECTIONAL_BINS,
  grooveEmissivity,
  grooveEmissivityDiffuseRadiosity,
  grooveEmissivitySpecularUnfolded,
  lambertBinShares,
} from "../viewfactor";

/** Wall finish of the louver cavity: diffusely or specularly reflecting grey walls. */
export type LouverFinish = "diffuse" | "specular";

/** Solver behind a table: the deterministic method of the finish, or the Monte Carlo tracer. */
export type LouverTableSolver = "deterministic" | "montecarlo";

/** Default opening-angle step per finish, degrees (see the interpolation error above). */
export const LOUVER_DEFAULT_STEP_DEG: Readonly<Record<LouverFinish, number>> = Object.freeze({ diffuse: 5, specular: 1 });

/** Default smallest tabulated opening angle, degrees. */
export const LOUVER_DEFAULT_MIN_DEG = 5;

/** Default largest tabulated opening angle, degrees (180° = flat, fully open). */
export const LOUVER_DEFAULT_MAX_DEG = 180;

/** Bound of the interpolation error of the hemispherical value at the default steps (dimensionless). */
export const LOUVER_INTERPOLATION_TOLERANCE = 0.005;

/** Default rays per angle of a Monte Carlo table. */
export const LOUVER_DEFAULT_RAYS = 200_000;

/** Default generator seed of a Monte Carlo table. */
export const LOUVER_DEFAULT_SEED = 1;

/** Version of the table model; part of the cache key, so a model change invalidates caches. */
export const LOUVER_TABLE_VERSION = 1;

/** Smallest opening angle the table accepts, degrees (cost of the specular construction grows as 1/α). */
const MIN_TABLE_ANGLE_DEG = 0.5;

/** Largest number of tabulated angles (protects the server from a runaway request). */
const MAX_TABLE_ANGLES = 2000;

/** Parameters of {@link buildLouverTable} and {@link louverTableKey}. */
export interface LouverTableParams {
  /** Grey wall emissivity of the cavity walls, dimensionless, (0, 1]. */
  wallEmissivity: number;
  /** Wall finish (reflection law). */
  finish: LouverFinish;
  /** Opening-angle step, degrees, (0, 180]; default {@link LOUVER_DEFAULT_STEP_DEG} of the finish. */
  stepDeg?: number;
  /** Smallest tabulated opening angle, degrees, [0.5, maxDeg); default 5. */
  minDeg?: number;
  /** Largest tabulated opening angle, degrees, (minDeg, 180]; default 180. */
  maxDeg?: number;
  /** Solver; default "deterministic". */
  solver?: LouverTableSolver;
  /** Rays per angle (Monte Carlo only), integer in [1000, 1e8]; default 200 000. */
  rays?: number;
  /** Generator seed (Monte Carlo only), safe integer; default 1. */
  seed?: number;
}

/** A tabulated louver cavity: plain arrays, JSON-serialisable. */
export interface LouverTable {
  /** Model version ({@link LOUVER_TABLE_VERSION}). */
  version: number;
  /** Cache key of the parameters ({@link louverTableKey}). */
  key: string;
  /** Grey wall emissivity, dimensionless. */
  wallEmissivity: number;
  /** Wall finish. */
  finish: LouverFinish;
  /** Method that produced the values: "radiosity" (diffuse), "unfolding" (specular) or "montecarlo". */
  method: "radiosity" | "unfolding" | "montecarlo";
  /** Tabulated full opening angles, degrees, increasing; the last one is maxDeg. */
  anglesDeg: number[];
  /** Apparent hemispherical emissivity of the cavity opening per angle, dimensionless. */
  hemispherical: number[];
  /** Monte Carlo standard error of `hemispherical` per angle (0 for the deterministic solvers). */
  standardError: number[];
  /** Estimated solver (discretisation) error of `hemispherical` per angle (0 for Monte Carlo and unfolding). */
  solverError: number[];
  /**
   * Per angle, 9 directional apparent emissivities (dimensionless), one per folded 10° in-plane
   * exit-angle bin from the groove bisector (0–10°, …, 80–90°): hemispherical·share_k / lambertShare_k,
   * i.e. the cos-weighted average of the directional apparent emissivity over the bin.
   */
  directionalEmissivity: number[][];
}

interface ResolvedParams {
  wallEmissivity: number;
  finish: LouverFinish;
  stepDeg: number;
  minDeg: number;
  maxDeg: number;
  solver: LouverTableSolver;
  rays: number;
  seed: number;
}

function resolveParams(p: Readonly<LouverTableParams>): ResolvedParams {
  if (p.finish !== "diffuse" && p.finish !== "specular") {
    throw new RangeError(`finish must be "diffuse" or "specular", got ${String(p.finish)}`);
  }
  const wallEmissivity = p.wallEmissivity;
  if (typeof wallEmissivity !== "number" || !Number.isFinite(wallEmissivity) || wallEmissivity <= 0 || wallEmissivity > 1) {
    throw new RangeError(`wallEmissivity must be a finite number in (0, 1], got ${String(wallEmissivity)}`);
  }
  const solver = p.solver ?? "deterministic";
  if (solver !== "deterministic" && solver !== "montecarlo") {
    throw new RangeError(`solver must be "deterministic" or "montecarlo", got ${String(solver)}`);
  }
  const stepDeg = p.stepDeg ?? LOUVER_DEFAULT_STEP_DEG[p.finish];
  const minDeg = p.minDeg ?? LOUVER_DEFAULT_MIN_DEG;
  const maxDeg = p.maxDeg ?? LOUVER_DEFAULT_MAX_DEG;
  for (const [name, v] of [["stepDeg", stepDeg], ["minDeg", minDeg], ["maxDeg", maxDeg]] as const) {
    if (typeof v !== "number" || !Number.isFinite(v)) throw new RangeError(`${name} must be a finite number, got ${String(v)}`);
  }
  if (stepDeg <= 0 || stepDeg > 180) throw new RangeError(`stepDeg must be in (0, 180], got ${stepDeg}`);
  if (minDeg < MIN_TABLE_ANGLE_DEG || maxDeg > 180 || !(minDeg < maxDeg)) {
    throw new RangeError(`need ${MIN_TABLE_ANGLE_DEG} ≤ minDeg < maxDeg ≤ 180, got minDeg ${minDeg}, maxDeg ${maxDeg}`);
  }
  if (Math.ceil((maxDeg - minDeg) / stepDeg - 1e-9) + 1 > MAX_TABLE_ANGLES) {
    throw new RangeError(`the table would have more than ${MAX_TABLE_ANGLES} angles`);
  }
  const rays = p.rays ?? LOUVER_DEFAULT_RAYS;
  const seed = p.seed ?? LOUVER_DEFAULT_SEED;
  if (!Number.isInteger(rays) || rays < 1000 || rays > 1e8) throw new RangeError(`rays must be an integer in [1000, 1e8], got ${String(rays)}`);
  if (!Number.isSafeInteger(seed)) throw new RangeError(`seed must be a safe integer, got ${String(seed)}`);
  return { wallEmissivity, finish: p.finish, stepDeg, minDeg, maxDeg, solver, rays, seed };
}

/**
 * Tabulated angles: minDeg, minDeg + step, … while below maxDeg (values within 1e-9·step of
 * maxDeg are merged into it), then maxDeg.
 */
export function tableAngles(minDeg: number, maxDeg: number, stepDeg: number): number[] {
  const out: number[] = [];
  for (let i = 0; ; i++) {
    const a = minDeg + i * stepDeg;
    if (a >= maxDeg - 1e-9 * stepDeg) break;
    out.push(a);
  }
  out.push(maxDeg);
  return out;
}

/**
 * Cache key of a louver table: the resolved parameters (defaults filled in, numbers in
 * JavaScript's shortest round-trip form) and the model version, e.g.
 * `louver/v1/diffuse/e0.9/a5-180/s5/deterministic`. Equal parameters give equal keys;
 * Monte Carlo keys also carry rays and seed.
 *
 * @param params table parameters (see {@link LouverTableParams}).
 * @returns the key string.
 * @throws RangeError for parameters {@link buildLouverTable} would reject.
 */
export function louverTableKey(params: Readonly<LouverTableParams>): string {
  const r = resolveParams(params);
  const base = `louver/v${LOUVER_TABLE_VERSION}/${r.finish}/e${r.wallEmissivity}/a${r.minDeg}-${r.maxDeg}/s${r.stepDeg}/${r.solver}`;
  return r.solver === "montecarlo" ? `${base}/r${r.rays}/seed${r.seed}` : base;
}

/**
 * Tabulates the apparent emissivity (hemispherical and 9 directional bins) of the louver's
 * V-groove cavity over opening angles minDeg…maxDeg, for one wall emissivity and finish.
 * Cavity model: isothermal grey infinitely long V-groove, apparent emissivity per unit
 * opening width [8], [12], [14]; solvers and their accuracy as stated in this file's header.
 *
 * @param params.wallEmissivity grey wall emissivity, (0, 1]
 * @param params.finish "diffuse" or "specular"
 * @param params.stepDeg opening-angle step, degrees, (0, 180]; default 5 (diffuse) / 1 (specular)
 * @param params.minDeg smallest tabulated angle, degrees, [0.5, maxDeg); default 5
 * @param params.maxDeg largest tabulated angle, degrees, (minDeg, 180]; default 180
 * @param params.solver "deterministic" (default) or "montecarlo"
 * @param params.rays rays per angle (Monte Carlo), integer in [1000, 1e8]; default 200 000
 * @param params.seed generator seed (Monte Carlo), safe integer; default 1
 * @returns the table record (see {@link LouverTable}).
 * @throws RangeError for parameters outside these ranges or more than 2000 angles.
 */
export function buildLouverTable(params: Readonly<LouverTableParams>): LouverTable {
  const r = resolveParams(params);
  const anglesDeg = tableAngles(r.minDeg, r.maxDeg, r.stepDeg);
  const n = anglesDeg.length;
  const hemispherical = new Array<number>(n);
  const standardError = new Array<number>(n).fill(0);
  const solverError = new Array<number>(n).fill(0);
  const directionalEmissivity = new Array<number[]>(n);
  const lambert = lambertBinShares();
  const method = r.solver === "montecarlo" ? "montecarlo" : r.finish === "diffuse" ? "radiosity" : "unfolding";
  for (let i = 0; i < n; i++) {
    const openingAngleDeg = anglesDeg[i] as number;
    if (method === "radiosity") {
      const s = grooveEmissivityDiffuseRadiosity({ openingAngleDeg, wallEmissivity: r.wallEmissivity });
      hemispherical[i] = s.hemispherical;
      solverError[i] = Math.abs(s.hemispherical - s.hemisphericalFine);
      directionalEmissivity[i] = s.binEmissivity.slice();
    } else if (method === "unfolding") {
      const s = grooveEmissivitySpecularUnfolded({ openingAngleDeg, wallEmissivity: r.wallEmissivity });
      hemispherical[i] = s.hemispherical;
      directionalEmissivity[i] = s.binEmissivity.slice();
    } else {
      const s = grooveEmissivity({ openingAngleDeg, wallEmissivity: r.wallEmissivity, reflection: r.finish, rays: r.rays, seed: r.seed });
      hemispherical[i] = s.hemispherical;
      standardError[i] = s.standardError;
      const bins = new Array<number>(GROOVE_DIRECTIONAL_BINS);
      for (let k = 0; k < GROOVE_DIRECTIONAL_BINS; k++) {
        bins[k] = (s.hemispherical * (s.directional[k] as number)) / (lambert[k] as number);
      }
      directionalEmissivity[i] = bins;
    }
  }
  return {
    version: LOUVER_TABLE_VERSION,
    key: louverTableKey(params),
    wallEmissivity: r.wallEmissivity,
    finish: r.finish,
    method,
    anglesDeg,
    hemispherical,
    standardError,
    solverError,
    directionalEmissivity,
  };
}
