import "server-only";
import { and, asc, eq, sql } from "drizzle-orm";
import { getDb, type Database, type Transaction } from "@/db/client";
import { scenarios } from "@/db/schema";
import { recordAudit } from "@/lib/audit";
import type { Member } from "@/lib/auth/session";
import { AppError, notFound } from "@/lib/http/errors";
import { getProject } from "@/lib/projects/service";
import type { ScenarioConditions, ScenarioInput } from "@/lib/scenarios/schema";

export interface Scenario {
  id: string;
  projectId: string;
  name: string;
  conditions: ScenarioConditions;
  /** Grows by one on every update; part of the compute cache key. */
  version: number;
  createdAt: string;
  updatedAt: string;
}

function toScenario(row: typeof scenarios.$inferSelect): Scenario {
  return {
    id: row.id,
    projectId: row.projectId,
    name: row.name,
    conditions: row.conditions,
    version: row.version,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

function isDuplicateKey(error: unknown): boolean {
  const e = error as { code?: string; cause?: { code?: string } };
  return e?.code === "ER_DUP_ENTRY" || e?.cause?.code === "ER_DUP_ENTRY";
}

function duplicateName(name: string): AppError {
  return new AppError("conflict", `This project has a scenario named "${name}" already.`, [{ path: "name", message: "already used in this project" }]);
}

export async function listScenarios(organisationId: string, projectId: string): Promise<Scenario[]> {
  await getProject(organisationId, projectId);
  const rows = await getDb().select().from(scenarios).where(eq(scenarios.projectId, projectId)).orderBy(asc(scenarios.createdAt), asc(scenarios.name));
  return rows.map(toScenario);
}

/** A scenario of a project of the member's organisation; 404 for unknown and foreign ids alike. */
export async function getScenario(organisationId: string, projectId: string, scenarioId: string): Promise<Scenario> {
  await getProject(organisationId, projectId);
  const [row] = await getDb()
    .select()
    .from(scenarios)
    .where(and(eq(scenarios.id, scenarioId), eq(scenarios.projectId, projectId)))
    .limit(1);
  if (!row) throw notFound("No such scenario.");
  return toScenario(row);
}

/** Inserts a scenario inside a transaction (also used by the demo seed). */
export async function insertScenario(db: Database | Transaction, projectId: string, input: ScenarioInput): Promise<string> {
  const id = crypto.randomUUID();
  await db.insert(scenarios).values({ id, projectId, name: input.name, conditions: input.conditions, version: 1 });
  return id;
}

export async function createScenario(member: Member, projectId: string, input: ScenarioInput): Promise<Scenario> {
  await getProject(member.organisationId, projectId);
  let id = "";
  try {
    await getDb().transaction(async (tx) => {
      id = await insertScenario(tx, projectId, input);
      await recordAudit(tx, {
        organisationId: member.organisationId,
        actorId: member.userId,
        action: "scenarios.save",
        targetType: "scenario",
        targetId: id,
        details: { projectId, name: input.name, version: 1 },
      });
    });
  } catch (error) {
    if (isDuplicateKey(error)) throw duplicateName(input.name);
    throw error;
  }
  return getScenario(member.organisationId, projectId, id);
}

/** Replaces a scenario's name and conditions and bumps its version (cached results of older versions stop matching). */
export async function updateScenario(member: Member, projectId: string, scenarioId: string, input: ScenarioInput): Promise<Scenario> {
  await getScenario(member.organisationId, projectId, scenarioId);
  try {
    await getDb().transaction(async (tx) => {
      await tx
        .update(scenarios)
        .set({ name: input.name, conditions: input.conditions, version: sql`${scenarios.version} + 1` })
        .where(and(eq(scenarios.id, scenarioId), eq(scenarios.projectId, projectId)));
      await recordAudit(tx, {
        organisationId: member.organisationId,
        actorId: member.userId,
        action: "scenarios.save",
        targetType: "scenario",
        targetId: scenarioId,
        details: { projectId, name: input.name },
      });
    });
  } catch (error) {
    if (isDuplicateKey(error)) throw duplicateName(input.name);
    throw error;
  }
  return getScenario(member.organisationId, projectId, scenarioId);
}
