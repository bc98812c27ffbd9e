/**
 * A sandbox for tests that reach the worker pool and the louver-table cache: a temporary
 * LOUVER_CACHE_DIR, an empty in-memory table cache, and the pool in `inline` mode (same
 * process) or `threads` mode (real worker threads on a bundle built into the sandbox).
 */
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { clearLouverTableMemory } from "@/lib/louvers/cavity-table-cache";
import { closePool, configurePool, defaultPoolOptions } from "@/lib/workers/pool";
import { buildWorkers } from "../../scripts/build-workers.mjs";

export interface WorkerSandbox {
  /** The temporary folder holding the cache (and the bundle in threads mode). */
  dir: string;
  close(): Promise<void>;
}

export async function openWorkerSandbox(name: string, mode: "inline" | "threads"): Promise<WorkerSandbox> {
  const previousCacheDir = process.env.LOUVER_CACHE_DIR;
  const dir = mkdtempSync(path.join(tmpdir(), `seatwise-${name}-`));
  process.env.LOUVER_CACHE_DIR = path.join(dir, "louver-tables");
  clearLouverTableMemory();
  if (mode === "threads") {
    const entryPath = await buildWorkers(path.join(dir, "workers", "entry.mjs"));
    await configurePool({ ...defaultPoolOptions(), mode, entryPath, threads: 1 });
  } else {
    await configurePool({ ...defaultPoolOptions(), mode });
  }
  return {
    dir,
    async close() {
      await closePool();
      await configurePool(defaultPoolOptions());
      clearLouverTableMemory();
      if (previousCacheDir === undefined) delete process.env.LOUVER_CACHE_DIR;
      else process.env.LOUVER_CACHE_DIR = previousCacheDir;
      rmSync(dir, { recursive: true, force: true });
    },
  };
}
