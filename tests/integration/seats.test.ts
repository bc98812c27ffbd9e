import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { getDb, pool } from "@/db/client";
import { auditLog, seats } from "@/db/schema";
import { GET } from "@/app/api/projects/[projectId]/seats/route";
import { PUT } from "@/app/api/projects/[projectId]/seats/[seatId]/route";
import { demoLayout } from "@/lib/demo/layout";
import { createProject } from "@/lib/projects/service";
import type { SeatRow } from "@/lib/seat-assignments";
import { addMember, call, newOrganisation, type ErrorBody, type TestMember } from "./support/members";

let admin: TestMember;
let manager: TestMember;
let designer: TestMember;
let occupant: TestMember;
let stranger: TestMember;
let projectId = "";

const list = (token: string) => call(GET, "GET", `/api/projects/${projectId}/seats`, { projectId }, token);
const assign = (token: string, seatId: string, body: unknown) => call(PUT, "PUT", `/api/projects/${projectId}/seats/${seatId}`, { projectId, seatId }, token, body);

async function occupantOf(seatId: string): Promise<string | null> {
  const [row] = await getDb().select({ occupant: seats.occupantUserId }).from(seats).where(and(eq(seats.projectId, projectId), eq(seats.seatId, seatId)));
  return row!.occupant;
}

beforeAll(async () => {
  admin = await newOrganisation("Seats");
  manager = await addMember(admin.member.organisationId, "facility_manager", "Seat Manager");
  designer = await addMember(admin.member.organisationId, "designer", "Seat Designer");
  occupant = await addMember(admin.member.organisationId, "occupant", "Olive Occupant");
  stranger = await newOrganisation("Outsider");
  projectId = (await createProject(admin.member, { name: "Seat project", description: "" }, demoLayout())).id;
});

afterAll(async () => {
  await pool().end();
});

describe("seats API", () => {
  it("lists the project's seats with their occupants", async () => {
    const res = await list(designer.token);
    expect(res.status).toBe(200);
    const body = (await res.json()) as { seats: SeatRow[] };
    expect(body.seats).toHaveLength(demoLayout().seats.length);
    expect(body.seats.find((s) => s.seatId === "seat-oo-1")).toEqual({
      seatId: "seat-oo-1", label: "Desk A1", occupantUserId: null, occupantName: null, firstRevision: 1, lastRevision: 1, removedInRevision: null,
    });
  });

  it("a facility manager assigns an organisation member to a seat, audited, and clears it again", async () => {
    const res = await assign(manager.token, "seat-oo-1", { occupantUserId: occupant.member.userId });
    expect(res.status).toBe(200);
    expect(await res.json()).toMatchObject({ seatId: "seat-oo-1", occupantUserId: occupant.member.userId, occupantName: "Olive Occupant" });
    expect(await occupantOf("seat-oo-1")).toBe(occupant.member.userId);
    const listed = (await (await list(manager.token)).json()) as { seats: SeatRow[] };
    expect(listed.seats.find((s) => s.seatId === "seat-oo-1")!.occupantName).toBe("Olive Occupant");
    const audit = await getDb().select().from(auditLog).where(and(eq(auditLog.action, "seats.assign"), eq(auditLog.organisationId, admin.member.organisationId)));
    expect(audit).toHaveLength(1);
    expect(audit[0]!.details).toMatchObject({ projectId, occupantUserId: occupant.member.userId, previousOccupantUserId: null });

    const cleared = await assign(manager.token, "seat-oo-1", { occupantUserId: null });
    expect(cleared.status).toBe(200);
    expect(await occupantOf("seat-oo-1")).toBeNull();
  });

  it("answers 400 naming occupantUserId for someone outside the organisation, and changes nothing", async () => {
    const res = await assign(manager.token, "seat-oo-2", { occupantUserId: stranger.member.userId });
    expect(res.status).toBe(400);
    expect(((await res.json()) as ErrorBody).fields).toEqual([{ path: "occupantUserId", message: "not a member of this organisation" }]);
    const malformed = await assign(manager.token, "seat-oo-2", { occupantUserId: 42 });
    expect(malformed.status).toBe(400);
    expect(((await malformed.json()) as ErrorBody).fields!.map((f) => f.path)).toEqual(["occupantUserId"]);
    expect(await occupantOf("seat-oo-2")).toBeNull();
  });

  it("answers 403 for a designer, 404 for an unknown seat and for another organisation", async () => {
    expect((await assign(designer.token, "seat-oo-3", { occupantUserId: occupant.member.userId })).status).toBe(403);
    expect((await assign(manager.token, "seat-nope", { occupantUserId: null })).status).toBe(404);
    expect((await assign(stranger.token, "seat-oo-3", { occupantUserId: null })).status).toBe(404);
    expect((await list(stranger.token)).status).toBe(404);
    expect(await occupantOf("seat-oo-3")).toBeNull();
  });
});
