import { describe, expect, it } from "vitest";
import { computeComfort, HEATMAP_HEIGHT_M, MAX_HEATMAP_CELLS, panelRadiantTemperature, panelSurfaceTemperature } from "@/lib/compute/comfort";
import { demoLayout } from "@/lib/demo/layout";
import { AppError } from "@/lib/http/errors";
import { emptyLayout, type Layout, type Panel, type Seat } from "@/lib/layout/schema";
import { characteristicOutput, STANDARD_SURFACE_EXCHANGE } from "@/lib/panels";
import { pmvPpd } from "@/lib/comfort";
import { SUMMER_DESIGN, WINTER_DESIGN, type ScenarioConditions } from "@/lib/scenarios/schema";

/** Every surface at the air temperature: an isothermal enclosure. */
function uniform(airC: number, over: Partial<ScenarioConditions> = {}): ScenarioConditions {
  const at = { kind: "surfaceTemperature" as const, surfaceTemperatureC: airC };
  return {
    airTemperatureC: airC, relativeHumidityPercent: 50, airSpeedMps: 0.1, defaultClo: 1, defaultMet: 1.2, outdoorTemperatureC: airC,
    activeModes: ["heating", "cooling"],
    surfaces: { exteriorWalls: at, interiorWalls: at, floor: at, ceiling: at, openings: at },
    ...over,
  };
}

function seat(id: string, x: number, y: number, over: Partial<Seat> = {}): Seat {
  return { id, label: `Seat ${id}`, position: { x, y }, posture: "seated", facingDeg: 90, clo: null, met: null, ...over };
}

function ceilingPanel(over: Partial<Panel> = {}): Panel {
  return {
    id: "p1", label: "P1", roomId: "r1", mounting: "ceiling", center: { x: 2, y: 2 }, rotationDeg: 0, widthM: 1.2, lengthM: 2.4,
    mountingHeightM: null, mode: "heating", supply: { kind: "surface", surfaceTemperatureC: 40 }, emissivity: 0.95, louver: null, productId: null,
    ...over,
  };
}

/** A 8 m × 5 m room, 2.8 m high, with a seat under a panel at (2, 2) and one far from it at (7, 4). */
function room(panels: Panel[] = [], seats: Seat[] = [seat("near", 2, 2), seat("far", 7, 4)]): Layout {
  return {
    ...emptyLayout(),
    rooms: [{ id: "r1", name: "Test room", outline: [{ x: 0, y: 0 }, { x: 8, y: 0 }, { x: 8, y: 5 }, { x: 0, y: 5 }], ceilingHeightM: 2.8 }],
    panels,
    seats,
  };
}

describe("computeComfort: an isothermal enclosure", () => {
  const result = computeComfort(room(), uniform(22), { stepM: 0.5 });

  it.each(["near", "far"])("seat %s has MRT = the surface temperature and PMV = pmvPpd at ta = tr", (id) => {
    const s = result.seats.find((x) => x.id === id)!;
    const expected = pmvPpd({ ta: 22, tr: 22, vr: 0.1, rh: 50, met: 1.2, clo: 1 });
    expect(s.mrtC).toBeCloseTo(22, 6);
    expect(s.operativeC).toBeCloseTo(22, 6);
    expect(s.pmv).toBeCloseTo(expected.pmv, 3);
    expect(s.ppd).toBeCloseTo(expected.ppd, 2);
    expect(Object.values(s.planeRadiantC).every((t) => Math.abs(t - 22) < 1e-6)).toBe(true);
    expect(s.verticalAsymmetryC).toBeCloseTo(0, 6);
    expect(s.horizontalAsymmetryC).toBeCloseTo(0, 6);
  });

  it("every heatmap cell inside the room has MRT = the surface temperature; the grid covers the room at 1.1 m", () => {
    const grid = result.heatmap.grids[0]!;
    expect(result.heatmap.heightM).toBe(HEATMAP_HEIGHT_M);
    expect([grid.cols, grid.rows]).toEqual([16, 10]);
    expect(grid.originX).toBeCloseTo(0.25, 10);
    expect(grid.mrtC.every((t) => t !== null && Math.abs(t - 22) < 0.01)).toBe(true);
  });
});

