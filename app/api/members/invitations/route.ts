import { inviteInput } from "@/lib/auth/schemas";
import { inviteMember } from "@/lib/auth/service";
import { memberRoute } from "@/lib/http/handler";
import { publicOrigin } from "@/lib/http/origin";

/** Creates an invitation; the response carries the link for the admin to pass on. */
export const POST = memberRoute("members:manage", { body: inviteInput, status: 201 }, ({ member, body, req }) =>
  inviteMember(member, body, publicOrigin(req)),
);
