/**
 * Automatic louver settings through their routes: POST /api/projects/{id}/louvers/optimise
 * (waits for the worker pool), …/optimise/jobs (202 + GET /api/jobs/{id} with progress per
 * room) and …/louvers/apply (a new layout revision). The worker bundle is built from source
 * into a temporary folder and run in a real worker thread; cavity tables live in a temporary
 * LOUVER_CACHE_DIR.
 */
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { GET as getJobRoute } from "@/app/api/jobs/[jobId]/route";
import { POST as applyRoute } from "@/app/api/projects/[projectId]/louvers/apply/route";
import { POST as optimiseJobsRoute } from "@/app/api/projects/[projectId]/louvers/optimise/jobs/route";
import { POST as optimiseRoute } from "@/app/api/projects/[projectId]/louvers/optimise/route";
import { GET as getLayoutRoute, PUT as saveLayoutRoute } from "@/app/api/projects/[projectId]/layout/route";
import { GET as listRevisionsRoute } from "@/app/api/projects/[projectId]/revisions/route";
import { POST as createScenarioRoute } from "@/app/api/projects/[projectId]/scenarios/route";
import { PUT as assignSeatRoute } from "@/app/api/projects/[projectId]/seats/[seatId]/route";
import { POST as createProjectRoute } from "@/app/api/projects/route";
import type { JobView } from "@/lib/jobs";
import { LAYOUT_SCHEMA_VERSION, type Layout, type Panel } from "@/lib/layout/schema";
import { louverTablesForLayout } from "@/lib/louvers/layout-tables";
import { optimiseLouvers } from "@/lib/louvers/optimise";
import type { LouverOptimiseOutput } from "@/lib/louvers/optimise-task";
import type { LayoutAtRevision } from "@/lib/projects/service";
import { WINTER_DESIGN } from "@/lib/scenarios/schema";
import { call, fieldPaths, organisationWithEveryRole } from "../support/api";
import { closeDatabase } from "../support/db";
import { openWorkerSandbox, type WorkerSandbox } from "@/tests/support/workers";

type Org = Awaited<ReturnType<typeof organisationWithEveryRole>>;
let org: Org;
let other: Org;
let projectId = "";
let scenarioId = "";
let sandbox: WorkerSandbox;

function panel(id: string, x: number, louvered: boolean): Panel {
  return {
    id, label: id.toUpperCase(), roomId: "room", mounting: "ceiling", center: { x, y: 2 }, rotationDeg: 0, widthM: 1.2, lengthM: 1.2, mountingHeightM: null,
    mode: "heating", supply: { kind: "surface", surfaceTemperatureC: 45 }, emissivity: 0.9, productId: null,
    louver: louvered ? { openingAngleDeg: 180, minOpeningAngleDeg: 30, maxOpeningAngleDeg: 180, axisDeg: 0, finish: "diffuse", wallEmissivity: 0.9 } : null,
  };
}

/** One 6 m × 4 m room, two louvered heating panels and a flat one, three desks in one zone. */
const LAYOUT: Layout = {
  schemaVersion: LAYOUT_SCHEMA_VERSION,
  rooms: [{ id: "room", name: "Studio", outline: [{ x: 0, y: 0 }, { x: 6, y: 0 }, { x: 6, y: 4 }, { x: 0, y: 4 }], ceilingHeightM: 2.7 }],
  openings: [],
  panels: [panel("lv-1", 1.5, true), panel("lv-2", 4.5, true), panel("flat", 3, false)],
  seats: [
    { id: "desk-1", label: "Desk 1", position: { x: 1.5, y: 1 }, posture: "seated", facingDeg: 90, clo: null, met: null },
    { id: "desk-2", label: "Desk 2", position: { x: 4.5, y: 1 }, posture: "seated", facingDeg: 90, clo: null, met: null },
    { id: "desk-3", label: "Desk 3", position: { x: 3, y: 3.2 }, posture: "seated", facingDeg: -90, clo: null, met: null },
  ],
  zones: [{ id: "desks", name: "Desks", outline: [{ x: 0, y: 0 }, { x: 6, y: 0 }, { x: 6, y: 4 }, { x: 0, y: 4 }], target: { kind: "pmvBand", minPmv: -0.7, maxPmv: 0.5 } }],
  underlay: null,
};

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

