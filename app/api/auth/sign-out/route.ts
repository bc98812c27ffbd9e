import { NextResponse } from "next/server";
import { signOut } from "@/lib/auth/service";
import { clearSessionCookie } from "@/lib/http/cookies";
import { memberRoute } from "@/lib/http/handler";

/** Invalidates the session on the server and clears the cookie. */
export const POST = memberRoute("own-seats:read", {}, async ({ member }) => {
  await signOut(member);
  return clearSessionCookie(NextResponse.json({ signedOut: true }));
});
