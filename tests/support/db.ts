/**
 * Database helpers for integration tests: row counts, direct reads, and closing the pool.
 *
 * How pools behave across files: with vitest's default `isolate: true` (the forks pool) each
 * integration file runs in its own child process, so each file creates its own mysql2 pool
 * and must end it in `afterAll` or the process lingers. `closeDatabase()` also forgets the pool
 * cached on globalThis, so a file that ran after it in the same process (`isolate: false`)
 * would get a new pool rather than an ended one.
 */
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { count, type SQL } from "drizzle-orm";
import type { MySqlTable } from "drizzle-orm/mysql-core";
import { getDb, pool } from "@/db/client";

export { getDb };

/** Rows in `table` (optionally those matching `where`). */
export async function countRows(table: MySqlTable, where?: SQL): Promise<number> {
  const query = getDb().select({ n: count() }).from(table);
  const [row] = await (where ? query.where(where) : query);
  return row?.n ?? 0;
}

/** Counts of several tables at once, keyed like the input, for "nothing was written" checks. */
export async function countAll<K extends string>(tables: Record<K, MySqlTable>): Promise<Record<K, number>> {
  const entries = await Promise.all(
    (Object.entries(tables) as [K, MySqlTable][]).map(async ([key, table]) => [key, await countRows(table)] as const),
  );
  return Object.fromEntries(entries) as Record<K, number>;
}

/** Ends the mysql2 pool and forgets the cached pool and Drizzle client. */
export async function closeDatabase(): Promise<void> {
  const cache = globalThis as unknown as { seatwisePool?: unknown; seatwiseDb?: unknown };
  if (!cache.seatwisePool) return;
  await pool().end();
  delete cache.seatwisePool;
  delete cache.seatwiseDb;
}

/** Points UPLOAD_DIR (read by lib/storage on every call) at a fresh temporary folder; returns its clean-up. */
export function useTemporaryUploadDir(): () => void {
  const dir = mkdtempSync(path.join(tmpdir(), "seatwise-uploads-"));
  const previous = process.env.UPLOAD_DIR;
  process.env.UPLOAD_DIR = dir;
  return () => {
    if (previous === undefined) delete process.env.UPLOAD_DIR;
    else process.env.UPLOAD_DIR = previous;
    rmSync(dir, { recursive: true, force: true });
  };
}
