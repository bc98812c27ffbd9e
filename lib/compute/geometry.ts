/**
 * Plan geometry for the comfort computation (pure, no I/O): layout rooms → 3-D radiant
 * surfaces, point-in-polygon, convex decomposition, interior/exterior walls and the checks a
 * layout must pass before it can be computed.
 *
 * Coordinates: plan x east, y north, z up from the finished floor, metres (as the layout).
 */
import type { Vec3 } from "@/lib/viewfactor";
import type { SurfaceKind } from "@/lib/compute/types";
import { AppError, type FieldError } from "@/lib/http/errors";
import { distanceToSegment, pointInPolygon as pointInOutline, signedArea } from "@/lib/layout/plan-geometry";
import type { Layout, Opening, Panel, PlanPoint, Room } from "@/lib/layout/schema";

export { distanceToSegment, signedArea };

/** Lengths below this are treated as zero, m. */
export const GEOMETRY_EPS_M = 1e-6;
/** A room smaller than this cannot be computed, m². */
export const MIN_ROOM_AREA_M2 = 0.01;
/** How far a wall panel's centre may sit from its wall line, m (panel depth, drawing slack). */
export const WALL_PANEL_SNAP_M = 0.15;
/** How far an element may stick out of its room before it counts as outside, m. */
const CONTAINMENT_TOLERANCE_M = 1e-3;

/** What sets a surface's temperature (the scenario's surface classes, plus the layout's own elements). */
export type SurfaceRole = "floor" | "ceiling" | "exteriorWall" | "interiorWall" | "opening" | "panel";

/** One radiant surface of a room: a planar region made of convex pieces. */
export interface RoomSurface {
  /** Layout id for openings and panels; "<roomId>:floor", "<roomId>:ceiling", "<roomId>:wall:<i>" otherwise. */
  id: string;
  kind: SurfaceKind;
  role: SurfaceRole;
  label: string;
  /** Convex planar polygons (m) that together form the surface. */
  pieces: Vec3[][];
  /** Gross area of the pieces, m². */
  areaM2: number;
  /** Index (in the room's surface list) of the surface this one lies in and covers, or −1. */
  hostIndex: number;
  /** Edge index for walls and the elements on them, else −1. */
  edgeIndex: number;
  /** The opening or panel of the layout, when the surface is one. */
  opening: Opening | null;
  panel: Panel | null;
}

export interface RoomGeometry {
  room: Room;
  /** The outline in counter-clockwise order. */
  outline: PlanPoint[];
  /** Per edge of `outline` (edge i from corner i to i+1): true when it is shared with another room. */
  interiorEdges: boolean[];
  surfaces: RoomSurface[];
  areaM2: number;
}

// ---------------------------------------------------------------------------------------------
// Plane polygons

/** The outline in counter-clockwise order (a new array when reversed). */
export function counterClockwise(outline: ReadonlyArray<PlanPoint>): PlanPoint[] {
  return signedArea(outline) < 0 ? [...outline].reverse() : [...outline];
}

/**
 * Point in polygon (lib/layout/plan-geometry.ts) with the computation's containment tolerance:
 * a point within `toleranceM` of an edge counts as inside, so a seat drawn on a wall line still
 * belongs to the room.
 */
export function pointInPolygon(p: PlanPoint, outline: ReadonlyArray<PlanPoint>, toleranceM = CONTAINMENT_TOLERANCE_M): boolean {
  return pointInOutline(p, outline, toleranceM);
}

function cross(o: PlanPoint, a: PlanPoint, b: PlanPoint): number {
  return (a.x - o.x) * (b.y - o.y) - (a.y - o.y) * (b.x - o.x);
}

/** True when every turn of the (counter-clockwise) outline is a left turn or straight. */
export function isConvex(ccw: ReadonlyArray<PlanPoint>): boolean {
  const n = ccw.length;
  for (let i = 0; i < n; i++) {
    if (cross(ccw[i]!, ccw[(i + 1) % n]!, ccw[(i + 2) % n]!) < -GEOMETRY_EPS_M) return false;
  }
  return true;
}

