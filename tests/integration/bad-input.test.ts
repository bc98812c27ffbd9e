/**
 * Bad input for every route that takes a body: missing fields, wrong types, over-long strings,
 * unknown fields and invalid JSON are each a 400 whose `fields` name exactly the bad fields,
 * and no table gains or loses a row.
 */
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { POST as confirmReset } from "@/app/api/auth/password-reset/confirm/route";
import { POST as requestReset } from "@/app/api/auth/password-reset/request/route";
import { POST as signIn } from "@/app/api/auth/sign-in/route";
import { POST as signUp } from "@/app/api/auth/sign-up/route";
import { POST as importCatalogue } from "@/app/api/catalogue/import/route";
import { POST as acceptInvitation } from "@/app/api/invitations/accept/route";
import { POST as requestCavityTable } from "@/app/api/louvers/cavity-table/route";
import { PATCH as patchSettings } from "@/app/api/me/settings/route";
import { PATCH as changeRole } from "@/app/api/members/[membershipId]/route";
import { POST as createInvitation } from "@/app/api/members/invitations/route";
import { POST as runCompute } from "@/app/api/projects/[projectId]/compute/route";
import { POST as sweepLouver } from "@/app/api/projects/[projectId]/louvers/sweep/route";
import { POST as applyLouvers } from "@/app/api/projects/[projectId]/louvers/apply/route";
import { POST as optimiseLouversJob } from "@/app/api/projects/[projectId]/louvers/optimise/jobs/route";
import { POST as optimiseLouvers } from "@/app/api/projects/[projectId]/louvers/optimise/route";
import { PUT as saveLayout } from "@/app/api/projects/[projectId]/layout/route";
import { POST as restoreRevision } from "@/app/api/projects/[projectId]/revisions/[number]/restore/route";
import { PATCH as patchProject } from "@/app/api/projects/[projectId]/route";
import { PUT as updateScenario } from "@/app/api/projects/[projectId]/scenarios/[scenarioId]/route";
import { POST as createScenario } from "@/app/api/projects/[projectId]/scenarios/route";
import { PUT as assignSeat } from "@/app/api/projects/[projectId]/seats/[seatId]/route";
import { POST as uploadUnderlay } from "@/app/api/projects/[projectId]/underlay/route";
import { POST as createProject } from "@/app/api/projects/route";
import {
  auditLog, computeResults, invitations, layoutRevisions, memberships, organisations, panelProducts, passwordResets, projects, scenarios, seats, sessions, uploads, users,
} from "@/db/schema";
import { CATALOGUE_COLUMNS } from "@/lib/catalogue/schema";
import { demoLayout } from "@/lib/demo/layout";
import { emptyLayout } from "@/lib/layout/schema";
import { WINTER_DESIGN } from "@/lib/scenarios/schema";
import { call, createMember, fieldPaths, imageForm, invite, organisationWithEveryRole, PASSWORD, pngBytes, uniqueEmail, type RouteHandler } from "../support/api";
import { closeDatabase, countAll, useTemporaryUploadDir } from "../support/db";
import { ROUTE_ACTIONS } from "../support/routes";

const TABLES = { users, organisations, memberships, sessions, invitations, passwordResets, projects, layoutRevisions, seats, scenarios, computeResults, uploads, panelProducts, auditLog };
const long = (n: number) => "x".repeat(n);
const longEmail = `${"a".repeat(250)}@example.test`;

type Org = Awaited<ReturnType<typeof organisationWithEveryRole>>;
interface Fx {
  org: Org;
  projectId: string;
  membershipId: string;
  inviteToken: string;
  scenarioId: string;
}
let fx: Fx;

