import "server-only";
import { existsSync } from "node:fs";
import { availableParallelism } from "node:os";
import path from "node:path";
import { Worker } from "node:worker_threads";
import { createProgressReporter, NO_PROGRESS, type Progress } from "./progress";
import { isTaskName, taskDefinition, type TaskInput, type TaskName, type TaskOutput } from "./tasks";
import type { WorkerReply, WorkerRequest } from "./protocol";

/**
 * The worker pool: the one place long computations leave the request thread.
 *
 * `runTask(name, input, { onProgress })` validates the input against the task's schema (zod,
 * a ZodError for bad input), queues it and resolves with the task's output. Two modes, one
 * interface:
 * - "threads" (default): a fixed number of Node worker threads, each running the bundled entry
 *   `.data/workers/entry.mjs` (scripts/build-workers.mjs bundles lib/workers/entry.ts with
 *   esbuild; `npm start` and `npm test` build it before `next build`). The path is resolved
 *   from `process.cwd()` at run time, because Next.js bundles server code and a worker needs a
 *   standalone file: nothing of the bundle's own layout is relied on.
 * - "inline" (`SEATWISE_WORKERS=inline`): the same tasks run on the calling thread. For unit
 *   tests and debugging only — it blocks the event loop for the length of the task.
 *
 * Environment: `SEATWISE_WORKERS` ("threads" | "inline"), `SEATWISE_WORKER_THREADS` (count,
 * default one less than the cores, at least 1, at most 4), `SEATWISE_WORKER_ENTRY` (path of
 * the bundled entry). One pool per server process, kept on globalThis so module copies in
 * different Next.js chunks (and hot reloads in development) share it.
 */

export type PoolMode = "threads" | "inline";

export interface PoolOptions {
  mode: PoolMode;
  /** Worker threads in the pool (threads mode). */
  threads: number;
  /** Absolute path of the bundled worker entry (threads mode). */
  entryPath: string;
  /** Runs waiting for a thread beyond which `runTask` refuses new work (PoolBusyError). */
  maxQueued: number;
  /** A run longer than this (counted from its thread being up) is stopped, its thread replaced, and it fails with RunTimeoutError, ms. */
  timeoutMs: number;
}

export interface RunOptions {
  /** Called with each progress report of the run (throttled in the worker), then never again once it settles. */
  onProgress?: (progress: Progress) => void;
  /** Called when a thread picks the run up (threads mode) or just before it runs (inline). */
  onStart?: () => void;
}

/** The bundled worker entry is missing: the deployment skipped `node scripts/build-workers.mjs`. */
export class WorkerEntryMissingError extends Error {
  constructor(readonly entryPath: string) {
    super(`The worker bundle ${entryPath} is missing: run \`node scripts/build-workers.mjs\` before starting the server.`);
    this.name = "WorkerEntryMissingError";
  }
}

/** Too many runs are waiting for a thread. */
export class PoolBusyError extends Error {
  constructor(queued: number) {
    super(`The computation queue is full (${queued} runs waiting); try again shortly.`);
    this.name = "PoolBusyError";
  }
}

/** A run exceeded the pool's time limit and was stopped. */
export class RunTimeoutError extends Error {
  constructor(task: string, timeoutMs: number) {
    super(`${task} took longer than ${Math.round(timeoutMs / 1000)} s and was stopped.`);
    this.name = "RunTimeoutError";
  }
}

/** An error thrown inside a task, carried back from the worker with its name and message. */
export class TaskError extends Error {
  constructor(
    readonly task: string,
    readonly errorName: string,
    message: string,
  ) {
    super(message);
    this.name = "TaskError";
  }
}

