import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { Suspense } from "react";
import { ProjectBreadcrumb } from "@/components/projects/breadcrumb";
import { LayoutCounts } from "@/components/projects/layout-counts";
import { RevisionList } from "@/components/projects/revision-list";
import { PageHeader } from "@/components/ui/page-header";
import { SkeletonRows } from "@/components/ui/skeleton";
import { requireMember } from "@/lib/auth/guard";
import { projectIdParams } from "@/lib/projects/schemas";
import { orNotFound } from "@/lib/projects/page-guard";
import { getLayout, getProject, listRevisions } from "@/lib/projects/service";

export const metadata: Metadata = { title: "Project" };

export default async function ProjectPage({ params }: { params: Promise<{ projectId: string }> }) {
  const member = await requireMember("projects:read");
  const parsed = projectIdParams.safeParse(await params);
  if (!parsed.success) notFound();
  const { projectId } = parsed.data;

  // Started now, awaited inside <Suspense> below; the catch only keeps an early notFound() from
  // leaving the promise's rejection unhandled (RevisionList still sees it).
  const revisions = listRevisions(member.organisationId, projectId);
  revisions.catch(() => undefined);
  const [project, head] = await orNotFound(Promise.all([getProject(member.organisationId, projectId), getLayout(member.organisationId, projectId)]));

  return (
    <>
      <ProjectBreadcrumb project={project} />
      <PageHeader
        title={project.name}
        actions={
          <div className="flex flex-wrap gap-2">
            <Link
              href={`/projects/${project.id}/scenarios`}
              className="rounded-md border border-line bg-white px-3.5 py-2 text-sm font-medium text-ink hover:border-accent hover:text-accent-strong"
            >
              Scenarios
            </Link>
            <Link
              href={`/projects/${project.id}/results`}
              className="rounded-md border border-line bg-white px-3.5 py-2 text-sm font-medium text-ink hover:border-accent hover:text-accent-strong"
            >
              Results
            </Link>
            <Link
              href={`/projects/${project.id}/seats`}
              className="rounded-md border border-line bg-white px-3.5 py-2 text-sm font-medium text-ink hover:border-accent hover:text-accent-strong"
            >
              Seats
            </Link>
            <Link
              href={`/projects/${project.id}/louvers`}
              className="rounded-md border border-line bg-white px-3.5 py-2 text-sm font-medium text-ink hover:border-accent hover:text-accent-strong"
            >
              Louvers
            </Link>
            <Link
              href={`/projects/${project.id}/plan`}
              className="rounded-md bg-accent px-3.5 py-2 text-sm font-medium text-white hover:bg-accent-strong"
            >
              Open plan
            </Link>
          </div>
        }
      >
        {project.description || "No description yet."}
      </PageHeader>

      <section aria-labelledby="head-layout-heading" className="mb-10 space-y-3">
        <h2 id="head-layout-heading" className="text-lg font-semibold">
          Head layout <span className="font-normal text-muted">(revision {head.revision})</span>
        </h2>
        <LayoutCounts layout={head.layout} />
      </section>

      <section aria-labelledby="revisions-heading" className="space-y-3">
        <h2 id="revisions-heading" className="text-lg font-semibold">
          Revisions
        </h2>
        <Suspense fallback={<SkeletonRows rows={3} label="Loading revisions…" />}>
          <RevisionList revisions={revisions} />
        </Suspense>
      </section>
    </>
  );
}