beforeAll(async () => {
  const org = await organisationWithEveryRole("bad-input");
  const project = await call<{ id: string }>(createProject, "POST", { token: org.designer.token, body: { name: "Validation hall" } });
  expect(project.status).toBe(201);
  const saved = await call(saveLayout, "PUT", { token: org.designer.token, params: { projectId: project.body.id }, body: { baseRevision: 1, message: "plan", layout: demoLayout() } });
  expect(saved.status).toBe(201);
  const member = await createMember(org.admin, "occupant");
  const invitation = await invite(org.admin, "designer");
  const scenario = await call<{ id: string }>(createScenario, "POST", { token: org.designer.token, params: { projectId: project.body.id }, body: WINTER_DESIGN });
  expect(scenario.status).toBe(201);
  fx = { org, projectId: project.body.id, membershipId: member.membershipId, inviteToken: invitation.token, scenarioId: scenario.body.id };
}, 60_000);

let removeUploads: () => void = () => {};
beforeAll(() => {
  removeUploads = useTemporaryUploadDir();
});

afterAll(async () => {
  removeUploads();
  await closeDatabase();
});

interface BadCase {
  name: string;
  body: unknown;
  fields: string[];
  /** Route params for this case when they differ from the route's usual ones. */
  params?: Record<string, string>;
}

interface BodyRoute {
  handler: RouteHandler;
  method: string;
  token?: (fx: Fx) => string;
  params?: (fx: Fx) => Record<string, string>;
  cases: (fx: Fx) => BadCase[];
}

