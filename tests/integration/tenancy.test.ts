/**
 * Tenant isolation: a member of organisation A, even its admin, gets 404 — never data, never a
 * change — for organisation B's projects, layouts, revisions, members and invitations.
 */
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { DELETE as removeMember, PATCH as changeRole } from "@/app/api/members/[membershipId]/route";
import { DELETE as revokeInvitation } from "@/app/api/members/invitations/[invitationId]/route";
import { GET as listMembers } from "@/app/api/members/route";
import { POST as runCompute } from "@/app/api/projects/[projectId]/compute/route";
import { GET as getLayout, PUT as saveLayout } from "@/app/api/projects/[projectId]/layout/route";
import { POST as restoreRevision } from "@/app/api/projects/[projectId]/revisions/[number]/restore/route";
import { GET as listRevisions } from "@/app/api/projects/[projectId]/revisions/route";
import { PUT as updateScenario } from "@/app/api/projects/[projectId]/scenarios/[scenarioId]/route";
import { GET as listScenarios, POST as createScenario } from "@/app/api/projects/[projectId]/scenarios/route";
import { PUT as assignSeat } from "@/app/api/projects/[projectId]/seats/[seatId]/route";
import { GET as listSeats } from "@/app/api/projects/[projectId]/seats/route";
import { GET as getUnderlay } from "@/app/api/projects/[projectId]/underlay/[imageId]/route";
import { POST as uploadUnderlay } from "@/app/api/projects/[projectId]/underlay/route";
import { GET as getProject, PATCH as patchProject } from "@/app/api/projects/[projectId]/route";
import { GET as listProjects, POST as createProject } from "@/app/api/projects/route";
import { computeResults, invitations, layoutRevisions, memberships, projects, scenarios, seats, uploads } from "@/db/schema";
import { demoLayout } from "@/lib/demo/layout";
import { emptyLayout } from "@/lib/layout/schema";
import { SUMMER_DESIGN, WINTER_DESIGN } from "@/lib/scenarios/schema";
import { call, createMember, imageForm, invite, organisationWithEveryRole, type CallOptions, type RouteHandler } from "../support/api";
import { closeDatabase, countRows, getDb, useTemporaryUploadDir } from "../support/db";

type Org = Awaited<ReturnType<typeof organisationWithEveryRole>>;
let a: Org;
let b: Org;
let bProject: { id: string; name: string; description: string };
let bMembershipId: string;
let bInvitation: { id: string; email: string };
let bScenarioId: string;
let bImageId: string;
let aProjectId: string;
let removeUploads: () => void = () => {};

beforeAll(async () => {
  removeUploads = useTemporaryUploadDir();
  [a, b] = await Promise.all([organisationWithEveryRole("tenant-a"), organisationWithEveryRole("tenant-b")]);
  const name = `B secret plant room ${crypto.randomUUID().slice(0, 6)}`;
  const created = await call<{ id: string }>(createProject, "POST", { token: b.admin.token, body: { name, description: "B's confidential notes" } });
  expect(created.status).toBe(201);
  const saved = await call(saveLayout, "PUT", {
    token: b.designer.token,
    params: { projectId: created.body.id },
    body: { baseRevision: 1, message: "B's plan", layout: demoLayout() },
  });
  expect(saved.status).toBe(201);
  bProject = { id: created.body.id, name, description: "B's confidential notes" };
  bMembershipId = (await createMember(b.admin, "designer")).membershipId;
  bInvitation = await invite(b.admin, "occupant");
  const scenario = await call<{ id: string }>(createScenario, "POST", {
    token: b.designer.token,
    params: { projectId: bProject.id },
    body: { ...WINTER_DESIGN, name: "B's secret winter" },
  });
  expect(scenario.status).toBe(201);
  bScenarioId = scenario.body.id;
  const image = await call<{ imageId: string }>(uploadUnderlay, "POST", { token: b.designer.token, params: { projectId: bProject.id }, formData: imageForm() });
  expect(image.status).toBe(201);
  bImageId = image.body.imageId;
  const seated = await call(assignSeat, "PUT", {
    token: b.facility_manager.token,
    params: { projectId: bProject.id, seatId: "seat-oo-1" },
    body: { occupantUserId: b.occupant.userId },
  });
  expect(seated.status).toBe(200);
  // A has a project of its own, so "empty because A has nothing" cannot pass for isolation.
  const own = await call<{ id: string }>(createProject, "POST", { token: a.admin.token, body: { name: "A's own project" } });
  expect(own.status).toBe(201);
  aProjectId = own.body.id;
}, 60_000);

afterAll(async () => {
  removeUploads();
  await closeDatabase();
});

