/**
 * The louver optimisation problem: everything about a layout under a scenario that does not
 * depend on the louver settings, precomputed once so that evaluating a candidate setting is a
 * few multiply-adds and one PMV per seat. Pure (no I/O). Plain data throughout, so the problem
 * crosses into a worker thread by structured clone and the search (optimise-search.ts) needs
 * none of the plan geometry.
 *
 * What is precomputed, and why it is exact (the same model as lib/compute/comfort.ts):
 * - Per seat and per plane direction d of ISO 7726 Annex C [2] (up, down, front, back, left,
 *   right): the plane radiant temperature is the fourth-power mean
 *   T_d⁴ = Σ_i F_di·T_i⁴ / Σ_i F_di over the room's surfaces. Only the active louvered panels'
 *   T_i depend on the settings, so `baseT4[d]` holds Σ F_di·T_i⁴ over every other surface
 *   and `factorSum[d]` holds Σ F_di. The MRT is the Annex C projected-area weighting of the six
 *   T_d (linear in T_d), so the angle-independent part is kept per plane rather than as one
 *   MRT⁴.
 * - Per (seat, louvered panel): the six plane view factors and, per candidate opening angle,
 *   the panel's effective T⁴ toward the seat (`louverTemperatureToward`: directional
 *   emissivity from the exit angle, effective temperature against the AUST). The exit angle
 *   and the view factors do not depend on the opening angle.
 * - Per (panel, candidate angle): the panel's output at that setting, as the comfort
 *   computation reports it (face hemispherical emissivity, `louveredPanelOutput`).
 *
 * Candidate angles: the panel's cavity-table grid (5° steps for diffuse walls, 1° for
 * specular) inside its allowed range, plus the range's two ends.
 */
import { CELSIUS_TO_KELVIN_OFFSET_K, ISO7730_CATEGORY_LIMITS } from "@/lib/comfort";
import {
  louverTemperatureToward,
  PLANE_DIRECTIONS,
  prepareComfortRooms,
  roomOfSeat,
  seatPlaneFactors,
  type PreparedLouver,
} from "@/lib/compute/comfort";
import { pointInPolygon } from "@/lib/compute/geometry";
import type { Layout, Seat, Zone, ZoneTarget } from "@/lib/layout/schema";
import { louveredPanelOutput, louverFaceEmissivityAt, type LouverTable } from "@/lib/panels";
import type { ScenarioConditions } from "@/lib/scenarios/schema";
import { ISO7726_PROJECTED_AREA_FACTORS } from "@/lib/viewfactor";

/** One zone target as an interval on PMV: lo ≤ PMV ≤ hi, or lo < PMV < hi when strict. */
export interface PmvConstraint {
  zoneId: string;
  lo: number;
  hi: number;
  /** Category targets are strict (ISO 7730 Table A.1 writes −x < PMV < +x). */
  strict: boolean;
}

export interface ProblemPanel {
  id: string;
  label: string;
  roomId: string;
  mode: "heating" | "cooling";
  /** The layout's setting and the allowed range, degrees. */
  currentAngleDeg: number;
  minAngleDeg: number;
  maxAngleDeg: number;
  /** Candidate opening angles, degrees, increasing, all inside [minAngleDeg, maxAngleDeg]. */
  anglesDeg: number[];
  /** Output per candidate, W (heat delivered when heating, heat removed when cooling). */
  outputW: number[];
  currentOutputW: number;
}

/** What a seat sees of one louvered panel. */
export interface ProblemLink {
  /** Index into `LouverProblem.panels`. */
  panel: number;
  /** View factors of the seat's six plane elements to the panel (PLANE_DIRECTIONS order). */
  factors: number[];
  /** The panel's effective (T + 273.15)⁴ toward the seat per candidate angle, K⁴. */
  t4: number[];
  /** The same at the layout's current setting, K⁴. */
  currentT4: number;
}

