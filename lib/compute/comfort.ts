/**
 * The comfort computation: a layout and a scenario's design conditions in, per-seat,
 * per-panel, per-zone results and a heatmap out. Pure (no database, no clock); the physics
 * comes from lib/viewfactor, lib/comfort and lib/panels — this module only assembles it.
 *
 * Method, in order:
 * 1. Geometry (geometry.ts): each room becomes radiant surfaces — floor, ceiling, a wall per
 *    edge, openings and panels as rectangles lying in (and covering part of) their host.
 * 2. Surface temperatures: the scenario's classes (exterior/interior walls, floor, ceiling;
 *    U-values through ISO 6946 inside surface resistances, surface-temperature.ts); openings
 *    their own thermal data; an active panel its supply temperature (or the one derived from
 *    its water temperature, see `panelSurfaceTemperature`); a panel whose mode is not active
 *    in the scenario sits at its host surface's temperature.
 * 3. Per seat, body centre at 0.6 m seated / 1.0 m standing (ISO 7726 Annex C): view factors
 *    of small plane elements facing up, down, front, back, left and right to every surface
 *    (exact contour integral, `elementToPolygon`); a covered host's factor is its full
 *    polygon's minus those of the elements on it. Plane radiant temperatures are the
 *    fourth-power means over these factors (ISO 7726); the MRT is the ISO 7726 Annex C
 *    projected-area weighting for the posture (`weightedMeanRadiantTemperature`). A surface's
 *    angle factor is the same weighting of its six plane view factors (so they sum to ≈ 1),
 *    and its MRT share is F·T⁴ / Σ F·T⁴. Horizontal asymmetry is the largest difference of
 *    opposite vertical planes, sampled every 5° as lib/viewfactor does.
 * 4. Operative temperature, PMV/PPD (ISO 7730), asymmetry dissatisfied (ISO 7730 clause 6.5),
 *    category and ASHRAE 55 (`classifySeat`).
 * 5. Panels: output from lib/panels against the room's AUST; condensation margin for chilled
 *    panels; a hot-surface caution for reachable heating panels. A louvered panel's output at
 *    its setting uses the face's apparent hemispherical emissivity (`louverFaceEmissivityAt`:
 *    cavity table × aperture share).
 * 5a. Louvered panels toward an occupant: the panel's apparent emissivity in the direction of
 *    the seat's body centre (or heatmap point) — `louverEmissivityToward`'s parts: exit angle
 *    across the grooves from the panel centre, directional emissivity per unit face area at the
 *    opening angle — and the effective radiant temperature `louverEffectiveTemperatureC`
 *    against the room's AUST. So the same panel looks warmer (heating) from a seat in line
 *    with its openings than from one at a grazing angle. The direction is taken from the panel
 *    centre (one direction per seat and panel).
 * 6. Heatmap: small-sphere MRT (solid angles) at seated head height and PMV with the scenario's
 *    defaults.
 *
 * Known simplifications (also in the report's method notes): surfaces are black for the
 * occupant except panels, which are grey (see `panelRadiantTemperature`; louvered panels
 * directionally grey, 5a); no obstruction
 * between surfaces and occupants (furniture, the other wing of an L-shaped room); uniform air
 * temperature and speed per scenario; a ceiling panel hung below the ceiling is modelled in
 * its own plane but still covers the ceiling area above it.
 */
import {
  classifySeat,
  operativeTemperature,
  pmvPpd,
  radiantAsymmetryDissatisfied,
  type RadiantAsymmetryKind,
  type PmvResult,
} from "@/lib/comfort";
import type {
  ComfortLimitFailure,
  ComputeResult,
  ComputeWarning,
  Heatmap,
  HeatmapGrid,
  PanelResult,
  SeatResult,
  SeatSurfaceShare,
  ZoneResult,
} from "@/lib/compute/types";
import { buildLayoutGeometry, pointInPolygon, netAreas, validateForCompute, type RoomGeometry, type RoomSurface } from "@/lib/compute/geometry";
import { boundsOf } from "@/lib/layout/plan-geometry";
import type { Layout, Panel, Seat, Zone } from "@/lib/layout/schema";
import {
  buildLouverTable,
  characteristicOutput,
  condensationMargin,
  louverDirectionalEmissivity,
  louverEffectiveTemperatureC,
  louverExitAngleDeg,
  louverFaceEmissivityAt,
  louveredPanelOutput,
  louverTableKey,
  panelOutput,
  STANDARD_SURFACE_EXCHANGE,
  type LouverEmissivity,
  type LouverTable,
  type LouverTableParams,
  type PanelOutput,
  type PanelOutputInput,
} from "@/lib/panels";
import type { ScenarioConditions, SurfaceThermal } from "@/lib/scenarios/schema";
import { insideSurfaceTemperature, type ElementPosition } from "@/lib/scenarios/surface-temperature";
import {
  CELSIUS_TO_KELVIN_OFFSET_K,
  elementToPolygon,
  fourthPowerMean,
  HORIZONTAL_ASYMMETRY_STEP_RAD,
  ISO7726_PROJECTED_AREA_FACTORS,
  sphereToPolygon,
  weightedMeanRadiantTemperature,
  type Vec3,
} from "@/lib/viewfactor";

