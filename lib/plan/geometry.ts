/**
 * Plan geometry of the layout's elements, in metres. Pure functions: the canvas draws what these
 * describe, and the editor uses them for hit-testing, containment and rubber-band selection.
 *
 * Angles follow the layout schema: degrees from +x toward +y. The canvas draws plan +y
 * downward (the screen convention), so a positive angle turns clockwise on screen.
 */
import { boundsOf, distanceToSegment, pointInPolygon, polygonArea, signedArea, type Bounds } from "@/lib/layout/plan-geometry";
import type { Layout, Opening, Panel, PlanPoint, Room, Seat, Zone } from "@/lib/layout/schema";

export type ElementKind = "room" | "opening" | "panel" | "seat" | "zone";

export type ElementOf<K extends ElementKind> = K extends "room"
  ? Room
  : K extends "opening"
    ? Opening
    : K extends "panel"
      ? Panel
      : K extends "seat"
        ? Seat
        : Zone;

export type AnyElement =
  | { kind: "room"; element: Room }
  | { kind: "opening"; element: Opening }
  | { kind: "panel"; element: Panel }
  | { kind: "seat"; element: Seat }
  | { kind: "zone"; element: Zone };

// The primitives live in lib/layout/plan-geometry.ts (shared with the computation).
export { boundsOf, distanceToSegment, pointInPolygon, polygonArea, signedArea, type Bounds } from "@/lib/layout/plan-geometry";

/** Radius a seat is drawn and hit with, m (about a person's shoulder half-width plus a margin). */
export const SEAT_RADIUS_M = 0.3;
/** Plan depth a wall panel is drawn with, m. */
export const WALL_PANEL_DEPTH_M = 0.08;

const DEG = Math.PI / 180;

export function toRad(deg: number): number {
  return deg * DEG;
}

export function distance(a: PlanPoint, b: PlanPoint): number {
  return Math.hypot(a.x - b.x, a.y - b.y);
}

/** Area centroid; for a degenerate (zero-area) outline, the mean of its corners. */
export function polygonCentroid(outline: readonly PlanPoint[]): PlanPoint {
  const area = signedArea(outline);
  if (Math.abs(area) < 1e-12) {
    const n = Math.max(outline.length, 1);
    return { x: outline.reduce((s, p) => s + p.x, 0) / n, y: outline.reduce((s, p) => s + p.y, 0) / n };
  }
  let cx = 0;
  let cy = 0;
  for (let i = 0; i < outline.length; i += 1) {
    const a = outline[i]!;
    const b = outline[(i + 1) % outline.length]!;
    const cross = a.x * b.y - b.x * a.y;
    cx += (a.x + b.x) * cross;
    cy += (a.y + b.y) * cross;
  }
  return { x: cx / (6 * area), y: cy / (6 * area) };
}

export function unionBounds(list: readonly Bounds[]): Bounds | null {
  if (list.length === 0) return null;
  return {
    minX: Math.min(...list.map((b) => b.minX)),
    minY: Math.min(...list.map((b) => b.minY)),
    maxX: Math.max(...list.map((b) => b.maxX)),
    maxY: Math.max(...list.map((b) => b.maxY)),
  };
}

/** Rotates points about `center` by `angleDeg` (from +x toward +y). */
export function rotatePoints(points: readonly PlanPoint[], center: PlanPoint, angleDeg: number): PlanPoint[] {
  const c = Math.cos(toRad(angleDeg));
  const s = Math.sin(toRad(angleDeg));
  return points.map((p) => {
    const dx = p.x - center.x;
    const dy = p.y - center.y;
    return { x: center.x + dx * c - dy * s, y: center.y + dx * s + dy * c };
  });
}

/** Scales points about `origin`. */
export function scalePoints(points: readonly PlanPoint[], origin: PlanPoint, sx: number, sy: number): PlanPoint[] {
  return points.map((p) => ({ x: origin.x + (p.x - origin.x) * sx, y: origin.y + (p.y - origin.y) * sy }));
}

