import "server-only";
import { z } from "zod";
import type { Member } from "@/lib/auth/session";
import { AppError, notFound } from "@/lib/http/errors";
import { invalidInput, zodFieldErrors } from "@/lib/http/handler";
import { poolOptions, poolStats, runTask, TaskError } from "@/lib/workers/pool";
import { NO_PROGRESS, type Progress } from "@/lib/workers/progress";
import { TASKS, type TaskInput, type TaskName, type TaskOutput } from "@/lib/workers/tasks";

/**
 * Jobs: long computations a client starts and then follows by polling `GET /api/jobs/{id}`.
 *
 * A job belongs to one organisation (other organisations get 404, like any foreign id) and
 * points at a *run* — one execution of a task in the worker pool (lib/workers/pool.ts). Runs
 * are shared: a second request for the same task and input while the first is still queued or
 * running gets its own job on the same run instead of computing twice (the warm-up at start
 * uses the same runs, see lib/louvers/cavity-table-cache.ts).
 *
 * Limitation: the registry is in memory, per server process. A job id is only known to the
 * process that started it, jobs are lost on restart, and several server processes behind a
 * load balancer would need sticky sessions (or a shared store) for polling to find the job.
 * Results worth keeping are stored by the feature that asked for them (e.g. cavity tables on
 * disk), so losing a job only means the client starts it again.
 */

export type JobStatus = "queued" | "running" | "done" | "failed";

/** Path parameters of `/api/jobs/{jobId}`. */
export const jobIdParams = z.strictObject({ jobId: z.uuid("not a job id") });

/** What `GET /api/jobs/{id}` answers. */
export interface JobView {
  id: string;
  task: TaskName;
  status: JobStatus;
  progress: Progress;
  /** The task's output, once `status` is "done". */
  result?: unknown;
  /** Why the run failed, once `status` is "failed". */
  error?: string;
}

/** A run's end, for code that waits on it: never rejects. */
export type RunOutcome<O> = { ok: true; output: O } | { ok: false; error: string };

interface Run {
  key: string;
  task: TaskName;
  status: JobStatus;
  progress: Progress;
  result?: unknown;
  error?: string;
  finishedAt: number | null;
  settled: Promise<RunOutcome<unknown>>;
}

interface Job {
  id: string;
  organisationId: string;
  userId: string;
  run: Run;
  createdAt: number;
}

/** A finished job is kept this long for the client to read, ms. */
export const JOB_TTL_MS = 10 * 60_000;
/** Queued or running jobs one organisation may have at once. */
export const MAX_ACTIVE_JOBS_PER_ORGANISATION = 8;
/** Jobs kept in memory at most; the oldest finished ones go first. */
const MAX_JOBS = 2_000;

interface Registry {
  jobs: Map<string, Job>;
  runs: Map<string, Run>;
}

const REGISTRY_KEY = Symbol.for("seatwise.jobs");

/** On globalThis: the route bundles and instrumentation of one process share one registry. */
function registry(): Registry {
  const holder = globalThis as unknown as Record<symbol, Registry | undefined>;
  return (holder[REGISTRY_KEY] ??= { jobs: new Map(), runs: new Map() });
}

/** The message a client may see for a failed run: a task's own error (e.g. a RangeError) is shown, pool trouble is not. */
function publicError(error: unknown): string {
  if (error instanceof TaskError) return error.message;
  console.error("[seatwise] compute run failed", error);
  return "The computation could not be completed on the server.";
}

/** Validates `input` for `task`: a 400 naming each bad field. */
function parseTaskInput<N extends TaskName>(task: N, input: unknown): unknown {
  const result = TASKS[task].input.safeParse(input);
  if (!result.success) throw invalidInput(zodFieldErrors(result.error));
  return result.data;
}

/**
 * Starts (or joins) the run of `task` on `input` in the worker pool.
 * @returns `settled` (resolves when the run ends, never rejects) and whether this call created the run.
 * @throws AppError invalid_input (400) for input the task refuses; unavailable (503) when the pool's queue is full.
 */
export function runShared<N extends TaskName>(task: N, input: TaskInput<N>): { settled: Promise<RunOutcome<TaskOutput<N>>>; created: boolean } {
  const run = joinOrStartRun(task, parseTaskInput(task, input));
  return { settled: run.run.settled as Promise<RunOutcome<TaskOutput<N>>>, created: run.created };
}

