/**
 * Room loads against panel output (pure assembly over lib/loads and lib/panels):
 * - the room's envelope from the plan geometry (lib/compute/geometry.ts) and the scenario's
 *   surface conditions: exterior walls (net of their openings), openings, floor and ceiling,
 *   each with its U-value; a surface the scenario gives only as a temperature, or as "at the air
 *   temperature", has no U-value and is listed as skipped with the reason. As in the comfort
 *   computation, the far side of a surface given by a U-value is the outdoor air (an interior
 *   wall's and an interior opening's far side is a neighbouring room at the same temperature);
 * - winter: design heat loss by the EN 12831:2003 simplified method (`roomDesignHeatLoss`:
 *   transmission Σ f·A·U·(θ_int − θ_e) + ventilation 0.34·n·V·(θ_int − θ_e));
 * - summer: steady sensible cooling load (`roomSensibleCoolingLoad`: conduction, outdoor air at
 *   the air-change rate, internal gains of people, equipment and lighting; no solar gain — the
 *   plan carries no orientation or shading data — and no thermal storage);
 * - coverage Σ panel output / load (`loadCoverage`), with a warning below 100 %;
 * - the water side of a water-supplied panel: its mean water temperature, the surface
 *   temperature the characteristic's output implies (inverse EN 1264-5 exchange law), flow and
 *   return temperatures about the mean (EN 442-2 convention) and the water flow from
 *   Q = ṁ·c_p·ΔT with c_p and ρ of water at the mean water temperature.
 */
import type { RoomGeometry, RoomSurface } from "@/lib/compute/geometry";
import type { Panel } from "@/lib/layout/schema";
import {
  loadCoverage,
  roomDesignHeatLoss,
  roomSensibleCoolingLoad,
  type EnvelopeSurface,
  type SurfaceAdjacency,
  type SurfaceKind,
} from "@/lib/loads";
import {
  characteristicOutput,
  flowReturnTemperatures,
  surfaceTemperatureForSpecificOutput,
  waterDensity,
  waterFlow,
  waterSpecificHeat,
  type PanelMode,
} from "@/lib/panels";
import type { ResolvedScenarioConditions, SurfaceThermal } from "@/lib/scenarios/schema";

export const HEATING_LOAD_METHOD = "EN 12831:2003 simplified method (transmission + ventilation)";
export const COOLING_LOAD_METHOD =
  "Steady-state sensible heat balance (conduction + outdoor air + internal gains at ASHRAE Fundamentals ch. 18 rates; no solar gain, no thermal storage)";
export const WATER_FLOW_METHOD = "Q = ṁ·c_p·ΔT (c_p and ρ of water at the mean water temperature)";

/** One envelope element of a room as the load calculation saw it. */
export interface EnvelopeRow {
  surfaceId: string;
  label: string;
  kind: SurfaceKind;
  /** Net area, m² (a wall without its openings). */
  areaM2: number;
  uValueWm2K: number | null;
  adjacent: SurfaceAdjacency | null;
  /** Heat flow through the element, W: a loss in winter, a gain in summer; null when skipped. */
  heatFlowW: number | null;
  /** Why the element has no heat flow computed (null when it was counted). */
  skipped: string | null;
}

const NO_U_TEMPERATURE = "given as a surface temperature, so it has no U-value";
const NO_U_AIR = "at the air temperature in the scenario (no U-value): no heat flow counted";

function fromThermal(
  surface: Pick<RoomSurface, "id" | "label">,
  kind: SurfaceKind,
  areaM2: number,
  thermal: SurfaceThermal | null,
  adjacent: SurfaceAdjacency,
): { row: EnvelopeRow; element: EnvelopeSurface | null } {
  const row: EnvelopeRow = { surfaceId: surface.id, label: surface.label, kind, areaM2, uValueWm2K: null, adjacent: null, heatFlowW: null, skipped: null };
  if (thermal === null) return { row: { ...row, skipped: NO_U_AIR }, element: null };
  if (thermal.kind === "surfaceTemperature") return { row: { ...row, skipped: NO_U_TEMPERATURE }, element: null };
  return { row: { ...row, uValueWm2K: thermal.uValueWm2K, adjacent }, element: { kind, areaM2, uValueWm2K: thermal.uValueWm2K, adjacent } };
}

/**
 * The envelope of a room: one row per floor, ceiling, wall and opening (panels are part of the
 * surface they are mounted in), and the elements with a U-value for lib/loads, in row order.
 */