async function headRevision(token = org.designer.token): Promise<number> {
  const reply = await call<LayoutAtRevision>(getLayoutRoute, "GET", { token, params: { projectId } });
  expect(reply.status).toBe(200);
  return reply.body.revision;
}

async function revisionCount(): Promise<number> {
  const reply = await call<unknown[]>(listRevisionsRoute, "GET", { token: org.designer.token, params: { projectId } });
  expect(reply.status).toBe(200);
  return reply.body.length;
}

const optimise = (token: string, body: unknown = { scenarioId }, id = projectId) => call<LouverOptimiseOutput>(optimiseRoute, "POST", { token, params: { projectId: id }, body });

beforeAll(async () => {
  sandbox = await openWorkerSandbox("louvers", "threads");
  [org, other] = await Promise.all([organisationWithEveryRole("louvers"), organisationWithEveryRole("louvers-other")]);
  const project = await call<{ id: string }>(createProjectRoute, "POST", { token: org.designer.token, body: { name: "Louver studio" } });
  expect(project.status).toBe(201);
  projectId = project.body.id;
  const saved = await call(saveLayoutRoute, "PUT", { token: org.designer.token, params: { projectId }, body: { baseRevision: 1, message: "Studio", layout: LAYOUT } });
  expect(saved.status, JSON.stringify(saved.body)).toBe(201);
  const scenario = await call<{ id: string }>(createScenarioRoute, "POST", { token: org.designer.token, params: { projectId }, body: WINTER_DESIGN });
  expect(scenario.status, JSON.stringify(scenario.body)).toBe(201);
  scenarioId = scenario.body.id;
}, 60_000);

afterAll(async () => {
  await sandbox.close();
  await closeDatabase();
});

