import { memberRoute } from "@/lib/http/handler";
import { panelPerformance, performanceQuery } from "@/lib/performance/service";
import { projectIdParams } from "@/lib/projects/schemas";

/** Each panel's output at every louver setting (5° steps) and the turndown ratio per panel and zone, `?scenarioId=&revision=`. */
export const GET = memberRoute("projects:read", { params: projectIdParams, query: performanceQuery }, ({ member, params, query }) =>
  panelPerformance(member, params.projectId, query),
);
