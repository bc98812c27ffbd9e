import "server-only";
import { z } from "zod";
import type { Member } from "@/lib/auth/session";
import { buildLayoutGeometry, pointInPolygon, validateForCompute, type RoomGeometry } from "@/lib/compute/geometry";
import type { AnnualEnergy, EnergyPairWh, Weekday } from "@/lib/energy";
import type { Layout } from "@/lib/layout/schema";
import { louverTablesForLayout } from "@/lib/louvers/layout-tables";
import { optimiseLouvers } from "@/lib/louvers/optimise";
import { louverTableKey, type LouverTable, type PanelMode } from "@/lib/panels";
import { planEnergy, zoneEnergyPlan, type AutomaticSource, type PeriodPanel } from "@/lib/performance/energy";
import { panelWaterSide, roomLoad, type RoomLoad, type WaterSide } from "@/lib/performance/loads";
import {
  LOUVER_SETTING_STEP_DEG,
  PERFORMANCE_APERTURE,
  panelOutputAt,
  panelOutputCurve,
  panelsInZone,
  panelTurndownRatio,
  roomOperatingPoints,
  zoneTurndown,
  type OutputPoint,
  type PanelOperatingPoint,
} from "@/lib/performance/panel-curves";
import { getLayout } from "@/lib/projects/service";
import { withLoadDefaults, type ResolvedScenarioConditions } from "@/lib/scenarios/schema";
import { getScenario } from "@/lib/scenarios/service";

/**
 * Panel performance, room loads and schedule energy for a layout revision under a scenario:
 * `GET /api/projects/{id}/panels/performance | loads | energy`. Reads are scoped to the member's
 * organisation (foreign or unknown ids are 404); the physics is the pure assembly in
 * panel-curves.ts, loads.ts and energy.ts. Louver cavity tables come from the table cache
 * (lib/louvers/layout-tables.ts); a table not computed yet is computed once in the worker pool
 * (off the request thread) while this request waits, then stored for every later request.
 */

/** Query of the three GET routes. */
export const performanceQuery = z.strictObject({
  scenarioId: z.uuid("not a scenario id"),
  /** Layout revision (default: the head). */
  revision: z.coerce.number().int("use a whole revision number").min(1).optional(),
});
export type PerformanceQuery = z.infer<typeof performanceQuery>;

interface Context {
  projectId: string;
  revision: number;
  scenarioId: string;
  layout: Layout;
  conditions: ResolvedScenarioConditions;
  geometry: Map<string, RoomGeometry>;
  points: PanelOperatingPoint[];
  /** Cavity tables by `louverTableKey`. */
  louverTables: Map<string, LouverTable>;
}

async function context(member: Member, projectId: string, query: PerformanceQuery): Promise<Context> {
  const [layoutAt, scenario] = await Promise.all([
    getLayout(member.organisationId, projectId, query.revision),
    getScenario(member.organisationId, projectId, query.scenarioId),
  ]);
  const layout = layoutAt.layout;
  validateForCompute(layout);
  const conditions = withLoadDefaults(scenario.conditions);
  const { tables: louverTables } = await louverTablesForLayout(layout);
  const byPanel = new Map<string, LouverTable>();
  for (const p of layout.panels) {
    if (p.louver) byPanel.set(p.id, louverTables.get(louverTableKey({ finish: p.louver.finish, wallEmissivity: p.louver.wallEmissivity }))!);
  }
  const geometry = buildLayoutGeometry(layout);
  const points = [...geometry.values()].flatMap((g) => roomOperatingPoints(g, conditions, byPanel));
  return { projectId, revision: layoutAt.revision, scenarioId: scenario.id, layout, conditions, geometry, points, louverTables };
}

const r = (x: number, digits = 2) => Math.round(x * 10 ** digits) / 10 ** digits;
const rn = (x: number | null, digits = 2) => (x === null || !Number.isFinite(x) ? null : r(x, digits));

function roundPoint(p: OutputPoint): OutputPoint {
  return {
    openingAngleDeg: p.openingAngleDeg,
    totalW: r(p.totalW),
    radiantW: r(p.radiantW),
    convectiveW: r(p.convectiveW),
    totalWm2: r(p.totalWm2, 3),
    radiantWm2: r(p.radiantWm2, 3),
    convectiveWm2: r(p.convectiveWm2, 3),
  };
}

// ---------------------------------------------------------------------------------------------
// Panel performance

