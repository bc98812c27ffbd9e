/**
 * Layout revisions: optimistic locking under concurrent saves, stale saves, restore, seat ids
 * kept across revisions, and the layout schema's cross-reference errors at the API.
 */
import { and, eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { GET as health } from "@/app/api/health/route";
import { GET as mySeats } from "@/app/api/me/seats/route";
import { GET as getLayout, PUT as saveLayout } from "@/app/api/projects/[projectId]/layout/route";
import { POST as restoreRevision } from "@/app/api/projects/[projectId]/revisions/[number]/restore/route";
import { GET as listRevisions } from "@/app/api/projects/[projectId]/revisions/route";
import { GET as getProject } from "@/app/api/projects/[projectId]/route";
import { POST as createProject } from "@/app/api/projects/route";
import { auditLog, layoutRevisions, seats } from "@/db/schema";
import { demoLayout } from "@/lib/demo/layout";
import { emptyLayout, type Layout, type Seat } from "@/lib/layout/schema";
import { call, fieldPaths, organisationWithEveryRole, type RouteHandler } from "../support/api";
import { closeDatabase, countRows, getDb } from "../support/db";

type Org = Awaited<ReturnType<typeof organisationWithEveryRole>>;
let org: Org;

beforeAll(async () => {
  org = await organisationWithEveryRole("layouts");
}, 60_000);

afterAll(closeDatabase);

async function newProject(name = "Quay offices"): Promise<string> {
  const reply = await call<{ id: string; headRevision: number }>(createProject, "POST", { token: org.designer.token, body: { name } });
  expect(reply.status).toBe(201);
  expect(reply.body.headRevision).toBe(1);
  return reply.body.id;
}

function save(token: string, projectId: string, baseRevision: number, layout: Layout, message = "edit") {
  return call<{ revision: number; headRevision: number; layout: Layout }>(saveLayout as RouteHandler, "PUT", {
    token,
    params: { projectId },
    body: { baseRevision, message, layout },
  });
}

async function head(projectId: string): Promise<number> {
  const reply = await call<{ headRevision: number }>(getProject, "GET", { token: org.admin.token, params: { projectId } });
  return reply.body.headRevision;
}

function seat(id: string, label: string, x: number): Seat {
  return { id, label, position: { x, y: 2 }, posture: "seated", facingDeg: 90, clo: null, met: null };
}

function layoutWithSeats(...list: Seat[]): Layout {
  const base = demoLayout();
  return { ...base, seats: list };
}

describe("concurrent saves on the same head", () => {
  test("exactly one 201 and one 409 with headRevision; the head advances by one; both can read", async () => {
    const projectId = await newProject();
    const mine = layoutWithSeats(seat("s-a", "Designer's desk", 2));
    const theirs = layoutWithSeats(seat("s-b", "Admin's desk", 4));
    const replies = await Promise.all([
      save(org.designer.token, projectId, 1, mine, "designer's edit"),
      save(org.admin.token, projectId, 1, theirs, "admin's edit"),
    ]);
    const statuses = replies.map((r) => r.status).sort();
    expect(statuses).toEqual([201, 409]);
    const winner = replies.find((r) => r.status === 201)!;
    const loser = replies.find((r) => r.status === 409)!;
    expect(winner.body.revision).toBe(2);
    expect(loser.body).toMatchObject({ error: "conflict", headRevision: 2 });

    expect(await head(projectId)).toBe(2);
    expect(await countRows(layoutRevisions, eq(layoutRevisions.projectId, projectId))).toBe(2);
    expect(await countRows(auditLog, and(eq(auditLog.targetId, projectId), eq(auditLog.action, "layouts.save")))).toBe(1);

    for (const token of [org.designer.token, org.admin.token, org.facility_manager.token]) {
      const read = await call<{ revision: number; layout: Layout }>(getLayout, "GET", { token, params: { projectId } });
      expect(read.status).toBe(200);
      expect(read.body.revision).toBe(2);
      expect(read.body.layout).toEqual(winner.body.layout);
    }
    // The loser can rebase on the head it was told about and save.
    const loserToken = winner === replies[0] ? org.admin.token : org.designer.token;
    const retry = await save(loserToken, projectId, loser.body.headRevision as number, theirs, "rebased");
    expect(retry.status).toBe(201);
    expect(retry.body.revision).toBe(3);
  });

  test("ten saves racing on one head: one wins, nine get 409, no revision number is skipped", async () => {
    const projectId = await newProject("Race");
    const replies = await Promise.all(
      Array.from({ length: 10 }, (_, i) => save(i % 2 ? org.admin.token : org.designer.token, projectId, 1, layoutWithSeats(seat(`s-${i}`, `Desk ${i}`, i)))),
    );
    expect(replies.filter((r) => r.status === 201)).toHaveLength(1);
    expect(replies.filter((r) => r.status === 409)).toHaveLength(9);
    const revisions = await call<{ revisions: { number: number }[] }>(listRevisions, "GET", { token: org.admin.token, params: { projectId } });
    expect(revisions.body.revisions.map((r) => r.number)).toEqual([2, 1]);
  });
});

describe("stale saves and restore", () => {
  test("a save based on a stale revision is 409 and writes no revision", async () => {
    const projectId = await newProject();
    expect((await save(org.designer.token, projectId, 1, demoLayout())).status).toBe(201);
    const before = await countRows(layoutRevisions, eq(layoutRevisions.projectId, projectId));
    const stale = await save(org.admin.token, projectId, 1, emptyLayout(), "from an old tab");
    expect(stale.status).toBe(409);
    expect(stale.body).toMatchObject({ error: "conflict", headRevision: 2 });
    expect(await countRows(layoutRevisions, eq(layoutRevisions.projectId, projectId))).toBe(before);
    expect(await head(projectId)).toBe(2);
    const ahead = await save(org.admin.token, projectId, 7, emptyLayout(), "from the future");
    expect(ahead.status).toBe(409);
    expect(await countRows(layoutRevisions, eq(layoutRevisions.projectId, projectId))).toBe(before);
  });

  test("restore saves the old layout as a new revision and keeps history", async () => {
    const projectId = await newProject();
    const first = layoutWithSeats(seat("s-1", "One", 1));
    const second = layoutWithSeats(seat("s-1", "One", 1), seat("s-2", "Two", 3));
    expect((await save(org.designer.token, projectId, 1, first, "first")).status).toBe(201);
    expect((await save(org.designer.token, projectId, 2, second, "second")).status).toBe(201);

    const restored = await call<{ revision: number; message: string; layout: Layout }>(restoreRevision, "POST", {
      token: org.designer.token,
      params: { projectId, number: "2" },
      body: { baseRevision: 3 },
    });
    expect(restored.status).toBe(201);
    expect(restored.body.revision).toBe(4);
    expect(restored.body.message).toBe("Restored revision 2");
    expect(restored.body.layout).toEqual(first);
    const revisions = await call<{ revisions: { number: number; message: string }[] }>(listRevisions, "GET", { token: org.designer.token, params: { projectId } });
    expect(revisions.body.revisions.map((r) => r.number)).toEqual([4, 3, 2, 1]);
    const old = await call<{ layout: Layout; headRevision: number }>(getLayout, "GET", { token: org.designer.token, path: "/api/x?revision=3", params: { projectId } });
    expect(old.body.layout).toEqual(second);
    expect(old.body.headRevision).toBe(4);

    const staleRestore = await call(restoreRevision, "POST", { token: org.designer.token, params: { projectId, number: "1" }, body: { baseRevision: 3 } });
    expect(staleRestore.status).toBe(409);
    const missing = await call(restoreRevision, "POST", { token: org.designer.token, params: { projectId, number: "99" }, body: { baseRevision: 4 } });
    expect(missing.status).toBe(404);
    expect(await head(projectId)).toBe(4);
  });
});

describe("seats keep their ids across revisions", () => {
  test("a removed seat is marked, a re-added one unmarked, and the occupant assignment survives", async () => {
    const projectId = await newProject();
    const seatRow = async (seatId: string) =>
      (await getDb().select().from(seats).where(and(eq(seats.projectId, projectId), eq(seats.seatId, seatId))))[0];
    const ownSeats = async () => (await call<{ seats: { seatId: string; label: string }[] }>(mySeats, "GET", { token: org.occupant.token })).body.seats.filter((s) => s.label.startsWith("Window"));

    expect((await save(org.designer.token, projectId, 1, layoutWithSeats(seat("w-1", "Window 1", 1), seat("w-2", "Window 2", 3)))).status).toBe(201);
    await getDb().update(seats).set({ occupantUserId: org.occupant.userId }).where(and(eq(seats.projectId, projectId), eq(seats.seatId, "w-2")));
    expect(await ownSeats()).toEqual([expect.objectContaining({ seatId: "w-2", label: "Window 2" })]);

    // Revision 3 drops w-2.
    expect((await save(org.designer.token, projectId, 2, layoutWithSeats(seat("w-1", "Window 1", 1)))).status).toBe(201);
    expect(await seatRow("w-2")).toMatchObject({ removedInRevision: 3, firstRevision: 2, lastRevision: 2, occupantUserId: org.occupant.userId });
    expect(await seatRow("w-1")).toMatchObject({ removedInRevision: null, firstRevision: 2, lastRevision: 3 });
    expect(await ownSeats()).toEqual([]);

    // Revision 4 brings it back, renamed.
    expect((await save(org.designer.token, projectId, 3, layoutWithSeats(seat("w-1", "Window 1", 1), seat("w-2", "Window 2b", 3)))).status).toBe(201);
    expect(await seatRow("w-2")).toMatchObject({ removedInRevision: null, firstRevision: 2, lastRevision: 4, label: "Window 2b", occupantUserId: org.occupant.userId });
    expect(await ownSeats()).toEqual([expect.objectContaining({ seatId: "w-2", label: "Window 2b" })]);
    expect(await countRows(seats, eq(seats.projectId, projectId))).toBe(2);

    // Restoring revision 3 (without w-2) marks it removed again, in revision 5.
    const restored = await call(restoreRevision, "POST", { token: org.designer.token, params: { projectId, number: "3" }, body: { baseRevision: 4 } });
    expect(restored.status).toBe(201);
    expect(await seatRow("w-2")).toMatchObject({ removedInRevision: 5, occupantUserId: org.occupant.userId });
  });
});

describe("layout schema at the API", () => {
  test("duplicate ids and a panel in an unknown room are 400 naming the paths, and nothing is written", async () => {
    const projectId = await newProject();
    const layout = demoLayout();
    const broken: Layout = {
      ...layout,
      seats: [layout.seats[0]!, { ...layout.seats[1]!, id: layout.seats[0]!.id }],
      panels: [{ ...layout.panels[0]!, roomId: "room-nowhere" }],
    };
    const before = await countRows(layoutRevisions, eq(layoutRevisions.projectId, projectId));
    const reply = await save(org.designer.token, projectId, 1, broken);
    expect(reply.status).toBe(400);
    expect(fieldPaths(reply.body)).toEqual(["layout.panels.0.roomId", "layout.seats.1.id"]);
    expect(await countRows(layoutRevisions, eq(layoutRevisions.projectId, projectId))).toBe(before);
    expect(await head(projectId)).toBe(1);
  });

  test("an opening on an edge its room does not have is 400 at layout.openings.N.edgeIndex", async () => {
    const projectId = await newProject();
    const layout = demoLayout();
    const broken: Layout = { ...layout, openings: [{ ...layout.openings[0]!, edgeIndex: 4 }] };
    const reply = await save(org.designer.token, projectId, 1, broken);
    expect(reply.status).toBe(400);
    expect(fieldPaths(reply.body)).toEqual(["layout.openings.0.edgeIndex"]);
  });

  test("the demo layout saves and reads back unchanged", async () => {
    const projectId = await newProject();
    const reply = await save(org.designer.token, projectId, 1, demoLayout());
    expect(reply.status).toBe(201);
    const read = await call<{ layout: Layout }>(getLayout, "GET", { token: org.facility_manager.token, params: { projectId } });
    expect(read.body.layout).toEqual(demoLayout());
    expect(await countRows(seats, eq(seats.projectId, projectId))).toBe(demoLayout().seats.length);
  });
});

describe("GET /api/health", () => {
  test("is 200 with the database reachable", async () => {
    const reply = await call(health as RouteHandler, "GET");
    expect(reply.status).toBe(200);
    expect(reply.body).toEqual({ status: "ok", database: "reachable" });
  });
});
