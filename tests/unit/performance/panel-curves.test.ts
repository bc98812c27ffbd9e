import { describe, expect, test } from "vitest";
import { buildLouverTable, panelOutput } from "@/lib/panels";
import {
  louverSettingsDeg, panelOutputAt, panelOutputCurve, panelsInZone, panelTurndownRatio, roomAustC, roomOperatingPoints, zoneTurndown, type OutputPoint,
} from "@/lib/performance/panel-curves";
import { ceilingPanel, geometryOf, LOUVER, oneRoom, winter } from "./fixtures";

const TABLE = buildLouverTable({ finish: "diffuse", wallEmissivity: 0.9 });

describe("louverSettingsDeg", () => {
  test.each([
    { min: 30, max: 180, expected: Array.from({ length: 31 }, (_, i) => 30 + 5 * i) },
    { min: 32, max: 50, expected: [32, 35, 40, 45, 50] },
    { min: 0, max: 12, expected: [0, 5, 10, 12] },
    { min: 90, max: 90, expected: [90] },
  ])("($min, $max) → the ends and the 5° multiples between", ({ min, max, expected }) => {
    expect(louverSettingsDeg(min, max)).toEqual(expected);
  });
  test("a reversed range is a RangeError", () => {
    expect(() => louverSettingsDeg(120, 60)).toThrow(RangeError);
  });
});

describe("roomAustC", () => {
  /** The one-room plan with its window given as a surface temperature. */
  function withWindowAt(surfaceTemperatureC: number) {
    const layout = oneRoom([ceilingPanel("p1", 2.5, 2)]);
    layout.openings[0]!.thermal = { kind: "surfaceTemperature", surfaceTemperatureC };
    return layout;
  }
  test("every surface at the air temperature gives the air temperature", () => {
    const c = winter({ surfaces: { exteriorWalls: { kind: "surfaceTemperature", surfaceTemperatureC: 20 }, interiorWalls: null, floor: null, ceiling: null, openings: { kind: "uValue", uValueWm2K: 1.4 } } });
    expect(roomAustC(geometryOf(withWindowAt(20)), c)).toBeCloseTo(20, 9);
  });
  test("area-weighted over net areas, active panels left out", () => {
    // Walls 51 m² net at 16 °C, window 3 m² at 10 °C, floor 20 m² and ceiling 20 − 2 m² (panel) at 20 °C.
    const c = winter({ surfaces: { exteriorWalls: { kind: "surfaceTemperature", surfaceTemperatureC: 16 }, interiorWalls: null, floor: null, ceiling: null, openings: { kind: "surfaceTemperature", surfaceTemperatureC: 10 } } });
    const expected = (51 * 16 + 3 * 10 + 20 * 20 + 18 * 20) / (51 + 3 + 20 + 18);
    expect(roomAustC(geometryOf(withWindowAt(10)), c)).toBeCloseTo(expected, 9);
    // The same panel inactive counts at its host's (the ceiling's) temperature: back to the full ceiling.
    const off = { ...c, activeModes: [] };
    expect(roomAustC(geometryOf(withWindowAt(10)), off)).toBeCloseTo((51 * 16 + 3 * 10 + 40 * 20) / 94, 9);
  });
});

describe("panelOutputCurve", () => {
  const layout = oneRoom([ceilingPanel("flat", 1.5, 2), ceilingPanel("louvered", 3.5, 2, { louver: { ...LOUVER } })]);
  const tables = new Map([["louvered", TABLE]]);
  const [flat, louvered] = roomOperatingPoints(geometryOf(layout), winter(), tables);

  test("a flat panel gives one point, equal to panelOutput at the room's AUST", () => {
    const curve = panelOutputCurve(flat!);
    expect(curve).toHaveLength(1);
    const direct = panelOutput({ orientation: "ceiling", mode: "heating", surfaceC: 32, airC: 20, austC: flat!.austC, emissivity: 0.9, areaM2: 2, equivalentDiameterM: (4 * 2) / 6 });
    expect(curve[0]!.openingAngleDeg).toBeNull();
    expect(curve[0]!.totalW).toBeCloseTo(direct.totalW, 9);
    expect(curve[0]!.radiantWm2).toBeCloseTo(direct.radiantWm2, 9);
    expect(panelTurndownRatio(flat!, curve)).toBeNull();
  });

  test("a louvered panel: one point per 5° across 30–180°, parts add up, output rises with the opening, turndown = max/min", () => {
    const curve = panelOutputCurve(louvered!);
    expect(curve.map((p) => p.openingAngleDeg)).toEqual(louverSettingsDeg(30, 180));
    for (const p of curve) {
      expect(p.radiantW + p.convectiveW).toBeCloseTo(p.totalW, 9);
      expect(p.totalWm2 * 2).toBeCloseTo(p.totalW, 9);
    }
    for (let i = 1; i < curve.length; i++) expect(curve[i]!.totalW).toBeGreaterThanOrEqual(curve[i - 1]!.totalW);
    // The convective part does not depend on the louver.
    expect(curve[0]!.convectiveW).toBeCloseTo(curve.at(-1)!.convectiveW, 9);
    const ratio = panelTurndownRatio(louvered!, curve)!;
    expect(ratio).toBeCloseTo(curve.at(-1)!.totalW / curve[0]!.totalW, 9);
    expect(ratio).toBeGreaterThan(1.1);
  });

  test("panelOutputAt clamps into the louver range and matches the curve", () => {
    const curve = panelOutputCurve(louvered!);
    expect(panelOutputAt(louvered!, 10).totalW).toBeCloseTo(curve[0]!.totalW, 9);
    expect(panelOutputAt(louvered!, 120).totalW).toBeCloseTo(curve.find((p) => p.openingAngleDeg === 120)!.totalW, 9);
  });

  test("an inactive panel gives 0 W at every setting", () => {
    const [, off] = roomOperatingPoints(geometryOf(layout), winter({ activeModes: ["cooling"] }), tables);
    const curve = panelOutputCurve(off!);
    expect(curve.length).toBe(31);
    expect(curve.every((p) => p.totalW === 0)).toBe(true);
    expect(panelTurndownRatio(off!, curve)).toBeNull();
  });
});

describe("zoneTurndown and panelsInZone", () => {
  const pt = (totalW: number): OutputPoint => ({ openingAngleDeg: null, totalW, radiantW: 0, convectiveW: totalW, totalWm2: totalW, radiantWm2: 0, convectiveWm2: totalW });
  test("Σ highest / Σ lowest over the zone's panels", () => {
    expect(zoneTurndown([[pt(100), pt(300)], [pt(50)]])).toBeCloseTo(350 / 150, 12);
    expect(zoneTurndown([[pt(0), pt(10)]])).toBeNull();
  });
  test("panels whose centre lies inside the outline; wall panels on its edge", () => {
    const zone = { outline: [{ x: 0, y: 0 }, { x: 2, y: 0 }, { x: 2, y: 4 }, { x: 0, y: 4 }] };
    const inside = { panel: ceilingPanel("a", 1, 2) };
    const outside = { panel: ceilingPanel("b", 3, 2) };
    const wall = { panel: ceilingPanel("c", 0.05, 2, { mounting: "wall" }) };
    expect(panelsInZone(zone, [inside, outside, wall]).map((p) => p.panel.id)).toEqual(["a", "c"]);
  });
});
