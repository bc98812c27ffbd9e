/**
 * Panel performance at a scenario's conditions (pure): each panel's operating point (surface
 * temperature, the room's AUST), its output at each louver setting (radiant and convective
 * parts, W and W/m²) and the turndown ratio per panel and per zone.
 *
 * Method: the same panel model as the comfort computation (lib/compute/comfort.ts) —
 * - surface temperature: the supply's, or for a water supply the one at which the standard
 *   exchange law of EN 1264-5 / ISO 11855-2 delivers the product characteristic's output
 *   (`panelSurfaceTemperature`);
 * - AUST: area-weighted temperature of every surface of the room except its active panels (net
 *   areas; inactive panels at their host's temperature), surface temperatures as the comfort
 *   computation sets them (`passiveSurfaceTemperature`);
 * - a flat panel: radiant ε·σ·(T_p⁴ − AUST⁴) plus the ASHRAE natural-convection correlation
 *   (`panelOutput`); a water-supplied flat panel delivers its characteristic's output, split
 *   into radiant and convective parts in the surface model's proportion;
 * - a louvered panel: `louverOutputCurve` (lib/panels/louverPerformance.ts) with the cavity table
 *   of its finish and wall emissivity and the default aperture model ("hinged-blades"): the
 *   louver changes the radiant part only. For a water-supplied louvered panel the surface
 *   temperature still comes from its characteristic (the flat product's test), and the output
 *   follows the surface model, so it changes with the louver setting.
 * Outputs are positive in the panel's mode (heat delivered when heating, removed when cooling).
 */
import { panelSurfaceTemperature, passiveSurfaceTemperature } from "@/lib/compute/comfort";
import { netAreas, pointInPolygon, WALL_PANEL_SNAP_M, type RoomGeometry } from "@/lib/compute/geometry";
import type { Panel, Zone } from "@/lib/layout/schema";
import {
  LOUVER_DEFAULT_APERTURE,
  louverOutputCurve,
  louverTurndownRatio,
  panelOutput,
  turndownRatio,
  type LouverAperture,
  type LouverTable,
  type PanelOutputInput,
} from "@/lib/panels";
import type { ScenarioConditions } from "@/lib/scenarios/schema";

/** Spacing of the louver settings reported per panel, degrees. */
export const LOUVER_SETTING_STEP_DEG = 5;
/** Aperture model used for louvered panels (lib/panels/louverAperture.ts). */
export const PERFORMANCE_APERTURE: LouverAperture = LOUVER_DEFAULT_APERTURE;

/** One point of a panel's output curve, positive in the panel's mode. */
export interface OutputPoint {
  /** Louver setting, degrees; null for a panel without louver. */
  openingAngleDeg: number | null;
  totalW: number;
  radiantW: number;
  convectiveW: number;
  totalWm2: number;
  radiantWm2: number;
  convectiveWm2: number;
}

/** What a panel's output depends on, at one scenario. */
export interface PanelOperatingPoint {
  panel: Panel;
  /** Face area, m². */
  areaM2: number;
  /** True when the panel's mode is active in the scenario (an inactive panel gives nothing). */
  active: boolean;
  surfaceC: number;
  airC: number;
  austC: number;
  /** Specific output of a water-supplied panel from its product characteristic, W/m² (null: surface supply). */
  characteristicWm2: number | null;
  /** Cavity table of a louvered panel (null: no louver). */
  table: LouverTable | null;
}

/**
 * Louver settings across [minDeg, maxDeg]: the two ends and the multiples of `stepDeg` between
 * them, increasing (e.g. 30, 35, …, 180).
 *
 * @param minDeg smallest allowed opening angle, degrees, 0…maxDeg.
 * @param maxDeg largest allowed opening angle, degrees, minDeg…180.
 * @param stepDeg spacing, degrees, > 0 (default 5).
 * @throws RangeError for a reversed or out-of-range interval or a non-positive step.
 */
