/**
 * PMV against a louver's opening angle (`POST /api/projects/{id}/louvers/sweep`) through its
 * route handler, on a small plan: an office with a louvered heating ceiling panel and two desks
 * (one under the panel, one near the far wall) next to a meeting room with a flat panel and a
 * seat of its own. The sweep must agree with the full comfort computation at the layout's own
 * setting, cover only the panel's room and answer the demo plan within the budget.
 */
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { POST as computeRoute } from "@/app/api/projects/[projectId]/compute/route";
import { PUT as saveLayout } from "@/app/api/projects/[projectId]/layout/route";
import { POST as sweepRoute } from "@/app/api/projects/[projectId]/louvers/sweep/route";
import { POST as createScenario } from "@/app/api/projects/[projectId]/scenarios/route";
import { POST as createProject } from "@/app/api/projects/route";
import type { ComputeResult } from "@/lib/compute/types";
import { demoLayout } from "@/lib/demo/layout";
import { LAYOUT_SCHEMA_VERSION, type Layout, type Panel } from "@/lib/layout/schema";
import { storeLouverTable } from "@/lib/louvers/cavity-table-cache";
import type { PmvSweep } from "@/lib/louvers/sweep";
import { buildLouverTable } from "@/lib/panels/louverTable";
import { WINTER_DESIGN } from "@/lib/scenarios/schema";
import { call, fieldPaths, organisationWithEveryRole } from "../support/api";
import { closeDatabase } from "../support/db";
import { openWorkerSandbox, type WorkerSandbox } from "@/tests/support/workers";

type Org = Awaited<ReturnType<typeof organisationWithEveryRole>>;
let org: Org;
let other: Org;
let projectId = "";
let scenarioId = "";
let revision = 0;
let demoProjectId = "";
let demoScenarioId = "";
let sandbox: WorkerSandbox;

const LOUVER: NonNullable<Panel["louver"]> = { openingAngleDeg: 120, minOpeningAngleDeg: 40, maxOpeningAngleDeg: 180, axisDeg: 0, finish: "diffuse", wallEmissivity: 0.9 };

function panel(id: string, roomId: string, x: number, y: number, louver: Panel["louver"]): Panel {
  return {
    id, label: id.toUpperCase(), roomId, mounting: "ceiling", center: { x, y }, rotationDeg: 0, widthM: 1.2, lengthM: 2.4,
    mountingHeightM: null, mode: "heating", supply: { kind: "surface", surfaceTemperatureC: 36 }, emissivity: 0.93, louver, productId: null,
  };
}

function plan(): Layout {
  return {
    schemaVersion: LAYOUT_SCHEMA_VERSION,
    rooms: [
      { id: "office", name: "Office", outline: [{ x: 0, y: 0 }, { x: 6, y: 0 }, { x: 6, y: 5 }, { x: 0, y: 5 }], ceilingHeightM: 2.8 },
      { id: "meeting", name: "Meeting", outline: [{ x: 6, y: 0 }, { x: 10, y: 0 }, { x: 10, y: 5 }, { x: 6, y: 5 }], ceilingHeightM: 2.8 },
    ],
    openings: [{ id: "w1", roomId: "office", kind: "window", edgeIndex: 0, offsetM: 1, widthM: 3, sillHeightM: 0.8, heightM: 1.6, thermal: { kind: "uValue", uValueWm2K: 1.4 } }],
    panels: [panel("lv", "office", 2, 1.8, LOUVER), panel("mt", "meeting", 8, 2.5, null)],
    seats: [
      { id: "under", label: "Under the panel", position: { x: 2, y: 1.8 }, posture: "seated", facingDeg: 90, clo: null, met: null },
      { id: "far", label: "Far desk", position: { x: 5.2, y: 4.3 }, posture: "seated", facingDeg: 180, clo: null, met: null },
      { id: "meet", label: "Meeting seat", position: { x: 8, y: 2.5 }, posture: "seated", facingDeg: 0, clo: null, met: null },
    ],
    zones: [{ id: "z1", name: "Desks", outline: [{ x: 0, y: 0 }, { x: 6, y: 0 }, { x: 6, y: 5 }, { x: 0, y: 5 }], target: { kind: "pmvBand", minPmv: -0.5, maxPmv: 0.5 } }],
    underlay: null,
  };
}

async function sweep(body: Record<string, unknown>, token = org.facility_manager.token, id = projectId) {
  return call<PmvSweep>(sweepRoute, "POST", { token, params: { projectId: id }, body });
}

beforeAll(async () => {
  sandbox = await openWorkerSandbox("sweep", "inline");
  await storeLouverTable(buildLouverTable({ finish: "diffuse", wallEmissivity: 0.9 }));
  [org, other] = await Promise.all([organisationWithEveryRole("sweep"), organisationWithEveryRole("sweep-other")]);
  const project = await call<{ id: string }>(createProject, "POST", { token: org.designer.token, body: { name: "Sweep bay" } });
  expect(project.status).toBe(201);
  projectId = project.body.id;
  const saved = await call<{ revision: number }>(saveLayout, "PUT", { token: org.designer.token, params: { projectId }, body: { baseRevision: 1, message: "two rooms", layout: plan() } });
  expect(saved.status, JSON.stringify(saved.body)).toBe(201);
  revision = saved.body.revision;
  const scenario = await call<{ id: string }>(createScenario, "POST", { token: org.designer.token, params: { projectId }, body: WINTER_DESIGN });
  expect(scenario.status).toBe(201);
  scenarioId = scenario.body.id;

  const demo = await call<{ id: string }>(createProject, "POST", { token: org.designer.token, body: { name: "Sweep demo" } });
  demoProjectId = demo.body.id;
  const demoSaved = await call(saveLayout, "PUT", { token: org.designer.token, params: { projectId: demoProjectId }, body: { baseRevision: 1, message: "demo", layout: demoLayout() } });
  expect(demoSaved.status).toBe(201);
  const demoScenario = await call<{ id: string }>(createScenario, "POST", { token: org.designer.token, params: { projectId: demoProjectId }, body: WINTER_DESIGN });
  demoScenarioId = demoScenario.body.id;
}, 60_000);

