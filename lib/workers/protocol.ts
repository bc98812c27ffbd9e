/**
 * Messages between the pool (lib/workers/pool.ts) and a worker thread (lib/workers/entry.ts).
 * Progress and the outcome travel on the same port (the worker's parentPort), so they arrive in
 * the order they were sent: no progress report can overtake the end of its run.
 */
import type { Progress } from "./progress";
import type { TaskName } from "./tasks";

/** Pool → worker: run one task. A worker runs one task at a time. */
export interface WorkerRequest {
  type: "run";
  runId: number;
  task: TaskName;
  /** Input already validated by the task's schema on the calling thread. */
  input: unknown;
}

/** Worker → pool. */
export type WorkerReply =
  | { type: "progress"; runId: number; progress: Progress }
  | { type: "done"; runId: number; output: unknown }
  | { type: "failed"; runId: number; error: { name: string; message: string } };
