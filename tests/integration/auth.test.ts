/**
 * Auth flows end to end through the route handlers, against the real database, with e-mail
 * going over SMTP to the in-process fake.
 */
import { createHash } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { POST as confirmReset } from "@/app/api/auth/password-reset/confirm/route";
import { POST as requestReset } from "@/app/api/auth/password-reset/request/route";
import { GET as getSession } from "@/app/api/auth/session/route";
import { POST as signIn } from "@/app/api/auth/sign-in/route";
import { POST as signOut } from "@/app/api/auth/sign-out/route";
import { POST as signUp } from "@/app/api/auth/sign-up/route";
import { GET as describeInvitation } from "@/app/api/invitations/[token]/route";
import { POST as acceptInvitation } from "@/app/api/invitations/accept/route";
import { auditLog, invitations, memberships, organisations, passwordResets, sessions, users } from "@/db/schema";
import { hashToken } from "@/lib/auth/tokens";
import { startSmtpFake, type SmtpFake } from "../../scripts/lib/smtp-fake.mjs";
import { call, invite, PASSWORD, signInAs, signUpOrganisation, uniqueEmail, whoAmI } from "../support/api";
import { closeDatabase, countRows, getDb } from "../support/db";

let smtp: SmtpFake;

beforeAll(async () => {
  // lib/mail.ts creates its transport on the first message it sends and keeps it, so SMTP_URL
  // is set here, before any test asks for a reset.
  smtp = await startSmtpFake({ port: 0 });
  process.env.SMTP_URL = `smtp://127.0.0.1:${smtp.port}`;
});

afterAll(async () => {
  delete process.env.SMTP_URL;
  await smtp?.close();
  await closeDatabase();
});

const db = () => getDb();

describe("POST /api/auth/sign-up", () => {
  test("creates the user, the organisation, an admin membership and an audit row, and sets a session cookie", async () => {
    const email = uniqueEmail("signup");
    const reply = await call(signUp, "POST", {
      body: { name: "Ines Navarro", email: email.toUpperCase(), password: PASSWORD, organisationName: "Harbour Works" },
    });
    expect(reply.status).toBe(201);
    expect(reply.body).toMatchObject({ role: "admin", home: "/projects" });
    expect(reply.token).toBeTruthy();

    const [user] = await db().select().from(users).where(eq(users.email, email));
    expect(user?.name).toBe("Ines Navarro");
    expect(user?.passwordHash).not.toContain(PASSWORD);
    const rows = await db().select().from(memberships).where(eq(memberships.userId, user!.id));
    expect(rows).toHaveLength(1);
    expect(rows[0]?.role).toBe("admin");
    const [organisation] = await db().select().from(organisations).where(eq(organisations.id, rows[0]!.organisationId));
    expect(organisation?.name).toBe("Harbour Works");
    expect(await countRows(auditLog, and(eq(auditLog.actorId, user!.id), eq(auditLog.action, "auth.sign_up")))).toBe(1);

    const me = await whoAmI(reply.token!);
    expect(me.user.email).toBe(email);
    expect(me.role).toBe("admin");
  });

  test("two sign-ups with one e-mail at once: one 201, one 409, one user", async () => {
    const email = uniqueEmail("race-signup");
    const replies = await Promise.all(
      ["One", "Two"].map((name) => call(signUp, "POST", { body: { name, email, password: PASSWORD, organisationName: `${name} org` } })),
    );
    expect(replies.map((r) => r.status).sort()).toEqual([201, 409]);
    expect(await countRows(users, eq(users.email, email))).toBe(1);
  });

  test("a second sign-up with the same e-mail is 409 naming the e-mail and writes nothing", async () => {
    const first = await signUpOrganisation("dupe");
    const before = { users: await countRows(users), organisations: await countRows(organisations) };
    const reply = await call(signUp, "POST", { body: { name: "Other", email: first.email, password: PASSWORD, organisationName: "Other org" } });
    expect(reply.status).toBe(409);
    expect(reply.body.fields).toEqual([{ path: "email", message: "already registered" }]);
    expect({ users: await countRows(users), organisations: await countRows(organisations) }).toEqual(before);
  });
});

