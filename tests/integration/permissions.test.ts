/**
 * The permission matrix: every role (and no session) × every route handler in app/api. The
 * expected status comes from PERMISSIONS in lib/permissions.ts and the action each route
 * declares (tests/support/routes.ts): allowed → the route's success status, refused → 403
 * with nothing written, no session → 401 for every member route.
 */
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { POST as confirmReset } from "@/app/api/auth/password-reset/confirm/route";
import { POST as requestReset } from "@/app/api/auth/password-reset/request/route";
import { GET as getSession } from "@/app/api/auth/session/route";
import { POST as signIn } from "@/app/api/auth/sign-in/route";
import { POST as signOut } from "@/app/api/auth/sign-out/route";
import { POST as signUp } from "@/app/api/auth/sign-up/route";
import { POST as importCatalogue } from "@/app/api/catalogue/import/route";
import { DELETE as deleteProduct } from "@/app/api/catalogue/products/[productId]/route";
import { GET as listProducts } from "@/app/api/catalogue/products/route";
import { GET as health } from "@/app/api/health/route";
import { GET as describeInvitation } from "@/app/api/invitations/[token]/route";
import { POST as acceptInvitation } from "@/app/api/invitations/accept/route";
import { GET as getJob } from "@/app/api/jobs/[jobId]/route";
import { POST as requestCavityTable } from "@/app/api/louvers/cavity-table/route";
import { GET as mySeats } from "@/app/api/me/seats/route";
import { PATCH as patchSettings } from "@/app/api/me/settings/route";
import { DELETE as removeMember, PATCH as changeRole } from "@/app/api/members/[membershipId]/route";
import { DELETE as revokeInvitation } from "@/app/api/members/invitations/[invitationId]/route";
import { POST as createInvitation } from "@/app/api/members/invitations/route";
import { GET as listMembers } from "@/app/api/members/route";
import { POST as runCompute } from "@/app/api/projects/[projectId]/compute/route";
import { GET as getEnergy } from "@/app/api/projects/[projectId]/energy/route";
import { GET as getLoads } from "@/app/api/projects/[projectId]/loads/route";
import { POST as sweepLouver } from "@/app/api/projects/[projectId]/louvers/sweep/route";
import { POST as applyLouvers } from "@/app/api/projects/[projectId]/louvers/apply/route";
import { POST as optimiseLouversJob } from "@/app/api/projects/[projectId]/louvers/optimise/jobs/route";
import { POST as optimiseLouvers } from "@/app/api/projects/[projectId]/louvers/optimise/route";
import { GET as getPanelPerformance } from "@/app/api/projects/[projectId]/panels/performance/route";
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
import { auditLog } from "@/db/schema";
import { ROLES, type Role } from "@/lib/auth/roles";
import { CATALOGUE_COLUMNS } from "@/lib/catalogue/schema";
import { demoLayout } from "@/lib/demo/layout";
import { WINTER_DESIGN } from "@/lib/scenarios/schema";
import { can, PERMISSIONS } from "@/lib/permissions";
import { startJob } from "@/lib/jobs";
import { storeLouverTable } from "@/lib/louvers/cavity-table-cache";
import { buildLouverTable } from "@/lib/panels/louverTable";
import {
  call, createMember, imageForm, invite, organisationWithEveryRole, PASSWORD, signInAs, uniqueEmail,
  type Account, type CallOptions, type RouteHandler,
} from "../support/api";
import { closeDatabase, countRows, useTemporaryUploadDir } from "../support/db";
import { exportedMethods, ROUTE_ACTIONS, routeFilesOnDisk, routeKeys } from "../support/routes";

type Org = Awaited<ReturnType<typeof organisationWithEveryRole>>;
interface Fixture {
  org: Org;
  projectId: string;
  /** A scenario of the project, and a revision holding the demo plan to compute. */
  scenarioId: string;
  demoRevision: number;
  /** An uploaded underlay image of the project. */
  imageId: string;
}
/** Who calls: a role's member, or nobody. */
type Caller = Account | null;

interface RequestSpec {
  handler: RouteHandler;
  /** Status when the caller may do it (or for a public route, always). */
  ok: number;
  /** A valid request; fresh targets for destructive calls so every call has something to act on. */
  build: (fx: Fixture, caller: Caller) => Promise<CallOptions>;
}

