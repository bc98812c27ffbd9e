/**
 * Runs once when a Next.js server process starts (Next.js calls `register`). Warms the louver
 * cavity tables (the standard finishes and those of the panel catalogue) in the background — loaded from `.data/cache/louver-tables` or computed in the
 * worker pool — without delaying start: `register` returns before the tables are ready, and a
 * request for a table that is not ready yet joins its computation as a job.
 */
export async function register(): Promise<void> {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  if (process.env.NEXT_PHASE === "phase-production-build") return; // not while building
  if (process.env.SEATWISE_WARM_CACHES === "0") return;
  const { startLouverTableWarmUp, warmLouverTables } = await import("@/lib/louvers/cavity-table-cache");
  const { catalogueLouverTableParams } = await import("@/lib/catalogue/service");
  // The standard finishes first, then those of the catalogue's products.
  void startLouverTableWarmUp()
    .then(async () => warmLouverTables(await catalogueLouverTableParams()))
    .catch((error: unknown) => console.error("[seatwise] warming the catalogue's louver tables failed", error));
}