/** Height of the body centre, m: ISO 7726 Annex C uses 0.6 m seated and 1.0 m standing. */
export const BODY_CENTRE_HEIGHT_M = { seated: 0.6, standing: 1.0 } as const;
/**
 * Heatmap plane: seated head height, 1.1 m — the upper of the three measuring heights for a
 * seated occupant (0.1 / 0.6 / 1.1 m) in ISO 7726 and ASHRAE 55.
 */
export const HEATMAP_HEIGHT_M = 1.1;
export const DEFAULT_HEATMAP_STEP_M = 0.25;
/**
 * Most heatmap cells one computation evaluates (all rooms together). A larger plan gets a
 * coarser grid, in 0.05 m steps, so a request stays within its time budget; a warning says so.
 */
export const MAX_HEATMAP_CELLS = 20_000;
/**
 * Reachable surfaces: a heating panel whose face is lower than 2 m and hotter than 43 °C gets a
 * caution. Both figures are common practice for touchable heated surfaces (no single standard
 * is cited); local codes and the manufacturer's instructions govern.
 */
export const REACHABLE_HEIGHT_M = 2;
export const HOT_SURFACE_LIMIT_C = 43;
export interface ComputeOptions {
  /** Heatmap grid step, m (default 0.25). */
  stepM?: number;
  /**
   * Louver cavity tables by `louverTableKey` (see {@link louverTableParams}); the service passes
   * them from its cache. A table missing here is built on the calling thread
   * (`buildLouverTable`, 0.3–1 s) and added to this map when one is given.
   */
  louverTables?: Map<string, LouverTable>;
}

/** What the computation produces; the service adds the request's ids, timing and cache flag. */
export type ComfortComputation = Pick<ComputeResult, "seats" | "panels" | "zones" | "heatmap" | "warnings">;

// ---------------------------------------------------------------------------------------------
// Surface temperatures

function thermalTemperature(thermal: SurfaceThermal | null, position: ElementPosition, airC: number, farSideC: number): number {
  if (thermal === null) return airC;
  if (thermal.kind === "surfaceTemperature") return thermal.surfaceTemperatureC;
  return insideSurfaceTemperature({ uValueWm2K: thermal.uValueWm2K, insideC: airC, outsideC: farSideC, position });
}

/** Temperature of a room surface that is not a panel, °C. */
export function passiveSurfaceTemperature(surface: RoomSurface, geometry: RoomGeometry, c: ScenarioConditions): number {
  const airC = c.airTemperatureC;
  const outC = c.outdoorTemperatureC;
  switch (surface.role) {
    case "floor":
      return thermalTemperature(c.surfaces.floor, "floor", airC, outC);
    case "ceiling":
      return thermalTemperature(c.surfaces.ceiling, "ceiling", airC, outC);
    case "exteriorWall":
      return thermalTemperature(c.surfaces.exteriorWalls, "wall", airC, outC);
    case "interiorWall":
      // The far side of an interior wall is a neighbouring room at the same air temperature.
      return thermalTemperature(c.surfaces.interiorWalls, "wall", airC, airC);
    case "opening": {
      const interior = geometry.interiorEdges[surface.edgeIndex] ?? false;
      return thermalTemperature(surface.opening?.thermal ?? c.surfaces.openings, "opening", airC, interior ? airC : outC);
    }
    case "panel":
      throw new RangeError("panels have no passive temperature");
  }
}

/** Parameters of the cavity table a louver needs: its finish and wall emissivity, default grid. */
export function louverTableParams(louver: Readonly<NonNullable<Panel["louver"]>>): LouverTableParams {
  return { finish: louver.finish, wallEmissivity: louver.wallEmissivity };
}

/**
 * The cavity table of a louvered panel from `tables`, built (and added to `tables`) when it is
 * missing.
 */
export function louverTableFor(louver: Readonly<NonNullable<Panel["louver"]>>, tables: Map<string, LouverTable>): LouverTable {
  const params = louverTableParams(louver);
  const key = louverTableKey(params);
  let table = tables.get(key);
  if (!table) {
    table = buildLouverTable(params);
    tables.set(key, table);
  }
  return table;
}

/** Where a louvered panel sits and how its grooves run, m and unit vectors. */
export interface LouverFrame {
  /** Centre of the panel face, m. */
  centre: Vec3;
  /** Unit face normal, into the room. */
  normal: Vec3;
  /** Unit groove axis, in the panel plane. */
  axis: Vec3;
}

/**
 * The frame of a louvered panel surface. Ceiling panel: face normal straight down, groove
 * axis the plan direction `louver.axisDeg`. Wall panel: face normal the wall's inward normal;
 * the plan direction is turned into the wall plane by its angle φ to the wall line —
 * axis = cos φ·(along the wall) + sin φ·(up): along the wall = horizontal grooves, across the
 * wall = vertical grooves (a convention of ours, stated in docs/api.md).
 */
