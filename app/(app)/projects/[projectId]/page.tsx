import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { Suspense } from "react";
import { LayoutCounts } from "@/components/projects/layout-counts";
import { RevisionList } from "@/components/projects/revision-list";
import { PageHeader } from "@/components/ui/page-header";
import { SkeletonRows } from "@/components/ui/skeleton";
import { requireMember } from "@/lib/auth/guard";
import { AppError } from "@/lib/http/errors";
import { projectIdParams } from "@/lib/projects/schemas";
import { getLayout, getProject, listRevisions } from "@/lib/projects/service";

export const metadata: Metadata = { title: "Project" };

/** The lib answers unknown and other organisations' ids with AppError("not_found"): both are a 404 page. */
function notFoundOnMissing(error: unknown): never {
  if (error instanceof AppError && error.code === "not_found") notFound();
  throw error;
}

export default async function ProjectPage({ params }: { params: Promise<{ projectId: string }> }) {
  const member = await requireMember("projects:read");
  const parsed = projectIdParams.safeParse(await params);
  if (!parsed.success) notFound();
  const { projectId } = parsed.data;

  // Started now, awaited inside <Suspense> below; the catch only keeps an early notFound() from
  // leaving the promise's rejection unhandled (RevisionList still sees it).
  const revisions = listRevisions(member.organisationId, projectId);
  revisions.catch(() => undefined);
  const [project, head] = await Promise.all([getProject(member.organisationId, projectId), getLayout(member.organisationId, projectId)]).catch(
    notFoundOnMissing,
  );

  return (
    <>
      <nav aria-label="Breadcrumb" className="mb-2 text-sm text-muted">
        <Link href="/projects" className="hover:underline">
          Projects
        </Link>{" "}
        / <span className="text-ink">{project.name}</span>
      </nav>
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
