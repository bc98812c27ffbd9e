import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { count, eq } from "drizzle-orm";
import { getDb, pool } from "@/db/client";
import { computeResults } from "@/db/schema";
import { POST as computeRoute } from "@/app/api/projects/[projectId]/compute/route";
import { PUT as saveLayoutRoute } from "@/app/api/projects/[projectId]/layout/route";
import { POST as createScenarioRoute } from "@/app/api/projects/[projectId]/scenarios/route";
import { PUT as updateScenarioRoute } from "@/app/api/projects/[projectId]/scenarios/[scenarioId]/route";
import type { ComputeResult } from "@/lib/compute/types";
import { demoLayout } from "@/lib/demo/layout";
import { createProject } from "@/lib/projects/service";
import { SUMMER_DESIGN, WINTER_DESIGN } from "@/lib/scenarios/schema";
import type { Scenario } from "@/lib/scenarios/service";
import { addMember, call, newOrganisation, type ErrorBody, type TestMember } from "./support/members";

let admin: TestMember;
let manager: TestMember;
let occupant: TestMember;
let stranger: TestMember;
let projectId = "";
let winter: Scenario;
let summer: Scenario;

const compute = (token: string, body: unknown, id = projectId) => call(computeRoute, "POST", `/api/projects/${id}/compute`, { projectId: id }, token, body);

async function cachedRows(): Promise<number> {
  const [row] = await getDb().select({ n: count() }).from(computeResults).where(eq(computeResults.projectId, projectId));
  return row!.n;
}

beforeAll(async () => {
  admin = await newOrganisation("Compute");
  manager = await addMember(admin.member.organisationId, "facility_manager", "Compute Manager");
  occupant = await addMember(admin.member.organisationId, "occupant", "Compute Occupant");
  stranger = await newOrganisation("Elsewhere");
  projectId = (await createProject(admin.member, { name: "Compute project", description: "demo-like plan" }, demoLayout())).id;
  const make = async (body: unknown) =>
    (await (await call(createScenarioRoute, "POST", `/api/projects/${projectId}/scenarios`, { projectId }, admin.token, body)).json()) as Scenario;
  winter = await make(WINTER_DESIGN);
  summer = await make(SUMMER_DESIGN);
});

afterAll(async () => {
  await pool().end();
});

