import "server-only";
import { louverTableParams } from "@/lib/compute/comfort";
import { AppError } from "@/lib/http/errors";
import { runShared } from "@/lib/jobs";
import { cachedLouverTable, storeLouverTable } from "@/lib/louvers/cavity-table-cache";
import type { Layout } from "@/lib/layout/schema";
import { louverTableKey, type LouverTable, type LouverTableParams } from "@/lib/panels/louverTable";

/** The cavity tables a layout's louvered panels need, and which of them this call had to compute. */
export interface LayoutLouverTables {
  /** By `louverTableKey`, ready for `computeComfort(…, { louverTables })` and the optimiser. */
  tables: Map<string, LouverTable>;
  /** Keys that were in neither the memory nor the disk cache and were computed now. */
  built: string[];
}

/**
 * Collects the cavity tables of every louvered panel of `layout` from the server cache
 * (lib/louvers/cavity-table-cache: memory, then disk). A table never computed before is built
 * as a "groove.table" run in the worker pool (joining a run already under way for the same
 * parameters) and stored, so only the first request that needs it waits.
 * @throws AppError unavailable (503) when the pool cannot build a missing table.
 */
export async function louverTablesForLayout(layout: Readonly<Layout>): Promise<LayoutLouverTables> {
  const wanted = new Map<string, LouverTableParams>();
  for (const panel of layout.panels) {
    if (!panel.louver) continue;
    const params = louverTableParams(panel.louver);
    wanted.set(louverTableKey(params), params);
  }
  const tables = new Map<string, LouverTable>();
  const built: string[] = [];
  await Promise.all(
    [...wanted].map(async ([key, params]) => {
      const cached = await cachedLouverTable(params);
      if (cached) {
        tables.set(key, cached);
        return;
      }
      const outcome = await runShared("groove.table", params).settled;
      if (!outcome.ok) throw new AppError("unavailable", `The louver cavity table could not be computed: ${outcome.error}`);
      await storeLouverTable(outcome.output);
      tables.set(key, outcome.output);
      built.push(key);
    }),
  );
  built.sort();
  return { tables, built };
}
