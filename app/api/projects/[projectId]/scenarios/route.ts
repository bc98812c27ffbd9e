import { memberRoute } from "@/lib/http/handler";
import { projectIdParams } from "@/lib/projects/schemas";
import { scenarioInput } from "@/lib/scenarios/schema";
import { createScenario, listScenarios } from "@/lib/scenarios/service";

export const GET = memberRoute("projects:read", { params: projectIdParams }, async ({ member, params }) => ({
  scenarios: await listScenarios(member.organisationId, params.projectId),
}));

/** Creates a scenario; 409 when the project has one of that name. */
export const POST = memberRoute("scenarios:write", { params: projectIdParams, body: scenarioInput, status: 201 }, ({ member, params, body }) =>
  createScenario(member, params.projectId, body),
);
