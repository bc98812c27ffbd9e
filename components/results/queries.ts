/**
 * Client data for the results and scenarios screens: one `queryOptions()` per resource next to
 * its fetcher, so each key is written once.
 */
import { queryOptions } from "@tanstack/react-query";
import { api } from "@/lib/client/query";
import type { ComputeResult } from "@/lib/compute/types";
import type { LayoutAtRevision, RevisionSummary } from "@/lib/projects/service";
import type { ScenarioInput } from "@/lib/scenarios/schema";
import type { Scenario } from "@/lib/scenarios/service";

// Type-only imports from server modules are erased at build time: the browser bundle gets none of them.
export type { Scenario } from "@/lib/scenarios/service";
export type Revision = RevisionSummary;

/**
 * Keys are shared with the plan editor's queries (components/plan/queries.ts), which cache the
 * same API answers under the same keys with the same shape (the bare list), so a change saved
 * on either screen refreshes both.
 */
export const projectKeys = {
  scenarios: (projectId: string) => ["projects", projectId, "scenarios"] as const,
  revisions: (projectId: string) => ["projects", projectId, "revisions"] as const,
  layoutAt: (projectId: string, revision: number) => ["projects", projectId, "layout", revision] as const,
  compute: (projectId: string) => ["compute", projectId] as const,
};

export async function fetchScenarios(projectId: string): Promise<Scenario[]> {
  return (await api<{ scenarios: Scenario[] }>(`/api/projects/${projectId}/scenarios`)).scenarios;
}

export function scenariosQuery(projectId: string) {
  return queryOptions({ queryKey: projectKeys.scenarios(projectId), queryFn: () => fetchScenarios(projectId) });
}

export async function fetchRevisions(projectId: string): Promise<Revision[]> {
  return (await api<{ revisions: Revision[] }>(`/api/projects/${projectId}/revisions`)).revisions;
}

export function revisionsQuery(projectId: string) {
  return queryOptions({ queryKey: projectKeys.revisions(projectId), queryFn: () => fetchRevisions(projectId) });
}

export function fetchCompute(projectId: string, scenarioId: string, revision: number): Promise<ComputeResult> {
  return api(`/api/projects/${projectId}/compute`, { method: "POST", body: { scenarioId, revision } });
}

/**
 * A computation of one (scenario, revision). A revision never changes, so the result stays
 * fresh until the scenario is edited (the scenario mutations invalidate projectKeys.compute).
 */
export function computeQuery(projectId: string, scenarioId: string, revision: number) {
  return queryOptions({
    queryKey: [...projectKeys.compute(projectId), scenarioId, revision],
    queryFn: () => fetchCompute(projectId, scenarioId, revision),
    staleTime: Infinity,
    gcTime: 30 * 60_000,
  });
}

export function createScenario(projectId: string, input: ScenarioInput): Promise<Scenario> {
  return api(`/api/projects/${projectId}/scenarios`, { method: "POST", body: input });
}

export function updateScenario(projectId: string, scenarioId: string, input: ScenarioInput): Promise<Scenario> {
  return api(`/api/projects/${projectId}/scenarios/${scenarioId}`, { method: "PUT", body: input });
}

export function updateUnitSystem(unitSystem: "si" | "ip"): Promise<{ unitSystem: "si" | "ip" }> {
  return api("/api/me/settings", { method: "PATCH", body: { unitSystem } });
}

export function fetchLayout(projectId: string, revision: number): Promise<LayoutAtRevision> {
  return api(`/api/projects/${projectId}/layout?revision=${revision}`);
}

/** A saved revision's layout (immutable once saved), e.g. for room names beside results. */
export function layoutQuery(projectId: string, revision: number) {
  return queryOptions({ queryKey: projectKeys.layoutAt(projectId, revision), queryFn: () => fetchLayout(projectId, revision), staleTime: Infinity });
}
