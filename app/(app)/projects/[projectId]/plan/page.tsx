import type { Metadata } from "next";
import { PlanEditorLoader } from "@/components/plan/plan-editor-loader";
import { ProjectBreadcrumb } from "@/components/projects/breadcrumb";
import { can } from "@/lib/permissions";
import { orNotFound, requireProjectPage } from "@/lib/projects/page-guard";
import { getLayout } from "@/lib/projects/service";

export const metadata: Metadata = { title: "Plan" };

/** The plan editor; roles that cannot write layouts (the facility manager) get it read-only. */
export default async function PlanPage({ params }: { params: Promise<{ projectId: string }> }) {
  const { member, project } = await requireProjectPage(params);
  const head = await orNotFound(getLayout(member.organisationId, project.id));

  return (
    // The editor wants the whole window width, wider than the shell's reading column.
    <div className="relative left-1/2 w-[calc(100vw-2rem)] max-w-[1800px] -translate-x-1/2">
      <ProjectBreadcrumb project={project} current="Plan" />
      <PlanEditorLoader
        projectId={project.id}
        projectName={project.name}
        initial={{ layout: head.layout, revision: head.revision }}
        units={member.unitSystem}
        readOnly={!can(member.role, "layouts:write")}
        canCompute={can(member.role, "compute:run")}
      />
    </div>
  );
}
