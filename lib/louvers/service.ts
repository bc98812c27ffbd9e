import "server-only";
import { z } from "zod";
import type { Member } from "@/lib/auth/session";
import { AppError } from "@/lib/http/errors";
import { invalidInput } from "@/lib/http/handler";
import { runShared, startJob } from "@/lib/jobs";
import { elementId, type Layout } from "@/lib/layout/schema";
import { louverTablesForLayout } from "@/lib/louvers/layout-tables";
import { buildLouverProblem } from "@/lib/louvers/optimise";
import type { LouverOptimiseInput, LouverOptimiseOutput } from "@/lib/louvers/optimise-task";
import { getLayout, saveLayout, type LayoutAtRevision } from "@/lib/projects/service";
import { getScenario } from "@/lib/scenarios/service";
import { listProjectSeats } from "@/lib/seat-assignments";

/**
 * Automatic louver settings for a project (POST /api/projects/{id}/louvers/optimise, …/jobs)
 * and applying them as a new layout revision (…/louvers/apply).
 *
 * The optimisation works on the head revision under one scenario. Target seats: the seats with
 * an occupant assigned when any are; otherwise every seat inside a zone (a plan nobody has been
 * assigned to yet is optimised for all its zone seats). The problem (view factors, candidate
 * outputs) is built on the request thread — about as long as one comfort computation — and the
 * search runs in the worker pool as a "louvers.optimise" run; identical concurrent requests
 * share the run.
 */

/** Body of the optimise routes. */
export const optimiseRequest = z.strictObject({ scenarioId: z.uuid("not a scenario id") });
export type OptimiseRequest = z.infer<typeof optimiseRequest>;

/** Body of POST /api/projects/{id}/louvers/apply. */
export const applyLouversRequest = z
  .strictObject({
    /** The head revision the settings were computed for; a different head is 409. */
    baseRevision: z.int().min(1),
    panels: z
      .array(z.strictObject({ id: elementId, openingAngleDeg: z.number().finite().min(0).max(180) }))
      .min(1, "list at least one panel")
      .max(1000),
    message: z.string().trim().min(1, "describe the change").max(200).optional(),
  })
  .superRefine((body, ctx) => {
    const seen = new Set<string>();
    body.panels.forEach((p, i) => {
      if (seen.has(p.id)) ctx.addIssue({ code: "custom", path: ["panels", i, "id"], message: `panel "${p.id}" is listed twice` });
      seen.add(p.id);
    });
  });
export type ApplyLouversRequest = z.infer<typeof applyLouversRequest>;

async function prepare(member: Member, projectId: string, request: OptimiseRequest): Promise<LouverOptimiseInput> {
  const [layout, scenario, seatRows] = await Promise.all([
    getLayout(member.organisationId, projectId),
    getScenario(member.organisationId, projectId, request.scenarioId),
    listProjectSeats(member.organisationId, projectId),
  ]);
  const occupied = seatRows.filter((s) => s.occupantUserId !== null && s.removedInRevision === null).map((s) => s.seatId);
  const { tables } = await louverTablesForLayout(layout.layout);
  const problem = buildLouverProblem(layout.layout, scenario.conditions, {
    louverTables: tables,
    ...(occupied.length > 0 ? { seatIds: occupied } : {}),
  });
  return {
    problem,
    context: { projectId, revision: layout.revision, scenarioId: scenario.id, seatSelection: occupied.length > 0 ? "occupied" : "zones" },
  };
}

/**
 * Chooses the louver settings and waits for them (the search runs in the worker pool).
 * @throws AppError not_found for foreign/unknown ids, invalid_input when the layout cannot be
 *   computed, unavailable when the pool cannot run it.
 */
export async function optimiseLouverSettings(member: Member, projectId: string, request: OptimiseRequest): Promise<LouverOptimiseOutput> {
  const input = await prepare(member, projectId, request);
  const outcome = await runShared("louvers.optimise", input).settled;
  if (!outcome.ok) throw new AppError("unavailable", `The louver settings could not be computed: ${outcome.error}`);
  return outcome.output;
}

/** Starts the same computation as a job; the client follows it with GET /api/jobs/{jobId} (progress per room). */
export async function startLouverOptimisationJob(member: Member, projectId: string, request: OptimiseRequest): Promise<{ jobId: string }> {
  const input = await prepare(member, projectId, request);
  return { jobId: startJob(member, "louvers.optimise", input) };
}

function withAngles(layout: Layout, angles: ReadonlyMap<string, number>): Layout {
  return {
    ...layout,
    panels: layout.panels.map((p) => (p.louver && angles.has(p.id) ? { ...p, louver: { ...p.louver, openingAngleDeg: angles.get(p.id)! } } : p)),
  };
}

/**
 * Saves the given opening angles as a new layout revision (through saveLayout, the one save
 * path). Every listed panel must exist in the base revision, be louvered, and get an angle in
 * its allowed range — otherwise 400 naming each bad entry, and nothing is written.
 * @throws AppError conflict (409) when `baseRevision` is not the head.
 */
export async function applyLouverSettings(member: Member, projectId: string, request: ApplyLouversRequest): Promise<LayoutAtRevision> {
  const head = await getLayout(member.organisationId, projectId);
  if (head.revision !== request.baseRevision) {
    throw new AppError("conflict", `Revision ${head.revision} was saved after the revision ${request.baseRevision} you started from.`, undefined, {
      headRevision: head.revision,
    });
  }
  const panels = new Map(head.layout.panels.map((p) => [p.id, p]));
  const fields: { path: string; message: string }[] = [];
  request.panels.forEach((entry, i) => {
    const panel = panels.get(entry.id);
    if (!panel) fields.push({ path: `panels.${i}.id`, message: `no panel "${entry.id}" in revision ${head.revision}` });
    else if (!panel.louver) fields.push({ path: `panels.${i}.id`, message: `panel "${panel.label}" has no louver` });
    else if (entry.openingAngleDeg < panel.louver.minOpeningAngleDeg || entry.openingAngleDeg > panel.louver.maxOpeningAngleDeg) {
      fields.push({
        path: `panels.${i}.openingAngleDeg`,
        message: `must lie within the louver's range ${panel.louver.minOpeningAngleDeg}°–${panel.louver.maxOpeningAngleDeg}° of panel "${panel.label}"`,
      });
    }
  });
  if (fields.length > 0) throw invalidInput(fields);
  const angles = new Map(request.panels.map((p) => [p.id, p.openingAngleDeg]));
  return saveLayout(member, projectId, {
    baseRevision: request.baseRevision,
    message: request.message ?? `Louver settings applied to ${request.panels.length} panel${request.panels.length === 1 ? "" : "s"}`,
    layout: withAngles(head.layout, angles),
  });
}
