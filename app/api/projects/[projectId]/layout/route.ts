import { z } from "zod";
import { memberRoute } from "@/lib/http/handler";
import { projectIdParams, saveLayoutInput } from "@/lib/projects/schemas";
import { getLayout, saveLayout } from "@/lib/projects/service";

const query = z.strictObject({ revision: z.coerce.number().int().min(1).optional() });

/** The head layout, or `?revision=N`. */
export const GET = memberRoute("projects:read", { params: projectIdParams, query }, ({ member, params, query }) =>
  getLayout(member.organisationId, params.projectId, query.revision),
);

/** Saves a new revision; 409 with the current head when `baseRevision` is stale. */
export const PUT = memberRoute("layouts:write", { params: projectIdParams, body: saveLayoutInput, status: 201 }, ({ member, params, body }) =>
  saveLayout(member, params.projectId, body),
);
