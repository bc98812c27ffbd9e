import { memberRoute } from "@/lib/http/handler";
import { projectIdParams, projectPatch } from "@/lib/projects/schemas";
import { getProject, updateProject } from "@/lib/projects/service";

export const GET = memberRoute("projects:read", { params: projectIdParams }, ({ member, params }) =>
  getProject(member.organisationId, params.projectId),
);

export const PATCH = memberRoute("projects:write", { params: projectIdParams, body: projectPatch }, ({ member, params, body }) =>
  updateProject(member, params.projectId, body),
);