afterAll(async () => {
  await sandbox.close();
  await closeDatabase();
});

describe("POST /api/projects/{id}/louvers/sweep", () => {
  test("default angles are the louver's range in 5° steps; only the panel's room's seats, one PMV per angle", async () => {
    const reply = await sweep({ scenarioId, panelId: "lv" });
    expect(reply.status, JSON.stringify(reply.body)).toBe(200);
    expect(reply.body).toMatchObject({ projectId, revision, scenarioId, panelId: "lv", roomId: "office" });
    expect(reply.body.anglesDeg).toEqual(Array.from({ length: 29 }, (_, i) => 40 + 5 * i));
    expect(reply.body.seats.map((s) => s.id)).toEqual(["under", "far"]);
    expect(reply.body.seats.map((s) => s.label)).toEqual(["Under the panel", "Far desk"]);
    for (const s of reply.body.seats) {
      expect(s.pmv).toHaveLength(29);
      for (const v of s.pmv) expect(Number.isFinite(v)).toBe(true);
    }
  });

  test("at the layout's own setting each PMV is the full computation's", async () => {
    const swept = await sweep({ scenarioId, panelId: "lv", anglesDeg: [LOUVER.openingAngleDeg] });
    expect(swept.status).toBe(200);
    const full = await call<ComputeResult>(computeRoute, "POST", { token: org.facility_manager.token, params: { projectId }, body: { scenarioId, revision } });
    expect(full.status, JSON.stringify(full.body)).toBe(200);
    for (const s of swept.body.seats) {
      const seat = full.body.seats.find((x) => x.id === s.id)!;
      expect(Math.abs(s.pmv[0]! - seat.pmv)).toBeLessThanOrEqual(0.001);
    }
  });

  test("a heating louver opened further warms the seat under it more than the far one, never cooling either", async () => {
    const reply = await sweep({ scenarioId, panelId: "lv", anglesDeg: [180, 40, 110, 110] });
    expect(reply.status).toBe(200);
    expect(reply.body.anglesDeg).toEqual([40, 110, 180]);
    const [under, far] = reply.body.seats;
    for (const s of [under!, far!]) {
      expect(s.pmv[1]!).toBeGreaterThanOrEqual(s.pmv[0]!);
      expect(s.pmv[2]!).toBeGreaterThanOrEqual(s.pmv[1]!);
    }
    const gainUnder = under!.pmv[2]! - under!.pmv[0]!;
    const gainFar = far!.pmv[2]! - far!.pmv[0]!;
    expect(gainUnder).toBeGreaterThan(0.01);
    expect(gainUnder).toBeGreaterThan(gainFar);
  });

  test("400 naming the field: a panel without louver, an unknown panel, an angle outside the louver's range", async () => {
    const flat = await sweep({ scenarioId, panelId: "mt" });
    expect(flat.status).toBe(400);
    expect(fieldPaths(flat.body)).toEqual(["panelId"]);
    const missing = await sweep({ scenarioId, panelId: "nope" });
    expect(missing.status).toBe(400);
    expect(fieldPaths(missing.body)).toEqual(["panelId"]);
    const outside = await sweep({ scenarioId, panelId: "lv", anglesDeg: [90, 30, 20] });
    expect(outside.status).toBe(400);
    expect(fieldPaths(outside.body)).toEqual(["anglesDeg.1", "anglesDeg.2"]);
  });

  test("another organisation's project or scenario is 404; an occupant is 403", async () => {
    expect((await sweep({ scenarioId, panelId: "lv" }, other.designer.token)).status).toBe(404);
    const foreignScenario = await call<{ id: string }>(createScenario, "POST", {
      token: other.designer.token,
      params: { projectId: (await call<{ id: string }>(createProject, "POST", { token: other.designer.token, body: { name: "Elsewhere" } })).body.id },
      body: WINTER_DESIGN,
    });
    expect((await sweep({ scenarioId: foreignScenario.body.id, panelId: "lv" })).status).toBe(404);
    expect((await sweep({ scenarioId, panelId: "lv" }, org.occupant.token)).status).toBe(403);
  });

  // Its time is a benchmark figure (bench/optimise.bench.ts), not an assertion here.
  test("the demo plan's window panel: the whole range in 5° steps for each of the room's 40 seats", async () => {
    const reply = await sweep({ scenarioId: demoScenarioId, panelId: "panel-oo-1" }, org.designer.token, demoProjectId);
    expect(reply.status).toBe(200);
    expect(reply.body.anglesDeg).toHaveLength(31);
    expect(reply.body.seats).toHaveLength(40);
    for (const seat of reply.body.seats) expect(seat.pmv).toHaveLength(31);
  });
});