function joinOrStartRun(task: TaskName, parsed: unknown): { run: Run; created: boolean } {
  const { runs } = registry();
  // The parsed input's JSON is a stable key: zod rebuilds objects in schema order.
  const key = `${task}:${JSON.stringify(parsed)}`;
  const existing = runs.get(key);
  if (existing) return { run: existing, created: false };
  const stats = poolStats();
  if (stats.queued >= poolOptions().maxQueued) throw new AppError("unavailable", "The server is busy with other computations; try again in a minute.");

  const run: Run = { key, task, status: "queued", progress: NO_PROGRESS, finishedAt: null, settled: Promise.resolve({ ok: false, error: "not started" }) };
  runs.set(key, run);
  run.settled = runTask(task, parsed as TaskInput<typeof task>, {
    onStart: () => {
      run.status = "running";
    },
    onProgress: (progress) => {
      run.progress = progress;
    },
  }).then(
    (output): RunOutcome<unknown> => {
      const total = Math.max(run.progress.total, 1);
      Object.assign(run, { status: "done", result: output, progress: { done: total, total, stage: "done" }, finishedAt: Date.now() });
      runs.delete(key);
      return { ok: true, output };
    },
    (error: unknown): RunOutcome<unknown> => {
      Object.assign(run, { status: "failed", error: publicError(error), finishedAt: Date.now() });
      runs.delete(key);
      return { ok: false, error: run.error! };
    },
  );
  return { run, created: true };
}

/** Drops jobs finished more than JOB_TTL_MS ago, and the oldest finished ones above MAX_JOBS. */
function sweep(now = Date.now()): void {
  const { jobs } = registry();
  for (const [id, job] of jobs) {
    if (job.run.finishedAt !== null && now - job.run.finishedAt > JOB_TTL_MS) jobs.delete(id);
  }
  if (jobs.size <= MAX_JOBS) return;
  const finished = [...jobs.values()].filter((j) => j.run.finishedAt !== null).sort((a, b) => a.createdAt - b.createdAt);
  for (const job of finished.slice(0, jobs.size - MAX_JOBS)) jobs.delete(job.id);
}

/**
 * Starts `task` on `input` for the member's organisation and returns the job id at once; the
 * client follows it with `GET /api/jobs/{id}`.
 * @throws AppError invalid_input (400) for bad input; unavailable (503) when the organisation
 *   already has MAX_ACTIVE_JOBS_PER_ORGANISATION jobs going or the pool's queue is full.
 */
export function startJob<N extends TaskName>(member: Pick<Member, "organisationId" | "userId">, task: N, input: TaskInput<N>): string {
  sweep();
  const { jobs } = registry();
  const parsed = parseTaskInput(task, input);
  let active = 0;
  for (const job of jobs.values()) if (job.organisationId === member.organisationId && job.run.finishedAt === null) active += 1;
  if (active >= MAX_ACTIVE_JOBS_PER_ORGANISATION) {
    throw new AppError("unavailable", `Your organisation already has ${active} computations running; wait for one to finish.`);
  }
  const { run } = joinOrStartRun(task, parsed);
  const id = crypto.randomUUID();
  jobs.set(id, { id, organisationId: member.organisationId, userId: member.userId, run, createdAt: Date.now() });
  return id;
}

/**
 * The job's state as the client sees it.
 * @throws AppError not_found (404) for an unknown or expired id, or a job of another organisation.
 */
export function getJob(member: Pick<Member, "organisationId">, jobId: string): JobView {
  sweep();
  const job = registry().jobs.get(jobId);
  if (!job || job.organisationId !== member.organisationId) throw notFound("No such job (jobs are kept for 10 minutes after they finish).");
  const { run } = job;
  return {
    id: job.id,
    task: run.task,
    status: run.status,
    progress: { ...run.progress },
    ...(run.status === "done" ? { result: run.result } : {}),
    ...(run.status === "failed" ? { error: run.error } : {}),
  };
}

/** Waits until a job's run has ended (for server code and tests; clients poll). */
export async function jobSettled(member: Pick<Member, "organisationId">, jobId: string): Promise<JobView> {
  const job = registry().jobs.get(jobId);
  if (!job || job.organisationId !== member.organisationId) throw notFound("No such job.");
  await job.run.settled;
  return getJob(member, jobId);
}
