"use client";

import type { JobStatus, Progress } from "./use-job";

const STATUS_TEXT: Record<JobStatus | "idle", string> = {
  idle: "Not started",
  queued: "Waiting for a free compute thread…",
  running: "Working…",
  done: "Done",
  failed: "Failed",
};

/**
 * A job's progress: a bar (done of total) and the stage the task reports, in a polite live
 * region so screen readers hear stage changes and the end. Use with `useJob`:
 *   const job = useJob<LouverTable>(jobId);
 *   <JobProgress label="Cavity table" status={job.status} progress={job.progress} error={job.error} />
 */
export function JobProgress({
  label,
  status,
  progress,
  error,
}: {
  /** What is being computed, e.g. "Cavity table"; names the progress bar. */
  label: string;
  status: JobStatus | "idle";
  progress: Progress | undefined;
  error?: string;
}) {
  const total = progress?.total ?? 0;
  const done = status === "done" ? total : (progress?.done ?? 0);
  const percent = status === "done" ? 100 : total > 0 ? Math.round((100 * done) / total) : 0;
  const failed = status === "failed";
  const stage = failed ? (error ?? "The computation failed.") : status === "running" && progress ? progress.stage : STATUS_TEXT[status];
  return (
    <div className="space-y-2 rounded-md border border-line bg-white px-4 py-3">
      <div
        role="progressbar"
        aria-label={`${label} progress`}
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={percent}
        aria-valuetext={total > 0 ? `${done} of ${total}` : STATUS_TEXT[status]}
        className="h-2 w-full overflow-hidden rounded bg-line/60"
      >
        <div className={`h-full transition-[width] duration-200 ${failed ? "bg-danger" : "bg-accent"}`} style={{ width: `${percent}%` }} />
      </div>
      <p role="status" aria-live="polite" className={`text-sm ${failed ? "text-danger" : "text-muted"}`}>
        <span className="font-medium text-ink">{label}:</span> {stage}
        {status === "running" && total > 0 ? ` (${done} of ${total})` : null}
      </p>
    </div>
  );
}