describe("POST /api/auth/sign-in", () => {
  test("answers 200 with a cookie whose token is stored only as its SHA-256", async () => {
    const account = await signUpOrganisation("signin");
    const reply = await call(signIn, "POST", { body: { email: account.email, password: PASSWORD } });
    expect(reply.status).toBe(200);
    expect(reply.body).toMatchObject({ role: "admin", home: "/projects" });
    const token = reply.token!;
    expect(token).toMatch(/^[a-z2-7]{32}$/);

    // Computed here independently of lib/auth/tokens.
    const sha256 = createHash("sha256").update(token, "utf8").digest("hex");
    expect(hashToken(token)).toBe(sha256);
    expect(await countRows(sessions, eq(sessions.id, sha256))).toBe(1);
    expect(await countRows(sessions, eq(sessions.id, token))).toBe(0);
    const [row] = await db().select().from(sessions).where(eq(sessions.id, sha256));
    expect(row?.id).toMatch(/^[0-9a-f]{64}$/);
    expect(row?.userId).toBe(account.userId);
    expect(row?.organisationId).toBe(account.organisationId);
    expect(row!.expiresAt.getTime()).toBeGreaterThan(Date.now() + 29 * 24 * 3600 * 1000);
    expect(await countRows(auditLog, and(eq(auditLog.actorId, account.userId), eq(auditLog.action, "auth.sign_in")))).toBe(1);
  });

  test("a wrong password and an unknown e-mail get the same 401 and no session", async () => {
    const account = await signUpOrganisation("wrongpw");
    const sessionsBefore = await countRows(sessions);
    const wrong = await call(signIn, "POST", { body: { email: account.email, password: "not the password" } });
    const unknown = await call(signIn, "POST", { body: { email: uniqueEmail("nobody"), password: "not the password" } });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body).toEqual(unknown.body);
    expect(wrong.body.message).toBe("E-mail or password is not right.");
    expect(wrong.token).toBeUndefined();
    expect(unknown.token).toBeUndefined();
    expect(await countRows(sessions)).toBe(sessionsBefore);
    expect(await countRows(auditLog, and(eq(auditLog.actorId, account.userId), eq(auditLog.action, "auth.sign_in_failed")))).toBe(1);
  });
});

describe("POST /api/auth/sign-out", () => {
  test("deletes the session row and clears the cookie; the old cookie then gets 401", async () => {
    const account = await signUpOrganisation("signout");
    const other = await signInAs(account);
    const reply = await call(signOut, "POST", { token: account.token });
    expect(reply.status).toBe(200);
    expect(reply.token).toBe("");
    expect(await countRows(sessions, eq(sessions.id, hashToken(account.token)))).toBe(0);
    expect((await call(getSession, "GET", { token: account.token })).status).toBe(401);
    // Only that session ended.
    expect((await call(getSession, "GET", { token: other })).status).toBe(200);
  });

  test("without a session is 401", async () => {
    expect((await call(signOut, "POST")).status).toBe(401);
    expect((await call(signOut, "POST", { token: "abcdefghijklmnopqrstuvwxyz234567" })).status).toBe(401);
  });
});

