import { z } from "zod";
import { memberRoute } from "@/lib/http/handler";
import { revokeInvitation } from "@/lib/members";

export const DELETE = memberRoute(
  "members:manage",
  { params: z.strictObject({ invitationId: z.uuid() }), status: 204 },
  ({ member, params }) => revokeInvitation(member, params.invitationId),
);