async function headRevision(fx: Fixture): Promise<number> {
  const reply = await call<{ headRevision: number }>(getProject, "GET", { token: fx.org.admin.token, params: { projectId: fx.projectId } });
  expect(reply.status).toBe(200);
  return reply.body.headRevision;
}

/** A one-product catalogue file with a name no other call has used. */
function catalogueCsv(): string {
  return `${CATALOGUE_COLUMNS.join(",")}\nMatrix panel ${crypto.randomUUID()},0.6,1.2,5.2,1.1,0.93,,,,\n`;
}

/** A fresh product of the organisation (imported by its admin), for calls that delete one. */
async function importedProductId(fx: Fixture): Promise<string> {
  const reply = await call<{ products: { id: string }[] }>(importCatalogue, "POST", {
    token: fx.org.admin.token,
    rawBody: catalogueCsv(),
    headers: { "content-type": "text/csv" },
  });
  expect(reply.status, JSON.stringify(reply.body)).toBe(201);
  return reply.body.products[0]!.id;
}

/**
 * A performance/loads/energy request on the demo plan. The demo's louver cavity table is stored
 * first (a fraction of a second to build), so no row waits on the worker pool.
 */
let demoTableStored: Promise<void> | null = null;
async function performanceRequest(fx: Fixture): Promise<CallOptions> {
  demoTableStored ??= storeLouverTable(buildLouverTable({ finish: "diffuse", wallEmissivity: 0.9 }));
  await demoTableStored;
  return { params: { projectId: fx.projectId }, path: `/api/x?scenarioId=${fx.scenarioId}&revision=${fx.demoRevision}` };
}