/** "route METHOD" → bad bodies and the fields each must name. Every POST/PUT/PATCH needs a row. */
const BODY_ROUTES: Record<string, BodyRoute> = {
  "auth/sign-up POST": {
    handler: signUp,
    method: "POST",
    cases: () => {
      const valid = { name: "Rosa Lind", email: uniqueEmail("bad-signup"), password: PASSWORD, organisationName: "Lind Engineering" };
      return [
        { name: "missing fields", body: {}, fields: ["email", "name", "organisationName", "password"] },
        { name: "wrong types", body: { name: 5, email: true, password: 123, organisationName: null }, fields: ["email", "name", "organisationName", "password"] },
        { name: "over-long strings", body: { name: long(121), email: longEmail, password: long(129), organisationName: long(121) }, fields: ["email", "name", "organisationName", "password"] },
        { name: "too short / blank", body: { ...valid, name: "   ", password: "short", organisationName: "x" }, fields: ["name", "organisationName", "password"] },
        { name: "unknown fields", body: { ...valid, role: "admin", organisationId: "x" }, fields: ["organisationId", "role"] },
        { name: "not an e-mail", body: { ...valid, email: "rosa at example" }, fields: ["email"] },
      ];
    },
  },
  "auth/sign-in POST": {
    handler: signIn,
    method: "POST",
    cases: (fx) => [
      { name: "missing fields", body: {}, fields: ["email", "password"] },
      { name: "wrong types", body: { email: ["a@b.test"], password: 42 }, fields: ["email", "password"] },
      { name: "over-long strings", body: { email: longEmail, password: long(129) }, fields: ["email", "password"] },
      { name: "unknown fields", body: { email: fx.org.admin.email, password: PASSWORD, remember: true }, fields: ["remember"] },
    ],
  },
  "auth/password-reset/request POST": {
    handler: requestReset,
    method: "POST",
    cases: (fx) => [
      { name: "missing fields", body: {}, fields: ["email"] },
      { name: "wrong types", body: { email: 7 }, fields: ["email"] },
      { name: "over-long strings", body: { email: longEmail }, fields: ["email"] },
      { name: "unknown fields", body: { email: fx.org.admin.email, redirect: "https://elsewhere.example" }, fields: ["redirect"] },
    ],
  },
  "auth/password-reset/confirm POST": {
    handler: confirmReset,
    method: "POST",
    cases: () => [
      { name: "missing fields", body: {}, fields: ["password", "token"] },
      { name: "wrong types", body: { token: 1234567890123, password: false }, fields: ["password", "token"] },
      { name: "over-long strings", body: { token: long(101), password: long(129) }, fields: ["password", "token"] },
      { name: "unknown fields", body: { token: long(32), password: PASSWORD, userId: "x" }, fields: ["userId"] },
    ],
  },
  "invitations/accept POST": {
    handler: acceptInvitation,
    method: "POST",
    cases: (fx) => [
      { name: "missing fields", body: {}, fields: ["name", "password", "token"] },
      { name: "wrong types", body: { token: {}, name: [], password: 1 }, fields: ["name", "password", "token"] },
      { name: "over-long strings", body: { token: long(101), name: long(121), password: long(129) }, fields: ["name", "password", "token"] },
      { name: "unknown fields", body: { token: fx.inviteToken, name: "Jo", password: PASSWORD, role: "admin" }, fields: ["role"] },
    ],
  },
  "members/invitations POST": {
    handler: createInvitation,
    method: "POST",
    token: (fx) => fx.org.admin.token,
    cases: () => [
      { name: "missing fields", body: {}, fields: ["email", "role"] },
      { name: "wrong types", body: { email: 1, role: 2 }, fields: ["email", "role"] },
      { name: "over-long strings", body: { email: longEmail, role: "designer" }, fields: ["email"] },
      { name: "not a role", body: { email: uniqueEmail("x"), role: "owner" }, fields: ["role"] },
      { name: "unknown fields", body: { email: uniqueEmail("x"), role: "designer", organisationId: "other" }, fields: ["organisationId"] },
    ],
  },
  "members/[membershipId] PATCH": {
    handler: changeRole,
    method: "PATCH",
    token: (fx) => fx.org.admin.token,
    params: (fx) => ({ membershipId: fx.membershipId }),
    cases: () => [
      { name: "missing fields", body: {}, fields: ["role"] },
      { name: "wrong types", body: { role: ["admin"] }, fields: ["role"] },
      { name: "over-long strings", body: { role: long(300) }, fields: ["role"] },
      { name: "unknown fields", body: { role: "designer", userId: "x" }, fields: ["userId"] },
      { name: "a bad id in the path", body: { role: "designer" }, params: { membershipId: "12" }, fields: ["params.membershipId"] },
    ],
  },
  "louvers/cavity-table POST": {
    handler: requestCavityTable,
    method: "POST",
    token: (fx) => fx.org.designer.token,
    cases: () => [
      { name: "missing fields", body: {}, fields: ["finish", "wallEmissivity"] },
      { name: "wrong types", body: { wallEmissivity: "0.9", finish: 1, stepDeg: "5" }, fields: ["finish", "stepDeg", "wallEmissivity"] },
      { name: "over-long strings", body: { wallEmissivity: 0.9, finish: long(300) }, fields: ["finish"] },
      { name: "unknown fields", body: { wallEmissivity: 0.9, finish: "diffuse", solver: "montecarlo" }, fields: ["solver"] },
      { name: "out of range", body: { wallEmissivity: 0, finish: "specular", stepDeg: 0.1 }, fields: ["stepDeg", "wallEmissivity"] },
    ],
  },
  "me/settings PATCH": {
    handler: patchSettings,
    method: "PATCH",
    token: (fx) => fx.org.occupant.token,
    cases: () => [
      { name: "missing fields", body: {}, fields: ["unitSystem"] },
      { name: "wrong types", body: { unitSystem: 1 }, fields: ["unitSystem"] },
      { name: "over-long strings", body: { unitSystem: long(300) }, fields: ["unitSystem"] },
      { name: "unknown fields", body: { unitSystem: "ip", name: "New name" }, fields: ["name"] },
    ],
  },
  "projects POST": {
    handler: createProject,
    method: "POST",
    token: (fx) => fx.org.designer.token,
    cases: () => [
      { name: "missing fields", body: {}, fields: ["name"] },
      { name: "wrong types", body: { name: 12, description: { text: "x" } }, fields: ["description", "name"] },
      { name: "over-long strings", body: { name: long(121), description: long(2001) }, fields: ["description", "name"] },
      { name: "unknown fields", body: { name: "Depot", organisationId: "other", headRevision: 9 }, fields: ["headRevision", "organisationId"] },
    ],
  },
  "projects/[projectId] PATCH": {
    handler: patchProject,
    method: "PATCH",
    token: (fx) => fx.org.designer.token,
    params: (fx) => ({ projectId: fx.projectId }),
    cases: (fx) => [
      { name: "missing body", body: undefined, fields: ["(root)"] },
      { name: "wrong types", body: { name: false, description: 3 }, fields: ["description", "name"] },
      { name: "over-long strings", body: { name: long(121), description: long(2001) }, fields: ["description", "name"] },
      { name: "unknown fields", body: { name: "Renamed", headRevision: 9 }, fields: ["headRevision"] },
      { name: "a bad id in the path", body: { name: "Renamed" }, params: { projectId: "not-a-uuid" }, fields: ["params.projectId"] },
      { name: "a blank name", body: { name: "  " }, params: { projectId: fx.projectId }, fields: ["name"] },
    ],
  },
  "projects/[projectId]/layout PUT": {
    handler: saveLayout,
    method: "PUT",
    token: (fx) => fx.org.designer.token,
    params: (fx) => ({ projectId: fx.projectId }),
    cases: () => {
      const demo = demoLayout();
      return [
        { name: "missing fields", body: {}, fields: ["baseRevision", "layout", "message"] },
        { name: "wrong types", body: { baseRevision: "1", message: 5, layout: "rooms" }, fields: ["baseRevision", "layout", "message"] },
        { name: "over-long strings", body: { baseRevision: 1, message: long(201), layout: emptyLayout() }, fields: ["message"] },
        { name: "unknown fields", body: { baseRevision: 1, message: "m", layout: emptyLayout(), force: true }, fields: ["force"] },
        {
          name: "bad fields deep in the layout",
          body: {
            baseRevision: 1,
            message: "m",
            layout: {
              ...demo,
              seats: [{ ...demo.seats[0]!, label: long(81), clo: "warm" }, ...demo.seats.slice(1)],
              panels: [{ ...demo.panels[0]!, colour: "red" }, ...demo.panels.slice(1)],
              schemaVersion: 2,
            },
          },
          fields: ["layout.panels.0.colour", "layout.schemaVersion", "layout.seats.0.clo", "layout.seats.0.label"],
        },
        { name: "a negative base revision", body: { baseRevision: -1, message: "m", layout: emptyLayout() }, fields: ["baseRevision"] },
      ];
    },
  },
  "projects/[projectId]/revisions/[number]/restore POST": {
    handler: restoreRevision,
    method: "POST",
    token: (fx) => fx.org.designer.token,
    params: (fx) => ({ projectId: fx.projectId, number: "1" }),
    cases: (fx) => [
      { name: "missing fields", body: {}, fields: ["baseRevision"] },
      { name: "wrong types", body: { baseRevision: 1.5, message: 3 }, fields: ["baseRevision", "message"] },
      { name: "over-long strings", body: { baseRevision: 1, message: long(201) }, fields: ["message"] },
      { name: "unknown fields", body: { baseRevision: 1, layout: emptyLayout() }, fields: ["layout"] },
      { name: "a bad revision number in the path", body: { baseRevision: 1 }, params: { projectId: fx.projectId, number: "zero" }, fields: ["params.number"] },
    ],
  },
  "projects/[projectId]/scenarios POST": {
    handler: createScenario,
    method: "POST",
    token: (fx) => fx.org.designer.token,
    params: (fx) => ({ projectId: fx.projectId }),
    cases: (fx) => scenarioCases(fx, `Winter ${crypto.randomUUID().slice(0, 6)}`),
  },
  "projects/[projectId]/scenarios/[scenarioId] PUT": {
    handler: updateScenario,
    method: "PUT",
    token: (fx) => fx.org.designer.token,
    params: (fx) => ({ projectId: fx.projectId, scenarioId: fx.scenarioId }),
    cases: (fx) => [
      ...scenarioCases(fx, WINTER_DESIGN.name),
      { name: "a bad scenario id in the path", body: WINTER_DESIGN, params: { projectId: fx.projectId, scenarioId: "nope" }, fields: ["params.scenarioId"] },
    ],
  },
  "projects/[projectId]/seats/[seatId] PUT": {
    handler: assignSeat,
    method: "PUT",
    token: (fx) => fx.org.facility_manager.token,
    params: (fx) => ({ projectId: fx.projectId, seatId: "seat-oo-2" }),
    cases: (fx) => [
      { name: "missing fields", body: {}, fields: ["occupantUserId"] },
      { name: "wrong types", body: { occupantUserId: 17 }, fields: ["occupantUserId"] },
      { name: "over-long strings", body: { occupantUserId: long(37) }, fields: ["occupantUserId"] },
      { name: "unknown fields", body: { occupantUserId: null, label: "Renamed" }, fields: ["label"] },
      { name: "someone who is not a member", body: { occupantUserId: crypto.randomUUID() }, fields: ["occupantUserId"] },
      { name: "a bad seat id in the path", body: { occupantUserId: null }, params: { projectId: fx.projectId, seatId: "seat 2/.." }, fields: ["params.seatId"] },
    ],
  },
  "projects/[projectId]/compute POST": {
    handler: runCompute,
    method: "POST",
    token: (fx) => fx.org.facility_manager.token,
    params: (fx) => ({ projectId: fx.projectId }),
    cases: (fx) => [
      { name: "missing fields", body: {}, fields: ["scenarioId"] },
      { name: "wrong types", body: { scenarioId: 5, revision: "1" }, fields: ["revision", "scenarioId"] },
      { name: "over-long strings", body: { scenarioId: long(300) }, fields: ["scenarioId"] },
      { name: "unknown fields", body: { scenarioId: fx.scenarioId, force: true }, fields: ["force"] },
      { name: "revision 0", body: { scenarioId: fx.scenarioId, revision: 0 }, fields: ["revision"] },
    ],
  },
  "projects/[projectId]/louvers/optimise POST": {
    handler: optimiseLouvers,
    method: "POST",
    token: (fx) => fx.org.facility_manager.token,
    params: (fx) => ({ projectId: fx.projectId }),
    cases: (fx) => [
      { name: "missing fields", body: {}, fields: ["scenarioId"] },
      { name: "wrong types", body: { scenarioId: 5 }, fields: ["scenarioId"] },
      { name: "over-long strings", body: { scenarioId: long(300) }, fields: ["scenarioId"] },
      { name: "unknown fields", body: { scenarioId: fx.scenarioId, method: "heuristic" }, fields: ["method"] },
      { name: "a bad id in the path", body: { scenarioId: fx.scenarioId }, params: { projectId: "12" }, fields: ["params.projectId"] },
    ],
  },
  "projects/[projectId]/louvers/optimise/jobs POST": {
    handler: optimiseLouversJob,
    method: "POST",
    token: (fx) => fx.org.designer.token,
    params: (fx) => ({ projectId: fx.projectId }),
    cases: (fx) => [
      { name: "missing fields", body: {}, fields: ["scenarioId"] },
      { name: "wrong types", body: { scenarioId: [fx.scenarioId] }, fields: ["scenarioId"] },
      { name: "over-long strings", body: { scenarioId: long(300) }, fields: ["scenarioId"] },
      { name: "unknown fields", body: { scenarioId: fx.scenarioId, seats: ["seat-oo-1"] }, fields: ["seats"] },
    ],
  },
  "projects/[projectId]/louvers/apply POST": {
    handler: applyLouvers,
    method: "POST",
    token: (fx) => fx.org.designer.token,
    params: (fx) => ({ projectId: fx.projectId }),
    cases: () => [
      { name: "missing fields", body: {}, fields: ["baseRevision", "panels"] },
      { name: "wrong types", body: { baseRevision: "2", panels: { id: "panel-oo-1" }, message: 5 }, fields: ["baseRevision", "message", "panels"] },
      { name: "over-long strings", body: { baseRevision: 2, panels: [{ id: long(300), openingAngleDeg: 90 }], message: long(300) }, fields: ["message", "panels.0.id"] },
      { name: "unknown fields", body: { baseRevision: 2, panels: [{ id: "panel-oo-1", openingAngleDeg: 90, axisDeg: 0 }], force: true }, fields: ["force", "panels.0.axisDeg"] },
      { name: "out of range", body: { baseRevision: 0, panels: [{ id: "panel-oo-1", openingAngleDeg: 181 }, { id: "panel-oo-2", openingAngleDeg: -1 }] }, fields: ["baseRevision", "panels.0.openingAngleDeg", "panels.1.openingAngleDeg"] },
      { name: "a panel listed twice", body: { baseRevision: 2, panels: [{ id: "panel-oo-1", openingAngleDeg: 90 }, { id: "panel-oo-1", openingAngleDeg: 60 }] }, fields: ["panels.1.id"] },
      { name: "no panels", body: { baseRevision: 2, panels: [] }, fields: ["panels"] },
    ],
  },
  "projects/[projectId]/louvers/sweep POST": {
    handler: sweepLouver,
    method: "POST",
    token: (fx) => fx.org.facility_manager.token,
    params: (fx) => ({ projectId: fx.projectId }),
    cases: (fx) => [
      { name: "missing fields", body: {}, fields: ["panelId", "scenarioId"] },
      { name: "wrong types", body: { scenarioId: 5, panelId: 7, anglesDeg: "90", revision: "1" }, fields: ["anglesDeg", "panelId", "revision", "scenarioId"] },
      { name: "over-long strings", body: { scenarioId: fx.scenarioId, panelId: long(300) }, fields: ["panelId"] },
      { name: "unknown fields", body: { scenarioId: fx.scenarioId, panelId: "panel-oo-1", stepDeg: 5 }, fields: ["stepDeg"] },
      { name: "angles out of range", body: { scenarioId: fx.scenarioId, panelId: "panel-oo-1", anglesDeg: [90, 200, -1] }, fields: ["anglesDeg.1", "anglesDeg.2"] },
      { name: "an angle outside the louver's range", body: { scenarioId: fx.scenarioId, panelId: "panel-oo-1", anglesDeg: [90, 10] }, fields: ["anglesDeg.1"] },
      { name: "a panel without louver", body: { scenarioId: fx.scenarioId, panelId: "panel-mt-1" }, fields: ["panelId"] },
      { name: "a panel that does not exist", body: { scenarioId: fx.scenarioId, panelId: "panel-nowhere" }, fields: ["panelId"] },
    ],
  },
};

