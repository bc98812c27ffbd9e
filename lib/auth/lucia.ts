import "server-only";
import { DrizzleMySQLAdapter } from "@lucia-auth/adapter-drizzle";
import { Lucia, TimeSpan } from "lucia";
import { getDb } from "@/db/client";
import { sessions, users } from "@/db/schema";

export const SESSION_COOKIE = "seatwise_session";

let instance: Lucia<{ organisationId: string }, { email: string; name: string; unitSystem: "si" | "ip" }> | undefined;

/**
 * Lucia v3 with its Drizzle adapter. The cookie carries a random token; the session id Lucia
 * stores and looks up is the token's SHA-256 (see lib/auth/session.ts), so the sessions table
 * holds nothing that could be replayed. Sessions last 30 days and slide: Lucia extends one that
 * is past half its life when it is validated.
 */
export function lucia() {
  instance ??= new Lucia(new DrizzleMySQLAdapter(getDb(), sessions, users), {
    sessionExpiresIn: new TimeSpan(30, "d"),
    sessionCookie: {
      name: SESSION_COOKIE,
      expires: true,
      attributes: { sameSite: "lax", secure: process.env.NODE_ENV === "production", path: "/" },
    },
    getSessionAttributes: (attributes) => ({ organisationId: attributes.organisationId }),
    getUserAttributes: (attributes) => ({
      email: attributes.email,
      name: attributes.name,
      unitSystem: attributes.unitSystem,
    }),
  });
  return instance;
}

declare module "lucia" {
  interface Register {
    Lucia: ReturnType<typeof lucia>;
    DatabaseSessionAttributes: { organisationId: string };
    DatabaseUserAttributes: { email: string; name: string; unitSystem: "si" | "ip" };
  }
}
