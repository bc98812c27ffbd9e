import "server-only";
import { notFound, redirect } from "next/navigation";
import { getCurrentMember, type Member } from "@/lib/auth/session";
import { can, type Action } from "@/lib/permissions";

/**
 * The page-side gate: every signed-in page calls this itself (the (app) layout checks too, but
 * authorisation never lives only in a layout).
 *
 * - No valid session → redirect to /sign-in.
 * - A role the permission table does not allow `action` → `notFound()`. We answer a refused page
 *   exactly like a missing or foreign id (HTTP 404, the segment's not-found page, which says the
 *   role may not open it), so a page reveals nothing about what exists to someone who may not
 *   see it. Next's `forbidden()` would need the experimental `authInterrupts` flag.
 */
export async function requireMember(action?: Action): Promise<Member> {
  const member = await getCurrentMember();
  if (!member) redirect("/sign-in");
  if (action && !can(member.role, action)) notFound();
  return member;
}
