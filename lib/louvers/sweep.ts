import "server-only";
import { z } from "zod";
import type { Member } from "@/lib/auth/session";
import { computeComfort, roomOfSeat } from "@/lib/compute/comfort";
import { validateForCompute } from "@/lib/compute/geometry";
import { invalidInput } from "@/lib/http/handler";
import type { Layout } from "@/lib/layout/schema";
import { louverTablesForLayout } from "@/lib/louvers/layout-tables";
import type { LouverTable } from "@/lib/panels/louverTable";
import { louverSettingsDeg } from "@/lib/performance/panel-curves";
import { getLayout } from "@/lib/projects/service";
import type { ScenarioConditions } from "@/lib/scenarios/schema";
import { getScenario } from "@/lib/scenarios/service";

/**
 * PMV of each seat of a louvered panel's room against that panel's opening angle
 * (`POST /api/projects/{id}/louvers/sweep`): the comfort computation (lib/compute/comfort.ts
 * `computeComfort`, the same model as the results screen) run once per angle on the layout
 * reduced to what the room's seats can see, with the panel's opening angle replaced and every
 * other panel left at its layout setting.
 *
 * What the reduced layout keeps: every room and opening (whether a wall is interior depends on
 * its neighbours, so the room's surface temperatures stay as in the full computation), but only
 * the panels and seats of the panel's room. Rooms are separate radiant enclosures, so a seat's
 * PMV is the one the full computation gives; the heatmap is evaluated on a coarse grid that is
 * not returned.
 */

/** Most angles one request may ask for (every 2.5° over 0…180°). */
export const MAX_SWEEP_ANGLES = 73;
/**
 * Heatmap step of the per-angle computations, m: larger than any room, so each room gets one
 * cell (computeComfort always evaluates a grid; the sweep reads only the seats).
 */
const SWEEP_HEATMAP_STEP_M = 1000;

export const sweepInput = z.strictObject({
  scenarioId: z.uuid("not a scenario id"),
  panelId: z.string().min(1).max(64),
  /** Opening angles to evaluate, degrees, each within the panel's range; default: the range in 5° steps. */
  anglesDeg: z.array(z.number().finite().min(0).max(180)).min(1).max(MAX_SWEEP_ANGLES).optional(),
  /** Layout revision (default: the head). */
  revision: z.int().min(1).optional(),
});
export type SweepInput = z.infer<typeof sweepInput>;

export interface PmvSweep {
  projectId: string;
  revision: number;
  scenarioId: string;
  panelId: string;
  roomId: string;
  /** Angles evaluated, degrees, increasing. */
  anglesDeg: number[];
  /** Each seat of the panel's room, in layout order; `pmv[i]` at `anglesDeg[i]`. */
  seats: { id: string; label: string; pmv: number[] }[];
}

/** The layout reduced to one room's panels and seats (rooms and openings kept whole; see the header). */
export function layoutForRoom(layout: Readonly<Layout>, roomId: string): Layout {
  return {
    ...layout,
    rooms: layout.rooms.map((r) => ({ ...r })),
    openings: layout.openings.map((o) => ({ ...o })),
    panels: layout.panels.filter((p) => p.roomId === roomId),
    seats: layout.seats.filter((s) => roomOfSeat(layout, s) === roomId),
    underlay: null,
  };
}

/**
 * The sweep itself (pure given the tables): PMV per seat of the panel's room at each angle.
 * @param anglesDeg opening angles, degrees, each inside the panel's louver range (checked by the caller).
 */
export function sweepPanelPmv(
  layout: Readonly<Layout>,
  conditions: ScenarioConditions,
  panelId: string,
  anglesDeg: readonly number[],
  louverTables: Map<string, LouverTable>,
): { roomId: string; seats: PmvSweep["seats"] } {
  const panel = layout.panels.find((p) => p.id === panelId);
  if (!panel?.louver) throw new RangeError(`panel ${panelId} has no louver`);
  const reduced = layoutForRoom(layout, panel.roomId);
  const seats = reduced.seats.map((s) => ({ id: s.id, label: s.label, pmv: [] as number[] }));
  for (const angle of anglesDeg) {
    const at: Layout = {
      ...reduced,
      panels: reduced.panels.map((p) => (p.id === panelId && p.louver ? { ...p, louver: { ...p.louver, openingAngleDeg: angle } } : p)),
    };
    const result = computeComfort(at, conditions, { louverTables, stepM: SWEEP_HEATMAP_STEP_M });
    result.seats.forEach((r, i) => seats[i]!.pmv.push(Math.round(r.pmv * 1000) / 1000));
  }
  return { roomId: panel.roomId, seats };
}

/**
 * `POST …/louvers/sweep`: validates the panel and angles against the layout (400 naming the
 * field), loads the cavity tables from the cache and runs the sweep.
 */
export async function panelPmvSweep(member: Pick<Member, "organisationId">, projectId: string, input: SweepInput): Promise<PmvSweep> {
  const [layoutAt, scenario] = await Promise.all([
    getLayout(member.organisationId, projectId, input.revision),
    getScenario(member.organisationId, projectId, input.scenarioId),
  ]);
  const layout = layoutAt.layout;
  const panel = layout.panels.find((p) => p.id === input.panelId);
  if (!panel) throw invalidInput([{ path: "panelId", message: `no panel "${input.panelId}" in revision ${layoutAt.revision}` }]);
  const louver = panel.louver;
  if (!louver) throw invalidInput([{ path: "panelId", message: `panel "${panel.label}" has no louver` }]);
  const outOfRange = (input.anglesDeg ?? [])
    .map((a, i) => ({ a, i }))
    .filter(({ a }) => a < louver.minOpeningAngleDeg || a > louver.maxOpeningAngleDeg)
    .map(({ i }) => ({ path: `anglesDeg.${i}`, message: `outside the louver's range ${louver.minOpeningAngleDeg}…${louver.maxOpeningAngleDeg}°` }));
  if (outOfRange.length > 0) throw invalidInput(outOfRange);
  validateForCompute(layout);
  const anglesDeg = input.anglesDeg ? [...new Set(input.anglesDeg)].sort((a, b) => a - b) : louverSettingsDeg(louver.minOpeningAngleDeg, louver.maxOpeningAngleDeg);
  const { tables } = await louverTablesForLayout(layoutForRoom(layout, panel.roomId));
  const swept = sweepPanelPmv(layout, scenario.conditions, panel.id, anglesDeg, tables);
  return { projectId, revision: layoutAt.revision, scenarioId: scenario.id, panelId: panel.id, roomId: swept.roomId, anglesDeg, seats: swept.seats };
}