/** True when segments p1–p2 and q1–q2 cross or touch (collinear overlaps included). */
function segmentsIntersect(p1: PlanPoint, p2: PlanPoint, q1: PlanPoint, q2: PlanPoint): boolean {
  const d1 = cross(q1, q2, p1);
  const d2 = cross(q1, q2, p2);
  const d3 = cross(p1, p2, q1);
  const d4 = cross(p1, p2, q2);
  const eps = 1e-12;
  if (((d1 > eps && d2 < -eps) || (d1 < -eps && d2 > eps)) && ((d3 > eps && d4 < -eps) || (d3 < -eps && d4 > eps))) return true;
  const onSegment = (a: PlanPoint, b: PlanPoint, c: PlanPoint) =>
    Math.min(a.x, b.x) - eps <= c.x && c.x <= Math.max(a.x, b.x) + eps && Math.min(a.y, b.y) - eps <= c.y && c.y <= Math.max(a.y, b.y) + eps;
  if (Math.abs(d1) <= eps && onSegment(q1, q2, p1)) return true;
  if (Math.abs(d2) <= eps && onSegment(q1, q2, p2)) return true;
  if (Math.abs(d3) <= eps && onSegment(p1, p2, q1)) return true;
  if (Math.abs(d4) <= eps && onSegment(p1, p2, q2)) return true;
  return false;
}

/** True when two edges of the outline that are not neighbours cross or touch. */
export function isSelfIntersecting(outline: ReadonlyArray<PlanPoint>): boolean {
  const n = outline.length;
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      const neighbours = j === i + 1 || (i === 0 && j === n - 1);
      if (neighbours) continue;
      if (segmentsIntersect(outline[i]!, outline[(i + 1) % n]!, outline[j]!, outline[(j + 1) % n]!)) return true;
    }
  }
  return false;
}

/**
 * Triangulation of a simple polygon by ear clipping (counter-clockwise input), O(n³) worst
 * case — rooms have at most 64 corners. Collinear corners are dropped.
 */
export function triangulate(ccw: ReadonlyArray<PlanPoint>): PlanPoint[][] {
  const remaining = [...ccw];
  const triangles: PlanPoint[][] = [];
  let guard = 0;
  while (remaining.length > 3 && guard++ < 10_000) {
    const n = remaining.length;
    let clipped = false;
    for (let i = 0; i < n; i++) {
      const a = remaining[(i + n - 1) % n]!;
      const b = remaining[i]!;
      const c = remaining[(i + 1) % n]!;
      const turn = cross(a, b, c);
      if (Math.abs(turn) <= 1e-12) {
        remaining.splice(i, 1); // collinear corner: no area, drop it
        clipped = true;
        break;
      }
      if (turn < 0) continue; // reflex corner
      let containsOther = false;
      for (const p of remaining) {
        if (p === a || p === b || p === c) continue;
        if (cross(a, b, p) >= 0 && cross(b, c, p) >= 0 && cross(c, a, p) >= 0) {
          containsOther = true;
          break;
        }
      }
      if (containsOther) continue;
      triangles.push([a, b, c]);
      remaining.splice(i, 1);
      clipped = true;
      break;
    }
    if (!clipped) break; // not simple; validation reports it
  }
  if (remaining.length === 3 && Math.abs(cross(remaining[0]!, remaining[1]!, remaining[2]!)) > 1e-12) triangles.push(remaining);
  return triangles;
}

/** Convex pieces of a plan polygon: itself when convex, else its triangles. */
export function convexPieces(outline: ReadonlyArray<PlanPoint>): PlanPoint[][] {
  const ccw = counterClockwise(outline);
  return isConvex(ccw) ? [ccw] : triangulate(ccw);
}

// ---------------------------------------------------------------------------------------------
// Rooms and their walls

