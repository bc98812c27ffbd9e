/**
 * Edits of the layout document: pure functions from one layout to the next. The editor reducer
 * calls them and records each result as one undo entry.
 */
import type { Layout, Opening, Panel, PlanPoint, Room, Seat, Zone } from "@/lib/layout/schema";
import { findElement, nearestEdge, polygonArea, roomAt, angleDeg, type AnyElement } from "@/lib/plan/geometry";
import { newId, type RandomSource } from "@/lib/plan/ids";

/** What a new element starts with; every value is editable in the properties panel. */
export const DEFAULTS = {
  ceilingHeightM: 2.8,
  panel: { widthM: 1.2, lengthM: 2.4, wallWidthM: 0.6, wallLengthM: 1.2, wallMountingHeightM: 0.3, surfaceTemperatureC: 32, emissivity: 0.93 },
  opening: { widthM: 1.2, sillHeightM: 0.9, heightM: 1.5, uValueWm2K: 1.4 },
  zoneBand: { minPmv: -0.5, maxPmv: 0.5 },
} as const;

export class PlacementError extends Error {}

function takenIds(layout: Layout): Set<string> {
  return new Set([...layout.rooms, ...layout.openings, ...layout.panels, ...layout.seats, ...layout.zones].map((e) => e.id));
}

/** "Room 3" when "Room 1" and "Room 2" exist. */
function nextLabel(prefix: string, existing: readonly string[]): string {
  const used = new Set(existing);
  for (let n = existing.length + 1; ; n += 1) if (!used.has(`${prefix} ${n}`)) return `${prefix} ${n}`;
}

function copyLabel(text: string): string {
  const copy = `${text} copy`;
  return copy.length <= 80 ? copy : text;
}

export function addRoom(layout: Layout, outline: readonly PlanPoint[], random?: RandomSource): { layout: Layout; id: string } {
  if (outline.length < 3 || polygonArea(outline) < 1e-6) throw new PlacementError("A room needs at least three corners enclosing an area.");
  const id = newId("room", takenIds(layout), random);
  const room: Room = { id, name: nextLabel("Room", layout.rooms.map((r) => r.name)), outline: [...outline], ceilingHeightM: DEFAULTS.ceilingHeightM };
  return { layout: { ...layout, rooms: [...layout.rooms, room] }, id };
}

export function addZone(layout: Layout, outline: readonly PlanPoint[], random?: RandomSource): { layout: Layout; id: string } {
  if (outline.length < 3 || polygonArea(outline) < 1e-6) throw new PlacementError("A zone needs at least three corners enclosing an area.");
  const id = newId("zone", takenIds(layout), random);
  const zone: Zone = {
    id,
    name: nextLabel("Zone", layout.zones.map((z) => z.name)),
    outline: [...outline],
    target: { kind: "pmvBand", ...DEFAULTS.zoneBand },
  };
  return { layout: { ...layout, zones: [...layout.zones, zone] }, id };
}

/**
 * A ceiling panel centred on `point` (inside a room), or a wall panel on the room edge nearest
 * to `point`, facing into the room.
 */
export function addPanel(layout: Layout, point: PlanPoint, mounting: Panel["mounting"], random?: RandomSource): { layout: Layout; id: string } {
  const id = newId("panel", takenIds(layout), random);
  const label = nextLabel("Panel", layout.panels.map((p) => p.label));
  const common = {
    id,
    label,
    mode: "heating" as const,
    supply: { kind: "surface" as const, surfaceTemperatureC: DEFAULTS.panel.surfaceTemperatureC },
    emissivity: DEFAULTS.panel.emissivity,
    louver: null,
    productId: null,
  };
  let panel: Panel;
  if (mounting === "ceiling") {
    const room = roomAt(layout, point);
    if (!room) throw new PlacementError("Place a ceiling panel inside a room.");
    panel = { ...common, roomId: room.id, mounting, center: point, rotationDeg: 0, widthM: DEFAULTS.panel.widthM, lengthM: DEFAULTS.panel.lengthM, mountingHeightM: null };
  } else {
    const edge = nearestEdge(layout, point, 1);
    if (!edge) throw new PlacementError("Place a wall panel on (or near) a room wall.");
    const half = Math.min(DEFAULTS.panel.wallLengthM, edge.edgeLengthM) / 2;
    const along = Math.max(half, Math.min(edge.edgeLengthM - half, edge.alongM));
    const start = edge.room.outline[edge.edgeIndex]!;
    const end = edge.room.outline[(edge.edgeIndex + 1) % edge.room.outline.length]!;
    const t = along / edge.edgeLengthM;
    panel = {
      ...common,
      roomId: edge.room.id,
      mounting,
      center: { x: start.x + (end.x - start.x) * t, y: start.y + (end.y - start.y) * t },
      rotationDeg: Math.round(angleDeg(edge.inward) * 1e6) / 1e6,
      widthM: DEFAULTS.panel.wallWidthM,
      lengthM: half * 2,
      mountingHeightM: DEFAULTS.panel.wallMountingHeightM,
    };
  }
  return { layout: { ...layout, panels: [...layout.panels, panel] }, id };
}

