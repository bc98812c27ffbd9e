import { memberRoute } from "@/lib/http/handler";
import { HOME_BY_ROLE } from "@/lib/permissions";

/** Who is signed in, in which organisation, with which role. */
export const GET = memberRoute("own-seats:read", {}, async ({ member }) => ({
  user: { id: member.userId, name: member.name, email: member.email, unitSystem: member.unitSystem },
  organisation: { id: member.organisationId, name: member.organisationName },
  role: member.role,
  home: HOME_BY_ROLE[member.role],
}));