describe("computeComfort: seats and panels", () => {
  const winter = uniform(20, { activeModes: ["heating"] });

  it("angle factors of each seat sum to ≈ 1 and MRT shares to 1 (demo plan, winter and summer)", () => {
    for (const scenario of [WINTER_DESIGN, SUMMER_DESIGN]) {
      const { seats } = computeComfort(demoLayout(), scenario.conditions);
      expect(seats.length).toBeGreaterThanOrEqual(40);
      for (const s of seats) {
        expect(s.surfaces.reduce((sum, x) => sum + x.angleFactor, 0)).toBeCloseTo(1, 3);
        expect(s.surfaces.reduce((sum, x) => sum + x.mrtShare, 0)).toBeCloseTo(1, 3);
        expect(s.surfaces.every((x) => x.angleFactor >= 0)).toBe(true);
      }
    }
  });

  it("a seat under a warm ceiling panel has a higher MRT than one far from it, and a warm-ceiling asymmetry", () => {
    const { seats } = computeComfort(room([ceilingPanel()]), winter);
    const near = seats.find((s) => s.id === "near")!;
    const far = seats.find((s) => s.id === "far")!;
    expect(near.mrtC).toBeGreaterThan(far.mrtC + 0.3);
    expect(near.mrtC).toBeGreaterThan(20);
    expect(near.verticalAsymmetryC).toBeGreaterThan(far.verticalAsymmetryC);
    expect(near.asymmetryKind).toBe("warmCeiling");
    const share = near.surfaces.find((x) => x.surfaceId === "p1")!;
    expect(share.kind).toBe("panel");
    expect(share.angleFactor).toBeGreaterThan(0.01);
    expect(share.mrtShare).toBeGreaterThan(share.angleFactor); // the hot panel weighs more than its size
  });

  it("raising a panel's surface temperature raises the seat's MRT and PMV", () => {
    const pmvAt = (t: number) =>
      computeComfort(room([ceilingPanel({ supply: { kind: "surface", surfaceTemperatureC: t } })]), winter).seats.find((s) => s.id === "near")!;
    const [a, b, c] = [30, 40, 50].map(pmvAt);
    expect(b!.mrtC).toBeGreaterThan(a!.mrtC);
    expect(c!.mrtC).toBeGreaterThan(b!.mrtC);
    expect(b!.pmv).toBeGreaterThan(a!.pmv);
    expect(c!.pmv).toBeGreaterThan(b!.pmv);
  });

  it("a panel whose mode is off radiates at its host's temperature and gives no output", () => {
    const result = computeComfort(room([ceilingPanel({ mode: "cooling", supply: { kind: "surface", surfaceTemperatureC: 16 } })]), winter);
    const panel = result.panels[0]!;
    expect(panel.active).toBe(false);
    expect(panel.surfaceTemperatureC).toBe(20);
    expect([panel.outputW, panel.outputWm2, panel.radiantWm2]).toEqual([0, 0, 0]);
    expect(result.seats.find((s) => s.id === "near")!.mrtC).toBeCloseTo(20, 6);
  });

  it("an active heating panel gives output W = W/m² × area with a radiant/convective split", () => {
    const panel = computeComfort(room([ceilingPanel()]), winter).panels[0]!;
    expect(panel.active).toBe(true);
    expect(panel.areaM2).toBeCloseTo(2.88, 6);
    expect(panel.outputWm2).toBeGreaterThan(50);
    expect(panel.outputW).toBeCloseTo(panel.outputWm2 * panel.areaM2, 1);
    expect(panel.radiantWm2 + panel.convectiveWm2).toBeCloseTo(panel.outputWm2, 2);
    expect(panel.radiantShare).toBeGreaterThan(0.5); // a warm ceiling works mostly by radiation
    expect(panel.condensation).toBeNull();
  });

  it("a chilled panel close to the dew point is flagged with a condensation caution; a safe one is not", () => {
    const humid = uniform(26, { activeModes: ["cooling"], relativeHumidityPercent: 60 }); // dew point ≈ 17.6 °C
    const cool = (t: number) => ceilingPanel({ mode: "cooling", supply: { kind: "surface", surfaceTemperatureC: t } });
    const risky = computeComfort(room([cool(18.5)]), humid);
    expect(risky.panels[0]!.condensation!.risk).toBe(true);
    expect(risky.panels[0]!.condensation!.dewPointC).toBeCloseTo(17.6, 0);
    expect(risky.panels[0]!.warnings.join(" ")).toMatch(/Condensation risk.*local codes/);
    expect(risky.warnings.map((w) => [w.code, w.objectId])).toEqual([["condensation_risk", "p1"]]);
    const safe = computeComfort(room([cool(21)]), humid);
    expect(safe.panels[0]!.condensation!.risk).toBe(false);
    expect(safe.panels[0]!.outputWm2).toBeGreaterThan(0); // cooling capacity is positive
    expect(safe.warnings).toEqual([]);
  });

  it("a hot wall panel within reach gets a hot-surface caution; the same panel high on the wall does not", () => {
    const wallPanel = (z: number) =>
      ceilingPanel({ mounting: "wall", center: { x: 7.95, y: 2.5 }, rotationDeg: 180, widthM: 0.6, lengthM: 1.2, mountingHeightM: z, supply: { kind: "surface", surfaceTemperatureC: 55 } });
    const low = computeComfort(room([wallPanel(0.3)]), winter);
    expect(low.panels[0]!.warnings.join(" ")).toMatch(/Hot reachable surface/);
    expect(low.warnings.map((w) => w.code)).toEqual(["hot_surface"]);
    const high = computeComfort(room([wallPanel(2.1)]), winter);
    expect(high.panels[0]!.warnings).toEqual([]);
  });

  it("a water-supplied panel's surface temperature follows from its characteristic and the standard exchange law", () => {
    const panel = ceilingPanel({ mounting: "wall", supply: { kind: "water", meanWaterTemperatureC: 45, characteristic: { kWm2PerKn: 5.2, n: 1.1 } } });
    const q = characteristicOutput({ kWPerKn: 5.2, n: 1.1, meanWaterC: 45, roomC: 20 });
    const { surfaceC, characteristicWm2 } = panelSurfaceTemperature(panel, 20);
    expect(characteristicWm2).toBeCloseTo(q, 10);
    expect(surfaceC).toBeCloseTo(20 + q / STANDARD_SURFACE_EXCHANGE.heating.wall.coefficient, 10);
    expect(surfaceC).toBeLessThan(45);
    expect(surfaceC).toBeGreaterThan(20);
  });

  it("panelRadiantTemperature: a black panel shows its own temperature, a grey one lies between it and the AUST", () => {
    expect(panelRadiantTemperature(40, 20, 1)).toBeCloseTo(40, 10);
    expect(panelRadiantTemperature(40, 20, 0)).toBeCloseTo(20, 10);
    const grey = panelRadiantTemperature(40, 20, 0.9);
    expect(grey).toBeGreaterThan(37);
    expect(grey).toBeLessThan(40);
  });

  it("a seat near a cold window sees a cool-wall asymmetry and a lower MRT than one in the middle", () => {
    const layout: Layout = {
      ...room([], [seat("window", 4, 0.8), seat("middle", 4, 2.5)]),
      openings: [{ id: "w1", roomId: "r1", kind: "window", edgeIndex: 0, offsetM: 1, widthM: 6, sillHeightM: 0.3, heightM: 2.2, thermal: { kind: "uValue", uValueWm2K: 2.8 } }],
    };
    const conditions = uniform(20, { outdoorTemperatureC: -10, activeModes: ["heating"] });
    const { seats } = computeComfort(layout, conditions);
    const [nearWindow, middle] = [seats[0]!, seats[1]!];
    expect(nearWindow.mrtC).toBeLessThan(middle.mrtC);
    expect(nearWindow.asymmetryKind).toBe("coolWall");
    expect(nearWindow.horizontalAsymmetryC).toBeGreaterThan(middle.horizontalAsymmetryC);
    expect(nearWindow.surfaces.find((x) => x.surfaceId === "w1")!.temperatureC).toBeCloseTo(20 - 2.8 * 0.13 * 30, 6);
  });

  it("seat clo/met override the scenario defaults", () => {
    const { seats } = computeComfort(room([], [seat("a", 4, 2.5, { clo: 0.5, met: 1.0 }), seat("b", 4, 2.6)]), winter);
    expect([seats[0]!.clo, seats[0]!.met]).toEqual([0.5, 1.0]);
    expect([seats[1]!.clo, seats[1]!.met]).toEqual([1, 1.2]);
    expect(seats[0]!.pmv).toBeLessThan(seats[1]!.pmv);
  });
});