export function louverFrame(surface: Readonly<RoomSurface>): LouverFrame {
  const panel = surface.panel;
  if (!panel?.louver) throw new RangeError(`surface ${surface.id} is not a louvered panel`);
  const corners = surface.pieces[0]!;
  const centre: Vec3 = [0, 0, 0];
  for (const c of corners) {
    centre[0] += c[0] / corners.length;
    centre[1] += c[1] / corners.length;
    centre[2] += c[2] / corners.length;
  }
  const a = (panel.louver.axisDeg * Math.PI) / 180;
  if (panel.mounting === "ceiling") return { centre, normal: [0, 0, -1], axis: [Math.cos(a), Math.sin(a), 0] };
  // Wall rectangle: corners 0 → 1 run along the counter-clockwise outline, so the room is on the left.
  const [p, q] = corners as [Vec3, Vec3];
  const len = Math.hypot(q[0] - p[0], q[1] - p[1]);
  const ux = (q[0] - p[0]) / len;
  const uy = (q[1] - p[1]) / len;
  const phi = a - Math.atan2(uy, ux);
  const c = Math.cos(phi);
  const sn = Math.abs(Math.sin(phi));
  return { centre, normal: [-uy, ux, 0], axis: [c * ux, c * uy, sn] };
}

/**
 * Effective radiant temperature of an active louvered panel seen from `point`, °C:
 * `louverEffectiveTemperatureC` with the directional emissivity per unit face area toward the
 * point (exit angle across the grooves from the panel centre, `louverExitAngleDeg`;
 * `louverDirectionalEmissivity` of the setting's face values). A point behind the face sees
 * the surroundings (ε = 0; its view factor is 0 anyway).
 */
export function louverTemperatureToward(louver: Readonly<PreparedLouver>, point: Readonly<Vec3>): number {
  const f = louver.frame;
  const d: Vec3 = [point[0] - f.centre[0], point[1] - f.centre[1], point[2] - f.centre[2]];
  if (d[0] === 0 && d[1] === 0 && d[2] === 0) return louver.austC;
  const theta = louverExitAngleDeg(f.normal, f.axis, d);
  const e = Number.isNaN(theta) ? 0 : Math.min(1, Math.max(0, louverDirectionalEmissivity(louver.face, theta)));
  return louverEffectiveTemperatureC({ surfaceC: louver.surfaceC, surroundingsC: louver.austC, directionalEmissivity: e });
}

/**
 * Surface temperature of an active panel, °C. A surface supply gives it directly. A water
 * supply gives the specific output from the product characteristic, q = K·ΔTⁿ with ΔT the mean
 * water temperature minus the room air (EN 14037 / EN 14240 style); the surface temperature is
 * then the one at which the standard total heat exchange law of EN 1264-5 / ISO 11855-2 for
 * the panel's orientation and mode (`STANDARD_SURFACE_EXCHANGE`, q = a·Δθⁿ) delivers that
 * output: θ_s = θ_room ± (q/a)^{1/n}.
 */
export function panelSurfaceTemperature(panel: Panel, airC: number): { surfaceC: number; characteristicWm2: number | null } {
  if (panel.supply.kind === "surface") return { surfaceC: panel.supply.surfaceTemperatureC, characteristicWm2: null };
  const q = characteristicOutput({
    kWPerKn: panel.supply.characteristic.kWm2PerKn,
    n: panel.supply.characteristic.n,
    meanWaterC: panel.supply.meanWaterTemperatureC,
    roomC: airC,
    mode: panel.mode,
  });
  const law = STANDARD_SURFACE_EXCHANGE[panel.mode][panel.mounting];
  const magnitude = Math.pow(Math.abs(q) / law.coefficient, 1 / law.exponent);
  const delta = q < 0 ? -magnitude : magnitude;
  return { surfaceC: panel.mode === "heating" ? airC + delta : airC - delta, characteristicWm2: q };
}

/**
 * Temperature at which a grey panel face appears to the occupant, °C: it emits ε·σT_s⁴ and
 * reflects (1 − ε) of what the room sends it, taken as black at the AUST:
 * T_eff⁴ = ε·T_s⁴ + (1 − ε)·T_AUST⁴ (K). ε is the louver's apparent emissivity when it has one.
 */
export function panelRadiantTemperature(surfaceC: number, austC: number, emissivity: number): number {
  const ts = surfaceC + CELSIUS_TO_KELVIN_OFFSET_K;
  const tu = austC + CELSIUS_TO_KELVIN_OFFSET_K;
  return Math.sqrt(Math.sqrt(emissivity * ts ** 4 + (1 - emissivity) * tu ** 4)) - CELSIUS_TO_KELVIN_OFFSET_K;
}

