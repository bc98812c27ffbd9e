/**
 * The louver screens' client data: one `queryOptions()` per resource next to its fetcher, and
 * the fetchers of the actions (start the optimiser, apply its result, sweep a panel). Every path
 * is the public API of docs/api.md.
 */
import { queryOptions } from "@tanstack/react-query";
import { api } from "@/lib/client/query";
import type { LayoutAtRevision } from "@/components/projects/queries";
import type { LouverTable } from "@/lib/panels/louverTable";
import type { EnergyResult, PerformanceResult, RoomLoadsResult } from "@/lib/performance/service";
import type { OptimiseResultView, SweepView } from "@/components/louvers/chart-data";

// Type-only imports from server modules are erased at build time: the browser gets none of them.
export type { EnergyResult, PerformanceResult, RoomLoadsResult } from "@/lib/performance/service";
export type { LouverTable } from "@/lib/panels/louverTable";

const base = (projectId: string) => `/api/projects/${projectId}`;

export const louverKeys = {
  /** Everything of one project (layout, revisions, these reads): invalidated after applying a result. */
  project: (projectId: string) => ["projects", projectId] as const,
  performance: (projectId: string, scenarioId: string, revision: number) => ["projects", projectId, "performance", scenarioId, revision] as const,
  loads: (projectId: string, scenarioId: string, revision: number) => ["projects", projectId, "loads", scenarioId, revision] as const,
  energy: (projectId: string, scenarioId: string, revision: number) => ["projects", projectId, "energy", scenarioId, revision] as const,
  cavityTable: (finish: string, wallEmissivity: number) => ["louver-cavity-table", finish, wallEmissivity] as const,
};

/** The head layout and the scenarios come from components/projects/queries.ts (one key per resource). */
export type HeadLayout = LayoutAtRevision;

const readQuery = (scenarioId: string, revision: number) => `?scenarioId=${encodeURIComponent(scenarioId)}&revision=${revision}`;

/** A revision never changes, so each (scenario, revision) answer stays fresh until the scenario is edited. */
export function performanceQuery(projectId: string, scenarioId: string, revision: number) {
  return queryOptions({
    queryKey: louverKeys.performance(projectId, scenarioId, revision),
    queryFn: () => api<PerformanceResult>(`${base(projectId)}/panels/performance${readQuery(scenarioId, revision)}`),
    staleTime: 5 * 60_000,
  });
}

export function loadsQuery(projectId: string, scenarioId: string, revision: number) {
  return queryOptions({
    queryKey: louverKeys.loads(projectId, scenarioId, revision),
    queryFn: () => api<RoomLoadsResult>(`${base(projectId)}/loads${readQuery(scenarioId, revision)}`),
    staleTime: 5 * 60_000,
  });
}

export function energyQuery(projectId: string, scenarioId: string, revision: number) {
  return queryOptions({
    queryKey: louverKeys.energy(projectId, scenarioId, revision),
    queryFn: () => api<EnergyResult>(`${base(projectId)}/energy${readQuery(scenarioId, revision)}`),
    staleTime: 5 * 60_000,
  });
}

/** `POST /api/louvers/cavity-table`: the table at once (200) or a job to follow (202). */
export function requestCavityTable(finish: "diffuse" | "specular", wallEmissivity: number): Promise<{ table: LouverTable } | { jobId: string }> {
  return api(`/api/louvers/cavity-table`, { method: "POST", body: { finish, wallEmissivity } });
}

export function cavityTableQuery(finish: "diffuse" | "specular", wallEmissivity: number) {
  return queryOptions({
    queryKey: louverKeys.cavityTable(finish, wallEmissivity),
    queryFn: () => requestCavityTable(finish, wallEmissivity),
    // A stored table never changes; a job answer is followed with useJob and not asked again.
    staleTime: Infinity,
  });
}

/** Starts the louver optimiser as a job (202 `{ jobId }`); its result is an {@link OptimiseResultView}. */
export function startOptimiseJob(projectId: string, scenarioId: string): Promise<{ jobId: string }> {
  return api(`${base(projectId)}/louvers/optimise/jobs`, { method: "POST", body: { scenarioId } });
}

export type { OptimiseResultView } from "@/components/louvers/chart-data";

export interface ApplyBody {
  baseRevision: number;
  panels: { id: string; openingAngleDeg: number }[];
  message?: string;
}

/** Saves the chosen angles as a new revision (409 when `baseRevision` is no longer the head). */
export function applyLouverSettings(projectId: string, body: ApplyBody): Promise<HeadLayout> {
  return api<HeadLayout>(`${base(projectId)}/louvers/apply`, { method: "POST", body });
}

export function sweepPanel(projectId: string, body: { scenarioId: string; panelId: string; anglesDeg?: number[]; revision?: number }): Promise<SweepView> {
  return api<SweepView>(`${base(projectId)}/louvers/sweep`, { method: "POST", body });
}

/** The optimiser's answer is plain data; this only narrows the job result's `unknown`. */
export function asOptimiseResult(result: unknown): OptimiseResultView | undefined {
  if (!result || typeof result !== "object") return undefined;
  const r = result as Partial<OptimiseResultView>;
  return Array.isArray(r.panels) && Array.isArray(r.seats) && Array.isArray(r.unreachable) && typeof r.totalOutputW === "number" ? (r as OptimiseResultView) : undefined;
}
