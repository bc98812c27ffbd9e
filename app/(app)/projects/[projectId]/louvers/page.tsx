import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { LouversView } from "@/components/louvers/louvers-view";
import { PageHeader } from "@/components/ui/page-header";
import { requireMember } from "@/lib/auth/guard";
import { AppError } from "@/lib/http/errors";
import { can } from "@/lib/permissions";
import { projectIdParams } from "@/lib/projects/schemas";
import { getProject } from "@/lib/projects/service";

export const metadata: Metadata = { title: "Louvers" };

/** Louver planning: automatic settings, panel performance, loads and energy for one scenario. */
export default async function LouversPage({ params }: { params: Promise<{ projectId: string }> }) {
  const member = await requireMember("projects:read");
  const parsed = projectIdParams.safeParse(await params);
  if (!parsed.success) notFound();
  const project = await getProject(member.organisationId, parsed.data.projectId).catch((error: unknown) => {
    if (error instanceof AppError && error.code === "not_found") notFound();
    throw error;
  });

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
        / <span className="text-ink">Louvers</span>
      </nav>
      <PageHeader title="Louvers and panel performance">
        Louver settings that keep each zone&apos;s seats inside their comfort target with the least panel output, each panel&apos;s output
        against its opening angle, room load coverage and schedule energy for {project.name}.
      </PageHeader>
      <LouversView projectId={project.id} canOptimise={can(member.role, "compute:run")} canApply={can(member.role, "layouts:write")} />
    </>
  );
}
