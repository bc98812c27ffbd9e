import { NextResponse } from "next/server";
import { signUpInput } from "@/lib/auth/schemas";
import { signUp } from "@/lib/auth/service";
import { setSessionCookie } from "@/lib/http/cookies";
import { publicRoute } from "@/lib/http/handler";
import { HOME_BY_ROLE } from "@/lib/permissions";

export const POST = publicRoute({ body: signUpInput }, async ({ body }) => {
  const session = await signUp(body);
  return setSessionCookie(NextResponse.json({ role: session.role, home: HOME_BY_ROLE[session.role] }, { status: 201 }), session.token);
});