function scenarioCases(_fx: Fx, name: string): BadCase[] {
  const conditions = WINTER_DESIGN.conditions;
  const { surfaces: _surfaces, ...withoutSurfaces } = conditions;
  return [
    { name: "missing fields", body: {}, fields: ["conditions", "name"] },
    { name: "wrong types", body: { name: 1, conditions: "warm" }, fields: ["conditions", "name"] },
    { name: "over-long strings", body: { name: long(81), conditions }, fields: ["name"] },
    { name: "unknown fields", body: { name, conditions, colour: "blue" }, fields: ["colour"] },
    {
      name: "bad conditions",
      body: { name, conditions: { ...conditions, airTemperatureC: 100, activeModes: ["heating", "heating"], windChill: 3 } },
      fields: ["conditions.activeModes", "conditions.airTemperatureC", "conditions.windChill"],
    },
    { name: "a missing nested object", body: { name, conditions: withoutSurfaces }, fields: ["conditions.surfaces"] },
  ];
}

/** Routes that take no body at all (anything sent is ignored). */
const BODILESS = ["auth/sign-out POST"];
/** Routes that take a multipart upload instead of JSON (tested below). */
const MULTIPART = ["projects/[projectId]/underlay POST"];
/** Routes that take a CSV file, raw or as a multipart field (tested below; rows in tests/integration/catalogue.test.ts). */
const CSV_UPLOADS = ["catalogue/import POST"];