/** A room prepared once for all its seats and heatmap cells (also the optimiser's starting point). */
export interface PreparedRoom {
  geometry: RoomGeometry;
  surfaces: RoomSurface[];
  /** Temperature each surface radiates at (as the occupant sees it), °C. */
  temperaturesC: Float64Array;
  /** (T + 273.15)⁴ per surface, K⁴. */
  t4: Float64Array;
  /** Flattened convex polygons with the surface they belong to and the host they cover (−1: none). */
  polygons: Vec3[][];
  polygonSurface: Int32Array;
  polygonHost: Int32Array;
  austC: number;
  panels: PanelResult[];
  /** The active louvered panels, whose temperature depends on where they are seen from. */
  louvers: PreparedLouver[];
}

/** An active louvered panel of a prepared room. */
export interface PreparedLouver {
  /** Index of the panel in the room's surfaces. */
  surfaceIndex: number;
  panel: Panel;
  /** The panel-output input at its surface temperature (the louver changes only the emissivity). */
  outputInput: PanelOutputInput;
  table: LouverTable;
  frame: LouverFrame;
  /** Face emissivities at the panel's opening angle (per unit face area). */
  face: LouverEmissivity;
  surfaceC: number;
  austC: number;
}

function round(x: number, digits: number): number {
  const f = 10 ** digits;
  return Math.round(x * f) / f;
}

function prepareRoom(geometry: RoomGeometry, c: ScenarioConditions, louverTables: Map<string, LouverTable>, warnings: ComputeWarning[]): PreparedRoom {
  const surfaces = geometry.surfaces;
  const airC = c.airTemperatureC;
  const temperaturesC = new Float64Array(surfaces.length);
  // Passive surfaces first; inactive panels take their host's temperature.
  const active = surfaces.map((s) => s.panel !== null && c.activeModes.includes(s.panel.mode));
  surfaces.forEach((s, i) => {
    if (s.role !== "panel") temperaturesC[i] = passiveSurfaceTemperature(s, geometry, c);
  });
  surfaces.forEach((s, i) => {
    if (s.role === "panel" && !active[i]) temperaturesC[i] = temperaturesC[s.hostIndex]!;
  });
  // AUST: area-weighted temperature of every surface but the active panels (net areas).
  const net = netAreas(surfaces);
  let aSum = 0;
  let taSum = 0;
  surfaces.forEach((_, i) => {
    if (active[i]) return;
    aSum += net[i]!;
    taSum += net[i]! * temperaturesC[i]!;
  });
  const austC = aSum > 0 ? taSum / aSum : airC;

  const panels: PanelResult[] = [];
  const louvers: PreparedLouver[] = [];
  surfaces.forEach((s, i) => {
    const p = s.panel;
    if (!p) return;
    if (!active[i]) {
      panels.push({
        id: p.id, label: p.label, roomId: geometry.room.id, mode: p.mode, active: false,
        surfaceTemperatureC: round(temperaturesC[i]!, 3), areaM2: round(s.areaM2, 4),
        outputW: 0, outputWm2: 0, radiantWm2: 0, convectiveWm2: 0, radiantShare: 0, condensation: null, warnings: [],
      });
      return;
    }
    const { surfaceC, characteristicWm2 } = panelSurfaceTemperature(p, airC);
    const orientation = p.mounting;
    const base: PanelOutputInput = {
      orientation, mode: p.mode, surfaceC, airC, austC, emissivity: p.emissivity, areaM2: s.areaM2,
      ...(orientation === "ceiling" ? { equivalentDiameterM: (4 * s.areaM2) / (2 * (p.widthM + p.lengthM)) } : { heightM: p.widthM }),
    };
    const table = p.louver ? louverTableFor(p.louver, louverTables) : null;
    const face = p.louver && table ? louverFaceEmissivityAt(table, p.louver.openingAngleDeg) : null;
    const out: PanelOutput = face === null ? panelOutput(base) : louveredPanelOutput({ ...base, apparentEmissivity: Math.min(1, face.hemispherical) });
    const share = Number.isFinite(out.radiantShare) ? out.radiantShare : 0;
    // A water-supplied flat panel delivers what its tested characteristic says; the split follows
    // the surface model. A louvered one: the characteristic sets its surface temperature, the
    // louver setting its output (the surface model at that temperature).
    const useCharacteristic = characteristicWm2 !== null && face === null;
    const totalWm2 = useCharacteristic ? characteristicWm2 : out.totalWm2;
    const radiantWm2 = useCharacteristic ? characteristicWm2 * share : out.radiantWm2;
    const panelWarnings: string[] = [];
    let condensation: PanelResult["condensation"] = null;
    if (p.mode === "cooling") {
      const m = condensationMargin({ surfaceC, airC, rhPercent: c.relativeHumidityPercent });
      condensation = { dewPointC: round(m.dewPointC, 3), marginK: round(m.marginK, 3), risk: m.risk };
      if (m.risk) {
        panelWarnings.push(
          `Condensation risk: the surface (${surfaceC.toFixed(1)} °C) is only ${m.marginK.toFixed(1)} K above the room dew point (${m.dewPointC.toFixed(1)} °C). ` +
            "Keep chilled surfaces at least 2 K above the dew point (common practice) with dew-point monitoring or supply-temperature limits, and follow local codes and the manufacturer's instructions.",
        );
      }
    }
    const lowestFaceM = p.mounting === "wall" ? (p.mountingHeightM ?? 0) : (p.mountingHeightM ?? geometry.room.ceilingHeightM);
    if (p.mode === "heating" && lowestFaceM < REACHABLE_HEIGHT_M && surfaceC > HOT_SURFACE_LIMIT_C) {
      panelWarnings.push(
        `Hot reachable surface: ${surfaceC.toFixed(1)} °C below ${REACHABLE_HEIGHT_M} m. Surfaces people can touch are commonly kept below about ${HOT_SURFACE_LIMIT_C} °C (common practice); guard the panel or lower its temperature, and follow local codes and the manufacturer's instructions.`,
      );
    }
    for (const message of panelWarnings) warnings.push({ code: message.startsWith("Condensation") ? "condensation_risk" : "hot_surface", message, objectId: p.id });
    // Seen from an unspecified direction (the surface list's figure): hemispherical face emissivity.
    temperaturesC[i] = panelRadiantTemperature(surfaceC, austC, face === null ? p.emissivity : Math.min(1, face.hemispherical));
    if (face !== null && table !== null) louvers.push({ surfaceIndex: i, panel: p, outputInput: base, table, frame: louverFrame(s), face, surfaceC, austC });
    panels.push({
      id: p.id, label: p.label, roomId: geometry.room.id, mode: p.mode, active: true,
      surfaceTemperatureC: round(surfaceC, 3), areaM2: round(s.areaM2, 4),
      outputW: round(totalWm2 * s.areaM2, 2), outputWm2: round(totalWm2, 3),
      radiantWm2: round(radiantWm2, 3), convectiveWm2: round(totalWm2 - radiantWm2, 3), radiantShare: round(share, 4),
      condensation, warnings: panelWarnings,
    });
  });

  const polygons: Vec3[][] = [];
  const owner: number[] = [];
  const host: number[] = [];
  surfaces.forEach((s, i) => {
    for (const piece of s.pieces) {
      polygons.push(piece);
      owner.push(i);
      host.push(s.hostIndex);
    }
  });
  const t4 = new Float64Array(surfaces.length);
  temperaturesC.forEach((t, i) => {
    const k = t + CELSIUS_TO_KELVIN_OFFSET_K;
    t4[i] = k * k * k * k;
  });
  return { geometry, surfaces, temperaturesC, t4, polygons, polygonSurface: Int32Array.from(owner), polygonHost: Int32Array.from(host), austC, panels, louvers };
}

