import { memberRoute } from "@/lib/http/handler";
import { performanceQuery, roomLoads } from "@/lib/performance/service";
import { projectIdParams } from "@/lib/projects/schemas";

/** Each room's design heat loss or sensible cooling load against its panels' output, and the panels' water side, `?scenarioId=&revision=`. */
export const GET = memberRoute("projects:read", { params: projectIdParams, query: performanceQuery }, ({ member, params, query }) =>
  roomLoads(member, params.projectId, query),
);