describe("invitations", () => {
  test("create → describe → accept gives the new user the invited role; a second accept is 410", async () => {
    const admin = await signUpOrganisation("invite");
    const invitation = await invite(admin, "facility_manager");

    const described = await call(describeInvitation, "GET", { params: { token: invitation.token } });
    expect(described.status).toBe(200);
    expect(described.body).toEqual({ email: invitation.email, role: "facility_manager", organisationName: admin.organisationName, accountExists: false });

    const accepted = await call(acceptInvitation, "POST", { body: { token: invitation.token, name: "Femi Adebayo", password: PASSWORD } });
    expect(accepted.status).toBe(200);
    expect(accepted.body).toMatchObject({ role: "facility_manager" });
    const me = await whoAmI(accepted.token!);
    expect(me).toMatchObject({ role: "facility_manager", user: { email: invitation.email }, organisation: { id: admin.organisationId } });
    const [row] = await db().select().from(invitations).where(eq(invitations.id, invitation.id));
    expect(row?.acceptedAt).toBeInstanceOf(Date);
    expect(row?.tokenHash).toBe(hashToken(invitation.token));

    const membershipsBefore = await countRows(memberships);
    const again = await call(acceptInvitation, "POST", { body: { token: invitation.token, name: "Someone Else", password: PASSWORD } });
    expect(again.status).toBe(410);
    expect(again.token).toBeUndefined();
    expect(await countRows(memberships)).toBe(membershipsBefore);
    expect((await call(describeInvitation, "GET", { params: { token: invitation.token } })).status).toBe(410);
  });

  test("an expired invitation is 410 to describe and to accept, and creates no user", async () => {
    const admin = await signUpOrganisation("expired-invite");
    const invitation = await invite(admin, "designer");
    await db().update(invitations).set({ expiresAt: new Date(Date.now() - 60_000) }).where(eq(invitations.id, invitation.id));

    expect((await call(describeInvitation, "GET", { params: { token: invitation.token } })).status).toBe(410);
    const accepted = await call(acceptInvitation, "POST", { body: { token: invitation.token, name: "Late Comer", password: PASSWORD } });
    expect(accepted.status).toBe(410);
    expect(await countRows(users, eq(users.email, invitation.email))).toBe(0);
  });

  test("two accepts of one invitation at once: exactly one 200 and one 410, one membership", async () => {
    const admin = await signUpOrganisation("race-invite");
    const invitation = await invite(admin, "designer");
    const replies = await Promise.all(
      ["First", "Second"].map((name) => call(acceptInvitation, "POST", { body: { token: invitation.token, name, password: PASSWORD } })),
    );
    expect(replies.map((r) => r.status).sort()).toEqual([200, 410]);
    const [user] = await db().select().from(users).where(eq(users.email, invitation.email));
    expect(await countRows(memberships, eq(memberships.userId, user!.id))).toBe(1);
  });

  test("someone with an account joins a second organisation with their current password", async () => {
    const other = await signUpOrganisation("first-home");
    const admin = await signUpOrganisation("second-home");
    const invitation = await invite(admin, "occupant", other.email);
    const described = await call(describeInvitation, "GET", { params: { token: invitation.token } });
    expect(described.body).toMatchObject({ email: other.email, accountExists: true });

    const wrong = await call(acceptInvitation, "POST", { body: { token: invitation.token, name: "ignored", password: "not the password" } });
    expect(wrong.status).toBe(401);
    expect(await countRows(memberships, eq(memberships.userId, other.userId))).toBe(1);
    expect((await call(describeInvitation, "GET", { params: { token: invitation.token } })).status).toBe(200);

    const accepted = await call(acceptInvitation, "POST", { body: { token: invitation.token, name: "ignored", password: PASSWORD } });
    expect(accepted.status).toBe(200);
    const me = await whoAmI(accepted.token!);
    expect(me).toMatchObject({ role: "occupant", user: { id: other.userId }, organisation: { id: admin.organisationId } });
    expect(await countRows(memberships, eq(memberships.userId, other.userId))).toBe(2);
    expect(await countRows(users, eq(users.email, other.email))).toBe(1);
    // The first session still belongs to the first organisation.
    expect((await whoAmI(other.token)).organisation.id).toBe(other.organisationId);
  });

  test("an unknown invitation token is 404", async () => {
    const token = "abcdefghijklmnopqrstuvwxyz234567";
    expect((await call(describeInvitation, "GET", { params: { token } })).status).toBe(404);
    expect((await call(acceptInvitation, "POST", { body: { token, name: "X", password: PASSWORD } })).status).toBe(404);
  });
});