/**
 * Surface temperatures as seen from `point`: the room's, with each active louvered panel at
 * its effective temperature toward the point. Writes °C to `outC` and (T + 273.15)⁴ to `outT4`.
 */
function temperaturesToward(room: PreparedRoom, point: Readonly<Vec3>, outC: Float64Array, outT4: Float64Array): void {
  outC.set(room.temperaturesC);
  outT4.set(room.t4);
  for (const l of room.louvers) {
    const t = louverTemperatureToward(l, point);
    const k = t + CELSIUS_TO_KELVIN_OFFSET_K;
    outC[l.surfaceIndex] = t;
    outT4[l.surfaceIndex] = k * k * k * k;
  }
}

// ---------------------------------------------------------------------------------------------
// Seats

/** Per-surface view factors of a small plane element at `position` facing `normal`, written to `out`. */
function planeFactors(room: PreparedRoom, position: Readonly<Vec3>, normal: Readonly<Vec3>, out: Float64Array): Float64Array {
  out.fill(0);
  for (let k = 0; k < room.polygons.length; k++) {
    const f = elementToPolygon(position, normal, room.polygons[k]!);
    const own = room.polygonSurface[k]!;
    out[own] = out[own]! + f;
    const h = room.polygonHost[k]!;
    if (h >= 0) out[h] = out[h]! - f;
  }
  for (let i = 0; i < out.length; i++) if (out[i]! < 0) out[i] = 0; // round-off of a covered host
  return out;
}

function planeRadiantC(temperaturesC: Float64Array, factors: Float64Array): number {
  return fourthPowerMean(factors, temperaturesC).temperatureC;
}

function toFailure(f: { code: string; message: string } | undefined): ComfortLimitFailure | null {
  return f ? { code: f.code, message: f.message } : null;
}

/** The six plane directions of ISO 7726 Annex C, in a fixed order. */
export const PLANE_DIRECTIONS = ["up", "down", "front", "back", "left", "right"] as const;
export type PlaneDirection = (typeof PLANE_DIRECTIONS)[number];

/**
 * A seat's body centre (ISO 7726 Annex C heights) and the per-surface view factors of its six
 * small plane elements (up, down, and front/back/left/right turned to the seat's facing).
 */