export function louverSettingsDeg(minDeg: number, maxDeg: number, stepDeg = LOUVER_SETTING_STEP_DEG): number[] {
  if (!(Number.isFinite(minDeg) && Number.isFinite(maxDeg) && minDeg >= 0 && maxDeg <= 180 && minDeg <= maxDeg)) {
    throw new RangeError(`need 0 ≤ minDeg ≤ maxDeg ≤ 180, got ${minDeg}, ${maxDeg}`);
  }
  if (!(stepDeg > 0)) throw new RangeError(`stepDeg must be > 0, got ${stepDeg}`);
  const out = [minDeg];
  for (let a = (Math.floor(minDeg / stepDeg) + 1) * stepDeg; a < maxDeg - 1e-9; a += stepDeg) out.push(a);
  if (maxDeg > minDeg) out.push(maxDeg);
  return out;
}

/**
 * Area-weighted unheated surface temperature of a room, °C: every surface except the active
 * panels, at net area (what the elements hosted on a surface cover is theirs), with the
 * comfort computation's surface temperatures; inactive panels sit at their host's temperature.
 */
export function roomAustC(geometry: RoomGeometry, conditions: ScenarioConditions): number {
  const surfaces = geometry.surfaces;
  const temperatures = surfaces.map((s) => (s.role === "panel" ? Number.NaN : passiveSurfaceTemperature(s, geometry, conditions)));
  const net = netAreas(surfaces);
  let area = 0;
  let sum = 0;
  surfaces.forEach((s, i) => {
    if (s.panel && conditions.activeModes.includes(s.panel.mode)) return;
    const t = s.role === "panel" ? temperatures[s.hostIndex]! : temperatures[i]!;
    area += net[i]!;
    sum += net[i]! * t;
  });
  return area > 0 ? sum / area : conditions.airTemperatureC;
}

/** The operating point of every panel of a room (tables keyed by panel id; null for unlouvered panels). */
export function roomOperatingPoints(
  geometry: RoomGeometry,
  conditions: ScenarioConditions,
  tables: ReadonlyMap<string, LouverTable>,
): PanelOperatingPoint[] {
  const austC = roomAustC(geometry, conditions);
  const airC = conditions.airTemperatureC;
  const out: PanelOperatingPoint[] = [];
  for (const s of geometry.surfaces) {
    const panel = s.panel;
    if (!panel) continue;
    const { surfaceC, characteristicWm2 } = panelSurfaceTemperature(panel, airC);
    out.push({
      panel,
      areaM2: s.areaM2,
      active: conditions.activeModes.includes(panel.mode),
      surfaceC,
      airC,
      austC,
      characteristicWm2,
      table: panel.louver ? (tables.get(panel.id) ?? null) : null,
    });
  }
  return out;
}

function baseInput(p: PanelOperatingPoint): Omit<PanelOutputInput, "emissivity"> {
  const { panel } = p;
  return {
    orientation: panel.mounting,
    mode: panel.mode,
    surfaceC: p.surfaceC,
    airC: p.airC,
    austC: p.austC,
    areaM2: p.areaM2,
    // Same characteristic lengths as the comfort computation: D_e = 4A/P for ceilings, the height for walls.
    ...(panel.mounting === "ceiling" ? { equivalentDiameterM: (4 * p.areaM2) / (2 * (panel.widthM + panel.lengthM)) } : { heightM: panel.widthM }),
  };
}

function point(openingAngleDeg: number | null, areaM2: number, totalWm2: number, radiantWm2: number): OutputPoint {
  return {
    openingAngleDeg,
    totalW: totalWm2 * areaM2,
    radiantW: radiantWm2 * areaM2,
    convectiveW: (totalWm2 - radiantWm2) * areaM2,
    totalWm2,
    radiantWm2,
    convectiveWm2: totalWm2 - radiantWm2,
  };
}

const OFF: Omit<OutputPoint, "openingAngleDeg"> = { totalW: 0, radiantW: 0, convectiveW: 0, totalWm2: 0, radiantWm2: 0, convectiveWm2: 0 };

/**
 * Output of a panel at the given louver settings (method in the file header). A panel without
 * louver gives one point (angle null) whatever `anglesDeg` holds; an inactive panel gives 0 W.
 *
 * @param p operating point; a louvered panel needs its `table`.
 * @param anglesDeg settings to evaluate, degrees, each inside the louver's allowed range
 *        (default: every 5° across the range, see {@link louverSettingsDeg}).
 * @throws RangeError for a louvered panel without table or an angle outside its range.
 */
