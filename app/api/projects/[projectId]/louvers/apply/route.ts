import { memberRoute } from "@/lib/http/handler";
import { applyLouverSettings, applyLouversRequest } from "@/lib/louvers/service";
import { projectIdParams } from "@/lib/projects/schemas";

/** Saves `{ baseRevision, panels: [{ id, openingAngleDeg }], message? }` as a new revision (201); 409 on a stale base. */
export const POST = memberRoute("layouts:write", { params: projectIdParams, body: applyLouversRequest, status: 201 }, ({ member, params, body }) =>
  applyLouverSettings(member, params.projectId, body),
);
