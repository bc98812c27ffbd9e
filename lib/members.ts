import "server-only";
import { and, desc, eq, gt, isNull } from "drizzle-orm";
import { getDb, type Transaction } from "@/db/client";
import { invitations, memberships, users } from "@/db/schema";
import { recordAudit } from "@/lib/audit";
import type { Role } from "@/lib/auth/roles";
import type { Member } from "@/lib/auth/session";
import { AppError, notFound } from "@/lib/http/errors";

export interface MemberRow {
  membershipId: string;
  userId: string;
  name: string;
  email: string;
  role: Role;
  joinedAt: string;
}

export interface PendingInvitation {
  id: string;
  email: string;
  role: Role;
  expiresAt: string;
}

export async function listMembers(organisationId: string): Promise<{ members: MemberRow[]; invitations: PendingInvitation[] }> {
  const db = getDb();
  const [rows, pending] = await Promise.all([
    db
      .select({ membershipId: memberships.id, userId: users.id, name: users.name, email: users.email, role: memberships.role, joinedAt: memberships.createdAt })
      .from(memberships)
      .innerJoin(users, eq(users.id, memberships.userId))
      .where(eq(memberships.organisationId, organisationId))
      .orderBy(users.name),
    db
      .select({ id: invitations.id, email: invitations.email, role: invitations.role, expiresAt: invitations.expiresAt })
      .from(invitations)
      .where(and(eq(invitations.organisationId, organisationId), isNull(invitations.acceptedAt), gt(invitations.expiresAt, new Date())))
      .orderBy(desc(invitations.createdAt)),
  ]);
  return {
    members: rows.map((r) => ({ ...r, joinedAt: r.joinedAt.toISOString() })),
    invitations: pending.map((p) => ({ ...p, expiresAt: p.expiresAt.toISOString() })),
  };
}

/** Locks the organisation's admin rows and refuses a change that would leave it without an admin. */
async function assertAdminRemains(tx: Transaction, organisationId: string, membershipId: string) {
  const admins = await tx
    .select({ id: memberships.id })
    .from(memberships)
    .where(and(eq(memberships.organisationId, organisationId), eq(memberships.role, "admin")))
    .for("update");
  if (admins.length === 1 && admins[0]?.id === membershipId) {
    throw new AppError("conflict", "An organisation needs at least one admin.", [{ path: "role", message: "last admin" }]);
  }
}

export async function changeRole(member: Member, membershipId: string, role: Role): Promise<MemberRow> {
  const db = getDb();
  await db.transaction(async (tx) => {
    const [target] = await tx
      .select()
      .from(memberships)
      .where(and(eq(memberships.id, membershipId), eq(memberships.organisationId, member.organisationId)))
      .for("update");
    if (!target) throw notFound("No such member.");
    if (target.role === role) return;
    if (target.role === "admin") await assertAdminRemains(tx, member.organisationId, membershipId);
    await tx.update(memberships).set({ role }).where(eq(memberships.id, membershipId));
    await recordAudit(tx, {
      organisationId: member.organisationId,
      actorId: member.userId,
      action: "members.role_change",
      targetType: "membership",
      targetId: membershipId,
      details: { from: target.role, to: role, userId: target.userId },
    });
  });
  const { members } = await listMembers(member.organisationId);
  const row = members.find((m) => m.membershipId === membershipId);
  if (!row) throw notFound("No such member.");
  return row;
}

/** Removes a member; their sessions stop working at once (sessions are checked against memberships). */
export async function removeMember(member: Member, membershipId: string): Promise<void> {
  await getDb().transaction(async (tx) => {
    const [target] = await tx
      .select()
      .from(memberships)
      .where(and(eq(memberships.id, membershipId), eq(memberships.organisationId, member.organisationId)))
      .for("update");
    if (!target) throw notFound("No such member.");
    if (target.role === "admin") await assertAdminRemains(tx, member.organisationId, membershipId);
    await tx.delete(memberships).where(eq(memberships.id, membershipId));
    await recordAudit(tx, {
      organisationId: member.organisationId,
      actorId: member.userId,
      action: "members.remove",
      targetType: "membership",
      targetId: membershipId,
      details: { userId: target.userId, role: target.role },
    });
  });
}

export async function revokeInvitation(member: Member, invitationId: string): Promise<void> {
  const result = await getDb()
    .delete(invitations)
    .where(and(eq(invitations.id, invitationId), eq(invitations.organisationId, member.organisationId), isNull(invitations.acceptedAt)));
  if (result[0].affectedRows !== 1) throw notFound("No such invitation.");
}
