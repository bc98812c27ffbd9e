import { memberRoute } from "@/lib/http/handler";
import { restoreRevisionInput, revisionParams } from "@/lib/projects/schemas";
import { restoreRevision } from "@/lib/projects/service";

/** Saves revision `number`'s layout as a new head revision (409 when `baseRevision` is stale). */
export const POST = memberRoute("layouts:write", { params: revisionParams, body: restoreRevisionInput, status: 201 }, ({ member, params, body }) =>
  restoreRevision(member, params.projectId, params.number, body.baseRevision, body.message),
);
