import { z } from "zod";

/** Body of PUT /api/projects/{id}/seats/{seatId}: a user id, or null to clear the seat. */
export const seatAssignmentInput = z.strictObject({ occupantUserId: z.string().min(1).max(36).nullable() });
export type SeatAssignmentInput = z.infer<typeof seatAssignmentInput>;