export function panelOutputCurve(p: PanelOperatingPoint, anglesDeg?: ReadonlyArray<number>): OutputPoint[] {
  const louver = p.panel.louver;
  if (!louver) {
    if (!p.active) return [{ openingAngleDeg: null, ...OFF }];
    const flat = panelOutput({ ...baseInput(p), emissivity: p.panel.emissivity });
    if (p.characteristicWm2 === null) return [point(null, p.areaM2, flat.totalWm2, flat.radiantWm2)];
    const share = Number.isFinite(flat.radiantShare) ? flat.radiantShare : 0;
    return [point(null, p.areaM2, p.characteristicWm2, p.characteristicWm2 * share)];
  }
  const angles = anglesDeg ?? louverSettingsDeg(louver.minOpeningAngleDeg, louver.maxOpeningAngleDeg);
  if (!p.active) return angles.map((a) => ({ openingAngleDeg: a, ...OFF }));
  if (!p.table) throw new RangeError(`panel ${p.panel.id} has a louver but no cavity table`);
  const curve = louverOutputCurve({
    panel: baseInput(p),
    table: p.table,
    aperture: PERFORMANCE_APERTURE,
    minOpeningDeg: louver.minOpeningAngleDeg,
    maxOpeningDeg: louver.maxOpeningAngleDeg,
    anglesDeg: angles,
  });
  return curve.map((c) => point(c.openingAngleDeg, p.areaM2, c.totalWm2, c.radiantW / p.areaM2));
}

/**
 * The panel's output at one louver setting; the angle is clamped into the louver's allowed
 * range (a panel without louver ignores it).
 */
export function panelOutputAt(p: PanelOperatingPoint, openingAngleDeg: number | null): OutputPoint {
  const louver = p.panel.louver;
  if (!louver || openingAngleDeg === null) return panelOutputCurve(p, louver ? [louver.openingAngleDeg] : undefined)[0]!;
  const angle = Math.min(louver.maxOpeningAngleDeg, Math.max(louver.minOpeningAngleDeg, openingAngleDeg));
  return panelOutputCurve(p, [angle])[0]!;
}

/**
 * Turndown ratio of one panel: highest / lowest total output over its curve (louverTurndownRatio,
 * common practice); null without louver, when inactive, or when the lowest output is ≤ 0.
 */
export function panelTurndownRatio(p: PanelOperatingPoint, curve: ReadonlyArray<OutputPoint>): number | null {
  if (!p.panel.louver || !p.active || curve.length === 0) return null;
  const ratio = louverTurndownRatio(curve.map((c) => ({ ...c, openingAngleDeg: c.openingAngleDeg ?? 0, faceEmissivity: 0 })));
  return Number.isFinite(ratio) ? ratio : null;
}

/**
 * Turndown ratio of a zone: Σ highest / Σ lowest output of its active panels, each over its own
 * louver range (a flat panel contributes its single output to both sums), as `zoneTurndownRatio`
 * does; null without active panels or when the summed lowest output is ≤ 0.
 */
export function zoneTurndown(curves: ReadonlyArray<ReadonlyArray<OutputPoint>>): number | null {
  let lo = 0;
  let hi = 0;
  for (const c of curves) {
    if (c.length === 0) continue;
    const totals = c.map((x) => x.totalW);
    lo += Math.min(...totals);
    hi += Math.max(...totals);
  }
  return lo > 0 ? turndownRatio([hi, lo]) : null;
}

/**
 * Panels of a zone: those whose plan centre lies inside the zone's outline — a ceiling panel
 * above the zone, a wall panel on its edge (within WALL_PANEL_SNAP_M of it).
 */
export function panelsInZone<T extends { panel: Panel }>(zone: Pick<Zone, "outline">, panels: ReadonlyArray<T>): T[] {
  return panels.filter(({ panel }) => pointInPolygon(panel.center, zone.outline, panel.mounting === "wall" ? WALL_PANEL_SNAP_M : 0.01));
}