export function seatPlaneFactors(seat: Readonly<Seat>, room: PreparedRoom): { position: Vec3; factors: Record<PlaneDirection, Float64Array> } {
  const n = room.surfaces.length;
  const position: Vec3 = [seat.position.x, seat.position.y, BODY_CENTRE_HEIGHT_M[seat.posture]];
  const facing = (seat.facingDeg * Math.PI) / 180;
  const cf = Math.cos(facing);
  const sf = Math.sin(facing);
  const normals: Record<PlaneDirection, Vec3> = {
    up: [0, 0, 1],
    down: [0, 0, -1],
    front: [cf, sf, 0],
    back: [-cf, -sf, 0],
    left: [-sf, cf, 0],
    right: [sf, -cf, 0],
  };
  const factors = {} as Record<PlaneDirection, Float64Array>;
  for (const dir of PLANE_DIRECTIONS) factors[dir] = planeFactors(room, position, normals[dir], new Float64Array(n));
  return { position, factors };
}

function computeSeat(seat: Seat, room: PreparedRoom, zones: ReadonlyArray<Zone>, c: ScenarioConditions): SeatResult {
  const n = room.surfaces.length;
  const { position, factors } = seatPlaneFactors(seat, room);
  const temperaturesC = new Float64Array(n);
  const t4 = new Float64Array(n);
  temperaturesToward(room, position, temperaturesC, t4);
  const tpr = {} as Record<PlaneDirection, number>;
  for (const dir of PLANE_DIRECTIONS) tpr[dir] = planeRadiantC(temperaturesC, factors[dir]);
  const mrtC = weightedMeanRadiantTemperature(
    { upC: tpr.up, downC: tpr.down, frontC: tpr.front, backC: tpr.back, leftC: tpr.left, rightC: tpr.right },
    seat.posture,
  );

  // Angle factors: the ISO 7726 Annex C projected-area weighting applied to each surface's plane view factors.
  const w = ISO7726_PROJECTED_AREA_FACTORS[seat.posture];
  const wTotal = 2 * (w.upDown + w.leftRight + w.frontBack);
  const angle = new Float64Array(n);
  let radiantSum = 0;
  for (let i = 0; i < n; i++) {
    angle[i] =
      (w.upDown * (factors.up[i]! + factors.down[i]!) +
        w.leftRight * (factors.left[i]! + factors.right[i]!) +
        w.frontBack * (factors.front[i]! + factors.back[i]!)) /
      wTotal;
    radiantSum += angle[i]! * t4[i]!;
  }
  const surfaces: SeatSurfaceShare[] = room.surfaces.map((s, i) => ({
    surfaceId: s.id,
    kind: s.kind,
    label: s.label,
    temperatureC: round(temperaturesC[i]!, 3),
    angleFactor: round(angle[i]!, 5),
    mrtShare: round(radiantSum > 0 ? (angle[i]! * t4[i]!) / radiantSum : 0, 5),
  }));

  // Horizontal asymmetry: opposite vertical planes every 5°, as lib/viewfactor's radiantField.
  const scratch = new Float64Array(n);
  const normal: Vec3 = [0, 0, 0];
  let horizontal = 0;
  let warmSide = mrtC;
  let coolSide = mrtC;
  const steps = Math.round(Math.PI / HORIZONTAL_ASYMMETRY_STEP_RAD);
  for (let k = 0; k < steps; k++) {
    const theta = k * HORIZONTAL_ASYMMETRY_STEP_RAD;
    normal[0] = Math.cos(theta);
    normal[1] = Math.sin(theta);
    const forward = planeRadiantC(temperaturesC, planeFactors(room, position, normal, scratch));
    normal[0] = -normal[0];
    normal[1] = -normal[1];
    const backward = planeRadiantC(temperaturesC, planeFactors(room, position, normal, scratch));
    if (Math.abs(forward - backward) > horizontal) {
      horizontal = Math.abs(forward - backward);
      warmSide = Math.max(forward, backward);
      coolSide = Math.min(forward, backward);
    }
  }
  const vertical = tpr.up - tpr.down;
  const verticalKind: RadiantAsymmetryKind = vertical >= 0 ? "warmCeiling" : "coolCeiling";
  // The wall side that departs more from the MRT is the cause: a warm wall or a cool wall.
  const horizontalKind: RadiantAsymmetryKind = warmSide - mrtC >= mrtC - coolSide ? "warmWall" : "coolWall";
  const entries = [
    { kind: verticalKind, deltaC: Math.abs(vertical) },
    { kind: horizontalKind, deltaC: horizontal },
  ];
  const pds = entries.map((e) => radiantAsymmetryDissatisfied(e.kind, e.deltaC));
  const governing = pds[0]! >= pds[1]! ? 0 : 1;

  const clo = seat.clo ?? c.defaultClo;
  const met = seat.met ?? c.defaultMet;
  const ta = c.airTemperatureC;
  const comfort = pmvPpd({ ta, tr: mrtC, vr: c.airSpeedMps, rh: c.relativeHumidityPercent, met, clo });
  const floorIndex = room.surfaces.findIndex((s) => s.role === "floor");
  const classification = classifySeat({
    pmv: comfort.pmv,
    ppd: comfort.ppd,
    radiantAsymmetry: entries,
    floorC: room.temperaturesC[floorIndex]!,
    posture: seat.posture,
  });

  return {
    id: seat.id,
    label: seat.label,
    roomId: room.geometry.room.id,
    zoneIds: zones.filter((zone) => pointInPolygon(seat.position, zone.outline)).map((zone) => zone.id),
    posture: seat.posture,
    clo,
    met,
    mrtC: round(mrtC, 3),
    operativeC: round(operativeTemperature(ta, mrtC, c.airSpeedMps), 3),
    pmv: round(comfort.pmv, 3),
    ppd: round(comfort.ppd, 2),
    withinRange: comfort.withinRange,
    planeRadiantC: {
      up: round(tpr.up, 3),
      down: round(tpr.down, 3),
      front: round(tpr.front, 3),
      back: round(tpr.back, 3),
      left: round(tpr.left, 3),
      right: round(tpr.right, 3),
    },
    verticalAsymmetryC: round(vertical, 3),
    horizontalAsymmetryC: round(horizontal, 3),
    asymmetryDissatisfiedPercent: round(pds[governing]!, 2),
    asymmetryKind: entries[governing]!.deltaC > 0 ? entries[governing]!.kind : null,
    category: classification.category,
    categoryLimit: toFailure(classification.failuresForNextBetterCategory[0]),
    ashrae55: {
      compliant: classification.ashrae55.compliant,
      failing: classification.ashrae55.failures.map((f) => ({ code: f.code, message: f.message })),
    },
    surfaces,
  };
}

