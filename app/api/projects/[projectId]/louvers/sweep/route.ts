import { memberRoute } from "@/lib/http/handler";
import { panelPmvSweep, sweepInput } from "@/lib/louvers/sweep";
import { projectIdParams } from "@/lib/projects/schemas";

/** PMV of each seat of a louvered panel's room against the panel's opening angle. */
export const POST = memberRoute("compute:run", { params: projectIdParams, body: sweepInput }, ({ member, params, body }) =>
  panelPmvSweep(member, params.projectId, body),
);