describe("POST /api/projects/{id}/compute", () => {
  let first: ComputeResult;

  it("computes the demo-like plan: every seat, panel and zone, and a heatmap per room", async () => {
    const res = await compute(manager.token, { scenarioId: winter.id });
    expect(res.status).toBe(200);
    first = (await res.json()) as ComputeResult;
    expect(first).toMatchObject({ projectId, revision: 1, scenarioId: winter.id, cached: false });
    expect(first.computeMs).toBeGreaterThan(0);
    expect(first.seats).toHaveLength(demoLayout().seats.length);
    expect(first.panels).toHaveLength(demoLayout().panels.length);
    expect(first.zones.map((z) => z.id)).toEqual(["zone-window", "zone-core", "zone-meeting"]);
    expect(first.heatmap.grids.map((g) => g.roomId)).toEqual(["room-open", "room-meeting", "room-focus"]);
    const seat = first.seats[0]!;
    expect(seat).toMatchObject({ id: "seat-oo-1", label: "Desk A1", roomId: "room-open" });
    for (const key of ["pmv", "ppd", "mrtC", "operativeC", "verticalAsymmetryC", "horizontalAsymmetryC"] as const) expect(Number.isFinite(seat[key])).toBe(true);
    expect(seat.surfaces.reduce((sum, s) => sum + s.angleFactor, 0)).toBeCloseTo(1, 2);
    expect(await cachedRows()).toBe(1);
  });

  it("answers a repeat from the cache: identical numbers, cached = true, no new row", async () => {
    const res = await compute(admin.token, { scenarioId: winter.id, revision: 1 });
    expect(res.status).toBe(200);
    const again = (await res.json()) as ComputeResult;
    expect(again.cached).toBe(true);
    expect(again.computeMs).toBe(0);
    expect(again.computedAt).toBe(first.computedAt);
    expect({ seats: again.seats, panels: again.panels, zones: again.zones, heatmap: again.heatmap, warnings: again.warnings }).toEqual({
      seats: first.seats, panels: first.panels, zones: first.zones, heatmap: first.heatmap, warnings: first.warnings,
    });
    expect(await cachedRows()).toBe(1);
  });

  it("recomputes when the scenario changed (its version grew), with results that follow the change", async () => {
    const warmer = { name: winter.name, conditions: { ...winter.conditions, airTemperatureC: 23 } };
    const updated = await call(updateScenarioRoute, "PUT", `/api/projects/${projectId}/scenarios/${winter.id}`, { projectId, scenarioId: winter.id }, admin.token, warmer);
    expect(((await updated.json()) as Scenario).version).toBe(2);
    const res = (await (await compute(admin.token, { scenarioId: winter.id })).json()) as ComputeResult;
    expect(res.cached).toBe(false);
    expect(res.seats[0]!.pmv).toBeGreaterThan(first.seats[0]!.pmv);
    expect(await cachedRows()).toBe(2);
  });

  it("computes another scenario separately (summer: the chilled panels run, the heating panels are off)", async () => {
    const res = (await (await compute(admin.token, { scenarioId: summer.id })).json()) as ComputeResult;
    expect(res.cached).toBe(false);
    expect(res.panels.filter((p) => p.active).every((p) => p.mode === "cooling")).toBe(true);
    expect(res.panels.some((p) => p.condensation !== null)).toBe(true);
  });

  it("answers 400 naming a seat outside every room, and caches nothing for it", async () => {
    const layout = demoLayout();
    layout.seats[5] = { ...layout.seats[5]!, position: { x: 50, y: 50 } };
    const saved = await call(saveLayoutRoute, "PUT", `/api/projects/${projectId}/layout`, { projectId }, admin.token, { baseRevision: 1, message: "Seat moved out", layout });
    expect(saved.status).toBe(201);
    const before = await cachedRows();
    const res = await compute(admin.token, { scenarioId: winter.id });
    expect(res.status).toBe(400);
    const body = (await res.json()) as ErrorBody;
    expect(body.error).toBe("invalid_input");
    expect(body.fields).toEqual([{ path: "layout.seats.5", message: `seat "${layout.seats[5]!.label}" is outside every room` }]);
    expect(await cachedRows()).toBe(before);
    // The earlier revision still computes (from the cache).
    const old = (await (await compute(admin.token, { scenarioId: summer.id, revision: 1 })).json()) as ComputeResult;
    expect(old.cached).toBe(true);
  });

  it("answers 404 for an unknown scenario or revision and for another organisation's project", async () => {
    expect((await compute(admin.token, { scenarioId: crypto.randomUUID() })).status).toBe(404);
    expect((await compute(admin.token, { scenarioId: winter.id, revision: 99 })).status).toBe(404);
    const foreign = await compute(stranger.token, { scenarioId: winter.id });
    expect(foreign.status).toBe(404);
    expect(((await foreign.json()) as ErrorBody).error).toBe("not_found");
  });

  it("answers 400 for a malformed body, 403 for an occupant and 401 without a session", async () => {
    const bad = await compute(admin.token, { scenarioId: "winter", revision: 0, extra: true });
    expect(bad.status).toBe(400);
    expect(((await bad.json()) as ErrorBody).fields!.map((f) => f.path).sort()).toEqual(["extra", "revision", "scenarioId"]);
    expect((await compute(occupant.token, { scenarioId: winter.id })).status).toBe(403);
    expect((await compute("", { scenarioId: winter.id })).status).toBe(401);
  });
});
