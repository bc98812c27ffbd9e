import "server-only";
import { notFound } from "next/navigation";
import { requireMember } from "@/lib/auth/guard";
import type { Member } from "@/lib/auth/session";
import { AppError } from "@/lib/http/errors";
import type { Action } from "@/lib/permissions";
import { projectIdParams } from "@/lib/projects/schemas";
import { getProject, type ProjectSummary } from "@/lib/projects/service";

/** Turns the lib's AppError("not_found") — unknown and other organisations' ids alike — into the 404 page. */
export function orNotFound<T>(promise: Promise<T>): Promise<T> {
  return promise.catch((error: unknown) => {
    if (error instanceof AppError && error.code === "not_found") notFound();
    throw error;
  });
}

/**
 * The gate of every page under /projects/[projectId]: the member (with `action` allowed by the
 * permission table), a well-formed id, and the project of the member's organisation — or the
 * sign-in redirect / 404 page.
 */
export async function requireProjectPage(
  params: Promise<{ projectId: string }>,
  action: Action = "projects:read",
): Promise<{ member: Member; project: ProjectSummary }> {
  const member = await requireMember(action);
  const parsed = projectIdParams.safeParse(await params);
  if (!parsed.success) notFound();
  const project = await orNotFound(getProject(member.organisationId, parsed.data.projectId));
  return { member, project };
}