function edgeOf(outline: ReadonlyArray<PlanPoint>, i: number): [PlanPoint, PlanPoint] {
  return [outline[i]!, outline[(i + 1) % outline.length]!];
}

/** Length of the overlap of segment a–b with segment c–d when both lie on one line, else 0, m. */
export function collinearOverlapM(a: PlanPoint, b: PlanPoint, c: PlanPoint, d: PlanPoint, toleranceM = 0.01): number {
  const len = Math.hypot(b.x - a.x, b.y - a.y);
  if (len < GEOMETRY_EPS_M) return 0;
  const ux = (b.x - a.x) / len;
  const uy = (b.y - a.y) / len;
  const offC = Math.abs((c.x - a.x) * uy - (c.y - a.y) * ux);
  const offD = Math.abs((d.x - a.x) * uy - (d.y - a.y) * ux);
  if (offC > toleranceM || offD > toleranceM) return 0;
  const tc = (c.x - a.x) * ux + (c.y - a.y) * uy;
  const td = (d.x - a.x) * ux + (d.y - a.y) * uy;
  return Math.max(0, Math.min(len, Math.max(tc, td)) - Math.max(0, Math.min(tc, td)));
}

/**
 * Which edges of each room are interior: an edge is interior when, over at least half its
 * length, it lies on (collinear with and overlapping) edges of other rooms; every other edge
 * is an exterior wall. Keyed by room id; one flag per edge in the room's own corner order.
 */
export function interiorEdgeFlags(rooms: ReadonlyArray<Room>): Map<string, boolean[]> {
  const flags = new Map<string, boolean[]>();
  for (const room of rooms) {
    const own = room.outline;
    flags.set(
      room.id,
      own.map((_, i) => {
        const [a, b] = edgeOf(own, i);
        const len = Math.hypot(b.x - a.x, b.y - a.y);
        let shared = 0;
        for (const other of rooms) {
          if (other.id === room.id) continue;
          for (let j = 0; j < other.outline.length; j++) {
            const [c, d] = edgeOf(other.outline, j);
            shared += collinearOverlapM(a, b, c, d);
          }
        }
        return len > GEOMETRY_EPS_M && shared >= len / 2;
      }),
    );
  }
  return flags;
}

/** The first room (in layout order) whose outline holds the point, or null. */
export function roomAt(rooms: ReadonlyArray<Room>, p: PlanPoint): Room | null {
  return rooms.find((r) => pointInPolygon(p, r.outline)) ?? null;
}

// ---------------------------------------------------------------------------------------------
// Elements in 3-D

const v3 = (p: PlanPoint, z: number): Vec3 => [p.x, p.y, z];

/** Plan corners of a ceiling panel (centre, length along rotationDeg, width across). */
export function ceilingPanelCorners(panel: Panel): PlanPoint[] {
  const r = (panel.rotationDeg * Math.PI) / 180;
  const ux = Math.cos(r);
  const uy = Math.sin(r);
  const hl = panel.lengthM / 2;
  const hw = panel.widthM / 2;
  const c = panel.center;
  return [
    { x: c.x - ux * hl + uy * hw, y: c.y - uy * hl - ux * hw },
    { x: c.x + ux * hl + uy * hw, y: c.y + uy * hl - ux * hw },
    { x: c.x + ux * hl - uy * hw, y: c.y + uy * hl + ux * hw },
    { x: c.x - ux * hl - uy * hw, y: c.y - uy * hl + ux * hw },
  ];
}

