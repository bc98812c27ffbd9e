import type { Metadata } from "next";
import { NewProjectForm } from "@/components/projects/new-project-form";
import { ProjectList } from "@/components/projects/project-list";
import { PageHeader } from "@/components/ui/page-header";
import { requireMember } from "@/lib/auth/guard";
import { can } from "@/lib/permissions";
import { listProjects } from "@/lib/projects/service";

export const metadata: Metadata = { title: "Projects" };

export default async function ProjectsPage() {
  const member = await requireMember("projects:read");
  const projects = await listProjects(member.organisationId);
  const canCreate = can(member.role, "projects:write");
  return (
    <>
      <PageHeader title="Projects">
        Floor plans of {member.organisationName}, most recently changed first. Open one to see its revisions and its plan.
      </PageHeader>
      <div className={canCreate ? "grid gap-8 lg:grid-cols-[1fr_20rem]" : undefined}>
        <section aria-label="Project list">
          <ProjectList projects={projects} canCreate={canCreate} />
        </section>
        {canCreate ? (
          <aside>
            <NewProjectForm />
          </aside>
        ) : null}
      </div>
    </>
  );
}
