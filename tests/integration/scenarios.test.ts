import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { and, count, eq } from "drizzle-orm";
import { getDb, pool } from "@/db/client";
import { auditLog, scenarios } from "@/db/schema";
import { GET, POST } from "@/app/api/projects/[projectId]/scenarios/route";
import { PUT } from "@/app/api/projects/[projectId]/scenarios/[scenarioId]/route";
import { createProject } from "@/lib/projects/service";
import { SUMMER_DESIGN, WINTER_DESIGN, type ScenarioInput } from "@/lib/scenarios/schema";
import type { Scenario } from "@/lib/scenarios/service";
import { addMember, call, newOrganisation, type ErrorBody, type TestMember } from "./support/members";

let admin: TestMember;
let manager: TestMember;
let stranger: TestMember;
let projectId = "";

const list = (token: string, id = projectId) => call(GET, "GET", `/api/projects/${id}/scenarios`, { projectId: id }, token);
const create = (token: string, body: unknown, id = projectId) => call(POST, "POST", `/api/projects/${id}/scenarios`, { projectId: id }, token, body);
const update = (token: string, scenarioId: string, body: unknown) =>
  call(PUT, "PUT", `/api/projects/${projectId}/scenarios/${scenarioId}`, { projectId, scenarioId }, token, body);

async function rowCount(): Promise<number> {
  const [row] = await getDb().select({ n: count() }).from(scenarios).where(eq(scenarios.projectId, projectId));
  return row!.n;
}

beforeAll(async () => {
  admin = await newOrganisation("Scenarios");
  manager = await addMember(admin.member.organisationId, "facility_manager", "Scenario Manager");
  stranger = await newOrganisation("Stranger");
  projectId = (await createProject(admin.member, { name: "Scenario project", description: "" })).id;
});

afterAll(async () => {
  await pool().end();
});

describe("scenarios API", () => {
  let winterId = "";

  it("creates a scenario (201, version 1), lists it, and records the audit entry", async () => {
    expect(((await (await list(admin.token)).json()) as { scenarios: Scenario[] }).scenarios).toEqual([]);
    const res = await create(admin.token, WINTER_DESIGN);
    expect(res.status).toBe(201);
    const body = (await res.json()) as Scenario;
    expect(body).toMatchObject({ projectId, name: "Winter design", version: 1, conditions: WINTER_DESIGN.conditions });
    winterId = body.id;
    const listed = (await (await list(manager.token)).json()) as { scenarios: Scenario[] };
    expect(listed.scenarios.map((s) => s.id)).toEqual([winterId]);
    const audit = await getDb().select().from(auditLog).where(and(eq(auditLog.action, "scenarios.save"), eq(auditLog.targetId, winterId)));
    expect(audit).toHaveLength(1);
  });

  it("answers 409 naming the field for a duplicate name, and writes nothing", async () => {
    const before = await rowCount();
    const res = await create(admin.token, { ...SUMMER_DESIGN, name: "Winter design" });
    expect(res.status).toBe(409);
    expect(((await res.json()) as ErrorBody).fields).toEqual([{ path: "name", message: "already used in this project" }]);
    expect(await rowCount()).toBe(before);
  });

  it("answers 400 naming each bad field (range, type, unknown key, repeated mode), and writes nothing", async () => {
    const before = await rowCount();
    const bad = {
      name: "Broken",
      conditions: {
        ...WINTER_DESIGN.conditions,
        relativeHumidityPercent: 120,
        airTemperatureC: "warm",
        activeModes: ["heating", "heating"],
        surfaces: { ...WINTER_DESIGN.conditions.surfaces, floor: { kind: "uValue", uValueWm2K: -1 } },
        colour: "blue",
      },
    };
    const res = await create(admin.token, bad);
    expect(res.status).toBe(400);
    const body = (await res.json()) as ErrorBody;
    expect(body.error).toBe("invalid_input");
    expect(body.fields!.map((f) => f.path).sort()).toEqual(
      [
        "conditions.activeModes",
        "conditions.airTemperatureC",
        "conditions.colour",
        "conditions.relativeHumidityPercent",
        "conditions.surfaces.floor.uValueWm2K",
      ].sort(),
    );
    expect(await rowCount()).toBe(before);
    const empty = await create(admin.token, { ...WINTER_DESIGN, name: "  " });
    expect(empty.status).toBe(400);
    expect(((await empty.json()) as ErrorBody).fields!.map((f) => f.path)).toEqual(["name"]);
    expect(await rowCount()).toBe(before);
  });

  it("updates with PUT: the version grows by one on every update", async () => {
    const changed: ScenarioInput = { name: "Winter design (revised)", conditions: { ...WINTER_DESIGN.conditions, airTemperatureC: 21 } };
    const res = await update(admin.token, winterId, changed);
    expect(res.status).toBe(200);
    expect(await res.json()).toMatchObject({ id: winterId, name: changed.name, version: 2, conditions: { airTemperatureC: 21 } });
    const again = (await (await update(admin.token, winterId, changed)).json()) as Scenario;
    expect(again.version).toBe(3);
  });

  it("PUT answers 409 when renaming onto another scenario's name and 400 for bad conditions, leaving the row as it was", async () => {
    await create(admin.token, SUMMER_DESIGN);
    const [before] = await getDb().select().from(scenarios).where(eq(scenarios.id, winterId));
    const clash = await update(admin.token, winterId, { ...WINTER_DESIGN, name: "Summer design" });
    expect(clash.status).toBe(409);
    const invalid = await update(admin.token, winterId, { ...WINTER_DESIGN, conditions: { ...WINTER_DESIGN.conditions, defaultMet: 0 } });
    expect(invalid.status).toBe(400);
    expect(((await invalid.json()) as ErrorBody).fields!.map((f) => f.path)).toEqual(["conditions.defaultMet"]);
    const [after] = await getDb().select().from(scenarios).where(eq(scenarios.id, winterId));
    expect(after).toEqual(before);
  });

  it("lets a facility manager read but not write (403), and hides the project from another organisation (404)", async () => {
    expect((await list(manager.token)).status).toBe(200);
    expect((await create(manager.token, { ...WINTER_DESIGN, name: "FM attempt" })).status).toBe(403);
    expect((await update(manager.token, winterId, WINTER_DESIGN)).status).toBe(403);
    expect((await list(stranger.token)).status).toBe(404);
    expect((await create(stranger.token, { ...WINTER_DESIGN, name: "Intruder" })).status).toBe(404);
    expect((await update(stranger.token, winterId, WINTER_DESIGN)).status).toBe(404);
    expect((await list("")).status).toBe(401);
  });

  it("answers 404 for an unknown scenario id and 400 for a malformed one", async () => {
    expect((await update(admin.token, crypto.randomUUID(), WINTER_DESIGN)).status).toBe(404);
    const malformed = await update(admin.token, "not-a-uuid", WINTER_DESIGN);
    expect(malformed.status).toBe(400);
    expect(((await malformed.json()) as ErrorBody).fields!.map((f) => f.path)).toEqual(["params.scenarioId"]);
  });
});
