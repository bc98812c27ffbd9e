import { describe, expect, test } from "vitest";
import { characteristicOutput, standardSpecificOutput } from "@/lib/panels";
import { COOLING_LOAD_METHOD, HEATING_LOAD_METHOD, panelWaterSide, roomEnvelope, roomLoad } from "@/lib/performance/loads";
import { ceilingPanel, geometryOf, oneRoom, winter } from "./fixtures";

describe("roomLoad on a hand-worked room", () => {
  /*
   * Room 5 m × 4 m, 3 m high, all four walls exterior (no neighbouring room), one window
   * 2 m × 1.5 m (U 1.4) in edge 0; walls U 0.3; floor and ceiling "at the air temperature"
   * (no U-value → skipped); θ_int = 20 °C, θ_e = −10 °C (ΔT = 30 K); 0.5 air changes per hour.
   * 1. Gross wall area = perimeter × height = (5 + 4 + 5 + 4) × 3 = 54 m²; net = 54 − 3 = 51 m².
   * 2. H_T = Σ f·A·U = 1·51·0.3 + 1·3·1.4 = 15.3 + 4.2 = 19.5 W/K; Φ_T = 19.5 × 30 = 585 W.
   * 3. V = 5·4·3 = 60 m³; H_V = 0.34·n·V = 0.34·0.5·60 = 10.2 W/K; Φ_V = 10.2 × 30 = 306 W.
   * 4. Φ = 585 + 306 = 891 W (EN 12831 simplified: no reheat, no internal gains).
   * 5. Panels delivering 445.5 W cover 445.5 / 891 = 50 % → warning, 445.5 W short.
   */
  test("winter: 891 W design heat loss, 50 % coverage with a warning", () => {
    const load = roomLoad({ geometry: geometryOf(oneRoom()), conditions: winter(), mode: "heating", seatsInRoom: 2, panelOutputsW: [200, 245.5] });
    expect(load.method).toBe(HEATING_LOAD_METHOD);
    expect(load.volumeM3).toBeCloseTo(60, 9);
    expect(load.transmissionW).toBeCloseTo(585, 6);
    expect(load.ventilationW).toBeCloseTo(306, 6);
    expect(load.loadW).toBeCloseTo(891, 6);
    expect(load.internal.totalW).toBe(0);
    expect(load.coveragePercent).toBeCloseTo(50, 9);
    expect(load.shortfallW).toBeCloseTo(445.5, 6);
    expect(load.warning).toBe(true);
    expect(load.skippedSurfaceIds.sort()).toEqual(["r1:ceiling", "r1:floor"]);
    const window = load.surfaces.find((s) => s.surfaceId === "w1")!;
    expect(window).toMatchObject({ kind: "window", areaM2: 3, uValueWm2K: 1.4, adjacent: "outdoor" });
    expect(window.heatFlowW).toBeCloseTo(126, 6); // 3 × 1.4 × 30
    const wall0 = load.surfaces.find((s) => s.surfaceId === "r1:wall:0")!;
    expect(wall0.areaM2).toBeCloseTo(12, 9); // 15 − 3
    expect(wall0.heatFlowW).toBeCloseTo(12 * 0.3 * 30, 6);
  });

  /*
   * Summer, same room: θ_int = 26 °C, θ_e = 32 °C (ΔT = 6 K); 2 seats → 2 people × 70 W = 140 W;
   * equipment 10 W/m² × 20 m² = 200 W; lighting 8 W/m² × 20 m² = 160 W.
   * Conduction 19.5 × 6 = 117 W; outdoor air 10.2 × 6 = 61.2 W; internal 500 W; total 678.2 W.
   * Panels removing 700 W cover it (103.2 %), no warning.
   */
  test("summer: 678.2 W sensible gain with internal gains, covered without warning", () => {
    const conditions = winter({
      airTemperatureC: 26, outdoorTemperatureC: 32, activeModes: ["cooling"],
      internalGains: { occupants: { kind: "seats" }, sensibleWPerPerson: 70, equipmentWm2: 10, lightingWm2: 8 },
    });
    const load = roomLoad({ geometry: geometryOf(oneRoom()), conditions, mode: "cooling", seatsInRoom: 2, panelOutputsW: [700] });
    expect(load.method).toBe(COOLING_LOAD_METHOD);
    expect(load.transmissionW).toBeCloseTo(117, 6);
    expect(load.ventilationW).toBeCloseTo(61.2, 6);
    expect(load.internal).toMatchObject({ occupants: 2, peopleW: 140, equipmentW: 200, lightingW: 160, totalW: 500 });
    expect(load.loadW).toBeCloseTo(678.2, 6);
    expect(load.coveragePercent).toBeCloseTo((700 / 678.2) * 100, 9);
    expect(load.warning).toBe(false);
  });

  test("occupants from a density use the floor area", () => {
    const conditions = winter({ activeModes: ["cooling"], outdoorTemperatureC: 32, internalGains: { occupants: { kind: "density", personsPerM2: 0.1 }, sensibleWPerPerson: 75, equipmentWm2: 0, lightingWm2: 0 } });
    const load = roomLoad({ geometry: geometryOf(oneRoom()), conditions, mode: "cooling", seatsInRoom: 7, panelOutputsW: [] });
    expect(load.internal.occupants).toBeCloseTo(2, 9); // 0.1 × 20 m²
    expect(load.internal.peopleW).toBeCloseTo(150, 9);
    expect(load.coveragePercent).toBe(0);
    expect(load.warning).toBe(true);
  });

  test("a surface given only as a temperature is skipped with the reason; one with a U-value counts", () => {
    const conditions = winter({
      surfaces: { exteriorWalls: { kind: "surfaceTemperature", surfaceTemperatureC: 17 }, interiorWalls: null, floor: { kind: "uValue", uValueWm2K: 0.25 }, ceiling: null, openings: { kind: "uValue", uValueWm2K: 1.4 } },
    });
    const { rows } = roomEnvelope(geometryOf(oneRoom()), conditions);
    const walls = rows.filter((r) => r.kind === "wall");
    expect(walls).toHaveLength(4);
    for (const w of walls) expect(w.skipped).toMatch(/surface temperature/);
    const load = roomLoad({ geometry: geometryOf(oneRoom()), conditions, mode: "heating", seatsInRoom: 0, panelOutputsW: [] });
    // Floor 20 m² × 0.25 × 30 K = 150 W, window 126 W.
    expect(load.transmissionW).toBeCloseTo(276, 6);
    expect(load.skippedSurfaceIds).toContain("r1:wall:0");
    expect(load.skippedSurfaceIds).not.toContain("r1:floor");
  });
});

