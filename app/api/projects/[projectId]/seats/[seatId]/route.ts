import { z } from "zod";
import { memberRoute } from "@/lib/http/handler";
import { elementId } from "@/lib/layout/schema";
import { seatAssignmentInput } from "@/lib/seat-assignment-schema";
import { assignSeat } from "@/lib/seat-assignments";

const params = z.strictObject({ projectId: z.uuid("not a project id"), seatId: elementId });

/** Assigns an organisation member to the seat, or clears it with null. */
export const PUT = memberRoute("seats:manage", { params, body: seatAssignmentInput }, ({ member, params, body }) =>
  assignSeat(member, params.projectId, params.seatId, body.occupantUserId),
);