test("every POST/PUT/PATCH route has bad-input cases (or is known to take no body)", () => {
  const writes = Object.entries(ROUTE_ACTIONS).flatMap(([route, methods]) =>
    Object.keys(methods).filter((m) => m === "POST" || m === "PUT" || m === "PATCH").map((m) => `${route} ${m}`),
  );
  expect(writes.length).toBeGreaterThan(5);
  expect([...Object.keys(BODY_ROUTES), ...BODILESS, ...MULTIPART, ...CSV_UPLOADS].sort()).toEqual(writes.sort());
});

describe.each(Object.entries(BODY_ROUTES).map(([key, route]) => ({ key, route })))("$key", ({ route }) => {
  async function send(body: unknown, params: Record<string, string> | undefined, rawBody?: string) {
    return call(route.handler, route.method, {
      token: route.token?.(fx),
      params: params ?? route.params?.(fx),
      ...(rawBody !== undefined ? { rawBody } : { body }),
    });
  }

  test("each bad body is 400 naming exactly the bad fields, and nothing is written", async () => {
    const cases = route.cases(fx);
    expect(cases.length).toBeGreaterThanOrEqual(4);
    for (const c of cases) {
      const before = await countAll(TABLES);
      const reply = await send(c.body, c.params);
      expect(reply.status, `${c.name}: ${JSON.stringify(reply.body)}`).toBe(400);
      expect(reply.body.error).toBe("invalid_input");
      expect(fieldPaths(reply.body), c.name).toEqual([...c.fields].sort());
      for (const field of reply.body.fields as { message: string }[]) expect(field.message.length).toBeGreaterThan(0);
      expect(reply.token).toBeUndefined();
      expect(await countAll(TABLES), c.name).toEqual(before);
    }
  });

  test("invalid JSON is 400 at (body), and nothing is written", async () => {
    for (const raw of ["{", "{'name': 'x'}", "not json", '{"a":1}}']) {
      const before = await countAll(TABLES);
      const reply = await send(undefined, undefined, raw);
      expect(reply.status, raw).toBe(400);
      expect(fieldPaths(reply.body)).toEqual(["(body)"]);
      expect(await countAll(TABLES)).toEqual(before);
    }
  });

  test("an empty body is 400", async () => {
    const reply = await send(undefined, undefined, "");
    expect(reply.status).toBe(400);
    expect(fieldPaths(reply.body)).toEqual(["(root)"]);
  });
});

