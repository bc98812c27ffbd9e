import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import { getDb } from "@/db/client";
import { projects, seats } from "@/db/schema";
import type { Member } from "@/lib/auth/session";

export interface OwnSeat {
  projectId: string;
  projectName: string;
  seatId: string;
  label: string;
}

/** The seats assigned to the member in their organisation's projects (what an occupant sees). */
export async function listOwnSeats(member: Member): Promise<OwnSeat[]> {
  return getDb()
    .select({ projectId: projects.id, projectName: projects.name, seatId: seats.seatId, label: seats.label })
    .from(seats)
    .innerJoin(projects, eq(projects.id, seats.projectId))
    .where(and(eq(seats.occupantUserId, member.userId), eq(projects.organisationId, member.organisationId), isNull(seats.removedInRevision)))
    .orderBy(projects.name, seats.label);
}