/** The edge of the room a wall panel hangs on: the nearest edge line within WALL_PANEL_SNAP_M, with the centre's position along it. */
export function wallOfPanel(outline: ReadonlyArray<PlanPoint>, panel: Panel): { edgeIndex: number; alongM: number } | null {
  let best: { edgeIndex: number; alongM: number; distance: number } | null = null;
  for (let i = 0; i < outline.length; i++) {
    const [a, b] = edgeOf(outline, i);
    const len = Math.hypot(b.x - a.x, b.y - a.y);
    if (len < GEOMETRY_EPS_M) continue;
    const ux = (b.x - a.x) / len;
    const uy = (b.y - a.y) / len;
    const along = (panel.center.x - a.x) * ux + (panel.center.y - a.y) * uy;
    if (along < -WALL_PANEL_SNAP_M || along > len + WALL_PANEL_SNAP_M) continue;
    const distance = Math.abs((panel.center.x - a.x) * uy - (panel.center.y - a.y) * ux);
    if (distance <= WALL_PANEL_SNAP_M && (!best || distance < best.distance)) best = { edgeIndex: i, alongM: along, distance };
  }
  return best ? { edgeIndex: best.edgeIndex, alongM: best.alongM } : null;
}

function wallRectangle(a: PlanPoint, b: PlanPoint, fromM: number, toM: number, z0: number, z1: number): Vec3[] {
  const len = Math.hypot(b.x - a.x, b.y - a.y);
  const ux = (b.x - a.x) / len;
  const uy = (b.y - a.y) / len;
  const p = { x: a.x + ux * fromM, y: a.y + uy * fromM };
  const q = { x: a.x + ux * toM, y: a.y + uy * toM };
  return [v3(p, z0), v3(q, z0), v3(q, z1), v3(p, z1)];
}

function rectangleArea(poly: ReadonlyArray<Vec3>): number {
  const [a, b, , d] = poly as [Vec3, Vec3, Vec3, Vec3];
  return Math.hypot(b[0] - a[0], b[1] - a[1], b[2] - a[2]) * Math.hypot(d[0] - a[0], d[1] - a[1], d[2] - a[2]);
}

function planArea(pieces: ReadonlyArray<ReadonlyArray<PlanPoint>>): number {
  return pieces.reduce((sum, p) => sum + Math.abs(signedArea(p)), 0);
}

// ---------------------------------------------------------------------------------------------
// Validation and the room model

function describe(kind: string, name: string): string {
  return `${kind} "${name}"`;
}

/**
 * Checks a (schema-valid) layout for computing. Problems are collected, each naming the
 * object and its path, and thrown together as one AppError('invalid_input').
 */
