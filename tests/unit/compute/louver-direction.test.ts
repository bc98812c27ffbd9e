/**
 * Directional emission of louvered panels in the comfort computation (lib/compute/comfort.ts):
 * a seat's radiant exchange with a louvered panel uses the panel's apparent emissivity toward
 * that seat, from the cavity table (lib/panels), not one hemispherical value.
 *
 * The test room is symmetric under a 90° turn about its centre (square room, square panel in
 * the middle, no openings, one seat and its turned copy): any difference between the two seats
 * comes from the louver's direction. The flat-panel case checks that symmetry first.
 */
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { computeComfort, louverTableFor, louverTableParams, type ComfortComputation } from "@/lib/compute/comfort";
import { clearLouverTableMemory } from "@/lib/louvers/cavity-table-cache";
import { louverTablesForLayout } from "@/lib/louvers/layout-tables";
import { LAYOUT_SCHEMA_VERSION, type Layout, type Panel, type Seat } from "@/lib/layout/schema";
import { louverTableKey, type LouverTable } from "@/lib/panels";
import { WINTER_DESIGN } from "@/lib/scenarios/schema";
import { configurePool, defaultPoolOptions } from "@/lib/workers/pool";

const ROOM = 6;
const C = ROOM / 2;
const conditions = WINTER_DESIGN.conditions;

type Louver = NonNullable<Panel["louver"]>;

function panel(louver: Louver | null, emissivity = 0.9): Panel {
  return {
    id: "p1", label: "P1", roomId: "r1", mounting: "ceiling", center: { x: C, y: C }, rotationDeg: 0, widthM: 2.4, lengthM: 2.4,
    mountingHeightM: null, mode: "heating", supply: { kind: "surface", surfaceTemperatureC: 45 }, emissivity, louver, productId: null,
  };
}

function louver(patch: Partial<Louver>): Louver {
  return { openingAngleDeg: 30, minOpeningAngleDeg: 0, maxOpeningAngleDeg: 180, axisDeg: 0, finish: "specular", wallEmissivity: 0.1, ...patch };
}

/** Seat "x" lies along +x of the panel, seat "y" is its copy turned 90° about the room centre. */
const SEATS: Seat[] = [
  { id: "x", label: "Along x", position: { x: C + 2.5, y: C }, posture: "seated", facingDeg: 0, clo: null, met: null },
  { id: "y", label: "Along y", position: { x: C, y: C + 2.5 }, posture: "seated", facingDeg: 90, clo: null, met: null },
];

function layout(p: Panel): Layout {
  return {
    schemaVersion: LAYOUT_SCHEMA_VERSION,
    rooms: [{ id: "r1", name: "Test room", outline: [{ x: 0, y: 0 }, { x: ROOM, y: 0 }, { x: ROOM, y: ROOM }, { x: 0, y: ROOM }], ceilingHeightM: 2.8 }],
    openings: [],
    panels: [p],
    seats: SEATS,
    zones: [],
    underlay: null,
  };
}

const tables = new Map<string, LouverTable>();
function run(p: Panel): ComfortComputation {
  return computeComfort(layout(p), conditions, { louverTables: tables, stepM: 0.25 });
}

function seat(r: ComfortComputation, id: string) {
  const s = r.seats.find((x) => x.id === id);
  if (!s) throw new Error(`no seat ${id}`);
  return s;
}
/** The panel's temperature as the seat sees it, °C. */
function panelSeenBy(r: ComfortComputation, id: string): number {
  return seat(r, id).surfaces.find((s) => s.surfaceId === "p1")!.temperatureC;
}
/** Heatmap MRT at a plan point that is a cell centre, °C. */
function heatmapMrt(r: ComfortComputation, x: number, y: number): number {
  const g = r.heatmap.grids[0]!;
  const col = Math.round((x - g.originX) / r.heatmap.stepM);
  const row = Math.round((y - g.originY) / r.heatmap.stepM);
  const v = g.mrtC[row * g.cols + col];
  if (v === null || v === undefined) throw new Error("not a cell of the room");
  return v;
}