export function addSeat(layout: Layout, point: PlanPoint, random?: RandomSource): { layout: Layout; id: string } {
  if (!roomAt(layout, point)) throw new PlacementError("Place a seat inside a room.");
  const id = newId("seat", takenIds(layout), random);
  const seat: Seat = { id, label: nextLabel("Seat", layout.seats.map((s) => s.label)), position: point, posture: "seated", facingDeg: 0, clo: null, met: null };
  return { layout: { ...layout, seats: [...layout.seats, seat] }, id };
}

/** A window centred on the foot of `point` on the nearest room edge (within 0.5 m). */
export function addOpening(layout: Layout, point: PlanPoint, random?: RandomSource): { layout: Layout; id: string } {
  const edge = nearestEdge(layout, point, 0.5);
  if (!edge) throw new PlacementError("Click on a room wall to add an opening.");
  const widthM = Math.min(DEFAULTS.opening.widthM, edge.edgeLengthM);
  const offsetM = Math.round(Math.max(0, Math.min(edge.edgeLengthM - widthM, edge.alongM - widthM / 2)) * 1000) / 1000;
  const id = newId("opening", takenIds(layout), random);
  const opening: Opening = {
    id,
    roomId: edge.room.id,
    kind: "window",
    edgeIndex: edge.edgeIndex,
    offsetM,
    widthM,
    sillHeightM: DEFAULTS.opening.sillHeightM,
    heightM: DEFAULTS.opening.heightM,
    thermal: { kind: "uValue", uValueWm2K: DEFAULTS.opening.uValueWm2K },
  };
  return { layout: { ...layout, openings: [...layout.openings, opening] }, id };
}

/** A panel belongs to the room its centre lies in; moving it into another room moves it there. */
function withRoomOf(layout: Layout, panel: Panel): Panel {
  if (panel.mounting === "wall") {
    const edge = nearestEdge(layout, panel.center, 0.05);
    return edge && edge.room.id !== panel.roomId ? { ...panel, roomId: edge.room.id } : panel;
  }
  const room = roomAt(layout, panel.center);
  return room && room.id !== panel.roomId ? { ...panel, roomId: room.id } : panel;
}

/** Moves elements by (dx, dy) m. Openings sit on their room's edges and move with the room. */
export function moveElements(layout: Layout, ids: readonly string[], dx: number, dy: number): Layout {
  if (ids.length === 0 || (dx === 0 && dy === 0)) return layout;
  const set = new Set(ids);
  const shift = (p: PlanPoint): PlanPoint => ({ x: p.x + dx, y: p.y + dy });
  const moved: Layout = {
    ...layout,
    rooms: layout.rooms.map((r) => (set.has(r.id) ? { ...r, outline: r.outline.map(shift) } : r)),
    zones: layout.zones.map((z) => (set.has(z.id) ? { ...z, outline: z.outline.map(shift) } : z)),
    panels: layout.panels.map((p) => (set.has(p.id) ? { ...p, center: shift(p.center) } : p)),
    seats: layout.seats.map((s) => (set.has(s.id) ? { ...s, position: shift(s.position) } : s)),
  };
  return { ...moved, panels: moved.panels.map((p) => (set.has(p.id) ? withRoomOf(moved, p) : p)) };
}

