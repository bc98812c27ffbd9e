import { computeRequest } from "@/lib/compute/schema";
import { runCompute } from "@/lib/compute/service";
import { memberRoute } from "@/lib/http/handler";
import { projectIdParams } from "@/lib/projects/schemas";

/** Comfort results for `{ scenarioId, revision? }` (head revision by default); cached per revision and scenario version. */
export const POST = memberRoute("compute:run", { params: projectIdParams, body: computeRequest }, ({ member, params, body }) =>
  runCompute(member, params.projectId, body),
);
