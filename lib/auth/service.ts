import "server-only";
import { and, asc, eq, gt, isNull } from "drizzle-orm";
import { getDb } from "@/db/client";
import { invitations, memberships, organisations, passwordResets, sessions, users } from "@/db/schema";
import { recordAudit } from "@/lib/audit";
import { dummyPasswordHash, hashPassword, verifyPassword } from "@/lib/auth/password";
import type { AcceptInviteInput, InviteInput, SignInInput, SignUpInput } from "@/lib/auth/schemas";
import type { Role } from "@/lib/auth/roles";
import { createSession, type Member } from "@/lib/auth/session";
import { generateToken, hashToken } from "@/lib/auth/tokens";
import { AppError } from "@/lib/http/errors";
import { sendMail } from "@/lib/mail";

export const INVITATION_LIFETIME_MS = 7 * 24 * 3600 * 1000;
export const PASSWORD_RESET_LIFETIME_MS = 60 * 60 * 1000;

export interface SignedIn {
  token: string;
  expiresAt: Date;
  role: Role;
}

function isDuplicateKey(error: unknown): boolean {
  const e = error as { code?: string; cause?: { code?: string } };
  return e?.code === "ER_DUP_ENTRY" || e?.cause?.code === "ER_DUP_ENTRY";
}

/** Creates a user and a new organisation with that user as its admin, and signs them in. */
export async function signUp(input: SignUpInput): Promise<SignedIn> {
  const passwordHash = await hashPassword(input.password);
  const userId = crypto.randomUUID();
  const organisationId = crypto.randomUUID();
  try {
    await getDb().transaction(async (tx) => {
      await tx.insert(users).values({ id: userId, email: input.email, name: input.name, passwordHash });
      await tx.insert(organisations).values({ id: organisationId, name: input.organisationName });
      await tx.insert(memberships).values({ userId, organisationId, role: "admin" });
      await recordAudit(tx, { organisationId, actorId: userId, action: "auth.sign_up", targetType: "user", targetId: userId });
    });
  } catch (error) {
    if (isDuplicateKey(error)) {
      throw new AppError("conflict", "An account with this e-mail address exists already. Sign in instead.", [
        { path: "email", message: "already registered" },
      ]);
    }
    throw error;
  }
  const session = await createSession(userId, organisationId);
  return { ...session, role: "admin" };
}

/**
 * Signs in with e-mail and password into the user's oldest membership. The failure message is
 * the same whether or not the e-mail exists, and an unknown e-mail still costs one hash check.
 */
export async function signIn(input: SignInInput): Promise<SignedIn> {
  const db = getDb();
  const [user] = await db.select().from(users).where(eq(users.email, input.email)).limit(1);
  const valid = await verifyPassword(user?.passwordHash ?? (await dummyPasswordHash()), input.password);
  const [membership] = user
    ? await db.select().from(memberships).where(eq(memberships.userId, user.id)).orderBy(asc(memberships.createdAt)).limit(1)
    : [];
  if (!user || !valid || !membership) {
    await recordAudit(db, {
      organisationId: membership?.organisationId ?? null,
      actorId: user?.id ?? null,
      action: "auth.sign_in_failed",
      details: { reason: !user ? "unknown-email" : !valid ? "wrong-password" : "no-membership" },
      success: false,
    });
    throw new AppError("invalid_credentials", "E-mail or password is not right.");
  }
  const session = await createSession(user.id, membership.organisationId);
  await recordAudit(db, { organisationId: membership.organisationId, actorId: user.id, action: "auth.sign_in" });
  return { ...session, role: membership.role };
}

export async function signOut(member: Member): Promise<void> {
  await getDb().delete(sessions).where(eq(sessions.id, member.sessionId));
  await recordAudit(getDb(), { organisationId: member.organisationId, actorId: member.userId, action: "auth.sign_out" });
}

/** Creates an invitation and returns the link the admin passes on (e-mailing it comes later). */
export async function inviteMember(member: Member, input: InviteInput, baseUrl: string): Promise<{ id: string; inviteUrl: string; expiresAt: Date }> {
  const db = getDb();
  const existing = await db
    .select({ id: memberships.id })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(users.email, input.email), eq(memberships.organisationId, member.organisationId)))
    .limit(1);
  if (existing.length > 0) {
    throw new AppError("conflict", "This person is a member already.", [{ path: "email", message: "already a member" }]);
  }
  const token = generateToken();
  const id = crypto.randomUUID();
  const expiresAt = new Date(Date.now() + INVITATION_LIFETIME_MS);
  await db.transaction(async (tx) => {
    await tx.insert(invitations).values({
      id,
      organisationId: member.organisationId,
      email: input.email,
      role: input.role,
      tokenHash: hashToken(token),
      invitedBy: member.userId,
      expiresAt,
    });
    await recordAudit(tx, {
      organisationId: member.organisationId,
      actorId: member.userId,
      action: "members.invite",
      targetType: "invitation",
      targetId: id,
      details: { email: input.email, role: input.role },
    });
  });
  return { id, inviteUrl: `${baseUrl}/invite/${token}`, expiresAt };
}

