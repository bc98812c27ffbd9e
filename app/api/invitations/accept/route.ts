import { NextResponse } from "next/server";
import { acceptInviteInput } from "@/lib/auth/schemas";
import { acceptInvitation } from "@/lib/auth/service";
import { setSessionCookie } from "@/lib/http/cookies";
import { publicRoute } from "@/lib/http/handler";
import { HOME_BY_ROLE } from "@/lib/permissions";

export const POST = publicRoute({ body: acceptInviteInput }, async ({ body }) => {
  const session = await acceptInvitation(body);
  return setSessionCookie(NextResponse.json({ role: session.role, home: HOME_BY_ROLE[session.role] }), session.token);
});
