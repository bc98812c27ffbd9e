/**
 * Calling route handlers directly in integration tests: build a NextRequest (with a session
 * cookie when given), call the exported handler with its params, read status, JSON and the
 * session cookie it set. Organisations and members are created through the API itself.
 */
import { NextRequest } from "next/server";
import { expect } from "vitest";
import { POST as acceptInvitation } from "@/app/api/invitations/accept/route";
import { GET as listMembers } from "@/app/api/members/route";
import { POST as createInvitation } from "@/app/api/members/invitations/route";
import { GET as getSession } from "@/app/api/auth/session/route";
import { POST as signIn } from "@/app/api/auth/sign-in/route";
import { POST as signUp } from "@/app/api/auth/sign-up/route";
import { SESSION_COOKIE } from "@/lib/auth/lucia";
import type { Role } from "@/lib/auth/roles";

export const BASE_URL = "http://localhost:3000";
export const PASSWORD = "correct horse battery";

type RouteContext = { params: Promise<Record<string, string>> };
export type RouteHandler = (req: NextRequest, ctx: RouteContext) => Promise<Response>;

export interface CallOptions {
  /** Path used for the request URL (the handler does not route on it; query strings matter). */
  path?: string;
  params?: Record<string, string>;
  /** Serialised as JSON unless `rawBody` is given. */
  body?: unknown;
  rawBody?: string;
  /** A multipart body (the request sets its own content type and boundary). */
  formData?: FormData;
  /** Session token for the cookie; omit for an anonymous request. */
  token?: string | null;
  headers?: Record<string, string>;
}

export interface Reply<T = Record<string, unknown>> {
  status: number;
  body: T;
  /** The session token the response set (undefined when it set none; "" when it cleared it). */
  token: string | undefined;
  response: Response;
}

/** Calls a route handler the way Next.js would. */
export async function call<T = Record<string, unknown>>(handler: RouteHandler, method: string, options: CallOptions = {}): Promise<Reply<T>> {
  const headers = new Headers(options.headers);
  if (options.token) headers.set("cookie", `${SESSION_COOKIE}=${options.token}`);
  let body: string | FormData | undefined;
  if (options.formData) body = options.formData;
  else if (options.rawBody !== undefined) body = options.rawBody;
  else if (options.body !== undefined) body = JSON.stringify(options.body);
  if (typeof body === "string" && !headers.has("content-type")) headers.set("content-type", "application/json");
  const req = new NextRequest(`${BASE_URL}${options.path ?? "/api/test"}`, { method, headers, body });
  const response = await handler(req, { params: Promise.resolve(options.params ?? {}) });
  // JSON answers are parsed; anything else (an image) is left unread in `response`.
  const isJson = (response.headers.get("content-type") ?? "").includes("application/json");
  const text = isJson && response.status !== 204 ? await response.text() : "";
  return { status: response.status, body: (text ? JSON.parse(text) : {}) as T, token: sessionTokenOf(response), response };
}

/** The session cookie value a response set, if any. */
export function sessionTokenOf(response: Response): string | undefined {
  for (const header of response.headers.getSetCookie()) {
    const [pair] = header.split(";");
    const [name, ...value] = (pair ?? "").split("=");
    if (name?.trim() === SESSION_COOKIE) return value.join("=");
  }
  return undefined;
}

let counter = 0;
/** An e-mail address no other test (or earlier run on the same database) has used. */
export function uniqueEmail(label: string): string {
  counter += 1;
  return `${label}-${counter}-${crypto.randomUUID().slice(0, 8)}@example.test`;
}

export interface Account {
  email: string;
  password: string;
  token: string;
  userId: string;
  organisationId: string;
  role: Role;
}

/** The signed-in member behind a token, through GET /api/auth/session. */
export async function whoAmI(token: string) {
  const reply = await call<{ user: { id: string; email: string }; organisation: { id: string; name: string }; role: Role }>(getSession, "GET", { token });
  expect(reply.status).toBe(200);
  return reply.body;
}

