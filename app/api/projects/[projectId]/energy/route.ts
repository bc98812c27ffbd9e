import { memberRoute } from "@/lib/http/handler";
import { performanceQuery, scheduleEnergy } from "@/lib/performance/service";
import { projectIdParams } from "@/lib/projects/schemas";

/** Panel energy per zone schedule (per weekday and year), with louvers and fixed fully open, `?scenarioId=&revision=`. */
export const GET = memberRoute("projects:read", { params: projectIdParams, query: performanceQuery }, ({ member, params, query }) =>
  scheduleEnergy(member, params.projectId, query),
);
