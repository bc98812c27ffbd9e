import { describe, expect, it } from "vitest";
import {
  buildLayoutGeometry,
  collinearOverlapM,
  convexPieces,
  counterClockwise,
  interiorEdgeFlags,
  isSelfIntersecting,
  pointInPolygon,
  roomAt,
  signedArea,
  triangulate,
  validateForCompute,
} from "@/lib/compute/geometry";
import { demoLayout } from "@/lib/demo/layout";
import { AppError } from "@/lib/http/errors";
import { emptyLayout, type Layout, type Panel, type PlanPoint } from "@/lib/layout/schema";
import { polygonArea } from "@/lib/viewfactor";

const pts = (...xy: number[]): PlanPoint[] => Array.from({ length: xy.length / 2 }, (_, i) => ({ x: xy[2 * i]!, y: xy[2 * i + 1]! }));
const square = pts(0, 0, 4, 0, 4, 4, 0, 4);
/** An L: 6 × 6 with the 3 × 3 north-east quarter cut away. */
const ell = pts(0, 0, 6, 0, 6, 3, 3, 3, 3, 6, 0, 6);

function layoutWith(patch: Partial<Layout>): Layout {
  return { ...emptyLayout(), rooms: [{ id: "r1", name: "Room one", outline: square, ceilingHeightM: 3 }], ...patch };
}

function panel(over: Partial<Panel>): Panel {
  return {
    id: "p1", label: "P1", roomId: "r1", mounting: "ceiling", center: { x: 2, y: 2 }, rotationDeg: 0, widthM: 1, lengthM: 2,
    mountingHeightM: null, mode: "heating", supply: { kind: "surface", surfaceTemperatureC: 35 }, emissivity: 0.9, louver: null, productId: null,
    ...over,
  };
}

function fieldsOf(fn: () => void): { path: string; message: string }[] {
  try {
    fn();
  } catch (error) {
    expect(error).toBeInstanceOf(AppError);
    expect((error as AppError).status).toBe(400);
    return [...((error as AppError).fields ?? [])];
  }
  throw new Error("expected an AppError");
}

describe("plan polygons", () => {
  it("signedArea is positive counter-clockwise and negative clockwise; counterClockwise reorders", () => {
    expect(signedArea(square)).toBe(16);
    expect(signedArea([...square].reverse())).toBe(-16);
    expect(signedArea(counterClockwise([...square].reverse()))).toBe(16);
    expect(signedArea(ell)).toBe(27);
  });

  it("pointInPolygon: inside, outside, in the cut-away corner of an L, and on an edge (within tolerance)", () => {
    expect(pointInPolygon({ x: 1, y: 1 }, ell)).toBe(true);
    expect(pointInPolygon({ x: 5, y: 5 }, ell)).toBe(false);
    expect(pointInPolygon({ x: 7, y: 1 }, ell)).toBe(false);
    expect(pointInPolygon({ x: 6, y: 1 }, ell)).toBe(true);
    expect(pointInPolygon({ x: 6.01, y: 1 }, ell)).toBe(false);
  });

  it("triangulate splits a non-convex L into triangles covering its area; a convex room stays one piece", () => {
    const triangles = triangulate(ell);
    expect(triangles).toHaveLength(4);
    expect(triangles.reduce((sum, t) => sum + Math.abs(signedArea(t)), 0)).toBeCloseTo(27, 10);
    for (const t of triangles) expect(signedArea(t)).toBeGreaterThan(0);
    expect(convexPieces(square)).toHaveLength(1);
    expect(convexPieces(ell).length).toBeGreaterThan(1);
  });

  it("isSelfIntersecting finds a bow-tie but not a square or an L", () => {
    expect(isSelfIntersecting(pts(0, 0, 4, 4, 4, 0, 0, 4))).toBe(true);
    expect(isSelfIntersecting(square)).toBe(false);
    expect(isSelfIntersecting(ell)).toBe(false);
  });

  it("collinearOverlapM measures shared wall length and is 0 for parallel or skew edges", () => {
    expect(collinearOverlapM({ x: 0, y: 0 }, { x: 10, y: 0 }, { x: 12, y: 0 }, { x: 4, y: 0 })).toBeCloseTo(6, 10);
    expect(collinearOverlapM({ x: 0, y: 0 }, { x: 10, y: 0 }, { x: 0, y: 1 }, { x: 10, y: 1 })).toBe(0);
    expect(collinearOverlapM({ x: 0, y: 0 }, { x: 10, y: 0 }, { x: 5, y: -1 }, { x: 5, y: 1 })).toBe(0);
  });
});

describe("interior and exterior walls", () => {
  it("in the demo plan, walls shared with another room are interior and the façade is exterior", () => {
    const flags = interiorEdgeFlags(demoLayout().rooms);
    // Open office: south façade, east wall shared with the meeting and focus rooms, north, west.
    expect(flags.get("room-open")).toEqual([false, true, false, false]);
    // Meeting room: south façade, east, north (shared with the focus room), west (shared with the open office).
    expect(flags.get("room-meeting")).toEqual([false, false, true, true]);
    expect(flags.get("room-focus")).toEqual([true, false, false, true]);
  });

  it("a wall touching another room over less than half its length stays exterior", () => {
    const rooms = [
      { id: "a", name: "A", outline: pts(0, 0, 10, 0, 10, 4, 0, 4), ceilingHeightM: 3 },
      { id: "b", name: "B", outline: pts(10, 0, 12, 0, 12, 1, 10, 1), ceilingHeightM: 3 },
    ];
    expect(interiorEdgeFlags(rooms).get("a")).toEqual([false, false, false, false]);
    expect(interiorEdgeFlags(rooms).get("b")).toEqual([false, false, false, true]);
  });
});

