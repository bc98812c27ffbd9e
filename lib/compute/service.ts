import "server-only";
import { and, eq, sql } from "drizzle-orm";
import { getDb } from "@/db/client";
import { computeResults } from "@/db/schema";
import type { Member } from "@/lib/auth/session";
import { computeComfort } from "@/lib/compute/comfort";
import type { ComputeRequest } from "@/lib/compute/schema";
import type { ComputeResult } from "@/lib/compute/types";
import { louverTablesForLayout } from "@/lib/louvers/layout-tables";
import { getLayout } from "@/lib/projects/service";
import { getScenario } from "@/lib/scenarios/service";

/**
 * Version of the computation's method. A cached result made by another version is recomputed
 * (and replaced), so a change to the physics never serves an old answer. Bump it with every
 * change that moves a number.
 */
export const COMPUTE_MODEL_VERSION = 2;

/**
 * Comfort results for a layout revision under a scenario. Results are cached per (project,
 * revision, scenario, scenario version) and method version: revisions never change and a
 * scenario's version grows with every edit, so a cached row is never stale. Everything is read scoped to the member's
 * organisation: foreign or unknown ids are 404. The computation itself runs on the request
 * thread: the demo plan takes well under the 300 ms budget (bench/compute.bench.ts). Louvered
 * panels need cavity tables: they come from the server cache, and only a table never computed
 * before is built (in the worker pool) while the request waits.
 */
export async function runCompute(member: Member, projectId: string, request: ComputeRequest): Promise<ComputeResult> {
  const [layout, scenario] = await Promise.all([
    getLayout(member.organisationId, projectId, request.revision),
    getScenario(member.organisationId, projectId, request.scenarioId),
  ]);
  const key = and(
    eq(computeResults.projectId, projectId),
    eq(computeResults.revision, layout.revision),
    eq(computeResults.scenarioId, scenario.id),
    eq(computeResults.scenarioVersion, scenario.version),
  );
  const [hit] = await getDb().select({ result: computeResults.result }).from(computeResults).where(key).limit(1);
  if (hit && hit.result.modelVersion === COMPUTE_MODEL_VERSION) return { ...hit.result, cached: true, computeMs: 0 };

  const { tables } = await louverTablesForLayout(layout.layout);
  const started = performance.now();
  const computed = computeComfort(layout.layout, scenario.conditions, { louverTables: tables });
  const computeMs = Math.round((performance.now() - started) * 10) / 10;
  const result: ComputeResult = {
    projectId,
    revision: layout.revision,
    scenarioId: scenario.id,
    computedAt: new Date().toISOString(),
    modelVersion: COMPUTE_MODEL_VERSION,
    computeMs,
    cached: false,
    ...computed,
  };
  // A concurrent request may have stored the same key first (either copy is the same result);
  // a row from an older method version is replaced.
  await getDb()
    .insert(computeResults)
    .values({ projectId, revision: layout.revision, scenarioId: scenario.id, scenarioVersion: scenario.version, result, computeMs: Math.round(computeMs) })
    .onDuplicateKeyUpdate({ set: { result: sql`values(${computeResults.result})`, computeMs: sql`values(${computeResults.computeMs})` } });
  return result;
}