export function validateForCompute(layout: Layout): void {
  const fields: FieldError[] = [];
  const badRooms = new Set<string>();
  layout.rooms.forEach((room, i) => {
    const path = `layout.rooms.${i}`;
    const area = Math.abs(signedArea(room.outline));
    const zeroEdge = room.outline.some((_, k) => {
      const [a, b] = edgeOf(room.outline, k);
      return Math.hypot(b.x - a.x, b.y - a.y) < GEOMETRY_EPS_M;
    });
    if (zeroEdge) fields.push({ path, message: `${describe("room", room.name)} has two corners on the same spot` });
    else if (isSelfIntersecting(room.outline)) fields.push({ path, message: `${describe("room", room.name)} crosses itself` });
    else if (area < MIN_ROOM_AREA_M2) fields.push({ path, message: `${describe("room", room.name)} has no area` });
    else return;
    badRooms.add(room.id);
  });
  const rooms = new Map(layout.rooms.map((r) => [r.id, r]));

  layout.openings.forEach((o, i) => {
    const room = rooms.get(o.roomId);
    if (!room || badRooms.has(room.id)) return;
    const [a, b] = edgeOf(room.outline, o.edgeIndex);
    const len = Math.hypot(b.x - a.x, b.y - a.y);
    const path = `layout.openings.${i}`;
    if (o.offsetM + o.widthM > len + CONTAINMENT_TOLERANCE_M) {
      fields.push({ path, message: `${o.kind} "${o.id}" does not fit its wall: ${(o.offsetM + o.widthM).toFixed(2)} m along a ${len.toFixed(2)} m edge` });
    } else if (o.sillHeightM + o.heightM > room.ceilingHeightM + CONTAINMENT_TOLERANCE_M) {
      fields.push({ path, message: `${o.kind} "${o.id}" reaches above the ceiling of ${describe("room", room.name)}` });
    }
  });

  layout.panels.forEach((p, i) => {
    const room = rooms.get(p.roomId);
    if (!room || badRooms.has(room.id)) return;
    const path = `layout.panels.${i}`;
    if (p.mounting === "ceiling") {
      const z = p.mountingHeightM ?? room.ceilingHeightM;
      if (!ceilingPanelCorners(p).every((c) => pointInPolygon(c, room.outline, 0.01)) || !pointInPolygon(p.center, room.outline, 0.01)) {
        fields.push({ path, message: `panel "${p.label}" is outside its ${describe("room", room.name)}` });
      } else if (z > room.ceilingHeightM + CONTAINMENT_TOLERANCE_M || z <= 0) {
        fields.push({ path, message: `panel "${p.label}" is mounted at ${z} m, outside the ${room.ceilingHeightM} m height of ${describe("room", room.name)}` });
      }
      return;
    }
    const wall = wallOfPanel(room.outline, p);
    if (!wall) {
      fields.push({ path, message: `panel "${p.label}" is outside its ${describe("room", room.name)}: its centre is on none of the room's walls` });
      return;
    }
    const [a, b] = edgeOf(room.outline, wall.edgeIndex);
    const len = Math.hypot(b.x - a.x, b.y - a.y);
    const z0 = p.mountingHeightM ?? 0;
    if (wall.alongM - p.lengthM / 2 < -CONTAINMENT_TOLERANCE_M || wall.alongM + p.lengthM / 2 > len + CONTAINMENT_TOLERANCE_M) {
      fields.push({ path, message: `panel "${p.label}" is wider than its wall allows in ${describe("room", room.name)}` });
    } else if (z0 + p.widthM > room.ceilingHeightM + CONTAINMENT_TOLERANCE_M) {
      fields.push({ path, message: `panel "${p.label}" reaches above the ceiling of ${describe("room", room.name)}` });
    }
  });

  const goodRooms = layout.rooms.filter((r) => !badRooms.has(r.id));
  layout.seats.forEach((s, i) => {
    if (!roomAt(goodRooms, s.position)) fields.push({ path: `layout.seats.${i}`, message: `seat "${s.label}" is outside every room` });
  });

  if (fields.length > 0) throw new AppError("invalid_input", "The layout cannot be computed: fix the objects named.", fields);
}

/**
 * The radiant surfaces of one room: floor, ceiling (convex pieces), a wall per edge, the
 * openings as rectangles in their walls, ceiling panels at their mounting height, wall panels
 * on their wall. Openings and panels record the surface they cover (`hostIndex`); the
 * computation subtracts their view factors from the host's. Call after validateForCompute.
 */