export interface PanelPerformance {
  id: string;
  label: string;
  roomId: string;
  zoneIds: string[];
  mode: PanelMode;
  active: boolean;
  louvered: boolean;
  areaM2: number;
  surfaceTemperatureC: number;
  austC: number;
  /** Louver range, degrees (null without louver). */
  louverRange: { minOpeningAngleDeg: number; maxOpeningAngleDeg: number; currentOpeningAngleDeg: number } | null;
  /** Output at each louver setting (one point with angle null for a panel without louver). */
  curve: OutputPoint[];
  /** Output at the layout's current setting. */
  current: OutputPoint;
  turndownRatio: number | null;
}

export interface PerformanceResult {
  projectId: string;
  revision: number;
  scenarioId: string;
  method: string;
  stepDeg: number;
  panels: PanelPerformance[];
  zones: { id: string; name: string; panelIds: string[]; turndownRatio: number | null }[];
}

export async function panelPerformance(member: Member, projectId: string, query: PerformanceQuery): Promise<PerformanceResult> {
  const ctx = await context(member, projectId, query);
  const zonesOf = (id: string) => ctx.layout.zones.filter((z) => panelsInZone(z, ctx.points.filter((p) => p.panel.id === id)).length > 0).map((z) => z.id);
  const curves = new Map<string, OutputPoint[]>();
  const panels = ctx.points.map((p): PanelPerformance => {
    const curve = panelOutputCurve(p);
    curves.set(p.panel.id, curve);
    const l = p.panel.louver;
    return {
      id: p.panel.id,
      label: p.panel.label,
      roomId: p.panel.roomId,
      zoneIds: zonesOf(p.panel.id),
      mode: p.panel.mode,
      active: p.active,
      louvered: l !== null,
      areaM2: r(p.areaM2, 4),
      surfaceTemperatureC: r(p.surfaceC, 3),
      austC: r(p.austC, 3),
      louverRange: l ? { minOpeningAngleDeg: l.minOpeningAngleDeg, maxOpeningAngleDeg: l.maxOpeningAngleDeg, currentOpeningAngleDeg: l.openingAngleDeg } : null,
      curve: curve.map(roundPoint),
      current: roundPoint(panelOutputAt(p, l ? l.openingAngleDeg : null)),
      turndownRatio: rn(panelTurndownRatio(p, curve), 4),
    };
  });
  const zones = ctx.layout.zones.map((z) => {
    const inZone = panelsInZone(z, ctx.points);
    const active = inZone.filter((p) => p.active);
    return {
      id: z.id,
      name: z.name,
      panelIds: inZone.map((p) => p.panel.id),
      turndownRatio: active.length === 0 ? null : rn(zoneTurndown(active.map((p) => curves.get(p.panel.id)!)), 4),
    };
  });
  return {
    projectId,
    revision: ctx.revision,
    scenarioId: ctx.scenarioId,
    method:
      `Flat panels: radiant ε·σ·(T⁴ − AUST⁴) + ASHRAE natural convection (water supply: product characteristic Q = K·ΔTⁿ); ` +
      `louvered panels: cavity apparent emissivity × opening share ("${PERFORMANCE_APERTURE}" aperture model), convective part unchanged; ` +
      "turndown = highest / lowest output over the louver range (zone: Σ highest / Σ lowest).",
    stepDeg: LOUVER_SETTING_STEP_DEG,
    panels,
    zones,
  };
}

// ---------------------------------------------------------------------------------------------
// Room loads and coverage

export interface RoomLoadsResult {
  projectId: string;
  revision: number;
  scenarioId: string;
  conditions: { airChangesPerHour: number; internalGains: ResolvedScenarioConditions["internalGains"]; waterTemperatureDropK: ResolvedScenarioConditions["waterTemperatureDropK"] };
  rooms: {
    id: string;
    name: string;
    loads: (RoomLoad & { panels: { id: string; label: string; outputW: number; waterSide: WaterSide | null }[] })[];
  }[];
  warnings: { code: "coverage_below_100"; roomId: string; mode: PanelMode; message: string }[];
  cautions: string[];
}

const LOAD_CAUTIONS = [
  "Design loads here are estimates for comparing layouts; size the installation with a full calculation to the standard that applies locally, by a qualified designer.",
  "Chilled panels must stay above the room dew point (see the comfort results' condensation margin); hot or electrically supplied panels, their mounting and their connections follow local codes, the manufacturer's instructions and licensed practice.",
];

function roundLoad(l: RoomLoad): RoomLoad {
  return {
    ...l,
    floorAreaM2: r(l.floorAreaM2, 3),
    volumeM3: r(l.volumeM3, 3),
    transmissionW: r(l.transmissionW),
    ventilationW: r(l.ventilationW),
    internal: { occupants: r(l.internal.occupants, 3), peopleW: r(l.internal.peopleW), equipmentW: r(l.internal.equipmentW), lightingW: r(l.internal.lightingW), totalW: r(l.internal.totalW) },
    loadW: r(l.loadW),
    surfaces: l.surfaces.map((s) => ({ ...s, areaM2: r(s.areaM2, 3), heatFlowW: rn(s.heatFlowW) })),
    panelOutputW: r(l.panelOutputW),
    coveragePercent: rn(l.coveragePercent, 1),
    shortfallW: r(l.shortfallW),
  };
}