const REQUESTS: Record<string, RequestSpec> = {
  "auth/password-reset/confirm POST": {
    handler: confirmReset,
    ok: 404,
    build: async () => ({ body: { token: "abcdefghijklmnopqrstuvwxyz234567", password: "a new passphrase" } }),
  },
  "auth/password-reset/request POST": { handler: requestReset, ok: 202, build: async () => ({ body: { email: uniqueEmail("nobody") } }) },
  "auth/session GET": { handler: getSession, ok: 200, build: async () => ({}) },
  "auth/sign-in POST": {
    handler: signIn,
    ok: 200,
    build: async (fx, caller) => ({ body: { email: (caller ?? fx.org.admin).email, password: PASSWORD } }),
  },
  "auth/sign-out POST": {
    handler: signOut,
    ok: 200,
    // A throwaway session, so the role's main session lives on.
    build: async (_fx, caller) => ({ token: caller ? await signInAs(caller) : null }),
  },
  "auth/sign-up POST": {
    handler: signUp,
    ok: 201,
    build: async () => ({ body: { name: "New Person", email: uniqueEmail("matrix-signup"), password: PASSWORD, organisationName: "Fresh Org" } }),
  },
  "catalogue/products GET": { handler: listProducts, ok: 200, build: async () => ({}) },
  "catalogue/import POST": {
    handler: importCatalogue,
    ok: 201,
    build: async () => ({ rawBody: catalogueCsv(), headers: { "content-type": "text/csv" } }),
  },
  "catalogue/products/[productId] DELETE": {
    handler: deleteProduct,
    ok: 204,
    build: async (fx) => ({ params: { productId: await importedProductId(fx) } }),
  },
  "health GET": { handler: health as RouteHandler, ok: 200, build: async () => ({}) },
  "invitations/[token] GET": {
    handler: describeInvitation,
    ok: 200,
    build: async (fx) => ({ params: { token: (await invite(fx.org.admin, "occupant")).token } }),
  },
  "invitations/accept POST": {
    handler: acceptInvitation,
    ok: 200,
    build: async (fx) => ({ body: { token: (await invite(fx.org.admin, "occupant")).token, name: "Joiner", password: PASSWORD } }),
  },
  "jobs/[jobId] GET": {
    handler: getJob,
    ok: 200,
    // A small job of the organisation: 200 whatever state it is in by the time it is read.
    build: async (fx) => ({
      params: { jobId: startJob(fx.org.admin, "groove.trace", { openingAngleDeg: 60, wallEmissivity: 0.5, reflection: "diffuse", rays: 1_000 }) },
    }),
  },
  "louvers/cavity-table POST": {
    handler: requestCavityTable,
    ok: 200,
    // A stored table is answered at once (200); the 202 job path is in tests/integration/jobs.test.ts.
    build: async () => {
      const body = { finish: "specular", wallEmissivity: 0.8, stepDeg: 5 } as const;
      await storeLouverTable(buildLouverTable(body));
      return { body };
    },
  },
  "me/seats GET": { handler: mySeats, ok: 200, build: async () => ({}) },
  "me/settings PATCH": { handler: patchSettings, ok: 200, build: async () => ({ body: { unitSystem: "si" } }) },
  "members/[membershipId] PATCH": {
    handler: changeRole,
    ok: 200,
    build: async (fx) => ({ params: { membershipId: (await createMember(fx.org.admin, "occupant")).membershipId }, body: { role: "designer" } }),
  },
  "members/[membershipId] DELETE": {
    handler: removeMember,
    ok: 204,
    build: async (fx) => ({ params: { membershipId: (await createMember(fx.org.admin, "occupant")).membershipId } }),
  },
  "members/invitations/[invitationId] DELETE": {
    handler: revokeInvitation,
    ok: 204,
    build: async (fx) => ({ params: { invitationId: (await invite(fx.org.admin, "designer")).id } }),
  },
  "members/invitations POST": { handler: createInvitation, ok: 201, build: async () => ({ body: { email: uniqueEmail("invitee"), role: "occupant" } }) },
  "members GET": { handler: listMembers, ok: 200, build: async () => ({}) },
  "projects/[projectId]/compute POST": {
    handler: runCompute,
    ok: 200,
    build: async (fx) => ({ params: { projectId: fx.projectId }, body: { scenarioId: fx.scenarioId, revision: fx.demoRevision } }),
  },
  "projects/[projectId]/panels/performance GET": {
    handler: getPanelPerformance,
    ok: 200,
    build: performanceRequest,
  },
  "projects/[projectId]/loads GET": {
    handler: getLoads,
    ok: 200,
    build: performanceRequest,
  },
  "projects/[projectId]/energy GET": {
    handler: getEnergy,
    ok: 200,
    build: performanceRequest,
  },
  "projects/[projectId]/louvers/sweep POST": {
    handler: sweepLouver,
    ok: 200,
    // Two angles of a louvered demo panel: the table is stored first, as for the reads above.
    build: async (fx) => {
      await performanceRequest(fx);
      return { params: { projectId: fx.projectId }, body: { scenarioId: fx.scenarioId, panelId: "panel-oo-1", anglesDeg: [60, 180], revision: fx.demoRevision } };
    },
  },
  "projects/[projectId]/louvers/optimise POST": {
    handler: optimiseLouvers,
    ok: 200,
    // The search runs in the worker pool; the demo's cavity table is stored first, as above.
    build: async (fx) => {
      await performanceRequest(fx);
      return { params: { projectId: fx.projectId }, body: { scenarioId: fx.scenarioId } };
    },
  },
  "projects/[projectId]/louvers/optimise/jobs POST": {
    handler: optimiseLouversJob,
    ok: 202,
    build: async (fx) => {
      await performanceRequest(fx);
      return { params: { projectId: fx.projectId }, body: { scenarioId: fx.scenarioId } };
    },
  },
  "projects/[projectId]/louvers/apply POST": {
    handler: applyLouvers,
    ok: 201,
    build: async (fx) => ({ params: { projectId: fx.projectId }, body: { baseRevision: await headRevision(fx), panels: [{ id: "panel-oo-1", openingAngleDeg: 90 }] } }),
  },
  "projects/[projectId]/scenarios GET": { handler: listScenarios, ok: 200, build: async (fx) => ({ params: { projectId: fx.projectId } }) },
  "projects/[projectId]/scenarios POST": {
    handler: createScenario,
    ok: 201,
    build: async (fx) => ({ params: { projectId: fx.projectId }, body: { ...WINTER_DESIGN, name: `Winter ${crypto.randomUUID().slice(0, 8)}` } }),
  },
  "projects/[projectId]/scenarios/[scenarioId] PUT": {
    handler: updateScenario,
    ok: 200,
    build: async (fx) => ({ params: { projectId: fx.projectId, scenarioId: fx.scenarioId }, body: WINTER_DESIGN }),
  },
  "projects/[projectId]/seats GET": { handler: listSeats, ok: 200, build: async (fx) => ({ params: { projectId: fx.projectId } }) },
  "projects/[projectId]/seats/[seatId] PUT": {
    handler: assignSeat,
    ok: 200,
    build: async (fx) => ({ params: { projectId: fx.projectId, seatId: "seat-oo-1" }, body: { occupantUserId: fx.org.occupant.userId } }),
  },
  "projects/[projectId]/underlay POST": { handler: uploadUnderlay, ok: 201, build: async (fx) => ({ params: { projectId: fx.projectId }, formData: imageForm() }) },
  "projects/[projectId]/underlay/[imageId] GET": {
    handler: getUnderlay,
    ok: 200,
    build: async (fx) => ({ params: { projectId: fx.projectId, imageId: fx.imageId } }),
  },
  "projects/[projectId]/layout GET": { handler: getLayout, ok: 200, build: async (fx) => ({ params: { projectId: fx.projectId } }) },
  "projects/[projectId]/layout PUT": {
    handler: saveLayout,
    ok: 201,
    build: async (fx) => ({
      params: { projectId: fx.projectId },
      // The demo plan again, so the seats other rows assign stay in the layout.
      body: { baseRevision: await headRevision(fx), message: "matrix save", layout: demoLayout() },
    }),
  },
  "projects/[projectId]/revisions/[number]/restore POST": {
    handler: restoreRevision,
    ok: 201,
    build: async (fx) => ({ params: { projectId: fx.projectId, number: String(fx.demoRevision) }, body: { baseRevision: await headRevision(fx) } }),
  },
  "projects/[projectId]/revisions GET": { handler: listRevisions, ok: 200, build: async (fx) => ({ params: { projectId: fx.projectId } }) },
  "projects/[projectId] GET": { handler: getProject, ok: 200, build: async (fx) => ({ params: { projectId: fx.projectId } }) },
  "projects/[projectId] PATCH": {
    handler: patchProject,
    ok: 200,
    build: async (fx) => ({ params: { projectId: fx.projectId }, body: { description: `edited ${crypto.randomUUID()}` } }),
  },
  "projects GET": { handler: listProjects, ok: 200, build: async () => ({}) },
  "projects POST": { handler: createProject, ok: 201, build: async () => ({ body: { name: "Matrix project" } }) },
};

