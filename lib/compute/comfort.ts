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
 *    panels; a hot-surface caution for reachable heating panels.
 * 6. Heatmap: small-sphere MRT (solid angles) at seated head height and PMV with the scenario's
 *    defaults.
 *
 * Known simplifications (also in the report's method notes): surfaces are black for the
 * occupant except panels, which are grey (see `panelRadiantTemperature`); no obstruction
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
import type { Layout, Panel, Seat, Zone } from "@/lib/layout/schema";
import {
  characteristicOutput,
  condensationMargin,
  louveredPanelOutput,
  panelOutput,
  STANDARD_SURFACE_EXCHANGE,
  type PanelOutput,
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
import { grooveEmissivityDiffuseRadiosity, grooveEmissivitySpecularUnfolded } from "@/lib/viewfactor/groove";

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
/** Strips per wall for the diffuse louver-cavity radiosity solution (plenty for 3 decimals). */
const LOUVER_RADIOSITY_STRIPS = 64;

export interface ComputeOptions {
  /** Heatmap grid step, m (default 0.25). */
  stepM?: number;
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
function passiveSurfaceTemperature(surface: RoomSurface, geometry: RoomGeometry, c: ScenarioConditions): number {
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

/**
 * Apparent emissivity of a louvered panel's V-groove cavities at their opening angle
 * (lib/viewfactor/groove: diffuse walls by radiosity, specular by unfolding), memoised per
 * computation. A closed louver (0°) is taken at 1°, the smallest angle modelled.
 */
function louverApparentEmissivity(panel: Panel, memo: Map<string, number>): number | null {
  const l = panel.louver;
  if (!l) return null;
  const angle = Math.max(1, l.openingAngleDeg);
  const key = `${l.finish}:${angle}:${l.wallEmissivity}`;
  const known = memo.get(key);
  if (known !== undefined) return known;
  const value =
    l.finish === "diffuse"
      ? grooveEmissivityDiffuseRadiosity({ openingAngleDeg: angle, wallEmissivity: l.wallEmissivity, strips: LOUVER_RADIOSITY_STRIPS }).hemispherical
      : grooveEmissivitySpecularUnfolded({ openingAngleDeg: angle, wallEmissivity: l.wallEmissivity }).hemispherical;
  memo.set(key, value);
  return value;
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

/** A room prepared once for all its seats and heatmap cells. */
interface PreparedRoom {
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
}

function round(x: number, digits: number): number {
  const f = 10 ** digits;
  return Math.round(x * f) / f;
}

function prepareRoom(geometry: RoomGeometry, c: ScenarioConditions, louverMemo: Map<string, number>, warnings: ComputeWarning[]): PreparedRoom {
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
  surfaces.forEach((s, i) => {
    const p = s.panel;
    if (!p) return;
    const apparent = louverApparentEmissivity(p, louverMemo);
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
    const base = {
      orientation, mode: p.mode, surfaceC, airC, austC, emissivity: p.emissivity, areaM2: s.areaM2,
      ...(orientation === "ceiling" ? { equivalentDiameterM: (4 * s.areaM2) / (2 * (p.widthM + p.lengthM)) } : { heightM: p.widthM }),
    };
    const out: PanelOutput = apparent === null ? panelOutput(base) : louveredPanelOutput({ ...base, apparentEmissivity: apparent });
    const share = Number.isFinite(out.radiantShare) ? out.radiantShare : 0;
    // A water-supplied panel delivers what its tested characteristic says; the split follows the surface model.
    const totalWm2 = characteristicWm2 ?? out.totalWm2;
    const radiantWm2 = characteristicWm2 === null ? out.radiantWm2 : characteristicWm2 * share;
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
    temperaturesC[i] = panelRadiantTemperature(surfaceC, austC, apparent ?? p.emissivity);
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
  return { geometry, surfaces, temperaturesC, t4, polygons, polygonSurface: Int32Array.from(owner), polygonHost: Int32Array.from(host), austC, panels };
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

function planeRadiantC(room: PreparedRoom, factors: Float64Array): number {
  return fourthPowerMean(factors, room.temperaturesC).temperatureC;
}

function toFailure(f: { code: string; message: string } | undefined): ComfortLimitFailure | null {
  return f ? { code: f.code, message: f.message } : null;
}

function computeSeat(seat: Seat, room: PreparedRoom, zones: ReadonlyArray<Zone>, c: ScenarioConditions): SeatResult {
  const n = room.surfaces.length;
  const z = BODY_CENTRE_HEIGHT_M[seat.posture];
  const position: Vec3 = [seat.position.x, seat.position.y, z];
  const facing = (seat.facingDeg * Math.PI) / 180;
  const cf = Math.cos(facing);
  const sf = Math.sin(facing);
  const normals: Record<"up" | "down" | "front" | "back" | "left" | "right", Vec3> = {
    up: [0, 0, 1],
    down: [0, 0, -1],
    front: [cf, sf, 0],
    back: [-cf, -sf, 0],
    left: [-sf, cf, 0],
    right: [sf, -cf, 0],
  };
  const factors = {} as Record<keyof typeof normals, Float64Array>;
  const tpr = {} as Record<keyof typeof normals, number>;
  for (const dir of Object.keys(normals) as (keyof typeof normals)[]) {
    factors[dir] = planeFactors(room, position, normals[dir], new Float64Array(n));
    tpr[dir] = planeRadiantC(room, factors[dir]);
  }
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
    radiantSum += angle[i]! * room.t4[i]!;
  }
  const surfaces: SeatSurfaceShare[] = room.surfaces.map((s, i) => ({
    surfaceId: s.id,
    kind: s.kind,
    label: s.label,
    temperatureC: round(room.temperaturesC[i]!, 3),
    angleFactor: round(angle[i]!, 5),
    mrtShare: round(radiantSum > 0 ? (angle[i]! * room.t4[i]!) / radiantSum : 0, 5),
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
    const forward = planeRadiantC(room, planeFactors(room, position, normal, scratch));
    normal[0] = -normal[0];
    normal[1] = -normal[1];
    const backward = planeRadiantC(room, planeFactors(room, position, normal, scratch));
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
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const p of outline) {
    minX = Math.min(minX, p.x);
    minY = Math.min(minY, p.y);
    maxX = Math.max(maxX, p.x);
    maxY = Math.max(maxY, p.y);
  }
  const cols = Math.max(1, Math.ceil((maxX - minX) / stepM - 1e-9));
  const rows = Math.max(1, Math.ceil((maxY - minY) / stepM - 1e-9));
  const originX = minX + stepM / 2;
  const originY = minY + stepM / 2;
  const pmv: (number | null)[] = new Array(cols * rows).fill(null);
  const mrt: (number | null)[] = new Array(cols * rows).fill(null);
  const factors = new Float64Array(room.surfaces.length);
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
      let fSum = 0;
      let t4Sum = 0;
      for (let i = 0; i < factors.length; i++) {
        const f = factors[i]! > 0 ? factors[i]! : 0;
        fSum += f;
        t4Sum += f * room.t4[i]!;
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
  const louverMemo = new Map<string, number>();
  const prepared = new Map<string, PreparedRoom>();
  for (const room of layout.rooms) prepared.set(room.id, prepareRoom(geometry.get(room.id)!, conditions, louverMemo, warnings));

  const seats = layout.seats.map((seat) => {
    const room = layout.rooms.find((r) => pointInPolygon(seat.position, r.outline))!;
    const result = computeSeat(seat, prepared.get(room.id)!, layout.zones, conditions);
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
