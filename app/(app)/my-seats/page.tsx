import type { Metadata } from "next";
import { PageHeader } from "@/components/ui/page-header";
import { requireMember } from "@/lib/auth/guard";
import { listOwnSeats } from "@/lib/seats";

export const metadata: Metadata = { title: "My seats" };

export default async function MySeatsPage() {
  const member = await requireMember("own-seats:read");
  const seats = await listOwnSeats(member);
  return (
    <>
      <PageHeader title="My seats">The places in {member.organisationName}&apos;s buildings where you usually sit.</PageHeader>
      {seats.length === 0 ? (
        <div className="max-w-prose rounded-lg border border-dashed border-line p-6 text-sm text-muted">
          <p className="font-medium text-ink">No seat is assigned to you yet.</p>
          <p className="mt-1">
            Your facility manager links people to seats on the floor plan. Once they have assigned yours, it appears here, and later you will be
            able to tell them how warm, cool or draughty it feels there.
          </p>
        </div>
      ) : (
        <ul className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
          {seats.map((s) => (
            <li key={`${s.projectId}/${s.seatId}`} className="rounded-lg border border-line bg-white px-4 py-3">
              <p className="text-lg font-semibold">{s.label}</p>
              <p className="text-sm text-muted">{s.projectName}</p>
            </li>
          ))}
        </ul>
      )}
    </>
  );
}