export function buildRoomGeometry(room: Room, layout: Layout, interiorEdges: boolean[]): RoomGeometry {
  const reversed = signedArea(room.outline) < 0;
  const outline = counterClockwise(room.outline);
  const n = outline.length;
  /** Edge index in the CCW outline for an edge index of the room's own corner order. */
  const ccwEdge = (i: number) => (reversed ? (2 * n - 2 - i) % n : i);
  const interiorCcw = outline.map((_, k) => interiorEdges[reversed ? (2 * n - 2 - k) % n : k] ?? false);
  const h = room.ceilingHeightM;
  const pieces = convexPieces(outline);
  const areaM2 = planArea(pieces);
  const surfaces: RoomSurface[] = [];
  const base = { hostIndex: -1, edgeIndex: -1, opening: null, panel: null };

  surfaces.push({ ...base, id: `${room.id}:floor`, kind: "floor", role: "floor", label: `${room.name} floor`, pieces: pieces.map((p) => p.map((q) => v3(q, 0))), areaM2 });
  const ceilingIndex = surfaces.length;
  surfaces.push({ ...base, id: `${room.id}:ceiling`, kind: "ceiling", role: "ceiling", label: `${room.name} ceiling`, pieces: pieces.map((p) => p.map((q) => v3(q, h))), areaM2 });

  const wallIndex: number[] = [];
  for (let k = 0; k < n; k++) {
    const [a, b] = edgeOf(outline, k);
    const len = Math.hypot(b.x - a.x, b.y - a.y);
    wallIndex.push(surfaces.length);
    const interior = interiorCcw[k]!;
    const rect = wallRectangle(a, b, 0, len, 0, h);
    surfaces.push({
      ...base,
      id: `${room.id}:wall:${ccwEdge(k)}`,
      kind: "wall",
      role: interior ? "interiorWall" : "exteriorWall",
      label: `${room.name} ${interior ? "interior" : "exterior"} wall ${ccwEdge(k) + 1}`,
      pieces: [rect],
      areaM2: len * h,
      edgeIndex: ccwEdge(k),
    });
  }

  for (const o of layout.openings) {
    if (o.roomId !== room.id) continue;
    const k = ccwEdge(o.edgeIndex);
    const [a, b] = edgeOf(outline, k);
    const len = Math.hypot(b.x - a.x, b.y - a.y);
    // Offsets run from the edge's start corner in the room's own order; reversed edges run the other way.
    const from = reversed ? len - o.offsetM - o.widthM : o.offsetM;
    const rect = wallRectangle(a, b, from, from + o.widthM, o.sillHeightM, o.sillHeightM + o.heightM);
    surfaces.push({
      id: o.id,
      kind: "opening",
      role: "opening",
      label: `${o.kind === "window" ? "Window" : "Glazed door"} ${o.id}`,
      pieces: [rect],
      areaM2: rectangleArea(rect),
      hostIndex: wallIndex[k]!,
      edgeIndex: o.edgeIndex,
      opening: o,
      panel: null,
    });
  }

  for (const p of layout.panels) {
    if (p.roomId !== room.id) continue;
    if (p.mounting === "ceiling") {
      const z = p.mountingHeightM ?? h;
      const corners = ceilingPanelCorners(p).map((c) => v3(c, z));
      surfaces.push({ id: p.id, kind: "panel", role: "panel", label: p.label, pieces: [corners], areaM2: p.widthM * p.lengthM, hostIndex: ceilingIndex, edgeIndex: -1, opening: null, panel: p });
      continue;
    }
    const wall = wallOfPanel(outline, p);
    if (!wall) continue; // validateForCompute reports it
    const [a, b] = edgeOf(outline, wall.edgeIndex);
    const z0 = p.mountingHeightM ?? 0;
    const rect = wallRectangle(a, b, wall.alongM - p.lengthM / 2, wall.alongM + p.lengthM / 2, z0, z0 + p.widthM);
    surfaces.push({
      id: p.id,
      kind: "panel",
      role: "panel",
      label: p.label,
      pieces: [rect],
      areaM2: p.widthM * p.lengthM,
      hostIndex: wallIndex[wall.edgeIndex]!,
      edgeIndex: ccwEdge(wall.edgeIndex),
      opening: null,
      panel: p,
    });
  }
  return { room, outline, interiorEdges: room.outline.map((_, i) => interiorEdges[i] ?? false), surfaces, areaM2 };
}

/** Room models for a whole (validated) layout, keyed by room id. */
export function buildLayoutGeometry(layout: Layout): Map<string, RoomGeometry> {
  const flags = interiorEdgeFlags(layout.rooms);
  return new Map(layout.rooms.map((r) => [r.id, buildRoomGeometry(r, layout, flags.get(r.id) ?? [])]));
}

/** Net area of each surface: gross area minus the areas of the surfaces it hosts, m². */
export function netAreas(surfaces: ReadonlyArray<RoomSurface>): number[] {
  const net = surfaces.map((s) => s.areaM2);
  for (const s of surfaces) if (s.hostIndex >= 0) net[s.hostIndex] = net[s.hostIndex]! - s.areaM2;
  return net.map((a) => Math.max(0, a));
}