async function openInvitation(token: string) {
  const [row] = await getDb()
    .select({ invitation: invitations, organisationName: organisations.name })
    .from(invitations)
    .innerJoin(organisations, eq(organisations.id, invitations.organisationId))
    .where(eq(invitations.tokenHash, hashToken(token)))
    .limit(1);
  if (!row) throw new AppError("not_found", "This invitation link is not valid.");
  if (row.invitation.acceptedAt) throw new AppError("gone", "This invitation has been used already.");
  if (row.invitation.expiresAt.getTime() <= Date.now()) throw new AppError("gone", "This invitation has expired. Ask your admin for a new one.");
  return row;
}

/** What the accept-invite page shows before the invitee sets a password. */
export async function describeInvitation(token: string): Promise<{ email: string; role: Role; organisationName: string; accountExists: boolean }> {
  const { invitation, organisationName } = await openInvitation(token);
  const [user] = await getDb().select({ id: users.id }).from(users).where(eq(users.email, invitation.email)).limit(1);
  return { email: invitation.email, role: invitation.role, organisationName, accountExists: Boolean(user) };
}

/**
 * Accepts an invitation: creates the user (or, when the e-mail has an account already, checks
 * its password), adds the membership, marks the invitation used, and signs in — all or nothing.
 */
export async function acceptInvitation(input: AcceptInviteInput): Promise<SignedIn> {
  const { invitation } = await openInvitation(input.token);
  const db = getDb();
  const [existing] = await db.select().from(users).where(eq(users.email, invitation.email)).limit(1);
  if (existing && !(await verifyPassword(existing.passwordHash, input.password))) {
    throw new AppError("invalid_credentials", "This e-mail has an account: enter its current password to join.");
  }
  const passwordHash = existing ? null : await hashPassword(input.password);
  const userId = existing?.id ?? crypto.randomUUID();
  await db.transaction(async (tx) => {
    const claimed = await tx
      .update(invitations)
      .set({ acceptedAt: new Date() })
      .where(and(eq(invitations.id, invitation.id), isNull(invitations.acceptedAt), gt(invitations.expiresAt, new Date())));
    if (claimed[0].affectedRows !== 1) throw new AppError("gone", "This invitation has been used already.");
    if (!existing && passwordHash) {
      await tx.insert(users).values({ id: userId, email: invitation.email, name: input.name, passwordHash });
    }
    await tx
      .insert(memberships)
      .values({ userId, organisationId: invitation.organisationId, role: invitation.role })
      .onDuplicateKeyUpdate({ set: { role: invitation.role } });
    await recordAudit(tx, {
      organisationId: invitation.organisationId,
      actorId: userId,
      action: "members.join",
      targetType: "invitation",
      targetId: invitation.id,
      details: { role: invitation.role },
    });
  });
  const session = await createSession(userId, invitation.organisationId);
  return { ...session, role: invitation.role };
}

/**
 * Starts a password reset: e-mails a single-use link valid for an hour. Answers the same
 * whether or not the address is known.
 */
export async function requestPasswordReset(email: string, baseUrl: string): Promise<void> {
  const db = getDb();
  const [user] = await db.select({ id: users.id }).from(users).where(eq(users.email, email)).limit(1);
  if (!user) return;
  const token = generateToken();
  await db.insert(passwordResets).values({
    userId: user.id,
    tokenHash: hashToken(token),
    expiresAt: new Date(Date.now() + PASSWORD_RESET_LIFETIME_MS),
  });
  await sendMail({
    to: email,
    subject: "Reset your Seatwise password",
    text: `Someone asked to reset the password of your Seatwise account.\n\nSet a new password here (the link works once, for one hour):\n${baseUrl}/reset-password/${token}\n\nIf it wasn't you, ignore this message.`,
  });
}

/** Completes a reset: sets the password, uses the token up, and signs out every session of the user. */
export async function resetPassword(token: string, password: string): Promise<void> {
  const db = getDb();
  const [reset] = await db.select().from(passwordResets).where(eq(passwordResets.tokenHash, hashToken(token))).limit(1);
  if (!reset) throw new AppError("not_found", "This reset link is not valid.");
  if (reset.usedAt) throw new AppError("gone", "This reset link has been used already.");
  if (reset.expiresAt.getTime() <= Date.now()) throw new AppError("gone", "This reset link has expired. Ask for a new one.");
  const passwordHash = await hashPassword(password);
  await db.transaction(async (tx) => {
    const claimed = await tx
      .update(passwordResets)
      .set({ usedAt: new Date() })
      .where(and(eq(passwordResets.id, reset.id), isNull(passwordResets.usedAt)));
    if (claimed[0].affectedRows !== 1) throw new AppError("gone", "This reset link has been used already.");
    await tx.update(users).set({ passwordHash }).where(eq(users.id, reset.userId));
    await tx.delete(sessions).where(eq(sessions.userId, reset.userId));
    await recordAudit(tx, { organisationId: null, actorId: reset.userId, action: "auth.password_reset" });
  });
}
