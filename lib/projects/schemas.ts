import { z } from "zod";
import { layoutSchema } from "@/lib/layout/schema";

const projectName = z.string().trim().min(2, "use at least 2 characters").max(120);
const projectDescription = z.string().trim().max(2000);

export const projectInput = z.strictObject({
  name: projectName,
  description: projectDescription.default(""),
});
/**
 * Only the fields sent change. Built without `.default()`: `projectInput.partial()` would still
 * fill a missing description with "" and so wipe it on every rename.
 */
export const projectPatch = z.strictObject({ name: projectName, description: projectDescription }).partial();

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
