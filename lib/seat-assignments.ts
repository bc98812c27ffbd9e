import "server-only";
import { and, asc, eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { memberships, seats, users } from "@/db/schema";
import { recordAudit } from "@/lib/audit";
import type { Member } from "@/lib/auth/session";
import { AppError, notFound } from "@/lib/http/errors";
import { invalidInput } from "@/lib/http/handler";
import { getProject } from "@/lib/projects/service";

/** A seat record of a project with its occupant (what facility managers manage). */
export interface SeatRow {
  seatId: string;
  label: string;
  occupantUserId: string | null;
  occupantName: string | null;
  firstRevision: number;
  lastRevision: number;
  /** Revision that removed the seat from the layout, or null while it is in the layout. */
  removedInRevision: number | null;
}

const columns = {
  seatId: seats.seatId,
  label: seats.label,
  occupantUserId: seats.occupantUserId,
  occupantName: users.name,
  firstRevision: seats.firstRevision,
  lastRevision: seats.lastRevision,
  removedInRevision: seats.removedInRevision,
};

/** A member who can be given a seat. */
export interface AssignableMember {
  userId: string;
  name: string;
  email: string;
}

/** The organisation's members, for the occupant choice of a seat. */
export async function listAssignableMembers(organisationId: string): Promise<AssignableMember[]> {
  return getDb()
    .select({ userId: users.id, name: users.name, email: users.email })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.organisationId, organisationId))
    .orderBy(asc(users.name));
}

export async function listProjectSeats(organisationId: string, projectId: string): Promise<SeatRow[]> {
  await getProject(organisationId, projectId);
  return getDb().select(columns).from(seats).leftJoin(users, eq(users.id, seats.occupantUserId)).where(eq(seats.projectId, projectId)).orderBy(asc(seats.label));
}

async function getSeat(projectId: string, seatId: string): Promise<SeatRow> {
  const [row] = await getDb()
    .select(columns)
    .from(seats)
    .leftJoin(users, eq(users.id, seats.occupantUserId))
    .where(and(eq(seats.projectId, projectId), eq(seats.seatId, seatId)))
    .limit(1);
  if (!row) throw notFound("No such seat.");
  return row;
}

/**
 * Assigns a member of the organisation to a seat, or clears it (null). The occupant must be a
 * member of the same organisation (400 naming occupantUserId); a seat removed from the layout
 * cannot be assigned (409).
 */
export async function assignSeat(member: Member, projectId: string, seatId: string, occupantUserId: string | null): Promise<SeatRow> {
  await getProject(member.organisationId, projectId);
  const seat = await getSeat(projectId, seatId);
  if (occupantUserId !== null) {
    if (seat.removedInRevision !== null) throw new AppError("conflict", `Seat "${seat.label}" was removed in revision ${seat.removedInRevision}.`);
    const [membership] = await getDb()
      .select({ id: memberships.id })
      .from(memberships)
      .where(and(eq(memberships.userId, occupantUserId), eq(memberships.organisationId, member.organisationId)))
      .limit(1);
    if (!membership) throw invalidInput([{ path: "occupantUserId", message: "not a member of this organisation" }]);
  }
  await getDb().transaction(async (tx) => {
    await tx.update(seats).set({ occupantUserId }).where(and(eq(seats.projectId, projectId), eq(seats.seatId, seatId)));
    await recordAudit(tx, {
      organisationId: member.organisationId,
      actorId: member.userId,
      action: "seats.assign",
      targetType: "seat",
      targetId: seatId,
      details: { projectId, occupantUserId, previousOccupantUserId: seat.occupantUserId },
    });
  });
  return getSeat(projectId, seatId);
}