describe("password reset", () => {
  const NEW_PASSWORD = "a brand new passphrase";

  async function requestAndReceive(email: string): Promise<string> {
    const before = smtp.messages.length;
    const reply = await call(requestReset, "POST", { body: { email } });
    expect(reply.status).toBe(202);
    // sendMail resolves once the fake has accepted (and parsed) the message.
    expect(smtp.messages.length).toBe(before + 1);
    const message = smtp.messages[smtp.messages.length - 1]!;
    expect(message.to).toBe(email);
    expect(message.subject).toBe("Reset your Seatwise password");
    const match = /\/reset-password\/([a-z2-7]+)/.exec(message.text);
    expect(match, message.text).not.toBeNull();
    return match![1]!;
  }

  test("request → e-mail → confirm: the new password works, the old does not, every session is revoked; reuse is 410", async () => {
    const account = await signUpOrganisation("reset");
    const second = await signInAs(account);
    const token = await requestAndReceive(account.email);
    expect(await countRows(passwordResets, eq(passwordResets.tokenHash, hashToken(token)))).toBe(1);
    expect(await countRows(passwordResets, eq(passwordResets.tokenHash, token))).toBe(0);

    const confirmed = await call(confirmReset, "POST", { body: { token, password: NEW_PASSWORD } });
    expect(confirmed.status).toBe(200);

    expect(await countRows(sessions, eq(sessions.userId, account.userId))).toBe(0);
    expect((await call(getSession, "GET", { token: account.token })).status).toBe(401);
    expect((await call(getSession, "GET", { token: second })).status).toBe(401);
    expect((await call(signIn, "POST", { body: { email: account.email, password: PASSWORD } })).status).toBe(401);
    expect((await call(signIn, "POST", { body: { email: account.email, password: NEW_PASSWORD } })).status).toBe(200);

    const reused = await call(confirmReset, "POST", { body: { token, password: "yet another passphrase" } });
    expect(reused.status).toBe(410);
    expect((await call(signIn, "POST", { body: { email: account.email, password: NEW_PASSWORD } })).status).toBe(200);
  });

  test("two confirms of one reset link at once: exactly one 200 and one 410", async () => {
    const account = await signUpOrganisation("reset-race");
    const token = await requestAndReceive(account.email);
    const replies = await Promise.all(
      ["first new passphrase", "second new passphrase"].map((password) => call(confirmReset, "POST", { body: { token, password } })),
    );
    expect(replies.map((r) => r.status).sort()).toEqual([200, 410]);
    const winner = replies[0]!.status === 200 ? "first new passphrase" : "second new passphrase";
    expect((await call(signIn, "POST", { body: { email: account.email, password: winner } })).status).toBe(200);
  });

  test("an expired reset link is 410 and leaves the password alone", async () => {
    const account = await signUpOrganisation("reset-expired");
    const token = await requestAndReceive(account.email);
    await db().update(passwordResets).set({ expiresAt: new Date(Date.now() - 60_000) }).where(eq(passwordResets.tokenHash, hashToken(token)));
    const reply = await call(confirmReset, "POST", { body: { token, password: NEW_PASSWORD } });
    expect(reply.status).toBe(410);
    expect((await call(signIn, "POST", { body: { email: account.email, password: PASSWORD } })).status).toBe(200);
    expect((await call(getSession, "GET", { token: account.token })).status).toBe(200);
  });

  test("an unknown address gets the same 202 and no e-mail is sent", async () => {
    const known = await signUpOrganisation("reset-known");
    const messagesBefore = smtp.messages.length;
    const resetsBefore = await countRows(passwordResets);
    const unknown = await call(requestReset, "POST", { body: { email: uniqueEmail("nobody") } });
    expect(unknown.status).toBe(202);
    expect(smtp.messages.length).toBe(messagesBefore);
    expect(await countRows(passwordResets)).toBe(resetsBefore);
    // The answer for a known address is the same body.
    const knownReply = await call(requestReset, "POST", { body: { email: known.email } });
    expect(knownReply.status).toBe(202);
    expect(knownReply.body).toEqual(unknown.body);
  });

  test("an unknown reset token is 404", async () => {
    const reply = await call(confirmReset, "POST", { body: { token: "abcdefghijklmnopqrstuvwxyz234567", password: NEW_PASSWORD } });
    expect(reply.status).toBe(404);
  });
});

describe("cross-site requests", () => {
  test("a state-changing request from another origin is 403 and signs nobody out", async () => {
    const account = await signUpOrganisation("origin");
    const reply = await call(signOut, "POST", { token: account.token, headers: { origin: "https://elsewhere.example", host: "localhost:3000" } });
    expect(reply.status).toBe(403);
    expect((await call(getSession, "GET", { token: account.token })).status).toBe(200);
  });
});
