import Link from "next/link";
import { DateTime } from "@/components/ui/date-time";
import type { ProjectSummary } from "@/lib/projects/service";

export function ProjectList({ projects, canCreate }: { projects: readonly ProjectSummary[]; canCreate: boolean }) {
  if (projects.length === 0) {
    return (
      <div className="rounded-lg border border-dashed border-line p-6 text-sm text-muted">
        <p className="font-medium text-ink">Your organisation has no projects yet.</p>
        <p className="mt-1">
          {canCreate
            ? "A project holds one floor plan: its rooms, radiant panels, seats and comfort zones, saved as numbered revisions. Create the first one with the form on this page."
            : "Projects are created by designers and admins. Once one of them starts a floor plan, it is listed here."}
        </p>
      </div>
    );
  }
  return (
    <ul className="divide-y divide-line rounded-lg border border-line bg-white">
      {projects.map((p) => (
        <li key={p.id} className="flex flex-wrap items-baseline justify-between gap-x-6 gap-y-1 px-4 py-3">
          <div className="min-w-0 flex-1">
            <Link href={`/projects/${p.id}`} className="font-medium text-accent-strong hover:underline">
              {p.name}
            </Link>
            {p.description ? <p className="mt-0.5 line-clamp-2 text-sm text-muted">{p.description}</p> : null}
          </div>
          <dl className="flex gap-4 text-xs text-muted">
            <div>
              <dt className="sr-only">Head revision</dt>
              <dd>Revision {p.headRevision}</dd>
            </div>
            <div>
              <dt className="sr-only">Last change</dt>
              <dd>
                Changed <DateTime iso={p.updatedAt} />
              </dd>
            </div>
          </dl>
        </li>
      ))}
    </ul>
  );
}
