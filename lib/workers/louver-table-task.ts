/**
 * The "groove.table" task: a louver cavity table (lib/panels/louverTable.ts) built with progress.
 *
 * `buildLouverTable` tabulates one angle after another and reports nothing while it works. To
 * report progress without changing it, the task builds the same grid in consecutive slices
 * (each slice one `buildLouverTable` call whose minDeg and maxDeg are grid angles) and joins
 * them. Each angle is solved on its own (the deterministic solvers have no state between
 * angles; the Monte Carlo tracer restarts from the same seed at every angle), so the joined
 * table equals the one-call table exactly — tests/unit/workers/louver-table-task.test.ts holds
 * that. Where the slices would not reproduce the grid bit for bit (a step that is not exact in
 * binary floating point, e.g. 0.1°), the task falls back to one call with start/end progress.
 */
import { z } from "zod";
import {
  buildLouverTable,
  LOUVER_DEFAULT_MAX_DEG,
  LOUVER_DEFAULT_MIN_DEG,
  LOUVER_DEFAULT_STEP_DEG,
  louverTableKey,
  tableAngles,
  type LouverTable,
  type LouverTableParams,
} from "../panels/louverTable";
import type { ReportProgress } from "./progress";

/** Input of "groove.table": the parameters of `buildLouverTable` (same ranges; it re-checks them). */
export const louverTableInputSchema = z
  .strictObject({
    wallEmissivity: z.number().gt(0).max(1),
    finish: z.enum(["diffuse", "specular"]),
    stepDeg: z.number().gt(0).max(180).optional(),
    minDeg: z.number().min(0.5).max(180).optional(),
    maxDeg: z.number().min(0.5).max(180).optional(),
    solver: z.enum(["deterministic", "montecarlo"]).optional(),
    rays: z.number().int().min(1000).max(100_000_000).optional(),
    seed: z.number().int().min(Number.MIN_SAFE_INTEGER).max(Number.MAX_SAFE_INTEGER).optional(),
  })
  .refine((p) => (p.minDeg ?? LOUVER_DEFAULT_MIN_DEG) < (p.maxDeg ?? LOUVER_DEFAULT_MAX_DEG), {
    message: "minDeg must be below maxDeg",
    path: ["minDeg"],
  });

/** Slices a table is built in (about; more progress messages cost nothing noticeable). */
const TARGET_SLICES = 24;


function sameNumbers(a: readonly number[], b: readonly number[]): boolean {
  return a.length === b.length && a.every((x, i) => x === b[i]);
}

/**
 * Builds the louver cavity table of `params` (exactly `buildLouverTable(params)`), reporting
 * `{ done: angles tabulated, total: angles in the table }` after each slice.
 * @throws RangeError as buildLouverTable does.
 */
export function runLouverTable(params: Readonly<LouverTableParams>, reportProgress: ReportProgress): LouverTable {
  const key = louverTableKey(params); // validates the parameters first (RangeError)
  const stepDeg = params.stepDeg ?? LOUVER_DEFAULT_STEP_DEG[params.finish];
  const grid = tableAngles(params.minDeg ?? LOUVER_DEFAULT_MIN_DEG, params.maxDeg ?? LOUVER_DEFAULT_MAX_DEG, stepDeg);
  const total = grid.length;
  const stage = `Tabulating the ${params.finish} louver cavity, wall emissivity ${params.wallEmissivity}`;
  reportProgress({ done: 0, total, stage });

  const sliceSize = Math.max(2, Math.ceil(total / TARGET_SLICES));
  const slices: LouverTable[] = [];
  for (let start = 0; start < total; start += sliceSize) {
    // Every slice holds at least 2 angles (minDeg < maxDeg): a lone last angle joins the slice before.
    let end = Math.min(start + sliceSize, total) - 1;
    if (total - 1 - end === 1) end = total - 1;
    const slice = buildLouverTable({ ...params, stepDeg, minDeg: grid[start]!, maxDeg: grid[end]! });
    if (!sameNumbers(slice.anglesDeg, grid.slice(start, end + 1))) {
      // The step is not exact in floating point: build the whole table at once instead.
      const whole = buildLouverTable(params);
      reportProgress({ done: total, total, stage });
      return whole;
    }
    slices.push(slice);
    reportProgress({ done: end + 1, total, stage });
    start = end + 1 - sliceSize;
  }

  const first = slices[0]!;
  return {
    version: first.version,
    key,
    wallEmissivity: first.wallEmissivity,
    finish: first.finish,
    method: first.method,
    anglesDeg: slices.flatMap((s) => s.anglesDeg),
    hemispherical: slices.flatMap((s) => s.hemispherical),
    standardError: slices.flatMap((s) => s.standardError),
    solverError: slices.flatMap((s) => s.solverError),
    directionalEmissivity: slices.flatMap((s) => s.directionalEmissivity),
  };
}
