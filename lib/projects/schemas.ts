import { z } from "zod";
import { layoutSchema } from "@/lib/layout/schema";

export const projectInput = z.strictObject({
  name: z.string().trim().min(2, "use at least 2 characters").max(120),
  description: z.string().trim().max(2000).default(""),
});
export const projectPatch = projectInput.partial();

export const saveLayoutInput = z.strictObject({
  /** The head revision the edit started from; a different head means someone saved meanwhile (409). */
  baseRevision: z.int().min(0),
  message: z.string().trim().min(1, "describe the change").max(200),
  layout: layoutSchema,
});

export const restoreRevisionInput = z.strictObject({
  baseRevision: z.int().min(0),
  message: z.string().trim().max(200).optional(),
});

export const projectIdParams = z.strictObject({ projectId: z.uuid("not a project id") });
export const revisionParams = z.strictObject({ projectId: z.uuid("not a project id"), number: z.coerce.number().int().min(1) });

export type ProjectInput = z.infer<typeof projectInput>;
export type SaveLayoutInput = z.infer<typeof saveLayoutInput>;