describe("POST /api/projects/{id}/louvers/optimise", () => {
  let result: LouverOptimiseOutput;

  test("answers the chosen angle and output per louvered panel, before/after PMV per zone seat, and the total", async () => {
    const reply = await optimise(org.designer.token);
    expect(reply.status, JSON.stringify(reply.body)).toBe(200);
    result = reply.body;
    expect(result).toMatchObject({ projectId, revision: 2, scenarioId, seatSelection: "zones" });
    expect(result.panels.map((p) => p.id)).toEqual(["lv-1", "lv-2"]);
    for (const p of result.panels) {
      expect(p.openingAngleDeg).toBeGreaterThanOrEqual(30);
      expect(p.openingAngleDeg).toBeLessThanOrEqual(180);
      expect(p.outputW).toBeGreaterThan(0);
    }
    expect(result.totalOutputW).toBeCloseTo(result.panels.reduce((sum, p) => sum + p.outputW, 0), 1);
    expect(result.seats.map((s) => s.id)).toEqual(["desk-1", "desk-2", "desk-3"]);
    for (const s of result.seats) {
      expect(typeof s.pmvBefore).toBe("number");
      expect(typeof s.pmvAfter).toBe("number");
      expect(s.inTarget).toBe(s.pmvAfter >= -0.7 && s.pmvAfter <= 0.5);
    }
    expect(Array.isArray(result.unreachable)).toBe(true);
  });

  test("equals the pure optimiser on the same layout, scenario and cached tables (the worker ran the same search)", async () => {
    const { tables } = await louverTablesForLayout(LAYOUT);
    const expected = optimiseLouvers(LAYOUT, WINTER_DESIGN.conditions, { louverTables: tables });
    expect(result.panels).toEqual(expected.panels);
    expect(result.seats).toEqual(expected.seats);
    expect(result.unreachable).toEqual(expected.unreachable);
    expect(result.totalOutputW).toBe(expected.totalOutputW);
  });

  test("is open to facility managers (compute:run), refused to occupants (403), and 404 for another organisation", async () => {
    expect((await optimise(org.facility_manager.token)).status).toBe(200);
    const occupant = await optimise(org.occupant.token);
    expect(occupant.status).toBe(403);
    const foreign = await optimise(other.designer.token);
    expect(foreign.status).toBe(404);
    // Another organisation's member naming this project's scenario on their own project is 404 too.
    const unknownScenario = await optimise(org.designer.token, { scenarioId: crypto.randomUUID() });
    expect(unknownScenario.status).toBe(404);
  });

  test("targets only the occupied seats once an occupant is assigned", async () => {
    const assigned = await call(assignSeatRoute, "PUT", {
      token: org.facility_manager.token, params: { projectId, seatId: "desk-2" }, body: { occupantUserId: org.occupant.userId },
    });
    expect(assigned.status, JSON.stringify(assigned.body)).toBe(200);
    const reply = await optimise(org.designer.token);
    expect(reply.status).toBe(200);
    expect(reply.body.seatSelection).toBe("occupied");
    expect(reply.body.seats.map((s) => s.id)).toEqual(["desk-2"]);
    const cleared = await call(assignSeatRoute, "PUT", { token: org.facility_manager.token, params: { projectId, seatId: "desk-2" }, body: { occupantUserId: null } });
    expect(cleared.status).toBe(200);
  });

  test("an unreachable band is reported per seat with a reason", async () => {
    const tight: Layout = { ...LAYOUT, zones: [{ ...LAYOUT.zones[0]!, target: { kind: "pmvBand", minPmv: 1.5, maxPmv: 2 } }] };
    const head = await headRevision();
    const saved = await call(saveLayoutRoute, "PUT", { token: org.designer.token, params: { projectId }, body: { baseRevision: head, message: "Tight band", layout: tight } });
    expect(saved.status).toBe(201);
    const reply = await optimise(org.designer.token);
    expect(reply.status).toBe(200);
    expect(reply.body.unreachable.map((u) => u.seatId)).toEqual(["desk-1", "desk-2", "desk-3"]);
    for (const u of reply.body.unreachable) expect(u.reason).toMatch(/more output than the panels give fully open/);
    const back = await call(saveLayoutRoute, "PUT", { token: org.designer.token, params: { projectId }, body: { baseRevision: head + 1, message: "Band back", layout: LAYOUT } });
    expect(back.status).toBe(201);
  });
});

describe("POST /api/projects/{id}/louvers/optimise/jobs → GET /api/jobs/{id}", () => {
  test("answers 202 with a job id; the job reports progress per room and ends with the same result as the direct route", async () => {
    const started = await call<{ jobId: string }>(optimiseJobsRoute, "POST", { token: org.facility_manager.token, params: { projectId }, body: { scenarioId } });
    expect(started.status, JSON.stringify(started.body)).toBe(202);
    expect(started.response.headers.get("location")).toBe(`/api/jobs/${started.body.jobId}`);
    let view: JobView | null = null;
    for (let i = 0; i < 500; i++) {
      const reply = await call<JobView>(getJobRoute, "GET", { token: org.facility_manager.token, params: { jobId: started.body.jobId } });
      expect(reply.status).toBe(200);
      view = reply.body;
      if (view.status === "done" || view.status === "failed") break;
      await sleep(20);
    }
    expect(view?.status).toBe("done");
    expect(view!.task).toBe("louvers.optimise");
    expect(view!.progress).toMatchObject({ done: 1, total: 1 });
    const direct = await optimise(org.designer.token);
    expect(view!.result).toEqual(direct.body);
    // Another organisation cannot read the job.
    const foreign = await call(getJobRoute, "GET", { token: other.admin.token, params: { jobId: started.body.jobId } });
    expect(foreign.status).toBe(404);
  });

  test("occupants are refused (403) and another organisation's project is 404", async () => {
    expect((await call(optimiseJobsRoute, "POST", { token: org.occupant.token, params: { projectId }, body: { scenarioId } })).status).toBe(403);
    expect((await call(optimiseJobsRoute, "POST", { token: other.designer.token, params: { projectId }, body: { scenarioId } })).status).toBe(404);
  });
});

