/**
 * The plan editor's own client data: the underlay image. Project resources (layout, revisions,
 * scenarios, compute) are shared with the other screens in components/projects/queries.ts.
 */
import { ApiError } from "@/lib/client/query";

export interface UploadedImage {
  imageId: string;
  widthPx: number;
  heightPx: number;
  contentType: string;
}

const base = (projectId: string) => `/api/projects/${projectId}`;

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
