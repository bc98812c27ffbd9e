import "server-only";
import { and, desc, eq, isNull, lt, sql } from "drizzle-orm";
import { getDb, type Transaction } from "@/db/client";
import { layoutRevisions, projects, seats, users } from "@/db/schema";
import { recordAudit } from "@/lib/audit";
import type { Member } from "@/lib/auth/session";
import { AppError, notFound } from "@/lib/http/errors";
import { emptyLayout, type Layout } from "@/lib/layout/schema";
import type { ProjectInput, SaveLayoutInput } from "@/lib/projects/schemas";

export interface ProjectSummary {
  id: string;
  name: string;
  description: string;
  headRevision: number;
  createdAt: string;
  updatedAt: string;
}

export interface RevisionSummary {
  number: number;
  message: string;
  authorName: string | null;
  createdAt: string;
}

export interface LayoutAtRevision {
  projectId: string;
  revision: number;
  headRevision: number;
  message: string;
  createdAt: string;
  layout: Layout;
}

function toSummary(row: typeof projects.$inferSelect): ProjectSummary {
  return {
    id: row.id,
    name: row.name,
    description: row.description,
    headRevision: row.headRevision,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

export async function listProjects(organisationId: string): Promise<ProjectSummary[]> {
  const rows = await getDb().select().from(projects).where(eq(projects.organisationId, organisationId)).orderBy(desc(projects.updatedAt));
  return rows.map(toSummary);
}

/** A project of the member's organisation; 404 for unknown ids and for other organisations' ids alike. */
export async function getProject(organisationId: string, projectId: string): Promise<ProjectSummary> {
  const [row] = await getDb()
    .select()
    .from(projects)
    .where(and(eq(projects.id, projectId), eq(projects.organisationId, organisationId)))
    .limit(1);
  if (!row) throw notFound("No such project.");
  return toSummary(row);
}

/** Creates a project with revision 1 holding an empty layout (or the one given). */
export async function createProject(member: Member, input: ProjectInput, layout: Layout = emptyLayout()): Promise<ProjectSummary> {
  const id = crypto.randomUUID();
  await getDb().transaction(async (tx) => {
    await tx.insert(projects).values({
      id,
      organisationId: member.organisationId,
      name: input.name,
      description: input.description,
      headRevision: 1,
      createdBy: member.userId,
    });
    await tx.insert(layoutRevisions).values({ projectId: id, number: 1, authorId: member.userId, message: "Project created", layout });
    await syncSeats(tx, id, layout, 1);
    await recordAudit(tx, { organisationId: member.organisationId, actorId: member.userId, action: "projects.create", targetType: "project", targetId: id });
  });
  return getProject(member.organisationId, id);
}

export async function updateProject(member: Member, projectId: string, patch: Partial<ProjectInput>): Promise<ProjectSummary> {
  const current = await getProject(member.organisationId, projectId);
  if (Object.keys(patch).length === 0) return current;
  await getDb().transaction(async (tx) => {
    await tx.update(projects).set(patch).where(and(eq(projects.id, projectId), eq(projects.organisationId, member.organisationId)));
    await recordAudit(tx, { organisationId: member.organisationId, actorId: member.userId, action: "projects.update", targetType: "project", targetId: projectId, details: patch });
  });
  return getProject(member.organisationId, projectId);
}

export async function listRevisions(organisationId: string, projectId: string): Promise<RevisionSummary[]> {
  await getProject(organisationId, projectId);
  const rows = await getDb()
    .select({ number: layoutRevisions.number, message: layoutRevisions.message, authorName: users.name, createdAt: layoutRevisions.createdAt })
    .from(layoutRevisions)
    .leftJoin(users, eq(users.id, layoutRevisions.authorId))
    .where(eq(layoutRevisions.projectId, projectId))
    .orderBy(desc(layoutRevisions.number));
  return rows.map((r) => ({ ...r, createdAt: r.createdAt.toISOString() }));
}

/** The layout at `revision` (default: the head). */
export async function getLayout(organisationId: string, projectId: string, revision?: number): Promise<LayoutAtRevision> {
  const project = await getProject(organisationId, projectId);
  const number = revision ?? project.headRevision;
  const [row] = await getDb()
    .select()
    .from(layoutRevisions)
    .where(and(eq(layoutRevisions.projectId, projectId), eq(layoutRevisions.number, number)))
    .limit(1);
  if (!row) throw notFound(`No revision ${number}.`);
  return {
    projectId,
    revision: row.number,
    headRevision: project.headRevision,
    message: row.message,
    createdAt: row.createdAt.toISOString(),
    layout: row.layout,
  };
}

/**
 * Keeps the seats table in step with a new revision: seats in the layout are upserted (their
 * ids are stable across revisions), seats no longer in it are marked removed. Occupant
 * assignments survive both.
 */
async function syncSeats(tx: Transaction, projectId: string, layout: Layout, revision: number): Promise<void> {
  if (layout.seats.length > 0) {
    await tx
      .insert(seats)
      .values(layout.seats.map((s) => ({ projectId, seatId: s.id, label: s.label, firstRevision: revision, lastRevision: revision })))
      .onDuplicateKeyUpdate({
        set: { label: sql`values(${seats.label})`, lastRevision: revision, removedInRevision: null },
      });
  }
  await tx
    .update(seats)
    .set({ removedInRevision: revision })
    .where(and(eq(seats.projectId, projectId), lt(seats.lastRevision, revision), isNull(seats.removedInRevision)));
}

/**
 * Appends a revision. The project row is locked and its head compared with `baseRevision`:
 * a save based on a stale head is refused with 409 and writes nothing.
 */
async function appendRevision(member: Member, projectId: string, baseRevision: number, message: string, layout: Layout, action: "layouts.save" | "layouts.restore"): Promise<LayoutAtRevision> {
  const number = await getDb().transaction(async (tx) => {
    const [project] = await tx
      .select({ headRevision: projects.headRevision })
      .from(projects)
      .where(and(eq(projects.id, projectId), eq(projects.organisationId, member.organisationId)))
      .for("update");
    if (!project) throw notFound("No such project.");
    if (project.headRevision !== baseRevision) {
      throw new AppError("conflict", `Revision ${project.headRevision} was saved after the revision ${baseRevision} you started from.`, undefined, {
        headRevision: project.headRevision,
      });
    }
    const next = project.headRevision + 1;
    await tx.insert(layoutRevisions).values({ projectId, number: next, authorId: member.userId, message, layout });
    await tx.update(projects).set({ headRevision: next }).where(eq(projects.id, projectId));
    await syncSeats(tx, projectId, layout, next);
    await recordAudit(tx, {
      organisationId: member.organisationId,
      actorId: member.userId,
      action,
      targetType: "project",
      targetId: projectId,
      details: { revision: next, message },
    });
    return next;
  });
  return getLayout(member.organisationId, projectId, number);
}

export function saveLayout(member: Member, projectId: string, input: SaveLayoutInput): Promise<LayoutAtRevision> {
  return appendRevision(member, projectId, input.baseRevision, input.message, input.layout, "layouts.save");
}

/** Restoring an old revision saves its layout as a new revision; history is never rewritten. */
export async function restoreRevision(member: Member, projectId: string, number: number, baseRevision: number, message?: string): Promise<LayoutAtRevision> {
  const old = await getLayout(member.organisationId, projectId, number);
  return appendRevision(member, projectId, baseRevision, message || `Restored revision ${number}`, old.layout, "layouts.restore");
}
