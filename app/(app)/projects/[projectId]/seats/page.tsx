import type { Metadata } from "next";
import { ProjectBreadcrumb } from "@/components/projects/breadcrumb";
import { SeatAssignments } from "@/components/seats/seat-assignments";
import { PageHeader } from "@/components/ui/page-header";
import { can } from "@/lib/permissions";
import { requireProjectPage } from "@/lib/projects/page-guard";
import { listAssignableMembers, listProjectSeats } from "@/lib/seat-assignments";

export const metadata: Metadata = { title: "Seats and occupants" };

/** Seat records and their occupants; facility managers and admins assign people to seats. */
export default async function SeatsPage({ params }: { params: Promise<{ projectId: string }> }) {
  const { member, project } = await requireProjectPage(params);
  const canManage = can(member.role, "seats:manage");
  const [seats, members] = await Promise.all([
    listProjectSeats(member.organisationId, project.id),
    canManage ? listAssignableMembers(member.organisationId) : Promise.resolve([]),
  ]);

  return (
    <>
      <ProjectBreadcrumb project={project} current="Seats" />
      <PageHeader title="Seats and occupants">
        Who sits where in {project.name}. Occupants see their seats on their own home page.{canManage ? "" : " Read-only for your role."}
      </PageHeader>
      <SeatAssignments projectId={project.id} initialSeats={seats} members={members} canManage={canManage} />
    </>
  );
}
