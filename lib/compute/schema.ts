import { z } from "zod";

/** Body of POST /api/projects/{id}/compute. */
export const computeRequest = z.strictObject({
  scenarioId: z.uuid("not a scenario id"),
  /** Layout revision to compute (default: the head). */
  revision: z.int().min(1).optional(),
});

export type ComputeRequest = z.infer<typeof computeRequest>;