// ---------------------------------------------------------------------------------------------
// Zones and heatmap

const CATEGORY_RANK = { A: 3, B: 2, C: 1 } as const;

function computeZone(zone: Zone, seats: ReadonlyArray<SeatResult>): ZoneResult {
  const inside = seats.filter((s) => s.zoneIds.includes(zone.id));
  const pmvs = inside.map((s) => s.pmv);
  const t = zone.target;
  const inTarget = inside.filter((s) =>
    t.kind === "pmvBand" ? s.pmv >= t.minPmv && s.pmv <= t.maxPmv : s.category !== null && CATEGORY_RANK[s.category] >= CATEGORY_RANK[t.category],
  );
  return {
    id: zone.id,
    name: zone.name,
    target: zone.target,
    seatIds: inside.map((s) => s.id),
    pmvMin: pmvs.length ? Math.min(...pmvs) : null,
    pmvMean: pmvs.length ? round(pmvs.reduce((a, b) => a + b, 0) / pmvs.length, 3) : null,
    pmvMax: pmvs.length ? Math.max(...pmvs) : null,
    shareInTarget: inside.length ? inTarget.length / inside.length : null,
  };
}

/**
 * Small-sphere MRT (view factors Ω/4π, `sphereToPolygon`; fourth-power mean as ISO 7726) and
 * PMV with the scenario's defaults on a grid over the room at HEATMAP_HEIGHT_M. The inner loop
 * reuses its point, factor and PMV storage.
 */
function computeGrid(room: PreparedRoom, stepM: number, c: ScenarioConditions): HeatmapGrid {
  const outline = room.geometry.outline;
  const { minX, minY, maxX, maxY } = boundsOf(outline);
  const cols = Math.max(1, Math.ceil((maxX - minX) / stepM - 1e-9));
  const rows = Math.max(1, Math.ceil((maxY - minY) / stepM - 1e-9));
  const originX = minX + stepM / 2;
  const originY = minY + stepM / 2;
  const pmv: (number | null)[] = new Array(cols * rows).fill(null);
  const mrt: (number | null)[] = new Array(cols * rows).fill(null);
  const factors = new Float64Array(room.surfaces.length);
  const cellC = new Float64Array(room.surfaces.length);
  const cellT4 = new Float64Array(room.surfaces.length);
  const point: Vec3 = [0, 0, HEATMAP_HEIGHT_M];
  const plan = { x: 0, y: 0 };
  const input = { ta: c.airTemperatureC, tr: 0, vr: c.airSpeedMps, rh: c.relativeHumidityPercent, met: c.defaultMet, clo: c.defaultClo };
  const result: PmvResult = { pmv: 0, ppd: 0, withinRange: true };
  const polygons = room.polygons;
  for (let r = 0; r < rows; r++) {
    for (let col = 0; col < cols; col++) {
      plan.x = originX + col * stepM;
      plan.y = originY + r * stepM;
      if (!pointInPolygon(plan, outline, 0)) continue;
      point[0] = plan.x;
      point[1] = plan.y;
      factors.fill(0);
      for (let k = 0; k < polygons.length; k++) {
        const f = sphereToPolygon(point, polygons[k]!);
        const own = room.polygonSurface[k]!;
        factors[own] = factors[own]! + f;
        const h = room.polygonHost[k]!;
        if (h >= 0) factors[h] = factors[h]! - f;
      }
      const t4 = room.louvers.length > 0 ? cellT4 : room.t4;
      if (room.louvers.length > 0) temperaturesToward(room, point, cellC, cellT4);
      let fSum = 0;
      let t4Sum = 0;
      for (let i = 0; i < factors.length; i++) {
        const f = factors[i]! > 0 ? factors[i]! : 0;
        fSum += f;
        t4Sum += f * t4[i]!;
      }
      const mrtC = Math.sqrt(Math.sqrt(t4Sum / fSum)) - CELSIUS_TO_KELVIN_OFFSET_K;
      input.tr = mrtC;
      pmvPpd(input, result);
      mrt[r * cols + col] = round(mrtC, 2);
      pmv[r * cols + col] = round(result.pmv, 3);
    }
  }
  return { roomId: room.geometry.room.id, originX: round(originX, 6), originY: round(originY, 6), cols, rows, pmv, mrtC: mrt };
}