describe("projects/[projectId]/underlay POST", () => {
  test.each([
    { name: "JSON instead of a form", options: { body: { file: "plan.png" } }, status: 400 },
    { name: "a form without the file field", options: { formData: imageForm(pngBytes(), "image") }, status: 400 },
    { name: "a file that is not an image", options: { formData: imageForm(new Uint8Array(new TextEncoder().encode("hello, not a png")), "file", "image/png") }, status: 415 },
    { name: "a PNG signature with a broken header", options: { formData: imageForm(pngBytes().slice(0, 20)) }, status: 415 },
  ])("$name is $status naming file, and nothing is written", async ({ options, status }) => {
    const before = await countAll(TABLES);
    const reply = await call(uploadUnderlay, "POST", { token: fx.org.designer.token, params: { projectId: fx.projectId }, ...options });
    expect(reply.status, JSON.stringify(reply.body)).toBe(status);
    expect(fieldPaths(reply.body)).toEqual(["file"]);
    expect(await countAll(TABLES)).toEqual(before);
  });

  test("a real PNG header is accepted with its pixel size", async () => {
    const reply = await call(uploadUnderlay, "POST", { token: fx.org.designer.token, params: { projectId: fx.projectId }, formData: imageForm(pngBytes(640, 480)) });
    expect(reply.status).toBe(201);
    expect(reply.body).toMatchObject({ widthPx: 640, heightPx: 480, contentType: "image/png" });
  });
});

