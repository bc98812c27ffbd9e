"use client";

import { queryOptions, useQuery } from "@tanstack/react-query";
import { api, ApiError } from "@/lib/client/query";
import type { JobStatus, JobView } from "@/lib/jobs";
import type { Progress } from "@/lib/workers/progress";

// Type-only imports from server modules are erased at build time: the browser gets none of them.
export type { JobStatus, JobView } from "@/lib/jobs";
export type { Progress } from "@/lib/workers/progress";

/** How often a running job is asked for, ms. */
export const JOB_POLL_MS = 300;

const isFinished = (status: JobStatus | undefined) => status === "done" || status === "failed";

export function fetchJob(jobId: string): Promise<JobView> {
  return api<JobView>(`/api/jobs/${encodeURIComponent(jobId)}`);
}

/**
 * A job (`GET /api/jobs/{id}`), polled every {@link JOB_POLL_MS} ms until it is done or failed;
 * a finished job never changes, so it is then fresh for good. A 404 (unknown or expired job)
 * stops the polling and is not retried.
 */
export function jobQuery(jobId: string) {
  return queryOptions({
    queryKey: ["job", jobId],
    queryFn: () => fetchJob(jobId),
    staleTime: (query) => (isFinished(query.state.data?.status) ? Infinity : 0),
    refetchInterval: (query) => (isFinished(query.state.data?.status) || query.state.error ? false : JOB_POLL_MS),
    refetchIntervalInBackground: true,
    retry: (count, error) => count < 2 && !(error instanceof ApiError && error.status < 500),
  });
}

export interface UseJob<R> {
  /** "idle" until there is a job id. */
  status: JobStatus | "idle";
  progress: Progress | undefined;
  /** The task's output once the job is done. */
  result: R | undefined;
  /** The job's failure, or why it could not be read (e.g. it expired). */
  error: string | undefined;
  /** True once the job is done or failed (or cannot be read any more). */
  finished: boolean;
}

/**
 * Follows a job started by a feature route (which answered 202 `{ jobId }`): polls it until it
 * ends. Pass null while no job is running. `R` is the task's output type.
 */
export function useJob<R = unknown>(jobId: string | null | undefined): UseJob<R> {
  const query = useQuery({ ...jobQuery(jobId ?? ""), enabled: Boolean(jobId) });
  const job = query.data;
  if (!jobId) return { status: "idle", progress: undefined, result: undefined, error: undefined, finished: false };
  const readError = query.error ? query.error.message : undefined;
  return {
    status: job?.status ?? (readError ? "failed" : "queued"),
    progress: job?.progress,
    result: job?.status === "done" ? (job.result as R) : undefined,
    error: job?.error ?? readError,
    finished: isFinished(job?.status) || Boolean(readError),
  };
}
