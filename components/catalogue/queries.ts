import { queryOptions } from "@tanstack/react-query";
import type { CatalogueRowError, PanelProduct } from "@/lib/catalogue/schema";
import { api, ApiError, type ApiFieldError } from "@/lib/client/query";

export interface ImportResult {
  imported: number;
  products: PanelProduct[];
}

/** The organisation's panel catalogue: one key, invalidated after every import and delete. */
export function catalogueProductsQuery() {
  return queryOptions({
    queryKey: ["catalogue-products"],
    queryFn: async () => (await api<{ products: PanelProduct[] }>("/api/catalogue/products")).products,
  });
}

/** Sends a CSV file as the multipart field `file`; throws ApiError (with `rows` in its body on a 400). */
export async function importCatalogueFile(file: File): Promise<ImportResult> {
  const form = new FormData();
  form.set("file", file);
  const res = await fetch("/api/catalogue/import", { method: "POST", body: form, credentials: "same-origin" });
  const data = (await res.json().catch(() => ({}))) as Record<string, unknown>;
  if (!res.ok) {
    throw new ApiError(res.status, String(data.error ?? "error"), String(data.message ?? res.statusText), (data.fields as ApiFieldError[]) ?? [], data);
  }
  return data as unknown as ImportResult;
}

export function deleteCatalogueProduct(productId: string): Promise<void> {
  return api<void>(`/api/catalogue/products/${productId}`, { method: "DELETE" });
}

/** The row-level problems of a refused import, if the error carries them. */
export function rowErrorsOf(error: unknown): CatalogueRowError[] {
  if (!(error instanceof ApiError)) return [];
  const rows = error.body.rows;
  return Array.isArray(rows) ? (rows as CatalogueRowError[]) : [];
}