describe("computeComfort with a louvered panel: emission toward each seat", () => {
  it("a flat panel looks the same from both seats (the test room is symmetric)", () => {
    const r = run(panel(null));
    expect(seat(r, "x").mrtC).toBeCloseTo(seat(r, "y").mrtC, 3);
    expect(seat(r, "x").pmv).toBeCloseTo(seat(r, "y").pmv, 3);
  });

  it("a seat in line with the louver openings gains more than one at a grazing angle, and the reverse once the axis turns 90°", () => {
    const along = run(panel(louver({ axisDeg: 0 })));
    // Seat x: direction in the plane of the groove axis and the normal → exit angle 0 (looks into the grooves).
    expect(panelSeenBy(along, "x")).toBeGreaterThan(panelSeenBy(along, "y") + 0.5);
    expect(seat(along, "x").mrtC).toBeGreaterThan(seat(along, "y").mrtC + 0.02);
    expect(seat(along, "x").pmv).toBeGreaterThan(seat(along, "y").pmv);

    const turned = run(panel(louver({ axisDeg: 90 })));
    expect(panelSeenBy(turned, "y")).toBeGreaterThan(panelSeenBy(turned, "x") + 0.5);
    expect(seat(turned, "y").mrtC).toBeGreaterThan(seat(turned, "x").mrtC + 0.02);
    expect(seat(turned, "y").pmv).toBeGreaterThan(seat(turned, "x").pmv);
    // By the symmetry, turning the axis swaps the two seats exactly.
    expect(seat(turned, "y").mrtC).toBeCloseTo(seat(along, "x").mrtC, 3);
    expect(seat(turned, "x").mrtC).toBeCloseTo(seat(along, "y").mrtC, 3);
  });

  it("diffuse cavity walls show the same sense, weaker (ε_w = 0.9 at 60°)", () => {
    const r = run(panel(louver({ finish: "diffuse", wallEmissivity: 0.9, openingAngleDeg: 60 })));
    expect(panelSeenBy(r, "x")).toBeGreaterThan(panelSeenBy(r, "y"));
    expect(seat(r, "x").mrtC).toBeGreaterThanOrEqual(seat(r, "y").mrtC);
  });

  it("the heatmap uses the direction too: a point in line with the openings is warmer than its turned copy", () => {
    const r = run(panel(louver({ axisDeg: 0 })));
    // (5.125, 3.125) and its copy turned 90° about the centre (2.875, 5.125) are both cell centres.
    expect(heatmapMrt(r, 5.125, 3.125)).toBeGreaterThan(heatmapMrt(r, 2.875, 5.125));
  });

  it("fully open (180°) behaves as a flat panel of the wall emissivity: the grooves lie flat, aperture share 1", () => {
    for (const finish of ["diffuse", "specular"] as const) {
      const flat = run(panel(null, 0.6));
      const open = run(panel(louver({ finish, wallEmissivity: 0.6, openingAngleDeg: 180 }), 0.93));
      for (const id of ["x", "y"]) {
        expect(seat(open, id).mrtC).toBeCloseTo(seat(flat, id).mrtC, 2);
        expect(seat(open, id).pmv).toBeCloseTo(seat(flat, id).pmv, 2);
      }
      expect(open.panels[0]!.outputW).toBeCloseTo(flat.panels[0]!.outputW, 0);
      expect(open.panels[0]!.radiantWm2).toBeCloseTo(flat.panels[0]!.radiantWm2, 1);
    }
  });

  it("a closed louver (0°, hinged blades) gives no radiant output and is seen at the room's unheated surface temperature", () => {
    const r = run(panel(louver({ openingAngleDeg: 0 })));
    expect(r.panels[0]!.radiantWm2).toBeCloseTo(0, 6);
    expect(r.panels[0]!.convectiveWm2).toBeGreaterThan(0);
    expect(panelSeenBy(r, "x")).toBeCloseTo(panelSeenBy(r, "y"), 3);
    expect(panelSeenBy(r, "x")).toBeLessThan(20); // below the air: the walls are cooler than the air in winter
  });

  it("output rises with the opening angle at the panel's own setting (hinged blades, diffuse walls)", () => {
    const outputs = [10, 45, 90, 135, 180].map((a) => run(panel(louver({ finish: "diffuse", wallEmissivity: 0.9, openingAngleDeg: a }))).panels[0]!.outputW);
    expect(outputs.length).toBe(5);
    for (let i = 1; i < outputs.length; i++) expect(outputs[i]!).toBeGreaterThan(outputs[i - 1]!);
  });
});

