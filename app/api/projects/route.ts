import { memberRoute } from "@/lib/http/handler";
import { projectInput } from "@/lib/projects/schemas";
import { createProject, listProjects } from "@/lib/projects/service";

export const GET = memberRoute("projects:read", {}, async ({ member }) => ({ projects: await listProjects(member.organisationId) }));

export const POST = memberRoute("projects:write", { body: projectInput, status: 201 }, ({ member, body }) => createProject(member, body));