function roundWater(w: WaterSide): WaterSide {
  return {
    ...w,
    surfaceTemperatureC: r(w.surfaceTemperatureC, 3),
    characteristicOutputW: r(w.characteristicOutputW),
    outputW: r(w.outputW),
    flowTemperatureC: r(w.flowTemperatureC, 3),
    returnTemperatureC: r(w.returnTemperatureC, 3),
    specificHeatJkgK: r(w.specificHeatJkgK, 1),
    densityKgM3: r(w.densityKgM3, 2),
    // Unrounded enough that Q = ṁ·c_p·ΔT can be checked to 0.1 %.
    massFlowKgS: Number(w.massFlowKgS.toPrecision(6)),
    litresPerHour: r(w.litresPerHour, 2),
  };
}

export async function roomLoads(member: Member, projectId: string, query: PerformanceQuery): Promise<RoomLoadsResult> {
  const ctx = await context(member, projectId, query);
  const c = ctx.conditions;
  const warnings: RoomLoadsResult["warnings"] = [];
  const rooms = ctx.layout.rooms.map((room) => {
    const geometry = ctx.geometry.get(room.id)!;
    const seatsInRoom = ctx.layout.seats.filter((s) => pointInPolygon(s.position, room.outline)).length;
    const loads = c.activeModes.map((mode) => {
      const panels = ctx.points.filter((p) => p.panel.roomId === room.id && p.panel.mode === mode && p.active);
      const outputs = panels.map((p) => panelOutputAt(p, p.panel.louver ? p.panel.louver.openingAngleDeg : null).totalW);
      const load = roomLoad({ geometry, conditions: c, mode, seatsInRoom, panelOutputsW: outputs });
      if (load.warning) {
        warnings.push({
          code: "coverage_below_100",
          roomId: room.id,
          mode,
          message: `${room.name}: the panels cover ${load.coveragePercent?.toFixed(0)} % of the ${mode === "heating" ? "design heat loss" : "sensible cooling load"} (${load.loadW.toFixed(0)} W); ${load.shortfallW.toFixed(0)} W short.`,
        });
      }
      return {
        ...roundLoad(load),
        panels: panels.map((p, i) => {
          const water = panelWaterSide(p.panel, p.areaM2, outputs[i]!, c.airTemperatureC, c.waterTemperatureDropK[mode]);
          return { id: p.panel.id, label: p.panel.label, outputW: r(outputs[i]!), waterSide: water ? roundWater(water) : null };
        }),
      };
    });
    return { id: room.id, name: room.name, loads };
  });
  return {
    projectId,
    revision: ctx.revision,
    scenarioId: ctx.scenarioId,
    conditions: { airChangesPerHour: c.airChangesPerHour, internalGains: c.internalGains, waterTemperatureDropK: c.waterTemperatureDropK },
    rooms,
    warnings,
    cautions: LOAD_CAUTIONS,
  };
}

// ---------------------------------------------------------------------------------------------
// Schedules and energy

/**
 * The angles "automatic" periods use: the louver optimiser's choice for the scenario
 * (lib/louvers/optimise.ts — each active louvered panel at the least output that keeps the
 * zones' seats inside their targets), one setting per panel for the scenario's design
 * conditions. Run on the request thread: about 0.1 s for the demo plan. When no zone has an
 * automatic period with a louvered panel, the optimiser is not run; a panel the optimiser
 * leaves out keeps its current opening angle from the layout.
 */
function automaticSettings(ctx: Context): { source: AutomaticSource; angles: Map<string, number>; unreachable: { seatId: string; reason: string }[] } | null {
  const automaticZones = ctx.layout.zones.filter((z) => z.schedule?.periods.some((p) => p.louver.mode === "automatic"));
  const louvered = automaticZones.some((z) => panelsInZone(z, ctx.points).some((p) => p.active && p.panel.louver));
  if (!louvered) return null;
  const result = optimiseLouvers(ctx.layout, ctx.conditions, { louverTables: ctx.louverTables });
  return {
    source: "optimiser",
    angles: new Map(result.panels.map((p) => [p.id, p.openingAngleDeg])),
    unreachable: result.unreachable.map((u) => ({ seatId: u.seatId, reason: u.reason })),
  };
}