describe("rooms in 3-D", () => {
  it("a clockwise room gets floor, ceiling, a wall per edge, openings in their wall and panels covering their host", () => {
    const layout = layoutWith({
      rooms: [{ id: "r1", name: "Room one", outline: [...square].reverse(), ceilingHeightM: 3 }],
      openings: [{ id: "w1", roomId: "r1", kind: "window", edgeIndex: 0, offsetM: 1, widthM: 2, sillHeightM: 1, heightM: 1.5, thermal: { kind: "uValue", uValueWm2K: 1.2 } }],
      panels: [panel({}), panel({ id: "p2", label: "P2", mounting: "wall", center: { x: 3.95, y: 2 }, rotationDeg: 180, widthM: 0.6, lengthM: 1, mountingHeightM: 0.2 })],
    });
    const room = buildLayoutGeometry(layout).get("r1")!;
    const kinds = room.surfaces.map((s) => s.kind);
    expect(kinds).toEqual(["floor", "ceiling", "wall", "wall", "wall", "wall", "opening", "panel", "panel"]);
    expect(room.areaM2).toBeCloseTo(16, 10);
    const window = room.surfaces.find((s) => s.id === "w1")!;
    // Edge 0 of the clockwise outline runs from (0,4) to (4,4): the window starts 1 m from (0,4).
    const xs = window.pieces[0]!.map((v) => v[0]);
    expect(Math.min(...xs)).toBeCloseTo(1, 10);
    expect(Math.max(...xs)).toBeCloseTo(3, 10);
    expect(window.pieces[0]!.every((v) => Math.abs(v[1] - 4) < 1e-12)).toBe(true);
    expect(room.surfaces[window.hostIndex]!.id).toBe("r1:wall:0");
    expect(polygonArea(window.pieces[0]!)).toBeCloseTo(3, 10);
    const ceilingPanel = room.surfaces.find((s) => s.id === "p1")!;
    expect(room.surfaces[ceilingPanel.hostIndex]!.role).toBe("ceiling");
    expect(ceilingPanel.pieces[0]!.every((v) => v[2] === 3)).toBe(true);
    const wallPanel = room.surfaces.find((s) => s.id === "p2")!;
    const host = room.surfaces[wallPanel.hostIndex]!;
    expect(host.kind).toBe("wall");
    expect(wallPanel.pieces[0]!.every((v) => Math.abs(v[0] - 4) < 1e-12)).toBe(true); // snapped onto the wall plane x = 4
    expect(Math.min(...wallPanel.pieces[0]!.map((v) => v[2]))).toBeCloseTo(0.2, 10);
  });

  it("roomAt finds the room holding a point and null outside every room", () => {
    const rooms = demoLayout().rooms;
    expect(roomAt(rooms, { x: 5, y: 5 })?.id).toBe("room-open");
    expect(roomAt(rooms, { x: 21, y: 9 })?.id).toBe("room-focus");
    expect(roomAt(rooms, { x: 30, y: 5 })).toBeNull();
  });
});

describe("validateForCompute", () => {
  it("accepts the demo plan", () => {
    expect(() => validateForCompute(demoLayout())).not.toThrow();
  });

  it("names a seat outside every room by index and label", () => {
    const layout = demoLayout();
    layout.seats[3] = { ...layout.seats[3]!, position: { x: 40, y: 40 } };
    expect(fieldsOf(() => validateForCompute(layout))).toEqual([{ path: "layout.seats.3", message: `seat "${layout.seats[3]!.label}" is outside every room` }]);
  });

  it("names a ceiling panel that sticks out of its room, and a wall panel on no wall", () => {
    const fields = fieldsOf(() =>
      validateForCompute(layoutWith({ panels: [panel({ center: { x: 3.8, y: 2 } }), panel({ id: "p2", label: "Wall P", mounting: "wall", center: { x: 2, y: 2 } })] })),
    );
    expect(fields.map((f) => f.path)).toEqual(["layout.panels.0", "layout.panels.1"]);
    expect(fields[0]!.message).toContain('panel "P1" is outside its room "Room one"');
    expect(fields[1]!.message).toContain('panel "Wall P"');
  });

  it("names a zero-area room and a self-intersecting room (and their seats are then outside every room)", () => {
    const fields = fieldsOf(() =>
      validateForCompute({
        ...emptyLayout(),
        rooms: [
          { id: "flat", name: "Flat", outline: pts(0, 0, 5, 0, 10, 0), ceilingHeightM: 3 },
          { id: "bow", name: "Bow", outline: pts(20, 0, 24, 4, 24, 0, 20, 4), ceilingHeightM: 3 },
        ],
      }),
    );
    expect(fields).toEqual([
      { path: "layout.rooms.0", message: 'room "Flat" has no area' },
      { path: "layout.rooms.1", message: 'room "Bow" crosses itself' },
    ]);
  });

  it("names an opening that does not fit its edge or reaches above the ceiling", () => {
    const base = { roomId: "r1", kind: "window" as const, edgeIndex: 0, sillHeightM: 1, thermal: { kind: "uValue" as const, uValueWm2K: 1.2 } };
    const fields = fieldsOf(() =>
      validateForCompute(
        layoutWith({
          openings: [
            { ...base, id: "w-long", offsetM: 3, widthM: 2, heightM: 1 },
            { ...base, id: "w-tall", offsetM: 0, widthM: 1, heightM: 2.5 },
            { ...base, id: "w-ok", offsetM: 2, widthM: 2, heightM: 2 },
          ],
        }),
      ),
    );
    expect(fields.map((f) => f.path)).toEqual(["layout.openings.0", "layout.openings.1"]);
    expect(fields[0]!.message).toContain('window "w-long" does not fit its wall');
    expect(fields[1]!.message).toContain('window "w-tall" reaches above the ceiling');
  });
});
