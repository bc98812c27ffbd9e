import { memberRoute } from "@/lib/http/handler";
import { optimiseLouverSettings, optimiseRequest } from "@/lib/louvers/service";
import { projectIdParams } from "@/lib/projects/schemas";

/**
 * Automatic louver settings for `{ scenarioId }` on the head revision: waits for the search
 * (worker pool) and answers `{ panels, seats, unreachable, totalOutputW, … }`.
 */
export const POST = memberRoute("compute:run", { params: projectIdParams, body: optimiseRequest }, ({ member, params, body }) =>
  optimiseLouverSettings(member, params.projectId, body),
);