/** Signs up a fresh organisation; its admin is returned signed in. */
export async function signUpOrganisation(label = "org"): Promise<Account & { organisationName: string }> {
  const email = uniqueEmail(`${label}-admin`);
  const organisationName = `${label} ${crypto.randomUUID().slice(0, 6)}`;
  const reply = await call(signUp, "POST", { body: { name: `${label} Admin`, email, password: PASSWORD, organisationName } });
  expect(reply.status, JSON.stringify(reply.body)).toBe(201);
  const token = reply.token;
  if (!token) throw new Error("sign-up set no session cookie");
  const me = await whoAmI(token);
  return { email, password: PASSWORD, token, userId: me.user.id, organisationId: me.organisation.id, role: "admin", organisationName };
}

/** Invites someone with `role` through the API and returns the invitation id and token. */
export async function invite(admin: { token: string }, role: Role, email = uniqueEmail(role)): Promise<{ id: string; token: string; email: string }> {
  const reply = await call<{ id: string; inviteUrl: string }>(createInvitation, "POST", { token: admin.token, body: { email, role } });
  expect(reply.status, JSON.stringify(reply.body)).toBe(201);
  const token = new URL(reply.body.inviteUrl).pathname.split("/").pop();
  if (!token) throw new Error("invitation link without a token");
  return { id: reply.body.id, token, email };
}

/** Creates a member with `role` in the admin's organisation: invitation → accept. */
export async function createMember(admin: Account, role: Role): Promise<Account & { membershipId: string }> {
  const invitation = await invite(admin, role);
  const reply = await call(acceptInvitation, "POST", { body: { token: invitation.token, name: `A ${role}`, password: PASSWORD } });
  expect(reply.status, JSON.stringify(reply.body)).toBe(200);
  const token = reply.token;
  if (!token) throw new Error("accepting set no session cookie");
  const me = await whoAmI(token);
  const members = await call<{ members: { membershipId: string; userId: string }[] }>(listMembers, "GET", { token: admin.token });
  const membershipId = members.body.members.find((m) => m.userId === me.user.id)?.membershipId;
  if (!membershipId) throw new Error("new member missing from the member list");
  return { email: invitation.email, password: PASSWORD, token, userId: me.user.id, organisationId: me.organisation.id, role, membershipId };
}

/** An organisation with one member of every role. */
export async function organisationWithEveryRole(label = "org") {
  const admin = await signUpOrganisation(label);
  const designer = await createMember(admin, "designer");
  const facilityManager = await createMember(admin, "facility_manager");
  const occupant = await createMember(admin, "occupant");
  return { admin, designer, facility_manager: facilityManager, occupant, byRole: { admin, designer, facility_manager: facilityManager, occupant } as Record<Role, Account> };
}

/** A new session for an existing account (e.g. to sign out without losing the main one). */
export async function signInAs(account: { email: string; password: string }): Promise<string> {
  const reply = await call(signIn, "POST", { body: { email: account.email, password: account.password } });
  expect(reply.status, JSON.stringify(reply.body)).toBe(200);
  if (!reply.token) throw new Error("sign-in set no session cookie");
  return reply.token;
}

/**
 * A tiny but well-formed PNG header (signature + IHDR of a 4 × 3 image): enough for the
 * upload route, which identifies images by their bytes.
 */
export function pngBytes(widthPx = 4, heightPx = 3): Uint8Array<ArrayBuffer> {
  const bytes = new Uint8Array(new ArrayBuffer(33));
  bytes.set([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 0x49, 0x48, 0x44, 0x52]);
  const view = new DataView(bytes.buffer);
  view.setUint32(16, widthPx);
  view.setUint32(20, heightPx);
  bytes.set([8, 6, 0, 0, 0], 24);
  return bytes;
}

/** A multipart form with `bytes` as the file field. */
export function imageForm(bytes: Uint8Array<ArrayBuffer> = pngBytes(), field = "file", type = "image/png"): FormData {
  const form = new FormData();
  form.set(field, new Blob([bytes], { type }), "plan.png");
  return form;
}

/** The distinct field paths of a 400 answer, sorted. */
export function fieldPaths(body: unknown): string[] {
  const fields = (body as { fields?: { path: string }[] }).fields ?? [];
  return [...new Set(fields.map((f) => f.path))].sort();
}
