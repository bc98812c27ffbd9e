import "server-only";
import { cookies } from "next/headers";
import { cache } from "react";
import { and, eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { memberships, organisations } from "@/db/schema";
import type { Role } from "@/lib/auth/roles";
import { lucia, SESSION_COOKIE } from "@/lib/auth/lucia";
import { generateToken, hashToken } from "@/lib/auth/tokens";

/** The signed-in user as every page, action and handler sees them. */
export interface Member {
  userId: string;
  email: string;
  name: string;
  unitSystem: "si" | "ip";
  organisationId: string;
  organisationName: string;
  role: Role;
  sessionId: string;
}

export type SessionValidation =
  | { ok: true; member: Member; refreshed: boolean }
  | { ok: false; reason: "missing" | "invalid" | "no-membership" };

/** Creates a session and returns the token for the cookie (the database keeps only its hash). */
export async function createSession(userId: string, organisationId: string): Promise<{ token: string; expiresAt: Date }> {
  const token = generateToken();
  const session = await lucia().createSession(userId, { organisationId }, { sessionId: hashToken(token) });
  return { token, expiresAt: session.expiresAt };
}

export async function invalidateSession(sessionId: string): Promise<void> {
  await lucia().invalidateSession(sessionId);
}

/**
 * Validates a cookie token: the session must exist and be unexpired, and the user must still be
 * a member of the session's organisation (a removed member is signed out everywhere at once).
 */
export async function validateSessionToken(token: string | undefined | null): Promise<SessionValidation> {
  if (!token) return { ok: false, reason: "missing" };
  const { session, user } = await lucia().validateSession(hashToken(token));
  if (!session || !user) return { ok: false, reason: "invalid" };
  const [row] = await getDb()
    .select({ role: memberships.role, organisationName: organisations.name })
    .from(memberships)
    .innerJoin(organisations, eq(organisations.id, memberships.organisationId))
    .where(and(eq(memberships.userId, user.id), eq(memberships.organisationId, session.organisationId)))
    .limit(1);
  if (!row) return { ok: false, reason: "no-membership" };
  return {
    ok: true,
    refreshed: session.fresh,
    member: {
      userId: user.id,
      email: user.email,
      name: user.name,
      unitSystem: user.unitSystem,
      organisationId: session.organisationId,
      organisationName: row.organisationName,
      role: row.role,
      sessionId: session.id,
    },
  };
}

export function sessionCookie(token: string) {
  return lucia().createSessionCookie(token);
}

export function blankSessionCookie() {
  return lucia().createBlankSessionCookie();
}

/** The current member for server components and actions, once per request. */
export const getCurrentMember = cache(async (): Promise<Member | null> => {
  const store = await cookies();
  const result = await validateSessionToken(store.get(SESSION_COOKIE)?.value);
  return result.ok ? result.member : null;
});
