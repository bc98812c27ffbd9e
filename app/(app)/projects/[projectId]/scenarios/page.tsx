import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { UnitToggle } from "@/components/results/unit-toggle";
import { ScenariosEditor } from "@/components/scenarios/scenarios-editor";
import { PageHeader } from "@/components/ui/page-header";
import { requireMember } from "@/lib/auth/guard";
import { AppError } from "@/lib/http/errors";
import { can } from "@/lib/permissions";
import { projectIdParams } from "@/lib/projects/schemas";
import { getProject } from "@/lib/projects/service";

export const metadata: Metadata = { title: "Design scenarios" };

export default async function ScenariosPage({ params }: { params: Promise<{ projectId: string }> }) {
  const member = await requireMember("projects:read");
  const parsed = projectIdParams.safeParse(await params);
  if (!parsed.success) notFound();
  const project = await getProject(member.organisationId, parsed.data.projectId).catch((error: unknown) => {
    if (error instanceof AppError && error.code === "not_found") notFound();
    throw error;
  });
  const canWrite = can(member.role, "scenarios:write");

  return (
    <>
      <nav aria-label="Breadcrumb" className="mb-2 text-sm text-muted">
        <Link href="/projects" className="hover:underline">
          Projects
        </Link>{" "}
        /{" "}
        <Link href={`/projects/${project.id}`} className="hover:underline">
          {project.name}
        </Link>{" "}
        / <span className="text-ink">Scenarios</span>
      </nav>
      <PageHeader title="Design scenarios" actions={<UnitToggle value={member.unitSystem} />}>
        The design conditions results are computed for: room air, humidity, air speed, clothing and activity, the outdoor temperature, which
        panels run, and the temperatures of the room surfaces.{canWrite ? "" : " Read-only for your role."}
      </PageHeader>
      <ScenariosEditor projectId={project.id} system={member.unitSystem} canWrite={canWrite} />
    </>
  );
}