describe("panelWaterSide", () => {
  const water = ceilingPanel("p1", 2.5, 2, { supply: { kind: "water", meanWaterTemperatureC: 45, characteristic: { kWm2PerKn: 5.2, n: 1.1 } } });

  test("flow, return and the water flow satisfy Q = ṁ·c_p·ΔT", () => {
    const w = panelWaterSide(water, 2, 350, 20, 5)!;
    expect(w.flowTemperatureC).toBeCloseTo(47.5, 9);
    expect(w.returnTemperatureC).toBeCloseTo(42.5, 9);
    expect(w.massFlowKgS * w.specificHeatJkgK * 5).toBeCloseTo(350, 6);
    expect(w.litresPerHour).toBeCloseTo((w.massFlowKgS / w.densityKgM3) * 3.6e6, 6);
    expect(w.specificHeatJkgK).toBeGreaterThan(4170);
    expect(w.specificHeatJkgK).toBeLessThan(4190);
  });

  test("characteristic output and the surface temperature are consistent: the exchange law gives the characteristic's output back", () => {
    const w = panelWaterSide(water, 2, 0, 20, 5)!;
    const q = characteristicOutput({ kWPerKn: 5.2, n: 1.1, meanWaterC: 45, roomC: 20 }); // 5.2 × 25^1.1 ≈ 179.4 W/m²
    expect(q).toBeCloseTo(5.2 * Math.pow(25, 1.1), 9);
    expect(w.characteristicOutputW).toBeCloseTo(2 * q, 9);
    expect(standardSpecificOutput({ orientation: "ceiling", mode: "heating", surfaceC: w.surfaceTemperatureC, roomC: 20 })).toBeCloseTo(q, 6);
    expect(w.massFlowKgS).toBe(0);
  });

  test("cooling: flow is the colder side", () => {
    const chilled = { ...water, mode: "cooling" as const, supply: { kind: "water" as const, meanWaterTemperatureC: 17, characteristic: { kWm2PerKn: 6, n: 1.05 } } };
    const w = panelWaterSide(chilled, 2, 120, 26, 3)!;
    expect(w.flowTemperatureC).toBeCloseTo(15.5, 9);
    expect(w.returnTemperatureC).toBeCloseTo(18.5, 9);
    expect(w.massFlowKgS * w.specificHeatJkgK * 3).toBeCloseTo(120, 6);
  });

  test("a surface-supplied panel has no water side", () => {
    expect(panelWaterSide(ceilingPanel("p2", 1, 1), 2, 100, 20, 5)).toBeNull();
  });
});
