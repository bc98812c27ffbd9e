/** Helpers for integration tests that call route handlers directly: people, sessions, requests. */
import { NextRequest } from "next/server";
import { eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { memberships, users } from "@/db/schema";
import { SESSION_COOKIE } from "@/lib/auth/lucia";
import type { Role } from "@/lib/auth/roles";
import { signUp } from "@/lib/auth/service";
import { createSession, validateSessionToken, type Member } from "@/lib/auth/session";

export interface TestMember {
  token: string;
  member: Member;
}

export const stamp = () => `${Date.now()}-${Math.round(Math.random() * 1e6)}`;

async function memberOf(token: string): Promise<Member> {
  const session = await validateSessionToken(token);
  if (!session.ok) throw new Error("test session is not valid");
  return session.member;
}

/** A new organisation with its admin signed in. */
export async function newOrganisation(label: string): Promise<TestMember> {
  const s = stamp();
  const { token } = await signUp({ name: `${label} Admin`, email: `${label.toLowerCase()}-${s}@example.test`, password: "correct horse battery", organisationName: `${label} Org ${s}` });
  return { token, member: await memberOf(token) };
}

/** Adds a member with `role` to the organisation and signs them in. */
export async function addMember(organisationId: string, role: Role, name: string): Promise<TestMember> {
  const id = crypto.randomUUID();
  await getDb().insert(users).values({ id, email: `${role}-${stamp()}@example.test`, name, passwordHash: "x" });
  await getDb().insert(memberships).values({ userId: id, organisationId, role });
  const { token } = await createSession(id, organisationId);
  return { token, member: await memberOf(token) };
}

export async function userIdByToken(token: string): Promise<string> {
  return (await memberOf(token)).userId;
}

export async function userName(userId: string): Promise<string> {
  const [row] = await getDb().select({ name: users.name }).from(users).where(eq(users.id, userId));
  return row!.name;
}

type Handler = (req: NextRequest, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>;

/** Calls a route handler as Next.js would: JSON body, session cookie, params. */
export function call(handler: Handler, method: string, url: string, params: Record<string, string>, token?: string, body?: unknown): Promise<Response> {
  const headers: Record<string, string> = {};
  if (token) headers.cookie = `${SESSION_COOKIE}=${token}`;
  if (body !== undefined) headers["content-type"] = "application/json";
  const init = body === undefined ? { method, headers } : { method, headers, body: typeof body === "string" ? body : JSON.stringify(body) };
  return handler(new NextRequest(`http://localhost${url}`, init), { params: Promise.resolve(params) });
}

export interface ErrorBody {
  error: string;
  message: string;
  fields?: { path: string; message: string }[];
}