async function snapshotOfB() {
  const db = getDb();
  const [project] = await db.select().from(projects).where(eq(projects.id, bProject.id));
  return {
    project: project && { name: project.name, description: project.description, headRevision: project.headRevision },
    revisions: await countRows(layoutRevisions, eq(layoutRevisions.projectId, bProject.id)),
    membership: (await db.select({ role: memberships.role }).from(memberships).where(eq(memberships.id, bMembershipId)))[0],
    invitation: await countRows(invitations, eq(invitations.id, bInvitation.id)),
    scenarios: await db.select({ id: scenarios.id, name: scenarios.name, version: scenarios.version }).from(scenarios).where(eq(scenarios.projectId, bProject.id)),
    results: await countRows(computeResults, eq(computeResults.projectId, bProject.id)),
    aScenarios: await countRows(scenarios, eq(scenarios.projectId, aProjectId)),
    uploads: await countRows(uploads, eq(uploads.projectId, bProject.id)),
    seats: await db.select({ seatId: seats.seatId, occupant: seats.occupantUserId }).from(seats).where(eq(seats.projectId, bProject.id)),
  };
}

/** Each case is tried by every role of A that may make the call at all (others get 403 before any lookup). */
type Caller = "admin" | "designer" | "facility_manager";
const READERS: Caller[] = ["admin", "designer", "facility_manager"];
const PLANNERS: Caller[] = ["admin", "designer"];
const ADMINS: Caller[] = ["admin"];

const cases: { name: string; handler: RouteHandler; method: string; callers: Caller[]; options: () => CallOptions }[] = [
  { name: "GET project", handler: getProject, callers: READERS, method: "GET", options: () => ({ params: { projectId: bProject.id } }) },
  { name: "PATCH project", handler: patchProject, callers: PLANNERS, method: "PATCH", options: () => ({ params: { projectId: bProject.id }, body: { name: "Taken over" } }) },
  { name: "GET layout", handler: getLayout, callers: READERS, method: "GET", options: () => ({ params: { projectId: bProject.id } }) },
  { name: "GET layout ?revision=1", handler: getLayout, callers: READERS, method: "GET", options: () => ({ path: "/api/x?revision=1", params: { projectId: bProject.id } }) },
  {
    name: "PUT layout",
    callers: PLANNERS,
    handler: saveLayout,
    method: "PUT",
    options: () => ({ params: { projectId: bProject.id }, body: { baseRevision: 2, message: "overwrite", layout: emptyLayout() } }),
  },
  { name: "GET revisions", handler: listRevisions, callers: READERS, method: "GET", options: () => ({ params: { projectId: bProject.id } }) },
  { name: "POST restore", handler: restoreRevision, callers: PLANNERS, method: "POST", options: () => ({ params: { projectId: bProject.id, number: "1" }, body: { baseRevision: 2 } }) },
  { name: "GET scenarios", handler: listScenarios, callers: READERS, method: "GET", options: () => ({ params: { projectId: bProject.id } }) },
  {
    name: "POST scenario",
    handler: createScenario,
    callers: PLANNERS,
    method: "POST",
    options: () => ({ params: { projectId: bProject.id }, body: SUMMER_DESIGN }),
  },
  {
    name: "PUT scenario",
    handler: updateScenario,
    callers: PLANNERS,
    method: "PUT",
    options: () => ({ params: { projectId: bProject.id, scenarioId: bScenarioId }, body: SUMMER_DESIGN }),
  },
  {
    name: "PUT B's scenario under A's project",
    handler: updateScenario,
    callers: PLANNERS,
    method: "PUT",
    options: () => ({ params: { projectId: aProjectId, scenarioId: bScenarioId }, body: SUMMER_DESIGN }),
  },
  {
    name: "POST compute",
    handler: runCompute,
    callers: READERS,
    method: "POST",
    options: () => ({ params: { projectId: bProject.id }, body: { scenarioId: bScenarioId } }),
  },
  {
    name: "POST compute on A's project with B's scenario",
    handler: runCompute,
    callers: READERS,
    method: "POST",
    options: () => ({ params: { projectId: aProjectId }, body: { scenarioId: bScenarioId } }),
  },
  { name: "GET seats", handler: listSeats, callers: READERS, method: "GET", options: () => ({ params: { projectId: bProject.id } }) },
  {
    name: "PUT seat assignment",
    handler: assignSeat,
    callers: ["admin", "facility_manager"],
    method: "PUT",
    options: () => ({ params: { projectId: bProject.id, seatId: "seat-oo-1" }, body: { occupantUserId: null } }),
  },
  { name: "POST underlay", handler: uploadUnderlay, callers: PLANNERS, method: "POST", options: () => ({ params: { projectId: bProject.id }, formData: imageForm() }) },
  { name: "GET underlay", handler: getUnderlay, callers: READERS, method: "GET", options: () => ({ params: { projectId: bProject.id, imageId: bImageId } }) },
  {
    name: "GET B's underlay under A's project",
    handler: getUnderlay,
    callers: READERS,
    method: "GET",
    options: () => ({ params: { projectId: aProjectId, imageId: bImageId } }),
  },
  { name: "PATCH member", handler: changeRole, callers: ADMINS, method: "PATCH", options: () => ({ params: { membershipId: bMembershipId }, body: { role: "admin" } }) },
  { name: "DELETE member", handler: removeMember, callers: ADMINS, method: "DELETE", options: () => ({ params: { membershipId: bMembershipId } }) },
  { name: "DELETE invitation", handler: revokeInvitation, callers: ADMINS, method: "DELETE", options: () => ({ params: { invitationId: bInvitation.id } }) },
];

