import { z } from "zod";
import { roleChangeInput } from "@/lib/auth/schemas";
import { memberRoute } from "@/lib/http/handler";
import { changeRole, removeMember } from "@/lib/members";

const params = z.strictObject({ membershipId: z.uuid("not a membership id") });

export const PATCH = memberRoute("members:manage", { params, body: roleChangeInput }, ({ member, params, body }) =>
  changeRole(member, params.membershipId, body.role),
);

export const DELETE = memberRoute("members:manage", { params, status: 204 }, ({ member, params }) =>
  removeMember(member, params.membershipId),
);
