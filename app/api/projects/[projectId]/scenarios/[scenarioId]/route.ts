import { memberRoute } from "@/lib/http/handler";
import { scenarioInput, scenarioParams } from "@/lib/scenarios/schema";
import { updateScenario } from "@/lib/scenarios/service";

/** Replaces the scenario's name and conditions; its version grows by one. 409 on a duplicate name. */
export const PUT = memberRoute("scenarios:write", { params: scenarioParams, body: scenarioInput }, ({ member, params, body }) =>
  updateScenario(member, params.projectId, params.scenarioId, body),
);
