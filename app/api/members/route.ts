import { memberRoute } from "@/lib/http/handler";
import { listMembers } from "@/lib/members";

export const GET = memberRoute("members:read", {}, ({ member }) => listMembers(member.organisationId));
