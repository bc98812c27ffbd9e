import { describe, expect, test } from "vitest";
import { WEEKS_PER_YEAR } from "@/lib/energy";
import { buildLouverTable } from "@/lib/panels";
import { planEnergy, zoneEnergyPlan } from "@/lib/performance/energy";
import { panelOutputAt, roomOperatingPoints } from "@/lib/performance/panel-curves";
import { ceilingPanel, geometryOf, LOUVER, oneRoom, winter } from "./fixtures";

const TABLE = buildLouverTable({ finish: "diffuse", wallEmissivity: 0.9 });
const layout = oneRoom([
  ceilingPanel("flat", 1.5, 2),
  ceilingPanel("lv", 3.5, 2, { louver: { ...LOUVER, openingAngleDeg: 150, maxOpeningAngleDeg: 170 } }),
  ceilingPanel("far", 4.5, 3.5, { widthM: 0.5, lengthM: 0.8 }),
]);
const points = roomOperatingPoints(geometryOf(layout), winter(), new Map([["lv", TABLE]]));
const [flat, lv] = points;
/** Covers x 0–4 m: the flat and the louvered panel, not "far". */
const outline = [{ x: 0, y: 0 }, { x: 4, y: 0 }, { x: 4, y: 4 }, { x: 0, y: 4 }];
const schedule = {
  periods: [
    { days: ["mon", "tue", "wed", "thu", "fri"] as const, startHour: 8, endHour: 12, louver: { mode: "fixed" as const, openingAngleDeg: 90 } },
    { days: ["mon", "wed"] as const, startHour: 13, endHour: 18, louver: { mode: "automatic" as const } },
    { days: ["sat"] as const, startHour: 9, endHour: 10, louver: { mode: "fixed" as const, openingAngleDeg: 10 } },
  ].map((p) => ({ ...p, days: [...p.days] })),
};

describe("zoneEnergyPlan", () => {
  const plan = zoneEnergyPlan({ id: "z", outline, schedule }, points, (p) => p.panel.louver!.openingAngleDeg);

  test("only the zone's panels; fixed angle, automatic angle and the fully open angle (the louver's largest)", () => {
    expect(plan.periods).toHaveLength(3);
    for (const period of plan.periods) expect(period.panels.map((p) => p.panelId)).toEqual(["flat", "lv"]);
    const [p0, p1, p2] = plan.periods;
    expect(p0!.panels[1]).toMatchObject({ openingAngleDeg: 90 });
    expect(p0!.panels[1]!.withLouversW).toBeCloseTo(panelOutputAt(lv!, 90).totalW, 9);
    expect(p0!.panels[1]!.fullyOpenW).toBeCloseTo(panelOutputAt(lv!, 170).totalW, 9);
    expect(p1!.panels[1]!.openingAngleDeg).toBe(150); // automatic → the callback's angle
    expect(p2!.panels[1]!.openingAngleDeg).toBe(30); // 10° clamped to the louver's smallest angle
    // A flat panel gives the same output either way.
    expect(p0!.panels[0]!.withLouversW).toBeCloseTo(panelOutputAt(flat!, null).totalW, 9);
    expect(p0!.panels[0]!.fullyOpenW).toBe(p0!.panels[0]!.withLouversW);
  });

  test("energy adds up: each day is Σ periods × hours, the year is the week × 365/7, the saving is fully open − with louvers", () => {
    const e = planEnergy([plan]);
    const sum = (i: number, key: "withLouversW" | "fullyOpenW") => plan.periods[i]!.panels.reduce((s, p) => s + p[key], 0);
    const monWith = sum(0, "withLouversW") * 4 + sum(1, "withLouversW") * 5;
    expect(e.byDay.mon.withLouversWh).toBeCloseTo(monWith, 6);
    expect(e.byDay.tue.withLouversWh).toBeCloseTo(sum(0, "withLouversW") * 4, 6);
    expect(e.byDay.sat.fullyOpenWh).toBeCloseTo(sum(2, "fullyOpenW") * 1, 6);
    expect(e.byDay.sun.withLouversWh).toBe(0);
    const week = Object.values(e.byDay).reduce((s, d) => s + d.withLouversWh, 0);
    expect(e.weekly.withLouversWh).toBeCloseTo(week, 6);
    expect(e.annual.withLouversKWh).toBeCloseTo((week * WEEKS_PER_YEAR) / 1000, 9);
    expect(e.annual.savingKWh).toBeCloseTo(e.annual.fullyOpenKWh - e.annual.withLouversKWh, 9);
    expect(e.annual.savingKWh).toBeGreaterThan(0); // 90° and 30° settings emit less than 170°
  });

  test("a zone without schedule has no periods and no energy", () => {
    const none = zoneEnergyPlan({ id: "z", outline }, points, () => 180);
    expect(none.periods).toEqual([]);
    expect(planEnergy([none]).annual.withLouversKWh).toBe(0);
  });

  test("inactive panels (mode off in the scenario) contribute nothing", () => {
    const summer = roomOperatingPoints(geometryOf(layout), winter({ activeModes: ["cooling"] }), new Map([["lv", TABLE]]));
    const p = zoneEnergyPlan({ id: "z", outline, schedule }, summer, () => 180);
    expect(p.periods[0]!.panels).toEqual([]);
    expect(planEnergy([p]).weekly).toEqual({ withLouversWh: 0, fullyOpenWh: 0 });
  });
});