describe("catalogue/import POST", () => {
  const header = CATALOGUE_COLUMNS.join(",");
  const csvForm = (content: string | Uint8Array<ArrayBuffer>, field = "file") => {
    const form = new FormData();
    form.set(field, new Blob([content], { type: "text/csv" }), "catalogue.csv");
    return form;
  };
  test.each([
    { name: "JSON instead of CSV", options: { body: { products: [] } }, status: 415, fields: ["file"] },
    { name: "a form without the file field", options: { formData: csvForm(`${header}\nA,1,1,5,1.1,0.9,,,,\n`, "csv") }, status: 400, fields: ["file"] },
    // "name" then a byte that starts no UTF-8 sequence (Latin-1 ÿ).
    { name: "a file that is not UTF-8", options: { formData: csvForm(new Uint8Array([0x6e, 0x61, 0x6d, 0x65, 0xff, 0x0a])) }, status: 400, fields: ["line 1 · (file)"] },
    {
      name: "a bad row next to a good one",
      options: { formData: csvForm(`${header}\nGood,1,1,5,1.1,0.9,,,,\nBad,1,1,5,1.1,7,,,,\n`) },
      status: 400,
      fields: ["line 3 · emissivity"],
    },
    { name: "an unknown column", options: { rawBody: `${header},colour\nA,1,1,5,1.1,0.9,,,,,red\n`, headers: { "content-type": "text/csv" } }, status: 400, fields: ["line 1 · colour"] },
  ])("$name is $status naming $fields, and nothing is written", async ({ options, status, fields }) => {
    const before = await countAll(TABLES);
    const reply = await call(importCatalogue, "POST", { token: fx.org.designer.token, ...options });
    expect(reply.status, JSON.stringify(reply.body)).toBe(status);
    expect(fieldPaths(reply.body)).toEqual(fields);
    expect(await countAll(TABLES)).toEqual(before);
  });
});