describe("a member of organisation A asking for organisation B's things", () => {
  test.each(cases)("$name → 404 with no data and no change", async ({ handler, method, callers, options }) => {
    const before = await snapshotOfB();
    for (const caller of callers) {
      const reply = await call(handler, method, { token: a[caller].token, ...options() });
      expect(reply.status, JSON.stringify(reply.body)).toBe(404);
      expect(reply.body.error).toBe("not_found");
      const text = JSON.stringify(reply.body);
      expect(text).not.toContain(bProject.name);
      expect(text).not.toContain(bProject.description);
      expect(text).not.toContain("seat-oo-1");
      expect(text).not.toContain(bInvitation.email);
      expect(text).not.toContain("B's secret winter");
    }
    expect(await snapshotOfB()).toEqual(before);
  });

  test("the same ids work for B's own admin (the 404s are not from bad ids)", async () => {
    expect((await call(getProject, "GET", { token: b.admin.token, params: { projectId: bProject.id } })).status).toBe(200);
    expect((await call(listRevisions, "GET", { token: b.facility_manager.token, params: { projectId: bProject.id } })).status).toBe(200);
    const members = await call<{ members: { membershipId: string }[]; invitations: { id: string }[] }>(listMembers, "GET", { token: b.admin.token });
    expect(members.body.members.map((m) => m.membershipId)).toContain(bMembershipId);
    expect(members.body.invitations.map((i) => i.id)).toContain(bInvitation.id);
  });

  test("lists show only A's own projects and members", async () => {
    const list = await call<{ projects: { id: string; name: string }[] }>(listProjects, "GET", { token: a.admin.token });
    expect(list.status).toBe(200);
    expect(list.body.projects.map((p) => p.name)).toEqual(["A's own project"]);
    const members = await call<{ members: { userId: string }[]; invitations: { id: string }[] }>(listMembers, "GET", { token: a.admin.token });
    const userIds = members.body.members.map((m) => m.userId);
    expect(userIds).toContain(a.admin.userId);
    expect(userIds).not.toContain(b.admin.userId);
    expect(members.body.invitations.map((i) => i.id)).not.toContain(bInvitation.id);
  });
});

describe("people of another organisation", () => {
  test("cannot be assigned to a seat (400 naming occupantUserId, nothing written)", async () => {
    const saved = await call(saveLayout, "PUT", {
      token: a.designer.token,
      params: { projectId: aProjectId },
      body: { baseRevision: 1, message: "plan", layout: demoLayout() },
    });
    expect(saved.status).toBe(201);
    const reply = await call(assignSeat, "PUT", {
      token: a.facility_manager.token,
      params: { projectId: aProjectId, seatId: "seat-oo-1" },
      body: { occupantUserId: b.occupant.userId },
    });
    expect(reply.status).toBe(400);
    expect(reply.body.fields).toEqual([{ path: "occupantUserId", message: expect.any(String) }]);
    const [row] = await getDb().select().from(seats).where(eq(seats.projectId, aProjectId)).limit(1);
    expect(row).toBeDefined();
    expect(await countRows(seats, eq(seats.occupantUserId, b.occupant.userId))).toBe(1);
  });
});

describe("PATCH /api/projects/[projectId]", () => {
  test("changes only the fields sent", async () => {
    const created = await call<{ id: string }>(createProject, "POST", { token: a.designer.token, body: { name: "Library wing", description: "Level 2 reading room" } });
    const projectId = created.body.id;
    const renamed = await call(patchProject, "PATCH", { token: a.designer.token, params: { projectId }, body: { name: "Library east wing" } });
    expect(renamed.status).toBe(200);
    expect(renamed.body).toMatchObject({ name: "Library east wing", description: "Level 2 reading room" });
    const described = await call(patchProject, "PATCH", { token: a.designer.token, params: { projectId }, body: { description: "Level 2 and 3" } });
    expect(described.body).toMatchObject({ name: "Library east wing", description: "Level 2 and 3" });
    const unchanged = await call(patchProject, "PATCH", { token: a.designer.token, params: { projectId }, body: {} });
    expect(unchanged.status).toBe(200);
    expect(unchanged.body).toMatchObject({ name: "Library east wing", description: "Level 2 and 3" });
  });
});