export function roomEnvelope(geometry: RoomGeometry, conditions: ResolvedScenarioConditions): { rows: EnvelopeRow[]; elements: (EnvelopeSurface | null)[] } {
  const s = conditions.surfaces;
  const openingArea = new Map<number, number>();
  geometry.surfaces.forEach((x) => {
    if (x.role === "opening") openingArea.set(x.hostIndex, (openingArea.get(x.hostIndex) ?? 0) + x.areaM2);
  });
  const rows: EnvelopeRow[] = [];
  const elements: (EnvelopeSurface | null)[] = [];
  geometry.surfaces.forEach((x, i) => {
    let entry: ReturnType<typeof fromThermal>;
    switch (x.role) {
      case "floor":
        entry = fromThermal(x, "floor", x.areaM2, s.floor, "outdoor");
        break;
      case "ceiling":
        entry = fromThermal(x, "ceiling", x.areaM2, s.ceiling, "outdoor");
        break;
      case "exteriorWall":
        entry = fromThermal(x, "wall", Math.max(0, x.areaM2 - (openingArea.get(i) ?? 0)), s.exteriorWalls, "outdoor");
        break;
      case "interiorWall":
        // The neighbour is at the same air temperature: f = 0 (EN 12831 "heated" neighbour).
        entry = fromThermal(x, "wall", Math.max(0, x.areaM2 - (openingArea.get(i) ?? 0)), s.interiorWalls, "heated");
        break;
      case "opening": {
        const interior = geometry.interiorEdges[x.edgeIndex] ?? false;
        const kind: SurfaceKind = x.opening?.kind === "glazedDoor" ? "door" : "window";
        entry = fromThermal(x, kind, x.areaM2, x.opening?.thermal ?? s.openings, interior ? "heated" : "outdoor");
        break;
      }
      case "panel":
        return;
    }
    rows.push(entry.row);
    elements.push(entry.element);
  });
  return { rows, elements };
}

/** Occupants counted for the internal gains: one per seat, or the density × floor area. */
export function occupantCount(conditions: ResolvedScenarioConditions, floorAreaM2: number, seatsInRoom: number): number {
  const o = conditions.internalGains.occupants;
  return o.kind === "seats" ? seatsInRoom : o.personsPerM2 * floorAreaM2;
}

export interface RoomLoadInput {
  geometry: RoomGeometry;
  conditions: ResolvedScenarioConditions;
  mode: PanelMode;
  /** Seats drawn in the room (occupants when the scenario counts one per seat). */
  seatsInRoom: number;
  /** Output of each active panel of the room in `mode`, W. */
  panelOutputsW: ReadonlyArray<number>;
}

export interface RoomLoad {
  mode: PanelMode;
  method: string;
  floorAreaM2: number;
  volumeM3: number;
  airChangesPerHour: number;
  indoorC: number;
  outdoorC: number;
  transmissionW: number;
  ventilationW: number;
  /** Internal gains counted (cooling only; 0 in winter, where the method leaves them out). */
  internal: { occupants: number; peopleW: number; equipmentW: number; lightingW: number; totalW: number };
  /** Heat loss (heating) or sensible gain (cooling), W. */
  loadW: number;
  surfaces: EnvelopeRow[];
  /** Ids of the surfaces without a U-value (see `surfaces[].skipped`). */
  skippedSurfaceIds: string[];
  panelOutputW: number;
  /** Σ panel output / load × 100, %; null when there is no load to cover. */
  coveragePercent: number | null;
  shortfallW: number;
  /** True below 100 % coverage. */
  warning: boolean;
}