let fx: Fixture;
let removeUploads: () => void = () => {};

beforeAll(async () => {
  removeUploads = useTemporaryUploadDir();
  const org = await organisationWithEveryRole("matrix");
  const created = await call<{ id: string }>(createProject, "POST", { token: org.admin.token, body: { name: "Matrix tower" } });
  expect(created.status).toBe(201);
  const projectId = created.body.id;
  const saved = await call<{ revision: number }>(saveLayout, "PUT", {
    token: org.admin.token,
    params: { projectId },
    body: { baseRevision: 1, message: "demo plan", layout: demoLayout() },
  });
  expect(saved.status).toBe(201);
  const scenario = await call<{ id: string }>(createScenario, "POST", { token: org.admin.token, params: { projectId }, body: WINTER_DESIGN });
  expect(scenario.status).toBe(201);
  const image = await call<{ imageId: string }>(uploadUnderlay, "POST", { token: org.designer.token, params: { projectId }, formData: imageForm() });
  expect(image.status).toBe(201);
  fx = { org, projectId, scenarioId: scenario.body.id, demoRevision: saved.body.revision, imageId: image.body.imageId };
}, 60_000);

afterAll(async () => {
  removeUploads();
  await closeDatabase();
});

describe("the route table", () => {
  test("has a row for every route file and every method it exports, and nothing else", async () => {
    const onDisk = routeFilesOnDisk();
    expect(onDisk.length).toBeGreaterThan(10);
    expect(onDisk).toEqual(Object.keys(ROUTE_ACTIONS).sort());
    for (const route of onDisk) {
      expect((await exportedMethods(route)).sort(), route).toEqual(Object.keys(ROUTE_ACTIONS[route] ?? {}).sort());
    }
  });

  test("has a request for every row, and every declared action is in the permission table", () => {
    expect(Object.keys(REQUESTS).sort()).toEqual(routeKeys());
    for (const methods of Object.values(ROUTE_ACTIONS)) {
      for (const action of Object.values(methods)) {
        if (action !== "public") expect(Object.keys(PERMISSIONS)).toContain(action);
      }
    }
  });
});

