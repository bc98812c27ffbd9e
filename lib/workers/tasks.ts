/**
 * The task registry: every computation that may run off the request thread, by name. A task is
 * a zod schema for its input and a pure function `(input, reportProgress) => output`.
 *
 * This file is bundled into the worker entry (scripts/build-workers.mjs), so it and everything
 * it imports must be pure: physics (lib/viewfactor, lib/panels, lib/comfort), pure parts of
 * lib/compute, and zod — no React, Next.js, database, `server-only` or Node-only APIs. The
 * build refuses such imports.
 *
 * Adding a task is one entry in TASKS, e.g.
 *   "louvers.optimise": defineTask({ input: optimiseInputSchema, run: (input, report) => optimiseLouvers(input, report) }),
 * then `runTask("louvers.optimise", input, …)` (lib/workers/pool.ts) or `startJob(member,
 * "louvers.optimise", input)` (lib/jobs.ts) runs it with progress. Inputs and outputs cross a
 * thread boundary by structured clone: plain data only (no functions, class instances or Maps).
 */
import { z } from "zod";
import { traceGroove, type GrooveTrace } from "../viewfactor/groove";
import type { ReportProgress } from "./progress";
import { louverTableInputSchema, runLouverTable } from "./louver-table-task";
import { louverOptimiseInputSchema, runLouverOptimise } from "../louvers/optimise-task";

export interface TaskDefinition<I, O> {
  /** Validates (and normalises) the input before the task is queued. */
  input: z.ZodType<I>;
  /** The computation: pure, synchronous or async; reports progress through `reportProgress`. */
  run: (input: I, reportProgress: ReportProgress) => O | Promise<O>;
}

/** Keeps each entry's input and output types tied together (identity at run time). */
export function defineTask<I, O>(definition: TaskDefinition<I, O>): TaskDefinition<I, O> {
  return definition;
}

/** Rays a single trace may ask for from the server (the tracer itself allows up to 1e9). */
export const MAX_TRACE_RAYS = 5_000_000;

/** Input of the "groove.trace" task: one V-groove cavity traced by Monte Carlo (lib/viewfactor). */
export const grooveTraceInputSchema = z.strictObject({
  openingAngleDeg: z.number().gt(0).max(180),
  wallEmissivity: z.number().gt(0).max(1),
  reflection: z.enum(["diffuse", "specular"]),
  rays: z.number().int().min(1).max(MAX_TRACE_RAYS).optional(),
  seed: z.number().int().min(Number.MIN_SAFE_INTEGER).max(Number.MAX_SAFE_INTEGER).optional(),
});
export type GrooveTraceTaskInput = z.output<typeof grooveTraceInputSchema>;

export const TASKS = {
  /** One cavity: apparent hemispherical and directional emissivity (traceGroove). */
  "groove.trace": defineTask({
    input: grooveTraceInputSchema,
    run: (input: GrooveTraceTaskInput, reportProgress): GrooveTrace => {
      // One call of the tracer: progress is its start and its end.
      reportProgress({ done: 0, total: 1, stage: "tracing rays" });
      const trace = traceGroove(input);
      reportProgress({ done: 1, total: 1, stage: "tracing rays" });
      return trace;
    },
  }),
  /** A cavity table over opening angles for one wall emissivity and finish (lib/panels/louverTable). */
  "groove.table": defineTask({ input: louverTableInputSchema, run: runLouverTable }),
  /** Automatic louver settings: the search over a prepared problem (lib/louvers/optimise-task.ts). */
  "louvers.optimise": defineTask({ input: louverOptimiseInputSchema, run: runLouverOptimise }),
};

export type TaskName = keyof typeof TASKS;
type DefinitionOf<N extends TaskName> = (typeof TASKS)[N];
/** What a caller passes (before zod defaults are applied). */
export type TaskInput<N extends TaskName> = z.input<DefinitionOf<N>["input"]>;
/** What the task returns once awaited. */
export type TaskOutput<N extends TaskName> = Awaited<ReturnType<DefinitionOf<N>["run"]>>;

export function isTaskName(name: unknown): name is TaskName {
  return typeof name === "string" && Object.prototype.hasOwnProperty.call(TASKS, name);
}

/** The registry entry of `name`, typed loosely for the code that dispatches by name. */
export function taskDefinition(name: TaskName): TaskDefinition<unknown, unknown> {
  return TASKS[name] as unknown as TaskDefinition<unknown, unknown>;
}
