import { NextResponse } from "next/server";
import { signInInput } from "@/lib/auth/schemas";
import { signIn } from "@/lib/auth/service";
import { setSessionCookie } from "@/lib/http/cookies";
import { publicRoute } from "@/lib/http/handler";
import { HOME_BY_ROLE } from "@/lib/permissions";

export const POST = publicRoute({ body: signInInput }, async ({ body }) => {
  const session = await signIn(body);
  return setSessionCookie(NextResponse.json({ role: session.role, home: HOME_BY_ROLE[session.role] }), session.token);
});