describe("computeComfort: zones, categories and the heatmap", () => {
  it("zones report min/mean/max PMV of their seats and the share inside the target", () => {
    const layout: Layout = {
      ...room([ceilingPanel({ supply: { kind: "surface", surfaceTemperatureC: 60 } })], [seat("a", 2, 2), seat("b", 7, 4), seat("c", 7.5, 4.5)]),
      zones: [
        { id: "z-all", name: "All", outline: [{ x: 0, y: 0 }, { x: 8, y: 0 }, { x: 8, y: 5 }, { x: 0, y: 5 }], target: { kind: "pmvBand", minPmv: -5, maxPmv: 5 } },
        { id: "z-east", name: "East", outline: [{ x: 6, y: 3 }, { x: 8, y: 3 }, { x: 8, y: 5 }, { x: 6, y: 5 }], target: { kind: "category", category: "A" } },
        { id: "z-empty", name: "Empty", outline: [{ x: 0, y: 4 }, { x: 1, y: 4 }, { x: 1, y: 5 }, { x: 0, y: 5 }], target: { kind: "category", category: "C" } },
      ],
    };
    const result = computeComfort(layout, uniform(20, { activeModes: ["heating"] }));
    const [all, east, empty] = result.zones;
    const pmvs = result.seats.map((s) => s.pmv);
    expect(all!.seatIds).toEqual(["a", "b", "c"]);
    expect(all!.pmvMin).toBe(Math.min(...pmvs));
    expect(all!.pmvMax).toBe(Math.max(...pmvs));
    expect(all!.pmvMean).toBeCloseTo(pmvs.reduce((x, y) => x + y) / 3, 3);
    expect(all!.shareInTarget).toBe(1);
    expect(east!.seatIds).toEqual(["b", "c"]);
    const inA = result.seats.filter((s) => east!.seatIds.includes(s.id) && s.category === "A").length;
    expect(east!.shareInTarget).toBe(inA / 2);
    expect(empty).toMatchObject({ seatIds: [], pmvMin: null, pmvMean: null, pmvMax: null, shareInTarget: null });
    expect(result.seats[0]!.zoneIds).toEqual(["z-all"]);
  });

  it("the heatmap of an L-shaped room is null outside the L and warmer under a hot panel", () => {
    const layout: Layout = {
      ...emptyLayout(),
      rooms: [{ id: "r1", name: "L", outline: [{ x: 0, y: 0 }, { x: 6, y: 0 }, { x: 6, y: 3 }, { x: 3, y: 3 }, { x: 3, y: 6 }, { x: 0, y: 6 }], ceilingHeightM: 3 }],
      panels: [ceilingPanel({ center: { x: 1.5, y: 4.5 }, lengthM: 2, widthM: 2, supply: { kind: "surface", surfaceTemperatureC: 45 } })],
    };
    const grid = computeComfort(layout, uniform(20, { activeModes: ["heating"] }), { stepM: 1 }).heatmap.grids[0]!;
    expect([grid.cols, grid.rows]).toEqual([6, 6]);
    const at = (col: number, row: number) => grid.mrtC[row * grid.cols + col];
    expect(at(5, 5)).toBeNull(); // the cut-away corner
    expect(grid.pmv[5 * grid.cols + 5]).toBeNull();
    expect(grid.mrtC.filter((t) => t !== null)).toHaveLength(27);
    expect(at(1, 4)!).toBeGreaterThan(at(5, 0)! + 0.5);
  });

  it("the demo plan: winter heats the window rows, summer cools the core rows, seats get categories", () => {
    const winter = computeComfort(demoLayout(), WINTER_DESIGN.conditions);
    const summer = computeComfort(demoLayout(), SUMMER_DESIGN.conditions);
    expect(winter.panels.length).toBeGreaterThanOrEqual(20);
    expect(winter.panels.filter((p) => p.active).every((p) => p.mode === "heating")).toBe(true);
    expect(summer.panels.filter((p) => p.active).every((p) => p.mode === "cooling")).toBe(true);
    expect(summer.panels.some((p) => p.active && p.condensation !== null)).toBe(true);
    expect(winter.seats.every((s) => s.category === null || ["A", "B", "C"].includes(s.category))).toBe(true);
    expect(winter.heatmap.grids).toHaveLength(3);
  });

  it("coarsens the heatmap of a very large floor so it stays within MAX_HEATMAP_CELLS, and says so", () => {
    const big: Layout = { ...emptyLayout(), rooms: [{ id: "hall", name: "Hall", outline: [{ x: 0, y: 0 }, { x: 60, y: 0 }, { x: 60, y: 40 }, { x: 0, y: 40 }], ceilingHeightM: 6 }] };
    const result = computeComfort(big, uniform(20));
    const grid = result.heatmap.grids[0]!;
    expect(result.heatmap.stepM).toBeGreaterThan(0.25);
    expect(grid.cols * grid.rows).toBeLessThanOrEqual(MAX_HEATMAP_CELLS);
    expect(result.warnings.map((w) => w.code)).toEqual(["heatmap_coarsened"]);
    expect(computeComfort(demoLayout(), WINTER_DESIGN.conditions).heatmap.stepM).toBe(0.25);
  });

  it("refuses an invalid layout with a 400 naming the object", () => {
    const layout = room([], [seat("lost", 20, 20)]);
    expect(() => computeComfort(layout, uniform(20))).toThrow(AppError);
    try {
      computeComfort(layout, uniform(20));
    } catch (error) {
      expect((error as AppError).fields).toEqual([{ path: "layout.seats.0", message: 'seat "Seat lost" is outside every room' }]);
    }
  });
});
