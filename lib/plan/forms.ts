/**
 * The properties forms' values and their conversion to layout elements. A form shows values in
 * the member's unit system; its schema converts them to SI and pipes them into the element's own
 * zod schema from lib/layout/schema (the one the server applies when a layout is saved), so a
 * form error carries the schema's path and lands on the matching input.
 */
import { z } from "zod";
import {
  opening as openingSchema, panel as panelSchema, room as roomSchema, seat as seatSchema, zone as zoneSchema,
  type Opening, type Panel, type Room, type Seat, type Zone,
} from "@/lib/layout/schema";
import { fromDisplay, toDisplay, type Quantity, type UnitSystem } from "@/lib/units";

/** A form schema: display values in, the element schema's SI output out. */
export function displayed<F, S extends z.ZodType>(schema: S, toElement: (values: F) => unknown) {
  return z
    .custom<F>(() => true)
    .transform(toElement)
    .pipe(schema);
}

/** Shown values keep three decimals: enough for millimetres and hundredths of a degree. */
const shown = (q: Quantity, si: number, units: UnitSystem) => Math.round(toDisplay(q, si, units) * 1000) / 1000;
const shownOrNull = (q: Quantity, si: number | null, units: UnitSystem) => (si === null ? null : shown(q, si, units));
/** Typed values go to SI unrounded, so a value typed in IP round-trips. A blank required value stays NaN for the schema to name. */
const si = (q: Quantity, value: number | null, units: UnitSystem) => fromDisplay(q, value ?? Number.NaN, units);
const siOrNull = (q: Quantity, value: number | null, units: UnitSystem) => (value === null ? null : fromDisplay(q, value, units));

// ---------- rooms ----------
export interface RoomForm {
  name: string;
  ceilingHeightM: number;
}
export const roomToForm = (room: Room, units: UnitSystem): RoomForm => ({ name: room.name, ceilingHeightM: shown("length", room.ceilingHeightM, units) });
export const roomFormSchema = (room: Room, units: UnitSystem) =>
  displayed<RoomForm, typeof roomSchema>(roomSchema, (v) => ({ id: room.id, outline: room.outline, name: v.name, ceilingHeightM: si("length", v.ceilingHeightM, units) }));

// ---------- openings ----------
export interface OpeningForm {
  kind: Opening["kind"];
  edgeIndex: string;
  offsetM: number;
  widthM: number;
  sillHeightM: number;
  heightM: number;
  thermal: { kind: Opening["thermal"]["kind"]; surfaceTemperatureC: number | null; uValueWm2K: number | null };
}
export function openingToForm(o: Opening, units: UnitSystem): OpeningForm {
  return {
    kind: o.kind,
    edgeIndex: String(o.edgeIndex),
    offsetM: shown("length", o.offsetM, units),
    widthM: shown("length", o.widthM, units),
    sillHeightM: shown("length", o.sillHeightM, units),
    heightM: shown("length", o.heightM, units),
    thermal: {
      kind: o.thermal.kind,
      surfaceTemperatureC: shown("temperature", o.thermal.kind === "surfaceTemperature" ? o.thermal.surfaceTemperatureC : 18, units),
      uValueWm2K: o.thermal.kind === "uValue" ? o.thermal.uValueWm2K : 1.4,
    },
  };
}
export const openingFormSchema = (o: Opening, units: UnitSystem) =>
  displayed<OpeningForm, typeof openingSchema>(openingSchema, (v) => ({
    id: o.id,
    roomId: o.roomId,
    kind: v.kind,
    edgeIndex: Number(v.edgeIndex),
    offsetM: si("length", v.offsetM, units),
    widthM: si("length", v.widthM, units),
    sillHeightM: si("length", v.sillHeightM, units),
    heightM: si("length", v.heightM, units),
    thermal:
      v.thermal.kind === "uValue"
        ? { kind: "uValue", uValueWm2K: v.thermal.uValueWm2K ?? Number.NaN }
        : { kind: "surfaceTemperature", surfaceTemperatureC: si("temperature", v.thermal.surfaceTemperatureC, units) },
  }));