describe("POST /api/projects/{id}/louvers/apply", () => {
  test("saves the chosen angles as a new revision", async () => {
    const base = await headRevision();
    const result = (await optimise(org.designer.token)).body;
    const reply = await call<LayoutAtRevision>(applyRoute, "POST", {
      token: org.designer.token,
      params: { projectId },
      body: { baseRevision: base, panels: result.panels.map((p) => ({ id: p.id, openingAngleDeg: p.openingAngleDeg })) },
    });
    expect(reply.status, JSON.stringify(reply.body)).toBe(201);
    expect(reply.body.revision).toBe(base + 1);
    expect(reply.body.message).toBe("Louver settings applied to 2 panels");
    const layout = (await call<LayoutAtRevision>(getLayoutRoute, "GET", { token: org.designer.token, params: { projectId } })).body.layout;
    for (const p of result.panels) expect(layout.panels.find((x) => x.id === p.id)!.louver!.openingAngleDeg).toBe(p.openingAngleDeg);
    // Everything else is the layout as it was.
    expect(layout.seats).toEqual(LAYOUT.seats);
    expect(layout.panels.find((x) => x.id === "flat")).toEqual(LAYOUT.panels[2]);
    // At the applied angles the seats start where the optimiser left them.
    const again = await optimise(org.designer.token);
    expect(again.body.seats.map((s) => s.pmvBefore)).toEqual(result.seats.map((s) => s.pmvAfter));
  });

  test("a stale base revision is 409 and writes nothing", async () => {
    const before = await revisionCount();
    const head = await headRevision();
    const reply = await call(applyRoute, "POST", { token: org.designer.token, params: { projectId }, body: { baseRevision: head - 1, panels: [{ id: "lv-1", openingAngleDeg: 90 }], message: "Old" } });
    expect(reply.status).toBe(409);
    expect(reply.body).toMatchObject({ error: "conflict", headRevision: head });
    expect(await revisionCount()).toBe(before);
  });

  test("a panel without a louver, an unknown panel and an angle outside the range are 400 naming each entry, and nothing is written", async () => {
    const before = await revisionCount();
    const head = await headRevision();
    const reply = await call(applyRoute, "POST", {
      token: org.designer.token,
      params: { projectId },
      body: {
        baseRevision: head,
        panels: [
          { id: "lv-1", openingAngleDeg: 90 },
          { id: "flat", openingAngleDeg: 90 },
          { id: "lv-2", openingAngleDeg: 10 },
          { id: "missing", openingAngleDeg: 90 },
        ],
      },
    });
    expect(reply.status).toBe(400);
    expect(fieldPaths(reply.body)).toEqual(["panels.1.id", "panels.2.openingAngleDeg", "panels.3.id"]);
    expect(JSON.stringify(reply.body)).toMatch(/has no louver/);
    expect(await revisionCount()).toBe(before);
  });

  test("needs layouts:write: facility managers and occupants get 403; another organisation gets 404", async () => {
    const head = await headRevision();
    const body = { baseRevision: head, panels: [{ id: "lv-1", openingAngleDeg: 90 }] };
    expect((await call(applyRoute, "POST", { token: org.facility_manager.token, params: { projectId }, body })).status).toBe(403);
    expect((await call(applyRoute, "POST", { token: org.occupant.token, params: { projectId }, body })).status).toBe(403);
    expect((await call(applyRoute, "POST", { token: other.designer.token, params: { projectId }, body })).status).toBe(404);
    expect(await headRevision()).toBe(head);
  });
});
