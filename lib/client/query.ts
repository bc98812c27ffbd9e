import { QueryClient } from "@tanstack/react-query";

/** The one QueryClient factory. */
export function makeQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: { staleTime: 30_000, retry: (count, error) => count < 2 && !(error instanceof ApiError && error.status < 500) },
    },
  });
}

export interface ApiFieldError {
  path: string;
  message: string;
}

/** An error answer from our API, with the field errors of a 400. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields: ApiFieldError[] = [],
    readonly body: Record<string, unknown> = {},
  ) {
    super(message);
    this.name = "ApiError";
  }
}

/** fetch for our JSON API: throws ApiError on a non-2xx answer. */
export async function api<T>(path: string, init: { method?: string; body?: unknown } = {}): Promise<T> {
  const res = await fetch(path, {
    method: init.method ?? "GET",
    headers: init.body === undefined ? undefined : { "content-type": "application/json" },
    body: init.body === undefined ? undefined : JSON.stringify(init.body),
    credentials: "same-origin",
  });
  if (res.status === 204) return undefined as T;
  const data = (await res.json().catch(() => ({}))) as Record<string, unknown>;
  if (!res.ok) {
    throw new ApiError(res.status, String(data.error ?? "error"), String(data.message ?? res.statusText), (data.fields as ApiFieldError[]) ?? [], data);
  }
  return data as T;
}