/** Replaces elements by id with new versions of the same kind (transform end, form submit). */
export function replaceElements(layout: Layout, items: readonly AnyElement[]): Layout {
  if (items.length === 0) return layout;
  const byId = new Map(items.map((i) => [i.element.id, i]));
  const pick = <T extends { id: string }>(kind: AnyElement["kind"], list: readonly T[]): T[] =>
    list.map((e) => {
      const item = byId.get(e.id);
      return item && item.kind === kind ? (item.element as unknown as T) : e;
    });
  const next: Layout = {
    ...layout,
    rooms: pick("room", layout.rooms),
    openings: pick("opening", layout.openings),
    panels: pick("panel", layout.panels),
    seats: pick("seat", layout.seats),
    zones: pick("zone", layout.zones),
  };
  return { ...next, panels: next.panels.map((p) => (byId.has(p.id) ? withRoomOf(next, p) : p)) };
}

/** Deletes elements; a deleted room takes its openings and panels with it. */
export function deleteElements(layout: Layout, ids: readonly string[]): Layout {
  if (ids.length === 0) return layout;
  const set = new Set(ids);
  const goneRooms = new Set(layout.rooms.filter((r) => set.has(r.id)).map((r) => r.id));
  return {
    ...layout,
    rooms: layout.rooms.filter((r) => !set.has(r.id)),
    zones: layout.zones.filter((z) => !set.has(z.id)),
    openings: layout.openings.filter((o) => !set.has(o.id) && !goneRooms.has(o.roomId)),
    panels: layout.panels.filter((p) => !set.has(p.id) && !goneRooms.has(p.roomId)),
    seats: layout.seats.filter((s) => !set.has(s.id)),
  };
}

/**
 * Copies elements `offset` m away, each with a new id (a copied room brings copies of its
 * openings). Returns the copies' ids, to select them.
 */
export function duplicateElements(layout: Layout, ids: readonly string[], offset: PlanPoint, random?: RandomSource): { layout: Layout; ids: string[] } {
  const taken = takenIds(layout);
  const fresh = (prefix: string) => {
    const id = newId(prefix, taken, random);
    taken.add(id);
    return id;
  };
  const shift = (p: PlanPoint): PlanPoint => ({ x: p.x + offset.x, y: p.y + offset.y });
  const newIds: string[] = [];
  const next: Layout = { ...layout, rooms: [...layout.rooms], openings: [...layout.openings], panels: [...layout.panels], seats: [...layout.seats], zones: [...layout.zones] };
  for (const id of ids) {
    const item = findElement(layout, id);
    if (!item) continue;
    switch (item.kind) {
      case "room": {
        const room: Room = { ...item.element, id: fresh("room"), name: copyLabel(item.element.name), outline: item.element.outline.map(shift) };
        next.rooms.push(room);
        newIds.push(room.id);
        for (const o of layout.openings.filter((o) => o.roomId === item.element.id)) next.openings.push({ ...o, id: fresh("opening"), roomId: room.id });
        break;
      }
      case "zone": {
        const zone: Zone = { ...item.element, id: fresh("zone"), name: copyLabel(item.element.name), outline: item.element.outline.map(shift) };
        next.zones.push(zone);
        newIds.push(zone.id);
        break;
      }
      case "panel": {
        const panel: Panel = { ...item.element, id: fresh("panel"), label: copyLabel(item.element.label), center: shift(item.element.center) };
        next.panels.push(panel);
        newIds.push(panel.id);
        break;
      }
      case "seat": {
        const seat: Seat = { ...item.element, id: fresh("seat"), label: copyLabel(item.element.label), position: shift(item.element.position) };
        next.seats.push(seat);
        newIds.push(seat.id);
        break;
      }
      case "opening":
        // An opening is tied to one edge; a copy would sit on top of it. Copy the room instead.
        break;
    }
  }
  const copied = new Set(newIds);
  return { layout: { ...next, panels: next.panels.map((p) => (copied.has(p.id) ? withRoomOf(next, p) : p)) }, ids: newIds };
}