describe("query strings", () => {
  test("GET layout with a bad ?revision is 400 at query.revision", async () => {
    const { GET } = await import("@/app/api/projects/[projectId]/layout/route");
    for (const revision of ["abc", "0", "1.5"]) {
      const reply = await call(GET, "GET", { token: fx.org.designer.token, path: `/api/x?revision=${revision}`, params: { projectId: fx.projectId } });
      expect(reply.status, revision).toBe(400);
      expect(fieldPaths(reply.body)).toEqual(["query.revision"]);
    }
    const unknown = await call(GET, "GET", { token: fx.org.designer.token, path: "/api/x?rev=1", params: { projectId: fx.projectId } });
    expect(unknown.status).toBe(400);
    expect(fieldPaths(unknown.body)).toEqual(["query.rev"]);
  });

  test.each([
    { route: "panels/performance", load: () => import("@/app/api/projects/[projectId]/panels/performance/route") },
    { route: "loads", load: () => import("@/app/api/projects/[projectId]/loads/route") },
    { route: "energy", load: () => import("@/app/api/projects/[projectId]/energy/route") },
  ])("GET $route with a bad query is 400 naming each bad field, and nothing is written", async ({ load }) => {
    const { GET } = await load();
    const cases: { query: string; fields: string[] }[] = [
      { query: "", fields: ["query.scenarioId"] },
      { query: "?scenarioId=winter", fields: ["query.scenarioId"] },
      { query: `?scenarioId=${fx.scenarioId}&revision=0`, fields: ["query.revision"] },
      { query: `?scenarioId=${fx.scenarioId}&revision=1.5`, fields: ["query.revision"] },
      { query: "?scenarioId=x&revision=abc", fields: ["query.revision", "query.scenarioId"] },
      { query: `?scenarioId=${fx.scenarioId}&angle=90`, fields: ["query.angle"] },
    ];
    for (const c of cases) {
      const before = await countAll(TABLES);
      const reply = await call(GET, "GET", { token: fx.org.designer.token, path: `/api/x${c.query}`, params: { projectId: fx.projectId } });
      expect(reply.status, c.query).toBe(400);
      expect(fieldPaths(reply.body), c.query).toEqual(c.fields);
      expect(await countAll(TABLES)).toEqual(before);
    }
  });
});

describe("oversized bodies", () => {
  test("a body over 2 MiB is 413 and nothing is written", async () => {
    const before = await countAll(TABLES);
    const reply = await call(createProject, "POST", { token: fx.org.designer.token, rawBody: JSON.stringify({ name: "Big", description: long(2.1 * 1024 * 1024) }) });
    expect(reply.status).toBe(413);
    expect(await countAll(TABLES)).toEqual(before);
  });
});
