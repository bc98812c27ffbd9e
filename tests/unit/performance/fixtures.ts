/** Small plans and scenarios for the performance assembly tests (invented values). */
import { buildLayoutGeometry } from "@/lib/compute/geometry";
import { LAYOUT_SCHEMA_VERSION, type Layout, type Panel } from "@/lib/layout/schema";
import { withLoadDefaults, type ResolvedScenarioConditions, type ScenarioConditions } from "@/lib/scenarios/schema";

/** A 5 m × 4 m room, 3 m high, every wall exterior (no neighbour), one 2 m × 1.5 m window on edge 0. */
export function oneRoom(panels: Panel[] = [], seats = 2): Layout {
  return {
    schemaVersion: LAYOUT_SCHEMA_VERSION,
    rooms: [{ id: "r1", name: "Office", outline: [{ x: 0, y: 0 }, { x: 5, y: 0 }, { x: 5, y: 4 }, { x: 0, y: 4 }], ceilingHeightM: 3 }],
    openings: [{ id: "w1", roomId: "r1", kind: "window", edgeIndex: 0, offsetM: 1, widthM: 2, sillHeightM: 0.9, heightM: 1.5, thermal: { kind: "uValue", uValueWm2K: 1.4 } }],
    panels,
    seats: Array.from({ length: seats }, (_, i) => ({ id: `s${i + 1}`, label: `Desk ${i + 1}`, position: { x: 1 + i, y: 2 }, posture: "seated" as const, facingDeg: 90, clo: null, met: null })),
    zones: [],
    underlay: null,
  };
}

export function ceilingPanel(id: string, x: number, y: number, extra: Partial<Panel> = {}): Panel {
  return {
    id, label: id.toUpperCase(), roomId: "r1", mounting: "ceiling", center: { x, y }, rotationDeg: 0, widthM: 1, lengthM: 2,
    mountingHeightM: null, mode: "heating", supply: { kind: "surface", surfaceTemperatureC: 32 }, emissivity: 0.9, louver: null, productId: null,
    ...extra,
  };
}

export const LOUVER = { openingAngleDeg: 180, minOpeningAngleDeg: 30, maxOpeningAngleDeg: 180, axisDeg: 0, finish: "diffuse", wallEmissivity: 0.9 } as const;

export function winter(extra: Partial<ScenarioConditions> = {}): ResolvedScenarioConditions {
  return withLoadDefaults({
    airTemperatureC: 20, relativeHumidityPercent: 40, airSpeedMps: 0.1, defaultClo: 1, defaultMet: 1.2, outdoorTemperatureC: -10,
    activeModes: ["heating"],
    surfaces: { exteriorWalls: { kind: "uValue", uValueWm2K: 0.3 }, interiorWalls: null, floor: null, ceiling: null, openings: { kind: "uValue", uValueWm2K: 1.4 } },
    ...extra,
  });
}

export function geometryOf(layout: Layout, roomId = "r1") {
  return buildLayoutGeometry(layout).get(roomId)!;
}
