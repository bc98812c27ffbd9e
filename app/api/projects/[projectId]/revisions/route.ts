import { memberRoute } from "@/lib/http/handler";
import { projectIdParams } from "@/lib/projects/schemas";
import { listRevisions } from "@/lib/projects/service";

export const GET = memberRoute("projects:read", { params: projectIdParams }, async ({ member, params }) => ({
  revisions: await listRevisions(member.organisationId, params.projectId),
}));
