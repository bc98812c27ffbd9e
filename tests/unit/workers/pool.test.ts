import { fileURLToPath } from "node:url";
import { afterAll, afterEach, describe, expect, test } from "vitest";
import { ZodError } from "zod";
import { traceGroove } from "@/lib/viewfactor";
import {
  closePool, configurePool, defaultPoolOptions, poolStats, runTask, RunTimeoutError, TaskError, WorkerEntryMissingError,
} from "@/lib/workers/pool";
import type { Progress } from "@/lib/workers/progress";

const FIXTURE = fileURLToPath(new URL("./fixtures/misbehaving-worker.mjs", import.meta.url));
const trace = (seed: number) => ({ openingAngleDeg: 45, wallEmissivity: 0.5, reflection: "specular" as const, rays: 2_000, seed });

afterEach(async () => {
  await closePool();
});
afterAll(async () => {
  await configurePool(defaultPoolOptions());
});

describe("defaultPoolOptions(env)", () => {
  test("threads mode with the bundle under .data/workers unless the environment says otherwise", () => {
    const options = defaultPoolOptions({});
    expect(options.mode).toBe("threads");
    expect(options.entryPath).toMatch(/\.data\/workers\/entry\.mjs$/);
    expect(options.threads).toBeGreaterThanOrEqual(1);
    expect(options.threads).toBeLessThanOrEqual(4);
    expect(defaultPoolOptions({ SEATWISE_WORKERS: "inline", SEATWISE_WORKER_THREADS: "3" })).toMatchObject({ mode: "inline", threads: 3 });
    expect(defaultPoolOptions({ SEATWISE_WORKER_THREADS: "zero" }).threads).toBe(options.threads);
  });
});

describe("runTask(name, input, options) inline (SEATWISE_WORKERS=inline)", () => {
  test("resolves with the task's output and passes its progress on, through the same interface", async () => {
    await configurePool({ mode: "inline" });
    const reports: Progress[] = [];
    let started = 0;
    const output = await runTask("groove.trace", trace(11), { onProgress: (p) => reports.push(p), onStart: () => (started += 1) });
    expect(output).toEqual(traceGroove(trace(11)));
    expect(started).toBe(1);
    expect(reports.map((p) => p.done)).toEqual([0, 1]);
  });

  test("rejects bad input with a ZodError, and a task's RangeError as a TaskError with its message", async () => {
    await configurePool({ mode: "inline" });
    await expect(runTask("groove.trace", { ...trace(1), wallEmissivity: 2 })).rejects.toBeInstanceOf(ZodError);
    const failure = runTask("groove.table", { finish: "diffuse", wallEmissivity: 0.5, stepDeg: 0.05 });
    await expect(failure).rejects.toBeInstanceOf(TaskError);
    await expect(failure).rejects.toMatchObject({ errorName: "RangeError", message: expect.stringMatching(/2000 angles/) });
  });
});

describe("runTask in threads mode (a stand-in worker entry)", () => {
  test("carries progress and the output back from the thread", async () => {
    await configurePool({ mode: "threads", entryPath: FIXTURE, threads: 1 });
    const reports: Progress[] = [];
    const output = await runTask("groove.trace", trace(1), { onProgress: (p) => reports.push(p) });
    expect(output).toEqual({ echoed: 45 });
    expect(reports).toEqual([{ done: 0, total: 2, stage: "fixture" }, { done: 2, total: 2, stage: "fixture" }]);
  });

  test("a thread that exits fails its run only; the next run gets a new thread", async () => {
    await configurePool({ mode: "threads", entryPath: FIXTURE, threads: 1 });
    await expect(runTask("groove.trace", trace(2))).rejects.toThrow(/stopped unexpectedly \(exit code 3\)/);
    await expect(runTask("groove.trace", trace(4))).rejects.toThrow(/fixture failure/);
    await expect(runTask("groove.trace", trace(1))).resolves.toEqual({ echoed: 45 });
  });

  test("queues runs beyond the thread count and runs them in turn", async () => {
    await configurePool({ mode: "threads", entryPath: FIXTURE, threads: 1 });
    const runs = [runTask("groove.trace", trace(1)), runTask("groove.trace", trace(1)), runTask("groove.trace", trace(1))];
    expect(poolStats()).toMatchObject({ mode: "threads", threads: 1, busy: 1, queued: 2 });
    expect(await Promise.all(runs)).toEqual([{ echoed: 45 }, { echoed: 45 }, { echoed: 45 }]);
    expect(poolStats()).toMatchObject({ busy: 0, queued: 0 });
  });

  test("stops a run that exceeds the time limit", async () => {
    // 1 s, counted once the thread is up: the stand-in answers at once, so only the silent run (seed 3) reaches it, even on a loaded machine.
    await configurePool({ mode: "threads", entryPath: FIXTURE, threads: 1, timeoutMs: 1_000 });
    await expect(runTask("groove.trace", trace(3))).rejects.toBeInstanceOf(RunTimeoutError);
    await expect(runTask("groove.trace", trace(1))).resolves.toEqual({ echoed: 45 });
  });

  test("refuses work beyond the queue limit, and says so when the bundle is missing", async () => {
    await configurePool({ mode: "threads", entryPath: FIXTURE, threads: 1, maxQueued: 1, timeoutMs: 60_000 });
    const running = runTask("groove.trace", trace(1));
    const queued = runTask("groove.trace", trace(1));
    await expect(runTask("groove.trace", trace(1))).rejects.toThrow(/queue is full/);
    await Promise.all([running, queued]);
    await configurePool({ entryPath: "/nonexistent/entry.mjs" });
    await expect(runTask("groove.trace", trace(1))).rejects.toBeInstanceOf(WorkerEntryMissingError);
  });
});
