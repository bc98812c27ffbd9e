import type { Metadata } from "next";
import { MembersPanel } from "@/components/members/members-panel";
import { PageHeader } from "@/components/ui/page-header";
import { requireMember } from "@/lib/auth/guard";
import { listMembers } from "@/lib/members";
import { can } from "@/lib/permissions";

export const metadata: Metadata = { title: "Members" };

export default async function MembersPage() {
  const member = await requireMember("members:read");
  const data = await listMembers(member.organisationId);
  return (
    <>
      <PageHeader title="Members">
        Who can use {member.organisationName}&apos;s Seatwise workspace, and in which role. Designers edit plans, facility managers check seats
        against occupant reports, occupants see their own seats.
      </PageHeader>
      <MembersPanel initialData={data} canManage={can(member.role, "members:manage")} currentUserId={member.userId} />
    </>
  );
}