export function translatePoints(points: readonly PlanPoint[], dx: number, dy: number): PlanPoint[] {
  return points.map((p) => ({ x: p.x + dx, y: p.y + dy }));
}

/** The four plan corners of a panel's footprint (a wall panel: a thin strip behind its face line). */
export function panelCorners(panel: Pick<Panel, "center" | "rotationDeg" | "widthM" | "lengthM" | "mounting">): PlanPoint[] {
  const { center } = panel;
  // Ceiling: length along rotationDeg, width across. Wall: the face points along rotationDeg,
  // its length runs along the wall (rotationDeg + 90°) and it is drawn WALL_PANEL_DEPTH_M deep.
  const along = panel.mounting === "ceiling" ? panel.lengthM : WALL_PANEL_DEPTH_M;
  const across = panel.mounting === "ceiling" ? panel.widthM : panel.lengthM;
  const local = [
    { x: -along / 2, y: -across / 2 },
    { x: along / 2, y: -across / 2 },
    { x: along / 2, y: across / 2 },
    { x: -along / 2, y: across / 2 },
  ];
  return rotatePoints(
    local.map((p) => ({ x: center.x + p.x, y: center.y + p.y })),
    center,
    panel.rotationDeg,
  );
}

/** Start and end of an opening along its room edge, or null when the edge no longer exists. */
export function openingSegment(opening: Opening, room: Room | undefined): [PlanPoint, PlanPoint] | null {
  if (!room) return null;
  const a = room.outline[opening.edgeIndex];
  const b = room.outline[(opening.edgeIndex + 1) % room.outline.length];
  if (!a || !b) return null;
  const length = distance(a, b);
  if (length === 0) return null;
  const ux = (b.x - a.x) / length;
  const uy = (b.y - a.y) / length;
  const start = Math.min(opening.offsetM, length);
  const end = Math.min(opening.offsetM + opening.widthM, length);
  return [
    { x: a.x + ux * start, y: a.y + uy * start },
    { x: a.x + ux * end, y: a.y + uy * end },
  ];
}

/** Every element of the layout with its kind, in drawing order (bottom first). */
export function allElements(layout: Layout): AnyElement[] {
  return [
    ...layout.rooms.map((element) => ({ kind: "room" as const, element })),
    ...layout.zones.map((element) => ({ kind: "zone" as const, element })),
    ...layout.openings.map((element) => ({ kind: "opening" as const, element })),
    ...layout.panels.map((element) => ({ kind: "panel" as const, element })),
    ...layout.seats.map((element) => ({ kind: "seat" as const, element })),
  ];
}

export function findElement(layout: Layout, id: string): AnyElement | null {
  return allElements(layout).find((e) => e.element.id === id) ?? null;
}

export function elementBounds(layout: Layout, item: AnyElement): Bounds | null {
  switch (item.kind) {
    case "room":
    case "zone":
      return boundsOf(item.element.outline);
    case "panel":
      return boundsOf(panelCorners(item.element));
    case "seat": {
      const { x, y } = item.element.position;
      return { minX: x - SEAT_RADIUS_M, minY: y - SEAT_RADIUS_M, maxX: x + SEAT_RADIUS_M, maxY: y + SEAT_RADIUS_M };
    }
    case "opening": {
      const segment = openingSegment(item.element, layout.rooms.find((r) => r.id === item.element.roomId));
      return segment ? boundsOf(segment) : null;
    }
  }
}

export function layoutBounds(layout: Layout): Bounds | null {
  return unionBounds(allElements(layout).flatMap((item) => elementBounds(layout, item) ?? []));
}

