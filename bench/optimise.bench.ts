/**
 * Automatic louver settings on the demo plan (lib/demo/layout: 48 seats, 11 louvered panels in
 * 2 rooms) under the winter design: problem set-up (view factors, candidate outputs), search
 * per room, and the whole call. The budget is 2 s per optimisation. Then the PMV sweep of one
 * panel over its whole louver range (the chart of PMV per seat against opening angle; budget
 * 2 s). Prints figures; asserts nothing.
 *
 * Run: npx tsx bench/optimise.bench.ts
 */
import { louverTableFor } from "../lib/compute/comfort";
import { demoLayout } from "../lib/demo/layout";
import { buildLouverProblem, optimiseLouvers, solveLouverProblem } from "../lib/louvers/optimise";
import { sweepPanelPmv } from "../lib/louvers/sweep";
import { louverSettingsDeg } from "../lib/performance/panel-curves";
import type { LouverTable } from "../lib/panels";
import { SUMMER_DESIGN, WINTER_DESIGN } from "../lib/scenarios/schema";
import { median, timeSamples } from "./support";

const ROUNDS = 5;
const BUDGET_MS = 2000;

function time(label: string, run: () => unknown): number {
  const samples = timeSamples(run, 1, ROUNDS);
  const m = median(samples);
  console.log(`  ${label.padEnd(46)} median ${m.toFixed(1).padStart(7)} ms   min ${Math.min(...samples).toFixed(1).padStart(7)} ms   max ${Math.max(...samples).toFixed(1).padStart(7)} ms`);
  return m;
}

const layout = demoLayout();
const louverTables = new Map<string, LouverTable>();
for (const p of layout.panels) if (p.louver) louverTableFor(p.louver, louverTables); // the server cache's job
console.log(`louver optimisation — demo plan: ${layout.seats.length} seats, ${layout.panels.filter((p) => p.louver).length} louvered panels, ${layout.zones.length} zones (${ROUNDS} rounds after a warm-up)`);

// A demanding variant: a cooler room (19 °C air) and every zone asking for PMV −0.2…+0.2, so the
// search has work to do in the open office (10 louvered panels, 40 seats).
const demanding = {
  ...WINTER_DESIGN,
  conditions: { ...WINTER_DESIGN.conditions, airTemperatureC: 19 },
};
const tightLayout = { ...layout, zones: layout.zones.map((z) => ({ ...z, target: { kind: "pmvBand" as const, minPmv: -0.2, maxPmv: 0.2 } })) };

for (const [name, scenario, plan] of [["winter", WINTER_DESIGN, layout], ["summer", SUMMER_DESIGN, layout], ["winter 19 °C, band ±0.2", demanding, tightLayout]] as const) {
  const layout = plan;
  const problem = buildLouverProblem(layout, scenario.conditions, { louverTables });
  time(`${name}: problem set-up`, () => buildLouverProblem(layout, scenario.conditions, { louverTables }));
  const whole = time(`${name}: search`, () => solveLouverProblem(problem));
  const total = time(`${name}: whole call (set-up + search)`, () => optimiseLouvers(layout, scenario.conditions, { louverTables }));
  const r = optimiseLouvers(layout, scenario.conditions, { louverTables });
  for (const room of r.rooms) {
    console.log(`    room ${room.roomId.padEnd(14)} ${room.method.padEnd(10)} ${String(room.combinations).padStart(16)} combinations, ${room.evaluations} PMV evaluations`);
  }
  const inBefore = r.seats.filter((s) => s.inTargetBefore).length;
  const inAfter = r.seats.filter((s) => s.inTarget).length;
  console.log(`    seats in target ${inBefore} → ${inAfter} of ${r.seats.length}; output ${r.totalOutputBeforeW.toFixed(0)} W → ${r.totalOutputW.toFixed(0)} W; ${r.unreachable.length} unreachable`);
  console.log(`    search ${(whole / total * 100).toFixed(0)} % of the call; budget ${BUDGET_MS} ms → ${((total / BUDGET_MS) * 100).toFixed(0)} % of it`);
}

// The PMV sweep behind the chart of PMV per seat against opening angle: the demo's first window
// panel over its whole range in the default steps.
const swept = layout.panels.find((p) => p.id === "panel-oo-1");
if (swept?.louver) {
  const angles = louverSettingsDeg(swept.louver.minOpeningAngleDeg, swept.louver.maxOpeningAngleDeg);
  const ms = time(`PMV sweep of ${swept.label}: ${angles.length} angles`, () => sweepPanelPmv(layout, WINTER_DESIGN.conditions, swept.id, angles, louverTables));
  console.log(`    budget ${BUDGET_MS} ms → ${((ms / BUDGET_MS) * 100).toFixed(0)} % of it`);
}
