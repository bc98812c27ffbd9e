import Link from "next/link";
import type { ReactNode } from "react";

/** Projects / <project> / <page>: the trail above every project page. */
export function ProjectBreadcrumb({
  project,
  trail = [],
  current,
  className = "mb-2",
}: {
  project: { id: string; name: string };
  /** Links between the project and the current page, e.g. Results above the report. */
  trail?: ReadonlyArray<{ href: string; label: string }>;
  current?: ReactNode;
  className?: string;
}) {
  return (
    <nav aria-label="Breadcrumb" className={`${className} text-sm text-muted`}>
      <Link href="/projects" className="hover:underline">
        Projects
      </Link>{" "}
      /{" "}
      {current === undefined ? (
        <span className="text-ink">{project.name}</span>
      ) : (
        <>
          <Link href={`/projects/${project.id}`} className="hover:underline">
            {project.name}
          </Link>
          {trail.map((t) => (
            <span key={t.href}>
              {" "}
              /{" "}
              <Link href={t.href} className="hover:underline">
                {t.label}
              </Link>
            </span>
          ))}{" "}
          / <span className="text-ink">{current}</span>
        </>
      )}
    </nav>
  );
}