const rows = Object.entries(ROUTE_ACTIONS).flatMap(([route, methods]) =>
  Object.entries(methods).map(([method, action]) => ({ route, method, action: action!, key: `${route} ${method}` })),
);

describe.each(rows)("$key ($action)", ({ key, method, action }) => {
  const expected = (role: Role) => {
    const ok = REQUESTS[key]!.ok;
    return action === "public" || can(role, action) ? ok : 403;
  };

  test.each(ROLES.map((role) => ({ role })))("$role", async ({ role }) => {
    const spec = REQUESTS[key]!;
    const caller = fx.org.byRole[role];
    const options = await spec.build(fx, caller);
    const auditBefore = await countRows(auditLog, eq(auditLog.organisationId, fx.org.admin.organisationId));
    const reply = await call(spec.handler, method, { token: caller.token, ...options });
    expect(reply.status, JSON.stringify(reply.body)).toBe(expected(role));
    if (reply.status === 403) {
      expect(reply.body.error).toBe("forbidden");
      expect(await countRows(auditLog, eq(auditLog.organisationId, fx.org.admin.organisationId))).toBe(auditBefore);
    }
  });

  test("no session", async () => {
    const spec = REQUESTS[key]!;
    const options = await spec.build(fx, null);
    const reply = await call(spec.handler, method, { ...options, token: null });
    expect(reply.status, JSON.stringify(reply.body)).toBe(action === "public" ? spec.ok : 401);
    if (action !== "public") {
      expect(reply.body.error).toBe("unauthenticated");
      const forged = await call(spec.handler, method, { ...options, token: "abcdefghijklmnopqrstuvwxyz234567" });
      expect(forged.status).toBe(401);
    }
  });
});

describe("sessions follow memberships", () => {
  test("a removed member's session stops working at once", async () => {
    const member = await createMember(fx.org.admin, "designer");
    expect((await call(getSession, "GET", { token: member.token })).status).toBe(200);
    expect((await call(removeMember, "DELETE", { token: fx.org.admin.token, params: { membershipId: member.membershipId } })).status).toBe(204);
    expect((await call(getSession, "GET", { token: member.token })).status).toBe(401);
  });

  test("a changed role applies to the next request", async () => {
    const member = await createMember(fx.org.admin, "occupant");
    expect((await call(listProjects, "GET", { token: member.token })).status).toBe(403);
    const changed = await call(changeRole, "PATCH", { token: fx.org.admin.token, params: { membershipId: member.membershipId }, body: { role: "designer" } });
    expect(changed.status).toBe(200);
    expect(changed.body).toMatchObject({ membershipId: member.membershipId, role: "designer" });
    expect((await call(listProjects, "GET", { token: member.token })).status).toBe(200);
  });

  test("the last admin can neither be demoted nor removed (409)", async () => {
    const org = await organisationWithEveryRole("last-admin");
    const members = await call<{ members: { membershipId: string; userId: string }[] }>(listMembers, "GET", { token: org.admin.token });
    const adminMembership = members.body.members.find((m) => m.userId === org.admin.userId)!.membershipId;
    const demote = await call(changeRole, "PATCH", { token: org.admin.token, params: { membershipId: adminMembership }, body: { role: "designer" } });
    expect(demote.status).toBe(409);
    const remove = await call(removeMember, "DELETE", { token: org.admin.token, params: { membershipId: adminMembership } });
    expect(remove.status).toBe(409);
    expect((await call(getSession, "GET", { token: org.admin.token })).status).toBe(200);
  });
});
