import "server-only";
import { existsSync } from "node:fs";
import { mkdir, readFile, rename, writeFile } from "node:fs/promises";
import path from "node:path";
import { z } from "zod";
import type { Member } from "@/lib/auth/session";
import { runShared, startJob } from "@/lib/jobs";
import { poolOptions } from "@/lib/workers/pool";
import { LOUVER_TABLE_VERSION, louverTableKey, type LouverTable, type LouverTableParams } from "@/lib/panels/louverTable";

/**
 * Louver cavity tables, computed once per parameters and then answered at once.
 *
 * Where they live: in memory (per server process) and on disk under `LOUVER_CACHE_DIR`
 * (default `.data/cache/louver-tables`), one JSON file per table named after its key
 * (lib/panels/louverTable.ts `louverTableKey`, which carries the model version, so a model
 * change never serves an old table). Files are written atomically (temporary file + rename);
 * a file that does not parse, or whose key or version differs, is ignored and recomputed.
 * No database table: a table is a pure function of its parameters, so losing the folder only
 * costs recomputation.
 *
 * A missing table is computed as a "groove.table" job in the worker pool (lib/jobs.ts): the
 * request answers 202 with the job id at once, and the finished table is stored here. At
 * server start (instrumentation.ts) the standard tables are loaded from disk or computed in
 * the background, so no request waits on ray tracing that was done before.
 */

/** The body of `POST /api/louvers/cavity-table`. */
export const cavityTableRequest = z.strictObject({
  /** Grey wall emissivity of the cavity walls, (0, 1]. */
  wallEmissivity: z.number().gt(0).max(1),
  /** Wall finish (reflection law). */
  finish: z.enum(["diffuse", "specular"]),
  /** Opening-angle step, degrees, 0.5…30; default 5 (diffuse) or 1 (specular). */
  stepDeg: z.number().min(0.5).max(30).optional(),
});
export type CavityTableRequest = z.infer<typeof cavityTableRequest>;

/**
 * Tables warmed at start: both finishes at a high-emissivity (painted) and a low-emissivity
 * (bare metal) wall, default steps. Other parameters are computed on first request.
 */
export const STANDARD_LOUVER_TABLES: readonly LouverTableParams[] = [
  { finish: "diffuse", wallEmissivity: 0.9 },
  { finish: "diffuse", wallEmissivity: 0.1 },
  { finish: "specular", wallEmissivity: 0.9 },
  { finish: "specular", wallEmissivity: 0.1 },
];

/** Tables kept in memory at most (a table is a few tens of kB); the oldest go first. */
const MAX_TABLES_IN_MEMORY = 500;

const storedTable = z.object({
  version: z.literal(LOUVER_TABLE_VERSION),
  key: z.string(),
  wallEmissivity: z.number(),
  finish: z.enum(["diffuse", "specular"]),
  method: z.enum(["radiosity", "unfolding", "montecarlo"]),
  anglesDeg: z.array(z.number()).min(1),
  hemispherical: z.array(z.number()),
  standardError: z.array(z.number()),
  solverError: z.array(z.number()),
  directionalEmissivity: z.array(z.array(z.number())),
});

interface CacheState {
  tables: Map<string, LouverTable>;
  /** Keys whose running computation already has a store-on-completion attached. */
  storing: Set<string>;
  warmUp: Promise<WarmUpEntry[]> | null;
}

const CACHE_KEY = Symbol.for("seatwise.louverTables");

function cache(): CacheState {
  const holder = globalThis as unknown as Record<symbol, CacheState | undefined>;
  return (holder[CACHE_KEY] ??= { tables: new Map(), storing: new Set(), warmUp: null });
}

export function louverCacheDir(): string {
  return path.resolve(/*turbopackIgnore: true*/ process.env.LOUVER_CACHE_DIR ?? path.join(/*turbopackIgnore: true*/ process.cwd(), ".data", "cache", "louver-tables"));
}

/** The file of a key: the key percent-encoded (no path separators), so distinct keys never share a file. */
function fileOf(key: string): string {
  return path.join(louverCacheDir(), `${encodeURIComponent(key)}.json`);
}

function keepInMemory(table: LouverTable): void {
  const { tables } = cache();
  tables.delete(table.key);
  tables.set(table.key, table);
  while (tables.size > MAX_TABLES_IN_MEMORY) tables.delete(tables.keys().next().value!);
}

async function readFromDisk(key: string): Promise<LouverTable | null> {
  let text: string;
  try {
    text = await readFile(fileOf(key), "utf8");
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === "ENOENT") return null;
    throw error;
  }
  try {
    const parsed = storedTable.safeParse(JSON.parse(text));
    return parsed.success && parsed.data.key === key ? parsed.data : null;
  } catch {
    return null; // a damaged file is recomputed and overwritten
  }
}