export function defaultPoolOptions(env: Readonly<Record<string, string | undefined>> = process.env): PoolOptions {
  const requested = Number(env.SEATWISE_WORKER_THREADS);
  const threads = Number.isInteger(requested) && requested > 0 ? Math.min(requested, 16) : Math.max(1, Math.min(4, availableParallelism() - 1));
  return {
    mode: env.SEATWISE_WORKERS === "inline" ? "inline" : "threads",
    threads,
    // Resolved at run time from the working directory, never traced into the build output.
    entryPath: path.resolve(/*turbopackIgnore: true*/ env.SEATWISE_WORKER_ENTRY ?? path.join(/*turbopackIgnore: true*/ process.cwd(), ".data", "workers", "entry.mjs")),
    maxQueued: 200,
    timeoutMs: 5 * 60_000,
  };
}

interface Pending {
  runId: number;
  task: TaskName;
  input: unknown;
  options: RunOptions;
  resolve: (output: unknown) => void;
  reject: (error: Error) => void;
}

interface Slot {
  worker: Worker;
  current: Pending | null;
  timer: NodeJS.Timeout | null;
  /** The thread has started; a run's time limit counts from then, not from the spawn. */
  online: boolean;
}

class ThreadPool {
  private readonly slots = new Set<Slot>();
  private readonly queue: Pending[] = [];
  private nextRunId = 1;
  private closed = false;

  constructor(readonly options: PoolOptions) {}

  run(task: TaskName, input: unknown, options: RunOptions): Promise<unknown> {
    if (this.closed) return Promise.reject(new Error("The worker pool is closed."));
    if (!existsSync(this.options.entryPath)) return Promise.reject(new WorkerEntryMissingError(this.options.entryPath));
    if (this.queue.length >= this.options.maxQueued) return Promise.reject(new PoolBusyError(this.queue.length));
    return new Promise((resolve, reject) => {
      this.queue.push({ runId: this.nextRunId++, task, input, options, resolve, reject });
      this.dispatch();
    });
  }

  stats(): { threads: number; busy: number; queued: number } {
    let busy = 0;
    for (const slot of this.slots) if (slot.current) busy += 1;
    return { threads: this.slots.size, busy, queued: this.queue.length };
  }

  async close(): Promise<void> {
    this.closed = true;
    for (const pending of this.queue.splice(0)) pending.reject(new Error("The worker pool is closed."));
    await Promise.all([...this.slots].map((slot) => this.retire(slot, new Error("The worker pool is closed."))));
  }

  /** Hands queued runs to idle threads, starting threads up to the pool size. */
  private dispatch(): void {
    while (this.queue.length > 0) {
      let slot = [...this.slots].find((s) => s.current === null);
      if (!slot && this.slots.size < this.options.threads) slot = this.spawn();
      if (!slot) return;
      this.assign(slot, this.queue.shift()!);
    }
  }

  private spawn(): Slot {
    const worker = new Worker(this.options.entryPath, { name: "seatwise-compute" });
    const slot: Slot = { worker, current: null, timer: null, online: false };
    worker.once("online", () => {
      slot.online = true;
      if (slot.current) this.startTimer(slot, slot.current);
    });
    worker.on("message", (reply: WorkerReply) => this.onReply(slot, reply));
    // An uncaught error kills the thread: fail its run, forget the thread, carry on with a new one.
    worker.on("error", (error) => void this.retire(slot, error));
    worker.on("exit", (code) => void this.retire(slot, new Error(`A compute thread stopped unexpectedly (exit code ${code}).`)));
    worker.unref(); // an idle pool does not keep the process alive
    this.slots.add(slot);
    return slot;
  }

  private assign(slot: Slot, pending: Pending): void {
    slot.current = pending;
    slot.worker.ref(); // a running task does
    if (slot.online) this.startTimer(slot, pending);
    pending.options.onStart?.();
    const request: WorkerRequest = { type: "run", runId: pending.runId, task: pending.task, input: pending.input };
    slot.worker.postMessage(request);
  }

  /** Starts the run's time limit (once its thread is online). */
  private startTimer(slot: Slot, pending: Pending): void {
    slot.timer = setTimeout(() => void this.retire(slot, new RunTimeoutError(pending.task, this.options.timeoutMs)), this.options.timeoutMs);
    slot.timer.unref();
  }