/** One room's load in one mode against its panels (method in the file header). */
export function roomLoad(input: Readonly<RoomLoadInput>): RoomLoad {
  const { geometry, conditions, mode } = input;
  const { rows, elements } = roomEnvelope(geometry, conditions);
  const used = elements.filter((e): e is EnvelopeSurface => e !== null);
  const floorAreaM2 = geometry.areaM2;
  const volumeM3 = floorAreaM2 * geometry.room.ceilingHeightM;
  const common = {
    surfaces: used,
    volumeM3,
    airChangesPerHour: conditions.airChangesPerHour,
    indoorC: conditions.airTemperatureC,
    outdoorC: conditions.outdoorTemperatureC,
  };
  let transmissionW: number;
  let ventilationW: number;
  let loadW: number;
  let flows: number[];
  let internal: RoomLoad["internal"] = { occupants: 0, peopleW: 0, equipmentW: 0, lightingW: 0, totalW: 0 };
  if (mode === "heating") {
    const r = roomDesignHeatLoss(common);
    ({ transmissionW, ventilationW } = r);
    loadW = r.totalW;
    flows = r.bySurface.map((b) => b.heatFlowW);
  } else {
    const g = conditions.internalGains;
    const occupants = occupantCount(conditions, floorAreaM2, input.seatsInRoom);
    const r = roomSensibleCoolingLoad({
      ...common,
      people: { count: occupants, sensibleWPerPerson: g.sensibleWPerPerson },
      floorAreaM2,
      equipmentWm2: g.equipmentWm2,
      lightingWm2: g.lightingWm2,
    });
    ({ transmissionW, ventilationW } = r);
    loadW = r.totalW;
    flows = r.bySurface.map((b) => b.heatFlowW);
    internal = { occupants, ...r.internal };
  }
  let k = 0;
  const surfaces = rows.map((row, i) => (elements[i] ? { ...row, heatFlowW: flows[k++]! } : row));
  const coverage = loadCoverage({ loadW, panelOutputsW: input.panelOutputsW });
  return {
    mode,
    method: mode === "heating" ? HEATING_LOAD_METHOD : COOLING_LOAD_METHOD,
    floorAreaM2,
    volumeM3,
    airChangesPerHour: conditions.airChangesPerHour,
    indoorC: conditions.airTemperatureC,
    outdoorC: conditions.outdoorTemperatureC,
    transmissionW,
    ventilationW,
    internal,
    loadW,
    surfaces,
    skippedSurfaceIds: surfaces.filter((s) => s.skipped !== null).map((s) => s.surfaceId),
    panelOutputW: coverage.totalOutputW,
    coveragePercent: coverage.noLoad ? null : coverage.coveragePercent,
    shortfallW: coverage.shortfallW,
    warning: coverage.warning,
  };
}

/** The water side of a water-supplied panel at its operating output. */
export interface WaterSide {
  method: string;
  meanWaterTemperatureC: number;
  /** Surface temperature at which the standard exchange law delivers the characteristic's output, °C. */
  surfaceTemperatureC: number;
  /** Output of the product characteristic Q = K·A·ΔTⁿ, W. */
  characteristicOutputW: number;
  /** Output the water carries (the panel's output at its current setting), W. */
  outputW: number;
  temperatureDropK: number;
  flowTemperatureC: number;
  returnTemperatureC: number;
  specificHeatJkgK: number;
  densityKgM3: number;
  massFlowKgS: number;
  litresPerHour: number;
}

/**
 * Water side of a panel with a water supply (null for a surface supply): mean water temperature
 * ↔ surface temperature ↔ output through the product characteristic, flow/return temperatures
 * and the water flow for `outputW` at the design drop (method in the file header).
 *
 * @param panel the panel; its characteristic K is per m² of panel.
 * @param areaM2 panel area, m².
 * @param outputW output the water delivers, W (clamped at 0 for the flow).
 * @param roomC room air temperature, °C (the characteristic's reference, as in the comfort computation).
 * @param temperatureDropK design drop |flow − return|, K, > 0.
 */
export function panelWaterSide(panel: Panel, areaM2: number, outputW: number, roomC: number, temperatureDropK: number): WaterSide | null {
  if (panel.supply.kind !== "water") return null;
  const meanWaterC = panel.supply.meanWaterTemperatureC;
  const qWm2 = characteristicOutput({ kWPerKn: panel.supply.characteristic.kWm2PerKn, n: panel.supply.characteristic.n, meanWaterC, roomC, mode: panel.mode });
  const cp = waterSpecificHeat(meanWaterC).value;
  const rho = waterDensity(meanWaterC).value;
  const temps = flowReturnTemperatures(meanWaterC, temperatureDropK, panel.mode);
  const flow = waterFlow({ outputW: Math.max(0, outputW), temperatureDropK, specificHeatJkgK: cp, densityKgM3: rho });
  return {
    method: WATER_FLOW_METHOD,
    meanWaterTemperatureC: meanWaterC,
    surfaceTemperatureC: surfaceTemperatureForSpecificOutput({ orientation: panel.mounting, mode: panel.mode, specificOutputWm2: qWm2, roomC }),
    characteristicOutputW: qWm2 * areaM2,
    outputW,
    temperatureDropK,
    flowTemperatureC: temps.flowC,
    returnTemperatureC: temps.returnC,
    specificHeatJkgK: cp,
    densityKgM3: rho,
    massFlowKgS: flow.massFlowKgS,
    litresPerHour: flow.litresPerHour,
  };
}