describe("cavity tables: built once, then served from the cache", () => {
  let dir = "";
  const previous = process.env.LOUVER_CACHE_DIR;
  beforeAll(async () => {
    dir = mkdtempSync(path.join(tmpdir(), "seatwise-louver-direction-"));
    process.env.LOUVER_CACHE_DIR = dir;
    clearLouverTableMemory();
    await configurePool({ ...defaultPoolOptions(), mode: "inline" });
  });
  afterAll(() => {
    if (previous === undefined) delete process.env.LOUVER_CACHE_DIR;
    else process.env.LOUVER_CACHE_DIR = previous;
    clearLouverTableMemory();
    rmSync(dir, { recursive: true, force: true });
  });

  it("louverTablesForLayout computes a missing table once; a second call (and one after a restart) computes nothing", async () => {
    const l = layout(panel(louver({ finish: "diffuse", wallEmissivity: 0.37 })));
    const key = louverTableKey(louverTableParams(l.panels[0]!.louver!));
    const first = await louverTablesForLayout(l);
    expect(first.built).toEqual([key]);
    const second = await louverTablesForLayout(l);
    expect(second.built).toEqual([]);
    expect(second.tables.get(key)).toBe(first.tables.get(key));
    clearLouverTableMemory(); // as after a restart: the disk copy serves
    const third = await louverTablesForLayout(l);
    expect(third.built).toEqual([]);
    expect(third.tables.get(key)!.hemispherical).toEqual(first.tables.get(key)!.hemispherical);
  });

  it("computeComfort uses the tables it is given and adds none", () => {
    const map = new Map<string, LouverTable>();
    const l = louver({ finish: "diffuse", wallEmissivity: 0.9 });
    const table = louverTableFor(l, map);
    const r1 = computeComfort(layout(panel(l)), conditions, { louverTables: map });
    const r2 = computeComfort(layout(panel(l)), conditions, { louverTables: map });
    expect(map.size).toBe(1);
    expect(map.get(louverTableKey(louverTableParams(l)))).toBe(table);
    expect(r2.seats).toEqual(r1.seats);
  });
});

describe("louverFrame: the groove axis of a wall panel", () => {
  it("lies in the wall plane as a unit vector orthogonal to the inward normal for any plan direction", async () => {
    const { buildLayoutGeometry } = await import("@/lib/compute/geometry");
    const { louverFrame } = await import("@/lib/compute/comfort");
    const axes = [0, 30, 90, 135, 180, -45];
    expect(axes.length).toBeGreaterThan(0);
    for (const axisDeg of axes) {
      const wall: Panel = {
        ...panel(louver({ axisDeg })), mounting: "wall", center: { x: ROOM, y: C }, rotationDeg: 180, widthM: 1, lengthM: 2, mountingHeightM: 0.5,
      };
      const geometry = buildLayoutGeometry(layout(wall)).get("r1")!;
      const f = louverFrame(geometry.surfaces.find((s) => s.id === "p1")!);
      expect(f.normal).toEqual([-1, 0, 0].map((x) => expect.closeTo(x, 12)));
      expect(Math.hypot(...f.axis)).toBeCloseTo(1, 12);
      expect(f.axis[0] * f.normal[0] + f.axis[1] * f.normal[1] + f.axis[2] * f.normal[2]).toBeCloseTo(0, 12);
      // Along the wall (plan ±y here) → horizontal grooves; across it (plan ±x) → vertical grooves.
      if (axisDeg === 90) expect(Math.abs(f.axis[1])).toBeCloseTo(1, 12);
      if (axisDeg === 0 || axisDeg === 180) expect(f.axis[2]).toBeCloseTo(1, 12);
      expect(() => run(wall)).not.toThrow();
    }
  });
});
