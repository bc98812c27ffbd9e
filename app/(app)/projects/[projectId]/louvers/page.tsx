import type { Metadata } from "next";
import { LouversView } from "@/components/louvers/louvers-view";
import { ProjectBreadcrumb } from "@/components/projects/breadcrumb";
import { PageHeader } from "@/components/ui/page-header";
import { can } from "@/lib/permissions";
import { requireProjectPage } from "@/lib/projects/page-guard";

export const metadata: Metadata = { title: "Louvers" };

/** Louver planning: automatic settings, panel performance, loads and energy for one scenario. */
export default async function LouversPage({ params }: { params: Promise<{ projectId: string }> }) {
  const { member, project } = await requireProjectPage(params);

  return (
    <>
      <ProjectBreadcrumb project={project} current="Louvers" />
      <PageHeader title="Louvers and panel performance">
        Louver settings that keep each zone&apos;s seats inside their comfort target with the least panel output, each panel&apos;s output
        against its opening angle, room load coverage and schedule energy for {project.name}.
      </PageHeader>
      <LouversView projectId={project.id} canOptimise={can(member.role, "compute:run")} canApply={can(member.role, "layouts:write")} />
    </>
  );
}
