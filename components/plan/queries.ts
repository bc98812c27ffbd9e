/**
 * The plan editor's client data: one `queryOptions()` per resource next to its fetcher, and the
 * mutations' fetchers. Every path is the public API documented in docs/api.md.
 */
import { queryOptions } from "@tanstack/react-query";
import { api, ApiError } from "@/lib/client/query";
import type { ComputeResult } from "@/lib/compute/types";
import type { Layout } from "@/lib/layout/schema";

export interface LayoutAtRevision {
  projectId: string;
  revision: number;
  headRevision: number;
  message: string;
  createdAt: string;
  layout: Layout;
}

export interface RevisionSummary {
  number: number;
  message: string;
  authorName: string | null;
  createdAt: string;
}

export interface ScenarioSummary {
  id: string;
  name: string;
  version: number;
}

export interface UploadedImage {
  imageId: string;
  widthPx: number;
  heightPx: number;
  contentType: string;
}

const base = (projectId: string) => `/api/projects/${projectId}`;

export const planKeys = {
  layout: (projectId: string) => ["projects", projectId, "layout"] as const,
  revisions: (projectId: string) => ["projects", projectId, "revisions"] as const,
  scenarios: (projectId: string) => ["projects", projectId, "scenarios"] as const,
};

export function revisionsQuery(projectId: string) {
  return queryOptions({
    queryKey: planKeys.revisions(projectId),
    queryFn: async () => (await api<{ revisions: RevisionSummary[] }>(`${base(projectId)}/revisions`)).revisions,
  });
}

export function scenariosQuery(projectId: string) {
  return queryOptions({
    queryKey: planKeys.scenarios(projectId),
    queryFn: async () => (await api<{ scenarios: ScenarioSummary[] }>(`${base(projectId)}/scenarios`)).scenarios,
  });
}

export function layoutQuery(projectId: string) {
  return queryOptions({
    queryKey: planKeys.layout(projectId),
    queryFn: () => api<LayoutAtRevision>(`${base(projectId)}/layout`),
  });
}

export function saveLayout(projectId: string, body: { baseRevision: number; message: string; layout: Layout }): Promise<LayoutAtRevision> {
  return api<LayoutAtRevision>(`${base(projectId)}/layout`, { method: "PUT", body });
}

export function restoreRevision(projectId: string, number: number, baseRevision: number): Promise<LayoutAtRevision> {
  return api<LayoutAtRevision>(`${base(projectId)}/revisions/${number}/restore`, { method: "POST", body: { baseRevision } });
}

export function runCompute(projectId: string, body: { scenarioId: string; revision: number }): Promise<ComputeResult> {
  return api<ComputeResult>(`${base(projectId)}/compute`, { method: "POST", body });
}

export function underlayUrl(projectId: string, imageId: string): string {
  return `${base(projectId)}/underlay/${encodeURIComponent(imageId)}`;
}

/** Multipart upload (field `file`); 413 and 415 come back as ApiError with the server's message. */
export async function uploadUnderlay(projectId: string, file: File): Promise<UploadedImage> {
  const form = new FormData();
  form.append("file", file);
  const res = await fetch(`${base(projectId)}/underlay`, { method: "POST", body: form, credentials: "same-origin" });
  const data = (await res.json().catch(() => ({}))) as Record<string, unknown>;
  if (!res.ok) throw new ApiError(res.status, String(data.error ?? "error"), String(data.message ?? res.statusText), [], data);
  return data as unknown as UploadedImage;
}
