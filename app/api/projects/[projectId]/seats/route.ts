import { memberRoute } from "@/lib/http/handler";
import { projectIdParams } from "@/lib/projects/schemas";
import { listProjectSeats } from "@/lib/seat-assignments";

/** The project's seat records with their occupants (removed seats included, with `removedInRevision`). */
export const GET = memberRoute("projects:read", { params: projectIdParams }, async ({ member, params }) => ({
  seats: await listProjectSeats(member.organisationId, params.projectId),
}));