async function writeToDisk(table: LouverTable): Promise<void> {
  const target = fileOf(table.key);
  await mkdir(path.dirname(target), { recursive: true });
  const temporary = `${target}.${process.pid}.${crypto.randomUUID()}.tmp`;
  await writeFile(temporary, JSON.stringify(table));
  await rename(temporary, target);
}

/** Keeps a computed table in memory and on disk (a failed write is logged; memory still serves it). */
export async function storeLouverTable(table: LouverTable): Promise<void> {
  keepInMemory(table);
  try {
    await writeToDisk(table);
  } catch (error) {
    console.error(`[seatwise] could not store louver table ${table.key}`, error);
  }
}

/** The stored table of `params` (memory, then disk), or null when it has not been computed. */
export async function cachedLouverTable(params: Readonly<LouverTableParams>): Promise<LouverTable | null> {
  const key = louverTableKey(params);
  const inMemory = cache().tables.get(key);
  if (inMemory) return inMemory;
  const onDisk = await readFromDisk(key);
  if (onDisk) keepInMemory(onDisk);
  return onDisk;
}

/** Makes sure the running computation of `params` stores its table when it ends; returns its end. */
function computeAndStore(params: LouverTableParams): Promise<boolean> {
  const key = louverTableKey(params);
  const { settled } = runShared("groove.table", params);
  const { storing } = cache();
  if (!storing.has(key)) {
    storing.add(key);
    void settled.then(async (outcome) => {
      if (outcome.ok) await storeLouverTable(outcome.output);
      storing.delete(key);
    });
  }
  return settled.then((outcome) => outcome.ok);
}

/**
 * `POST /api/louvers/cavity-table`: the table at once when it is stored, otherwise a
 * "groove.table" job (joining a computation of the same table already under way).
 */
export async function requestCavityTable(
  member: Pick<Member, "organisationId" | "userId">,
  request: CavityTableRequest,
): Promise<{ table: LouverTable } | { jobId: string }> {
  const params: LouverTableParams = { ...request };
  const table = await cachedLouverTable(params);
  if (table) return { table };
  const jobId = startJob(member, "groove.table", params);
  void computeAndStore(params); // joins the job's run; stores the table when it is done
  return { jobId };
}

export interface WarmUpEntry {
  key: string;
  source: "memory" | "disk" | "computed" | "failed";
}

/**
 * Loads or computes each table of `list`, one after another (the pool stays free for users'
 * own jobs in between). Never rejects: a failure is logged and reported in the entry.
 */
export async function warmLouverTables(list: readonly LouverTableParams[] = STANDARD_LOUVER_TABLES): Promise<WarmUpEntry[]> {
  const entries: WarmUpEntry[] = [];
  for (const params of list) {
    const key = louverTableKey(params);
    try {
      if (cache().tables.has(key)) entries.push({ key, source: "memory" });
      else if (await cachedLouverTable(params)) entries.push({ key, source: "disk" });
      else entries.push({ key, source: (await computeAndStore(params)) ? "computed" : "failed" });
    } catch (error) {
      console.error(`[seatwise] warming louver table ${key} failed`, error);
      entries.push({ key, source: "failed" });
    }
  }
  return entries;
}

/** Starts warming the standard tables in the background, once per process (instrumentation.ts). */
export function startLouverTableWarmUp(): Promise<WarmUpEntry[]> {
  const state = cache();
  const { mode, entryPath } = poolOptions();
  if (mode === "threads" && !existsSync(entryPath)) {
    // One clear line instead of a failure per table; jobs name the missing file too.
    console.error(`[seatwise] louver tables not warmed: the worker bundle ${entryPath} is missing (run \`node scripts/build-workers.mjs\`).`);
    return Promise.resolve([]);
  }
  state.warmUp ??= warmLouverTables().then((entries) => {
    const summary = entries.map((e) => `${e.key} (${e.source})`).join(", ");
    console.log(`[seatwise] louver cavity tables ready: ${summary}`);
    return entries;
  });
  return state.warmUp;
}

/**
 * Warms `list` in the background inside the running app (catalogue imports call it for their
 * products' finishes). Outside the Next.js server (scripts, tests) or with
 * SEATWISE_WARM_CACHES=0 it does nothing; tables are then computed on first request.
 */
export function warmInBackground(list: readonly LouverTableParams[]): void {
  if (process.env.NEXT_RUNTIME !== "nodejs" || process.env.SEATWISE_WARM_CACHES === "0" || list.length === 0) return;
  void warmLouverTables(list);
}

/** Forgets the in-memory tables (tests; the disk folder is left alone). */
export function clearLouverTableMemory(): void {
  cache().tables.clear();
}
