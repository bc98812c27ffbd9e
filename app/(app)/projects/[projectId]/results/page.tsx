import type { Metadata } from "next";
import { z } from "zod";
import { ResultsView } from "@/components/results/results-view";
import { UnitToggle } from "@/components/results/unit-toggle";
import { ProjectBreadcrumb } from "@/components/projects/breadcrumb";
import { PageHeader } from "@/components/ui/page-header";
import { can } from "@/lib/permissions";
import { requireProjectPage } from "@/lib/projects/page-guard";

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
  const { member, project } = await requireProjectPage(params);
  const search = searchSchema.parse(await searchParams);

  return (
    <>
      <ProjectBreadcrumb project={project} current="Results" className="no-print mb-2" />
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