// ---------- panels ----------
export interface PanelForm {
  label: string;
  mounting: Panel["mounting"];
  center: { x: number; y: number };
  rotationDeg: number;
  widthM: number;
  lengthM: number;
  /** Blank = the room's ceiling height (ceiling panels). */
  mountingHeightM: number | null;
  mode: Panel["mode"];
  supply: {
    kind: Panel["supply"]["kind"];
    surfaceTemperatureC: number | null;
    meanWaterTemperatureC: number | null;
    characteristic: { kWm2PerKn: number | null; n: number | null };
  };
  emissivity: number;
  louverOn: boolean;
  louver: { openingAngleDeg: number; minOpeningAngleDeg: number; maxOpeningAngleDeg: number; axisDeg: number; finish: "diffuse" | "specular"; wallEmissivity: number };
}
export function panelToForm(p: Panel, units: UnitSystem): PanelForm {
  const s = p.supply;
  return {
    label: p.label,
    mounting: p.mounting,
    center: { x: shown("length", p.center.x, units), y: shown("length", p.center.y, units) },
    rotationDeg: p.rotationDeg,
    widthM: shown("length", p.widthM, units),
    lengthM: shown("length", p.lengthM, units),
    mountingHeightM: shownOrNull("length", p.mountingHeightM, units),
    mode: p.mode,
    supply: {
      kind: s.kind,
      surfaceTemperatureC: shown("temperature", s.kind === "surface" ? s.surfaceTemperatureC : 32, units),
      meanWaterTemperatureC: shown("temperature", s.kind === "water" ? s.meanWaterTemperatureC : 45, units),
      characteristic: s.kind === "water" ? { ...s.characteristic } : { kWm2PerKn: 5, n: 1.1 },
    },
    emissivity: p.emissivity,
    louverOn: p.louver !== null,
    louver: p.louver ?? { openingAngleDeg: 180, minOpeningAngleDeg: 30, maxOpeningAngleDeg: 180, axisDeg: p.rotationDeg, finish: "diffuse", wallEmissivity: 0.9 },
  };
}
export const panelFormSchema = (p: Panel, units: UnitSystem) =>
  displayed<PanelForm, typeof panelSchema>(panelSchema, (v) => ({
    id: p.id,
    roomId: p.roomId,
    productId: p.productId,
    label: v.label,
    mounting: v.mounting,
    center: { x: si("length", v.center.x, units), y: si("length", v.center.y, units) },
    rotationDeg: v.rotationDeg,
    widthM: si("length", v.widthM, units),
    lengthM: si("length", v.lengthM, units),
    mountingHeightM: siOrNull("length", v.mountingHeightM, units),
    mode: v.mode,
    supply:
      v.supply.kind === "surface"
        ? { kind: "surface", surfaceTemperatureC: si("temperature", v.supply.surfaceTemperatureC, units) }
        : {
            kind: "water",
            meanWaterTemperatureC: si("temperature", v.supply.meanWaterTemperatureC, units),
            characteristic: { kWm2PerKn: v.supply.characteristic.kWm2PerKn ?? Number.NaN, n: v.supply.characteristic.n ?? Number.NaN },
          },
    emissivity: v.emissivity,
    louver: v.louverOn ? { ...v.louver } : null,
  }));

// ---------- seats ----------
export interface SeatForm {
  label: string;
  posture: Seat["posture"];
  position: { x: number; y: number };
  facingDeg: number;
  /** Blank = the scenario's default. */
  clo: number | null;
  met: number | null;
}
export const seatToForm = (s: Seat, units: UnitSystem): SeatForm => ({
  label: s.label,
  posture: s.posture,
  position: { x: shown("length", s.position.x, units), y: shown("length", s.position.y, units) },
  facingDeg: s.facingDeg,
  clo: s.clo,
  met: s.met,
});
export const seatFormSchema = (s: Seat, units: UnitSystem) =>
  displayed<SeatForm, typeof seatSchema>(seatSchema, (v) => ({
    id: s.id,
    label: v.label,
    posture: v.posture,
    position: { x: si("length", v.position.x, units), y: si("length", v.position.y, units) },
    facingDeg: v.facingDeg,
    clo: v.clo,
    met: v.met,
  }));

// ---------- zones ----------
export interface ZoneForm {
  name: string;
  target: { kind: Zone["target"]["kind"]; minPmv: number; maxPmv: number; category: "A" | "B" | "C" };
}
export function zoneToForm(z: Zone): ZoneForm {
  const t = z.target;
  return {
    name: z.name,
    target: {
      kind: t.kind,
      minPmv: t.kind === "pmvBand" ? t.minPmv : -0.5,
      maxPmv: t.kind === "pmvBand" ? t.maxPmv : 0.5,
      category: t.kind === "category" ? t.category : "B",
    },
  };
}
export const zoneFormSchema = (zone: Zone) =>
  displayed<ZoneForm, typeof zoneSchema>(zoneSchema, (v) => ({
    id: zone.id,
    outline: zone.outline,
    name: v.name,
    target: v.target.kind === "pmvBand" ? { kind: "pmvBand", minPmv: v.target.minPmv, maxPmv: v.target.maxPmv } : { kind: "category", category: v.target.category },
    // The schedule has its own form: this one keeps it as it is.
    ...(zone.schedule ? { schedule: zone.schedule } : {}),
  }));
