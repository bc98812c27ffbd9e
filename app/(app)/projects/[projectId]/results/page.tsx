import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { z } from "zod";
import { ResultsView } from "@/components/results/results-view";
import { UnitToggle } from "@/components/results/unit-toggle";
import { PageHeader } from "@/components/ui/page-header";
import { requireMember } from "@/lib/auth/guard";
import { AppError } from "@/lib/http/errors";
import { can } from "@/lib/permissions";
import { projectIdParams } from "@/lib/projects/schemas";
import { getProject } from "@/lib/projects/service";

export const metadata: Metadata = { title: "Comfort results" };

/** Optional preselection, e.g. from the report's "back to results" link; anything else is ignored. */
const searchSchema = z.object({
  scenario: z.uuid().optional().catch(undefined),
  revision: z.coerce.number().int().min(1).optional().catch(undefined),
});

export default async function ResultsPage({
  params,
  searchParams,
}: {
  params: Promise<{ projectId: string }>;
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const member = await requireMember("projects:read");
  const parsed = projectIdParams.safeParse(await params);
  if (!parsed.success) notFound();
  const project = await getProject(member.organisationId, parsed.data.projectId).catch((error: unknown) => {
    if (error instanceof AppError && error.code === "not_found") notFound();
    throw error;
  });
  const search = searchSchema.parse(await searchParams);

  return (
    <>
      <nav aria-label="Breadcrumb" className="no-print mb-2 text-sm text-muted">
        <Link href="/projects" className="hover:underline">
          Projects
        </Link>{" "}
        /{" "}
        <Link href={`/projects/${project.id}`} className="hover:underline">
          {project.name}
        </Link>{" "}
        / <span className="text-ink">Results</span>
      </nav>
      <PageHeader title="Comfort results" actions={<UnitToggle value={member.unitSystem} />}>
        Per-seat PMV, PPD, mean radiant and operative temperature, radiant asymmetry, and panel output for one design scenario and layout
        revision of {project.name}.
      </PageHeader>
      <ResultsView
        projectId={project.id}
        projectName={project.name}
        headRevision={project.headRevision}
        system={member.unitSystem}
        canRun={can(member.role, "compute:run")}
        canEditScenarios={can(member.role, "scenarios:write")}
        initial={{ scenarioId: search.scenario, revision: search.revision }}
      />
    </>
  );
}
