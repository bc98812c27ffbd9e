/**
 * The "louvers.optimise" worker task: the louver search (optimise-search.ts) on a problem the
 * server built on the request thread (optimise-problem.ts, which needs the plan geometry and
 * so stays out of the worker bundle). Pure: zod and the search only.
 *
 * The input carries the request's context (project, revision, scenario, which seats were
 * targeted) so the job's result and the synchronous route's answer are the same record.
 */
import { z } from "zod";
import type { ReportProgress } from "../workers/progress";
import { solveLouverProblem, type LouverOptimisation } from "./optimise-search";

const finite = z.number().finite();
const text = z.string().max(200);
const index = z.int().min(0);
const six = z.array(finite).length(6);

const problemSchema = z
  .strictObject({
    rooms: z.array(z.strictObject({ id: text, name: text, panels: z.array(index), seats: z.array(index) })),
    panels: z.array(
      z.strictObject({
        id: text,
        label: text,
        roomId: text,
        mode: z.enum(["heating", "cooling"]),
        currentAngleDeg: finite.min(0).max(180),
        minAngleDeg: finite.min(0).max(180),
        maxAngleDeg: finite.min(0).max(180),
        anglesDeg: z.array(finite.min(0).max(180)).min(1),
        outputW: z.array(finite).min(1),
        currentOutputW: finite,
      }),
    ),
    seats: z.array(
      z.strictObject({
        id: text,
        label: text,
        roomId: text,
        zoneIds: z.array(text),
        constraints: z.array(z.strictObject({ zoneId: text, lo: finite, hi: finite, strict: z.boolean() })).min(1),
        baseT4: six,
        factorSum: six,
        planeWeights: six,
        links: z.array(z.strictObject({ panel: index, factors: six, t4: z.array(finite.nonnegative()).min(1), currentT4: finite.nonnegative() })),
        pmv: z.strictObject({ ta: finite, vr: finite.nonnegative(), rh: finite.min(0).max(100), met: finite.nonnegative(), clo: finite.nonnegative() }),
      }),
    ),
  })
  .superRefine((p, ctx) => {
    p.panels.forEach((panel, j) => {
      if (panel.outputW.length !== panel.anglesDeg.length) ctx.addIssue({ code: "custom", path: ["panels", j, "outputW"], message: "one output per candidate angle" });
      if (panel.anglesDeg.some((a) => a < panel.minAngleDeg || a > panel.maxAngleDeg)) {
        ctx.addIssue({ code: "custom", path: ["panels", j, "anglesDeg"], message: "candidate angles must lie in the allowed range" });
      }
    });
    p.seats.forEach((seat, i) =>
      seat.links.forEach((link, k) => {
        const panel = p.panels[link.panel];
        if (!panel || link.t4.length !== panel.anglesDeg.length) ctx.addIssue({ code: "custom", path: ["seats", i, "links", k], message: "link does not match a panel" });
      }),
    );
    p.rooms.forEach((room, r) => {
      if (room.panels.some((j) => j >= p.panels.length) || room.seats.some((i) => i >= p.seats.length)) {
        ctx.addIssue({ code: "custom", path: ["rooms", r], message: "index out of range" });
      }
    });
  });

/** Input of "louvers.optimise". */
export const louverOptimiseInputSchema = z.strictObject({
  problem: problemSchema,
  method: z.enum(["auto", "exhaustive", "heuristic"]).optional(),
  context: z.strictObject({
    projectId: z.uuid(),
    revision: z.int().min(1),
    scenarioId: z.uuid(),
    /** "occupied": the seats with an occupant assigned; "zones": every seat in a zone (nobody assigned yet). */
    seatSelection: z.enum(["occupied", "zones"]),
  }),
});
export type LouverOptimiseInput = z.output<typeof louverOptimiseInputSchema>;

/** What the task returns: the optimisation and the request's context. */
export type LouverOptimiseOutput = LouverOptimisation & LouverOptimiseInput["context"];

/** Runs the search; progress is one unit per room. */
export function runLouverOptimise(input: LouverOptimiseInput, reportProgress: ReportProgress): LouverOptimiseOutput {
  return { ...solveLouverProblem(input.problem, { method: input.method ?? "auto" }, reportProgress), ...input.context };
}
