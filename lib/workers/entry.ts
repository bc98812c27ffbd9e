/**
 * The worker thread's entry point. Not imported by the app: scripts/build-workers.mjs bundles
 * it (with the task registry and the pure physics it calls) into `.data/workers/entry.mjs`,
 * which lib/workers/pool.ts starts as worker threads.
 */
import { parentPort } from "node:worker_threads";
import { createProgressReporter } from "./progress";
import type { WorkerReply, WorkerRequest } from "./protocol";
import { isTaskName, taskDefinition } from "./tasks";

const port = parentPort;
if (!port) throw new Error("lib/workers/entry runs only as a worker thread");

const reply = (message: WorkerReply) => port.postMessage(message);

async function run(request: WorkerRequest): Promise<void> {
  const { runId, task } = request;
  const reporter = createProgressReporter((progress) => reply({ type: "progress", runId, progress }));
  try {
    if (!isTaskName(task)) throw new RangeError(`unknown task ${String(task)}`);
    const output = await taskDefinition(task).run(request.input, reporter.report);
    reporter.flush();
    reply({ type: "done", runId, output });
  } catch (error) {
    const e = error instanceof Error ? error : new Error(String(error));
    reply({ type: "failed", runId, error: { name: e.name, message: e.message } });
  }
}

port.on("message", (request: WorkerRequest) => {
  if (request?.type === "run") void run(request);
});