export interface ProblemSeat {
  id: string;
  label: string;
  roomId: string;
  zoneIds: string[];
  /** Every zone target the seat has to meet. */
  constraints: PmvConstraint[];
  /** Σ F·T⁴ over the surfaces that are not active louvered panels, per plane, K⁴. */
  baseT4: number[];
  /** Σ F over all surfaces, per plane. */
  factorSum: number[];
  /** ISO 7726 Annex C projected-area weight of each plane, summing to 1. */
  planeWeights: number[];
  links: ProblemLink[];
  /** PMV inputs that do not depend on the louvers: air °C, air speed m/s, RH %, met, clo. */
  pmv: { ta: number; vr: number; rh: number; met: number; clo: number };
}

export interface ProblemRoom {
  id: string;
  name: string;
  /** Indices into `panels` (the room's active louvered panels) and `seats` (its target seats). */
  panels: number[];
  seats: number[];
}

/** The whole problem: rooms are separate enclosures, so each is optimised on its own. */
export interface LouverProblem {
  rooms: ProblemRoom[];
  panels: ProblemPanel[];
  seats: ProblemSeat[];
}

export interface LouverProblemOptions {
  /** Cavity tables by key (missing ones are built on the calling thread, see computeComfort). */
  louverTables?: Map<string, LouverTable>;
  /**
   * Seats to bring inside their zones' targets. Default: every seat inside at least one zone.
   * Seats listed here that lie in no zone have no target and are left out.
   */
  seatIds?: ReadonlyArray<string>;
}

/**
 * A zone target as a PMV interval: a band as given; a category as −x < PMV < +x with x the
 * classifier's limit (ISO 7730:2005 Annex A Table A.1 [1]).
 * @param zone the zone (its id is kept for reporting).
 * @param target the zone's target (PMV dimensionless, −3…3).
 * @returns the interval and whether its ends are strict.
 */
export function targetConstraint(zone: Readonly<Pick<Zone, "id">>, target: Readonly<ZoneTarget>): PmvConstraint {
  if (target.kind === "pmvBand") return { zoneId: zone.id, lo: target.minPmv, hi: target.maxPmv, strict: false };
  const limit = ISO7730_CATEGORY_LIMITS[target.category].pmvAbs;
  return { zoneId: zone.id, lo: -limit, hi: limit, strict: true };
}

function candidateAngles(table: Readonly<LouverTable>, minDeg: number, maxDeg: number): number[] {
  const angles = new Set<number>([minDeg, maxDeg]);
  for (const a of table.anglesDeg) if (a > minDeg && a < maxDeg) angles.add(a);
  return [...angles].sort((a, b) => a - b);
}

function outputAt(l: Readonly<PreparedLouver>, angleDeg: number): number {
  const face = louverFaceEmissivityAt(l.table, angleDeg);
  return louveredPanelOutput({ ...l.outputInput, apparentEmissivity: Math.min(1, face.hemispherical) }).totalW;
}

function t4Of(temperatureC: number): number {
  const k = temperatureC + CELSIUS_TO_KELVIN_OFFSET_K;
  return k * k * k * k;
}

/**
 * Builds the optimisation problem of a layout under a scenario (see the file header).
 * @throws AppError('invalid_input') when the layout cannot be computed (as computeComfort).
 */