type Annual = AnnualEnergy;
function roundAnnual(a: Annual): { withLouversKWh: number; fullyOpenKWh: number; savingKWh: number; savingPercent: number | null } {
  return { withLouversKWh: r(a.withLouversKWh, 3), fullyOpenKWh: r(a.fullyOpenKWh, 3), savingKWh: r(a.savingKWh, 3), savingPercent: rn(a.savingPercent, 2) };
}
function roundDays(days: Record<Weekday, EnergyPairWh>): Record<Weekday, EnergyPairWh> {
  const out = {} as Record<Weekday, EnergyPairWh>;
  for (const [d, e] of Object.entries(days) as [Weekday, EnergyPairWh][]) out[d] = { withLouversWh: r(e.withLouversWh, 3), fullyOpenWh: r(e.fullyOpenWh, 3) };
  return out;
}

export interface EnergyResult {
  projectId: string;
  revision: number;
  scenarioId: string;
  method: string;
  /** How "automatic" periods were set: the optimiser's angles (null when no zone has an automatic period with a louvered panel). */
  automatic: { source: AutomaticSource; panels: { panelId: string; openingAngleDeg: number }[]; unreachable: { seatId: string; reason: string }[] } | null;
  zones: {
    id: string;
    name: string;
    periods: { periodIndex: number; days: Weekday[]; startHour: number; endHour: number; louver: { mode: "fixed"; openingAngleDeg: number } | { mode: "automatic" }; durationH: number; withLouversW: number; fullyOpenW: number; withLouversWh: number; fullyOpenWh: number; panels: PeriodPanel[] }[];
    byDay: Record<Weekday, EnergyPairWh>;
    weekly: EnergyPairWh;
    annual: ReturnType<typeof roundAnnual>;
  }[];
  total: { byDay: Record<Weekday, EnergyPairWh>; weekly: EnergyPairWh; annual: ReturnType<typeof roundAnnual> };
}

export async function scheduleEnergy(member: Member, projectId: string, query: PerformanceQuery): Promise<EnergyResult> {
  const ctx = await context(member, projectId, query);
  const automatic = automaticSettings(ctx);
  const angleFor = (p: PanelOperatingPoint) => automatic?.angles.get(p.panel.id) ?? p.panel.louver!.openingAngleDeg;
  const plans = ctx.layout.zones.map((z) => zoneEnergyPlan(z, ctx.points, angleFor));
  const energy = planEnergy(plans);
  const zones = ctx.layout.zones.map((z, i) => {
    const e = energy.zones[i]!;
    const plan = plans[i]!;
    const periods = z.schedule?.periods ?? [];
    return {
      id: z.id,
      name: z.name,
      periods: e.periods.map((p) => {
        const period = periods[p.periodIndex]!;
        return {
          periodIndex: p.periodIndex,
          days: [...p.days],
          startHour: period.startHour,
          endHour: period.endHour,
          louver: period.louver,
          durationH: p.durationH,
          withLouversW: r(p.withLouversW),
          fullyOpenW: r(p.fullyOpenW),
          withLouversWh: r(p.withLouversWh, 3),
          fullyOpenWh: r(p.fullyOpenWh, 3),
          panels: plan.periods[p.periodIndex]!.panels.map((x) => ({ ...x, withLouversW: r(x.withLouversW), fullyOpenW: r(x.fullyOpenW) })),
        };
      }),
      byDay: roundDays(e.byDay),
      weekly: { withLouversWh: r(e.weekly.withLouversWh, 3), fullyOpenWh: r(e.weekly.fullyOpenWh, 3) },
      annual: roundAnnual(e.annual),
    };
  });
  return {
    projectId,
    revision: ctx.revision,
    scenarioId: ctx.scenarioId,
    method:
      "Panel thermal output × occupied time: E = Σ Φ·Δt per period (panels off outside the periods), summed per weekday, week and year (365/7 weeks); " +
      "with louvers at each period's setting vs. fixed fully open (the louver's largest angle); saving = fully open − with louvers. " +
      "Automatic periods use the louver optimiser's angle for each panel under the scenario's design conditions (the least output that keeps the zones' seats in their targets).",
    automatic: automatic && {
      source: automatic.source,
      panels: [...automatic.angles].map(([panelId, openingAngleDeg]) => ({ panelId, openingAngleDeg })),
      unreachable: automatic.unreachable,
    },
    zones,
    total: { byDay: roundDays(energy.byDay), weekly: { withLouversWh: r(energy.weekly.withLouversWh, 3), fullyOpenWh: r(energy.weekly.fullyOpenWh, 3) }, annual: roundAnnual(energy.annual) },
  };
}