// ---------------------------------------------------------------------------------------------

function prepareRooms(
  layout: Layout,
  geometry: Map<string, RoomGeometry>,
  conditions: ScenarioConditions,
  louverTables: Map<string, LouverTable>,
  warnings: ComputeWarning[],
): Map<string, PreparedRoom> {
  const prepared = new Map<string, PreparedRoom>();
  for (const room of layout.rooms) prepared.set(room.id, prepareRoom(geometry.get(room.id)!, conditions, louverTables, warnings));
  return prepared;
}

/**
 * Steps 1, 2 and 5 of the computation for every room — surfaces, their temperatures, AUST,
 * panel results and the active louvered panels — without seats or heatmap (the louver
 * optimiser starts from here).
 * @throws AppError('invalid_input') naming each object when the layout cannot be computed.
 */
export function prepareComfortRooms(layout: Layout, conditions: ScenarioConditions, louverTables: Map<string, LouverTable> = new Map()): Map<string, PreparedRoom> {
  validateForCompute(layout);
  return prepareRooms(layout, buildLayoutGeometry(layout), conditions, louverTables, []);
}

/** The room (in layout order) that holds a seat, as the computation assigns it. */
export function roomOfSeat(layout: Readonly<Layout>, seat: Readonly<Seat>): string | null {
  return layout.rooms.find((r) => pointInPolygon(seat.position, r.outline))?.id ?? null;
}

/**
 * Computes comfort for a layout under a scenario's conditions.
 * @throws AppError('invalid_input') naming each object when the layout cannot be computed.
 */
export function computeComfort(layout: Layout, conditions: ScenarioConditions, options: ComputeOptions = {}): ComfortComputation {
  validateForCompute(layout);
  const geometry = buildLayoutGeometry(layout);
  const warnings: ComputeWarning[] = [];
  const requestedStepM = options.stepM ?? DEFAULT_HEATMAP_STEP_M;
  const floorAreaM2 = [...geometry.values()].reduce((sum, g) => sum + g.areaM2, 0);
  const stepM =
    floorAreaM2 / (requestedStepM * requestedStepM) > MAX_HEATMAP_CELLS
      ? Math.ceil(Math.sqrt(floorAreaM2 / MAX_HEATMAP_CELLS) / 0.05) * 0.05
      : requestedStepM;
  if (stepM !== requestedStepM) {
    warnings.push({
      code: "heatmap_coarsened",
      message: `The plan's ${floorAreaM2.toFixed(0)} m² would need more than ${MAX_HEATMAP_CELLS} heatmap cells at ${requestedStepM} m; the heatmap uses ${stepM.toFixed(2)} m cells.`,
      objectId: null,
    });
  }
  const prepared = prepareRooms(layout, geometry, conditions, options.louverTables ?? new Map<string, LouverTable>(), warnings);

  const seats = layout.seats.map((seat) => {
    const result = computeSeat(seat, prepared.get(roomOfSeat(layout, seat)!)!, layout.zones, conditions);
    if (!result.withinRange) {
      warnings.push({
        code: "pmv_out_of_range",
        message: `Seat "${seat.label}": an input is outside the range ISO 7730 gives for PMV; treat its PMV as indicative.`,
        objectId: seat.id,
      });
    }
    return result;
  });
  const panelOrder = new Map(layout.panels.map((p, i) => [p.id, i]));
  const panels = [...prepared.values()].flatMap((r) => r.panels).sort((a, b) => panelOrder.get(a.id)! - panelOrder.get(b.id)!);
  const zones = layout.zones.map((zone) => computeZone(zone, seats));
  const heatmap: Heatmap = {
    stepM,
    heightM: HEATMAP_HEIGHT_M,
    grids: layout.rooms.map((room) => computeGrid(prepared.get(room.id)!, stepM, conditions)),
  };
  return { seats, panels, zones, heatmap, warnings };
}
