import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { PlanEditorLoader } from "@/components/plan/plan-editor-loader";
import { requireMember } from "@/lib/auth/guard";
import { AppError } from "@/lib/http/errors";
import { can } from "@/lib/permissions";
import { projectIdParams } from "@/lib/projects/schemas";
import { getLayout, getProject } from "@/lib/projects/service";

export const metadata: Metadata = { title: "Plan" };

function notFoundOnMissing(error: unknown): never {
  if (error instanceof AppError && error.code === "not_found") notFound();
  throw error;
}

/** The plan editor; roles that cannot write layouts (the facility manager) get it read-only. */
export default async function PlanPage({ params }: { params: Promise<{ projectId: string }> }) {
  const member = await requireMember("projects:read");
  const parsed = projectIdParams.safeParse(await params);
  if (!parsed.success) notFound();
  const { projectId } = parsed.data;
  const [project, head] = await Promise.all([getProject(member.organisationId, projectId), getLayout(member.organisationId, projectId)]).catch(notFoundOnMissing);

  return (
    // The editor wants the whole window width, wider than the shell's reading column.
    <div className="relative left-1/2 w-[calc(100vw-2rem)] max-w-[1800px] -translate-x-1/2">
      <nav aria-label="Breadcrumb" className="mb-2 text-sm text-muted">
        <Link href="/projects" className="hover:underline">
          Projects
        </Link>{" "}
        /{" "}
        <Link href={`/projects/${project.id}`} className="hover:underline">
          {project.name}
        </Link>{" "}
        / <span className="text-ink">Plan</span>
      </nav>
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