export function buildLouverProblem(layout: Layout, conditions: ScenarioConditions, options: LouverProblemOptions = {}): LouverProblem {
  const prepared = prepareComfortRooms(layout, conditions, options.louverTables ?? new Map());
  const wanted = options.seatIds ? new Set(options.seatIds) : null;
  const panels: ProblemPanel[] = [];
  const seats: ProblemSeat[] = [];
  const rooms: ProblemRoom[] = [];
  const louversOf = new Map<string, { louver: PreparedLouver; index: number }[]>();

  for (const room of layout.rooms) {
    const pr = prepared.get(room.id)!;
    const entry: ProblemRoom = { id: room.id, name: room.name, panels: [], seats: [] };
    const list: { louver: PreparedLouver; index: number }[] = [];
    for (const l of pr.louvers) {
      const louver = l.panel.louver!;
      const anglesDeg = candidateAngles(l.table, louver.minOpeningAngleDeg, louver.maxOpeningAngleDeg);
      const index = panels.length;
      panels.push({
        id: l.panel.id,
        label: l.panel.label,
        roomId: room.id,
        mode: l.panel.mode,
        currentAngleDeg: louver.openingAngleDeg,
        minAngleDeg: louver.minOpeningAngleDeg,
        maxAngleDeg: louver.maxOpeningAngleDeg,
        anglesDeg,
        outputW: anglesDeg.map((a) => outputAt(l, a)),
        currentOutputW: outputAt(l, louver.openingAngleDeg),
      });
      entry.panels.push(index);
      list.push({ louver: l, index });
    }
    louversOf.set(room.id, list);
    rooms.push(entry);
  }

  const roomIndex = new Map(rooms.map((r, i) => [r.id, i]));
  for (const seat of layout.seats) {
    if (wanted && !wanted.has(seat.id)) continue;
    const zones = layout.zones.filter((z) => pointInPolygon(seat.position, z.outline));
    if (zones.length === 0) continue;
    const roomId = roomOfSeat(layout, seat)!;
    const pr = prepared.get(roomId)!;
    seats.push(problemSeat(seat, roomId, zones, pr, louversOf.get(roomId)!, panels, conditions));
    rooms[roomIndex.get(roomId)!]!.seats.push(seats.length - 1);
  }
  return { rooms, panels, seats };
}

function problemSeat(
  seat: Readonly<Seat>,
  roomId: string,
  zones: ReadonlyArray<Zone>,
  room: Parameters<typeof seatPlaneFactors>[1],
  louvers: ReadonlyArray<{ louver: PreparedLouver; index: number }>,
  panels: ReadonlyArray<ProblemPanel>,
  c: ScenarioConditions,
): ProblemSeat {
  const { position, factors } = seatPlaneFactors(seat, room);
  const louverSurfaces = new Set(louvers.map((l) => l.louver.surfaceIndex));
  const baseT4: number[] = [];
  const factorSum: number[] = [];
  for (const dir of PLANE_DIRECTIONS) {
    const f = factors[dir];
    let base = 0;
    let sum = 0;
    for (let i = 0; i < f.length; i++) {
      sum += f[i]!;
      if (!louverSurfaces.has(i)) base += f[i]! * room.t4[i]!;
    }
    baseT4.push(base);
    factorSum.push(sum);
  }
  const w = ISO7726_PROJECTED_AREA_FACTORS[seat.posture];
  const total = 2 * (w.upDown + w.leftRight + w.frontBack);
  // PLANE_DIRECTIONS order: up, down, front, back, left, right.
  const planeWeights = [w.upDown, w.upDown, w.frontBack, w.frontBack, w.leftRight, w.leftRight].map((x) => x / total);
  const links: ProblemLink[] = [];
  for (const { louver, index } of louvers) {
    const planeF = PLANE_DIRECTIONS.map((dir) => factors[dir][louver.surfaceIndex]!);
    if (planeF.every((f) => f === 0)) continue; // the seat does not see the panel
    const t4 = panels[index]!.anglesDeg.map((a) =>
      t4Of(louverTemperatureToward({ ...louver, face: louverFaceEmissivityAt(louver.table, a) }, position)),
    );
    links.push({ panel: index, factors: planeF, t4, currentT4: t4Of(louverTemperatureToward(louver, position)) });
  }
  return {
    id: seat.id,
    label: seat.label,
    roomId,
    zoneIds: zones.map((z) => z.id),
    constraints: zones.map((z) => targetConstraint(z, z.target)),
    baseT4,
    factorSum,
    planeWeights,
    links,
    pmv: { ta: c.airTemperatureC, vr: c.airSpeedMps, rh: c.relativeHumidityPercent, met: seat.met ?? c.defaultMet, clo: seat.clo ?? c.defaultClo },
  };
}
