/**
 * Comfort computation on the demo plan (lib/demo/layout: 48 seats, 24 panels, 3 rooms,
 * heatmap at 0.25 m) under both demo scenarios: the budget is 300 ms of server time per
 * request. Also splits the time into seats and heatmap by computing without seats / with a
 * coarse grid. Prints figures; asserts nothing.
 *
 * Run: npx tsx bench/compute.bench.ts
 */
import { performance } from "node:perf_hooks";
import { computeComfort, louverTableFor } from "../lib/compute/comfort";
import type { LouverTable } from "../lib/panels";
import { demoLayout } from "../lib/demo/layout";
import { SUMMER_DESIGN, WINTER_DESIGN } from "../lib/scenarios/schema";
import { median, timeSamples } from "./support";

const WARMUP = 3;
const ROUNDS = 15;
const BUDGET_MS = 300;

function time(label: string, run: () => unknown): number {
  const samples = timeSamples(run, WARMUP, ROUNDS);
  const m = median(samples);
  console.log(`  ${label.padEnd(44)} median ${m.toFixed(1).padStart(6)} ms   min ${Math.min(...samples).toFixed(1).padStart(6)} ms   max ${Math.max(...samples).toFixed(1).padStart(6)} ms`);
  return m;
}

const layout = demoLayout();
const noSeats = { ...layout, seats: [], zones: [] };
// The louver cavity tables come from the server's cache (lib/louvers/cavity-table-cache), built once.
const louverTables = new Map<string, LouverTable>();
const tablesStarted = performance.now();
for (const p of layout.panels) if (p.louver) louverTableFor(p.louver, louverTables);
console.log(`louver cavity tables: ${louverTables.size} built once in ${(performance.now() - tablesStarted).toFixed(0)} ms (served from the cache in the app)`);
const withTables = { louverTables };
console.log(`compute — demo plan: ${layout.seats.length} seats, ${layout.panels.length} panels, ${layout.rooms.length} rooms (${ROUNDS} rounds after ${WARMUP} warm-up)`);
const firstCold = performance.now();
computeComfort(layout, WINTER_DESIGN.conditions, withTables);
console.log(`  first call (cold JIT)                         ${(performance.now() - firstCold).toFixed(1)} ms`);
const winter = time("winter design, heatmap 0.25 m", () => computeComfort(layout, WINTER_DESIGN.conditions, withTables));
const summer = time("summer design, heatmap 0.25 m", () => computeComfort(layout, SUMMER_DESIGN.conditions, withTables));
time("winter, heatmap only (no seats)", () => computeComfort(noSeats, WINTER_DESIGN.conditions, withTables));
time("winter, seats with a coarse 2 m heatmap", () => computeComfort(layout, WINTER_DESIGN.conditions, { stepM: 2, louverTables }));
const size = JSON.stringify(computeComfort(layout, WINTER_DESIGN.conditions, withTables)).length;
console.log(`  result JSON ≈ ${(size / 1024).toFixed(0)} KiB; budget ${BUDGET_MS} ms → worst median at ${((Math.max(winter, summer) / BUDGET_MS) * 100).toFixed(0)} % of it`);
