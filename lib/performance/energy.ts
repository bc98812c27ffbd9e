/**
 * Zone schedules → panel outputs per period → energy (pure assembly over lib/energy).
 *
 * For each period of a zone's schedule, each active panel of the zone (panels-in-zone rule of
 * panel-curves.ts) runs at:
 * - "with louvers": the period's fixed opening angle (clamped into the louver's allowed range),
 *   or for "automatic" the angle `automaticAngleDeg` gives for the panel;
 * - "fully open": its louver's largest allowed opening angle (180° on a louver that opens flat).
 * A panel without louver gives the same output in both. Outputs are the panel curves of
 * panel-curves.ts; a negative output (a panel working against its mode) counts as 0 — its
 * control would switch it off. Energy per period, day, week and year and the saving come from
 * `scenarioEnergy` (E = Σ Φ·Δt; year = week × 365/7). A panel inside two zones is counted in
 * both zones' figures and so twice in the total.
 */
import { scenarioEnergy, type ScenarioEnergy, type Weekday, type ZoneEnergyInput } from "@/lib/energy";
import type { ZoneSchedule } from "@/lib/energy/schedule-schema";
import { panelOutputAt, panelsInZone, type PanelOperatingPoint } from "@/lib/performance/panel-curves";
import type { Zone } from "@/lib/layout/schema";

/** How an "automatic" period's angle was chosen: the louver optimiser (lib/louvers/optimise.ts). */
export type AutomaticSource = "optimiser";

/** One panel's setting and outputs during one period. */
export interface PeriodPanel {
  panelId: string;
  /** Opening angle used with louvers, degrees (null: no louver). */
  openingAngleDeg: number | null;
  withLouversW: number;
  fullyOpenW: number;
}

export interface ZoneEnergyPlan {
  zoneId: string;
  periods: { periodIndex: number; panels: PeriodPanel[] }[];
  input: ZoneEnergyInput;
}

/**
 * Panel outputs of each period of a zone's schedule (rules in the file header).
 *
 * @param zone the zone (outline and schedule; no schedule = no periods).
 * @param points operating points of every panel of the plan.
 * @param automaticAngleDeg the opening angle an "automatic" period uses for a louvered panel.
 */
export function zoneEnergyPlan(
  zone: Pick<Zone, "id" | "outline"> & { schedule?: ZoneSchedule | undefined },
  points: ReadonlyArray<PanelOperatingPoint>,
  automaticAngleDeg: (p: PanelOperatingPoint) => number,
): ZoneEnergyPlan {
  const periods = zone.schedule?.periods ?? [];
  const panels = panelsInZone(zone, points).filter((p) => p.active);
  const plan: ZoneEnergyPlan["periods"] = periods.map((period, periodIndex) => ({
    periodIndex,
    panels: panels.map((p) => {
      const louver = p.panel.louver;
      const wanted = !louver ? null : period.louver.mode === "fixed" ? period.louver.openingAngleDeg : automaticAngleDeg(p);
      const withLouvers = panelOutputAt(p, wanted);
      const fullyOpen = panelOutputAt(p, louver ? louver.maxOpeningAngleDeg : null);
      return {
        panelId: p.panel.id,
        openingAngleDeg: withLouvers.openingAngleDeg,
        withLouversW: Math.max(0, withLouvers.totalW),
        fullyOpenW: Math.max(0, fullyOpen.totalW),
      };
    }),
  }));
  return {
    zoneId: zone.id,
    periods: plan,
    input: {
      periods: periods.map((p) => ({ ...p, days: p.days as Weekday[] })),
      outputs: plan.map((p) => ({ withLouversW: p.panels.map((x) => x.withLouversW), fullyOpenW: p.panels.map((x) => x.fullyOpenW) })),
    },
  };
}

/** The energy of every zone's schedule and their total (lib/energy `scenarioEnergy`). */
export function planEnergy(plans: ReadonlyArray<ZoneEnergyPlan>): ScenarioEnergy {
  return scenarioEnergy(plans.map((p) => p.input));
}