  private onReply(slot: Slot, reply: WorkerReply): void {
    const pending = slot.current;
    if (!pending || reply.runId !== pending.runId) return;
    if (reply.type === "progress") {
      pending.options.onProgress?.(reply.progress);
      return;
    }
    this.release(slot);
    if (reply.type === "done") pending.resolve(reply.output);
    else pending.reject(new TaskError(pending.task, reply.error.name, reply.error.message));
    this.dispatch();
  }

  /** Frees a thread after its run settled. */
  private release(slot: Slot): void {
    if (slot.timer) clearTimeout(slot.timer);
    slot.timer = null;
    slot.current = null;
    slot.worker.unref();
  }

  /** Stops a thread (error, exit, timeout or close), failing the run it held. */
  private async retire(slot: Slot, reason: Error): Promise<void> {
    if (!this.slots.delete(slot)) return;
    const pending = slot.current;
    this.release(slot);
    pending?.reject(reason);
    await slot.worker.terminate().catch(() => undefined);
    if (!this.closed) this.dispatch();
  }
}

/** Runs a task on the calling thread through the same interface (inline mode). */
async function runInline(task: TaskName, input: unknown, options: RunOptions): Promise<unknown> {
  await Promise.resolve(); // settle asynchronously, as the threads do
  options.onStart?.();
  const reporter = createProgressReporter((progress) => options.onProgress?.(progress));
  try {
    return await taskDefinition(task).run(input, reporter.report);
  } catch (error) {
    const e = error instanceof Error ? error : new Error(String(error));
    throw new TaskError(task, e.name, e.message);
  } finally {
    reporter.flush();
  }
}

interface PoolState {
  options: PoolOptions;
  threads: ThreadPool | null;
}

const STATE_KEY = Symbol.for("seatwise.workerPool");

function state(): PoolState {
  const holder = globalThis as unknown as Record<symbol, PoolState | undefined>;
  return (holder[STATE_KEY] ??= { options: defaultPoolOptions(), threads: null });
}

/** Replaces the pool's options (closing the current threads). For tests and start-up. */
export async function configurePool(options: Partial<PoolOptions>): Promise<void> {
  const s = state();
  await s.threads?.close();
  s.threads = null;
  s.options = { ...s.options, ...options };
}

/** Current options of the pool. */
export function poolOptions(): Readonly<PoolOptions> {
  return state().options;
}

/** How busy the pool is (threads mode; zeros inline). */
export function poolStats(): { mode: PoolMode; threads: number; busy: number; queued: number } {
  const s = state();
  return { mode: s.options.mode, ...(s.threads?.stats() ?? { threads: 0, busy: 0, queued: 0 }) };
}

/** Stops every thread; queued and running runs fail. The next `runTask` starts a fresh pool. */
export async function closePool(): Promise<void> {
  const s = state();
  const threads = s.threads;
  s.threads = null;
  await threads?.close();
}

/**
 * Runs task `name` with `input` off the request thread and resolves with its output.
 * @throws ZodError (synchronously rejected) for input the task's schema refuses; TaskError when
 *   the task throws; WorkerEntryMissingError, PoolBusyError, RunTimeoutError from the pool.
 */
export async function runTask<N extends TaskName>(name: N, input: TaskInput<N>, options: RunOptions = {}): Promise<TaskOutput<N>> {
  if (!isTaskName(name)) throw new RangeError(`unknown task ${String(name)}`);
  const parsed = taskDefinition(name).input.parse(input);
  const s = state();
  if (s.options.mode === "inline") return (await runInline(name, parsed, options)) as TaskOutput<N>;
  s.threads ??= new ThreadPool(s.options);
  return (await s.threads.run(name, parsed, options)) as TaskOutput<N>;
}

export { NO_PROGRESS };
