import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { z } from "zod";
import { ProjectBreadcrumb } from "@/components/projects/breadcrumb";
import { PrintButton } from "@/components/results/print-button";
import { ComfortReport } from "@/components/results/report";
import "@/components/results/report.css";
import { requireMember } from "@/lib/auth/guard";
import { runCompute } from "@/lib/compute/service";
import { can } from "@/lib/permissions";
import { projectIdParams } from "@/lib/projects/schemas";
import { orNotFound } from "@/lib/projects/page-guard";
import { getLayout, getProject, listRevisions } from "@/lib/projects/service";
import { listScenarios } from "@/lib/scenarios/service";

export const metadata: Metadata = { title: "Comfort report" };

const searchSchema = z.object({
  scenario: z.uuid().optional(),
  revision: z.coerce.number().int().min(1).optional(),
});

/**
 * The printable comfort report of one revision under one scenario. It computes through the same
 * service as POST /api/projects/{id}/compute (and so shares its cache), not over HTTP.
 */
export default async function ReportPage({
  params,
  searchParams,
}: {
  params: Promise<{ projectId: string }>;
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const member = await requireMember("projects:read");
  if (!can(member.role, "compute:run")) notFound();
  const parsedParams = projectIdParams.safeParse(await params);
  const search = searchSchema.safeParse(await searchParams);
  if (!parsedParams.success || !search.success) notFound();
  const { projectId } = parsedParams.data;

  const [project, scenarios, revisions] = await orNotFound(Promise.all([
    getProject(member.organisationId, projectId),
    listScenarios(member.organisationId, projectId),
    listRevisions(member.organisationId, projectId),
  ]));
  const scenario = search.data.scenario ? scenarios.find((s) => s.id === search.data.scenario) : scenarios[0];
  if (!scenario) notFound();
  const revisionNumber = search.data.revision ?? project.headRevision;
  const revision = revisions.find((r) => r.number === revisionNumber);
  if (!revision) notFound();

  const [layout, result] = await orNotFound(Promise.all([
    getLayout(member.organisationId, projectId, revisionNumber),
    runCompute(member, projectId, { scenarioId: scenario.id, revision: revisionNumber }),
  ]));

  return (
    <>
      <div className="no-print mb-6 flex flex-wrap items-center justify-between gap-3">
        <ProjectBreadcrumb
          project={project}
          trail={[{ href: `/projects/${project.id}/results?scenario=${scenario.id}&revision=${revisionNumber}`, label: "Results" }]}
          current="Report"
          className=""
        />
        <PrintButton />
      </div>
      <ComfortReport
        input={{
          project,
          revision: { ...revision, isHead: revision.number === project.headRevision },
          scenario,
          layout: layout.layout,
          result,
          generatedAt: new Date().toISOString(),
          preparedBy: member.name,
          system: member.unitSystem,
        }}
      />
    </>
  );
}