/** Whether `p` hits the element; `toleranceM` widens thin things (edges, openings). */
export function hitsElement(layout: Layout, item: AnyElement, p: PlanPoint, toleranceM: number): boolean {
  switch (item.kind) {
    case "room":
    case "zone":
      return pointInPolygon(p, item.element.outline);
    case "panel": {
      const corners = panelCorners(item.element);
      return pointInPolygon(p, corners) || corners.some((c, i) => distanceToSegment(p, c, corners[(i + 1) % 4]!) <= toleranceM);
    }
    case "seat":
      return distance(p, item.element.position) <= SEAT_RADIUS_M + toleranceM;
    case "opening": {
      const segment = openingSegment(item.element, layout.rooms.find((r) => r.id === item.element.roomId));
      return segment !== null && distanceToSegment(p, segment[0], segment[1]) <= toleranceM;
    }
  }
}

/** The topmost element under `p` (seats over panels over openings over zones over rooms), or null. */
export function hitTest(layout: Layout, p: PlanPoint, toleranceM = 0.1): AnyElement | null {
  const items = allElements(layout);
  for (let i = items.length - 1; i >= 0; i -= 1) {
    const item = items[i]!;
    if (hitsElement(layout, item, p, toleranceM)) return item;
  }
  return null;
}

/** Ids of the elements whose bounds lie wholly inside the rectangle spanned by `a` and `b`. */
export function elementsInRect(layout: Layout, a: PlanPoint, b: PlanPoint): string[] {
  const rect = boundsOf([a, b]);
  return allElements(layout)
    .filter((item) => {
      const bounds = elementBounds(layout, item);
      return bounds !== null && bounds.minX >= rect.minX && bounds.maxX <= rect.maxX && bounds.minY >= rect.minY && bounds.maxY <= rect.maxY;
    })
    .map((item) => item.element.id);
}

/** The smallest room whose outline contains `p` (rooms may nest), or null. */
export function roomAt(layout: Layout, p: PlanPoint): Room | null {
  let best: Room | null = null;
  let bestArea = Infinity;
  for (const room of layout.rooms) {
    if (!pointInPolygon(p, room.outline)) continue;
    const area = polygonArea(room.outline);
    if (area < bestArea) {
      best = room;
      bestArea = area;
    }
  }
  return best;
}

export interface EdgeHit {
  room: Room;
  edgeIndex: number;
  /** Distance along the edge from its start corner to the foot of the perpendicular, m. */
  alongM: number;
  edgeLengthM: number;
  distanceM: number;
  /** Foot of the perpendicular on the edge. */
  foot: PlanPoint;
  /** Unit normal pointing into the room. */
  inward: PlanPoint;
}

/** The room edge nearest to `p` within `maxDistanceM`, or null. */
export function nearestEdge(layout: Layout, p: PlanPoint, maxDistanceM: number): EdgeHit | null {
  let best: EdgeHit | null = null;
  for (const room of layout.rooms) {
    const ccw = signedArea(room.outline) > 0;
    room.outline.forEach((a, edgeIndex) => {
      const b = room.outline[(edgeIndex + 1) % room.outline.length]!;
      const d = distanceToSegment(p, a, b);
      if (d > maxDistanceM || (best && d >= best.distanceM)) return;
      const length = distance(a, b);
      if (length === 0) return;
      const ux = (b.x - a.x) / length;
      const uy = (b.y - a.y) / length;
      const alongM = Math.max(0, Math.min(length, (p.x - a.x) * ux + (p.y - a.y) * uy));
      // Left of the edge direction is inside for a counter-clockwise outline.
      const inward = ccw ? { x: -uy, y: ux } : { x: uy, y: -ux };
      best = { room, edgeIndex, alongM, edgeLengthM: length, distanceM: d, foot: { x: a.x + ux * alongM, y: a.y + uy * alongM }, inward };
    });
  }
  return best;
}

/** Plan angle of a vector, degrees from +x toward +y. */
export function angleDeg(v: PlanPoint): number {
  return Math.atan2(v.y, v.x) / DEG;
}
