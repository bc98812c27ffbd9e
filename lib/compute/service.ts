import "server-only";
import { and, eq, sql } from "drizzle-orm";
import { getDb } from "@/db/client";
import { computeResults } from "@/db/schema";
import type { Member } from "@/lib/auth/session";
import { computeComfort } from "@/lib/compute/comfort";
import type { ComputeRequest } from "@/lib/compute/schema";
import type { ComputeResult } from "@/lib/compute/types";
import { getLayout } from "@/lib/projects/service";
import { getScenario } from "@/lib/scenarios/service";

/**
 * Comfort results for a layout revision under a scenario. Results are cached per (project,
 * revision, scenario, scenario version): revisions never change and a scenario's version grows
 * with every edit, so a cached row is never stale. Everything is read scoped to the member's
 * organisation: foreign or unknown ids are 404. Synchronous: the demo plan takes well under
 * the 300 ms budget (bench/compute.bench.ts).
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
  if (hit) return { ...hit.result, cached: true, computeMs: 0 };

  const started = performance.now();
  const computed = computeComfort(layout.layout, scenario.conditions);
  const computeMs = Math.round((performance.now() - started) * 10) / 10;
  const result: ComputeResult = {
    projectId,
    revision: layout.revision,
    scenarioId: scenario.id,
    computedAt: new Date().toISOString(),
    computeMs,
    cached: false,
    ...computed,
  };
  // A concurrent request may have stored the same key first; either copy is the same result.
  await getDb()
    .insert(computeResults)
    .values({ projectId, revision: layout.revision, scenarioId: scenario.id, scenarioVersion: scenario.version, result, computeMs: Math.round(computeMs) })
    .onDuplicateKeyUpdate({ set: { id: sql`${computeResults.id}` } });
  return result;
}
