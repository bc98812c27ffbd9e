import type { Metadata } from "next";
import { UnitToggle } from "@/components/results/unit-toggle";
import { ScenariosEditor } from "@/components/scenarios/scenarios-editor";
import { ProjectBreadcrumb } from "@/components/projects/breadcrumb";
import { PageHeader } from "@/components/ui/page-header";
import { can } from "@/lib/permissions";
import { requireProjectPage } from "@/lib/projects/page-guard";

export const metadata: Metadata = { title: "Design scenarios" };

export default async function ScenariosPage({ params }: { params: Promise<{ projectId: string }> }) {
  const { member, project } = await requireProjectPage(params);
  const canWrite = can(member.role, "scenarios:write");

  return (
    <>
      <ProjectBreadcrumb project={project} current="Scenarios" />
      <PageHeader title="Design scenarios" actions={<UnitToggle value={member.unitSystem} />}>
        The design conditions results are computed for: room air, humidity, air speed, clothing and activity, the outdoor temperature, which
        panels run, and the temperatures of the room surfaces.{canWrite ? "" : " Read-only for your role."}
      </PageHeader>
      <ScenariosEditor projectId={project.id} system={member.unitSystem} canWrite={canWrite} />
    </>
  );
}
