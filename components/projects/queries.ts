/**
 * Client data of a project, shared by the plan editor, the results and the scenarios screens:
 * one `queryOptions()` per resource next to its fetcher, so each key is written once and a
 * change saved on one screen refreshes the others. Paths are the public API (docs/api.md).
 */
import { queryOptions } from "@tanstack/react-query";
import { api } from "@/lib/client/query";
import type { ComputeResult } from "@/lib/compute/types";
import type { Layout } from "@/lib/layout/schema";
import type { LayoutAtRevision, RevisionSummary } from "@/lib/projects/service";
import type { ScenarioInput } from "@/lib/scenarios/schema";
import type { Scenario } from "@/lib/scenarios/service";

// Type-only imports from server modules are erased at build time: the browser bundle gets none of them.
export type { LayoutAtRevision, RevisionSummary } from "@/lib/projects/service";
export type { Scenario } from "@/lib/scenarios/service";

const base = (projectId: string) => `/api/projects/${projectId}`;

export const projectKeys = {
  /** The head layout (changes with every save). */
  layout: (projectId: string) => ["projects", projectId, "layout"] as const,
  /** A saved revision's layout (immutable). */
  layoutAt: (projectId: string, revision: number) => ["projects", projectId, "layout", revision] as const,
  revisions: (projectId: string) => ["projects", projectId, "revisions"] as const,
  scenarios: (projectId: string) => ["projects", projectId, "scenarios"] as const,
  compute: (projectId: string) => ["compute", projectId] as const,
};

export function revisionsQuery(projectId: string) {
  return queryOptions({
    queryKey: projectKeys.revisions(projectId),
    queryFn: async () => (await api<{ revisions: RevisionSummary[] }>(`${base(projectId)}/revisions`)).revisions,
  });
}

export function scenariosQuery(projectId: string) {
  return queryOptions({
    queryKey: projectKeys.scenarios(projectId),
    queryFn: async () => (await api<{ scenarios: Scenario[] }>(`${base(projectId)}/scenarios`)).scenarios,
  });
}

export function headLayoutQuery(projectId: string) {
  return queryOptions({
    queryKey: projectKeys.layout(projectId),
    queryFn: () => api<LayoutAtRevision>(`${base(projectId)}/layout`),
  });
}

export function layoutAtQuery(projectId: string, revision: number) {
  return queryOptions({
    queryKey: projectKeys.layoutAt(projectId, revision),
    queryFn: () => api<LayoutAtRevision>(`${base(projectId)}/layout?revision=${revision}`),
    staleTime: Infinity,
  });
}

export function runCompute(projectId: string, body: { scenarioId: string; revision: number }): Promise<ComputeResult> {
  return api<ComputeResult>(`${base(projectId)}/compute`, { method: "POST", body });
}

/**
 * A computation of one (scenario, revision). A revision never changes, so the result stays
 * fresh until the scenario is edited (the scenario mutations invalidate projectKeys.compute).
 */
export function computeQuery(projectId: string, scenarioId: string, revision: number) {
  return queryOptions({
    queryKey: [...projectKeys.compute(projectId), scenarioId, revision],
    queryFn: () => runCompute(projectId, { scenarioId, revision }),
    staleTime: Infinity,
    gcTime: 30 * 60_000,
  });
}

export function saveLayout(projectId: string, body: { baseRevision: number; message: string; layout: Layout }): Promise<LayoutAtRevision> {
  return api<LayoutAtRevision>(`${base(projectId)}/layout`, { method: "PUT", body });
}

export function restoreRevision(projectId: string, number: number, baseRevision: number): Promise<LayoutAtRevision> {
  return api<LayoutAtRevision>(`${base(projectId)}/revisions/${number}/restore`, { method: "POST", body: { baseRevision } });
}

export function createScenario(projectId: string, input: ScenarioInput): Promise<Scenario> {
  return api(`${base(projectId)}/scenarios`, { method: "POST", body: input });
}

export function updateScenario(projectId: string, scenarioId: string, input: ScenarioInput): Promise<Scenario> {
  return api(`${base(projectId)}/scenarios/${scenarioId}`, { method: "PUT", body: input });
}
