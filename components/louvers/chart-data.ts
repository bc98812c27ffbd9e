/**
 * Pure shaping of the louver screens' data for tables and charts (no React, no fetching), so
 * each step can be unit-tested: target bands, before/after rows per zone, all-open totals,
 * the polar plot of a louver setting's directional emission, and the PMV sweep rows.
 */
import { ISO7730_CATEGORY_LIMITS } from "@/lib/comfort/classifySeat";
import type { Layout, ZoneTarget } from "@/lib/layout/schema";
import { pointInPolygon } from "@/lib/plan/geometry";
import { GROOVE_BIN_WIDTH_DEG, GROOVE_DIRECTIONAL_BINS } from "@/lib/viewfactor/groove-bins";

/** A PMV interval; `strict` when the limits themselves are outside (ISO 7730 categories). */
export interface PmvBand {
  min: number;
  max: number;
  strict: boolean;
}

/** The PMV band a zone target asks for: a band as given, a category as −x < PMV < +x (ISO 7730 Table A.1). */
export function targetBand(target: Readonly<ZoneTarget>): PmvBand {
  if (target.kind === "pmvBand") return { min: target.minPmv, max: target.maxPmv, strict: false };
  const limit = ISO7730_CATEGORY_LIMITS[target.category].pmvAbs;
  return { min: -limit, max: limit, strict: true };
}

/** Text of a band for captions: "−0.20 … +0.40" (category: "category B, |PMV| < 0.5"). */
export function bandText(target: Readonly<ZoneTarget>): string {
  if (target.kind === "category") return `category ${target.category}, |PMV| < ${ISO7730_CATEGORY_LIMITS[target.category].pmvAbs}`;
  const f = (v: number) => (v > 0 ? `+${v.toFixed(2)}` : v.toFixed(2));
  return `${f(target.minPmv)} … ${f(target.maxPmv)}`;
}

export function inBand(pmv: number, band: Readonly<PmvBand>): boolean {
  return band.strict ? pmv > band.min && pmv < band.max : pmv >= band.min && pmv <= band.max;
}

/** What the optimiser answers (docs/api.md); the extra fields are read when the server gives them. */
export interface OptimisedPanelView {
  id: string;
  openingAngleDeg: number;
  outputW: number;
  label?: string;
  previousAngleDeg?: number;
  previousOutputW?: number;
  minAngleDeg?: number;
  maxAngleDeg?: number;
}
export interface OptimisedSeatView {
  id: string;
  pmvBefore: number;
  pmvAfter: number;
  inTarget: boolean;
  label?: string;
  zoneIds?: string[];
  inTargetBefore?: boolean;
}
export interface OptimiseResultView {
  panels: OptimisedPanelView[];
  seats: OptimisedSeatView[];
  unreachable: { seatId: string; reason: string; code?: string }[];
  totalOutputW: number;
  totalOutputBeforeW?: number;
  /** The head revision the settings were computed on. */
  revision?: number;
  /** Which seats were targeted: those with an occupant assigned, or every seat inside a zone. */
  seatSelection?: "occupied" | "zones";
}

export interface BeforeAfterSeat {
  id: string;
  label: string;
  pmvBefore: number;
  pmvAfter: number;
  inTarget: boolean;
  inTargetBefore: boolean;
  /** Why the optimiser could not bring it inside, if it could not. */
  unreachable: string | null;
}

export interface BeforeAfterZone {
  zoneId: string;
  name: string;
  target: ZoneTarget;
  band: PmvBand;
  seats: BeforeAfterSeat[];
}

/**
 * The optimiser's seats grouped by the layout's zones (layout order; a seat in two zones is
 * listed under both), each with its label and the zone's band. Seats the layout no longer has
 * are skipped. "In target before" is the server's flag when given, else the band test of the
 * seat's zones.
 */
export function beforeAfterByZone(result: Readonly<OptimiseResultView>, layout: Readonly<Layout>): BeforeAfterZone[] {
  const seatsById = new Map(layout.seats.map((s) => [s.id, s]));
  const reasons = new Map(result.unreachable.map((u) => [u.seatId, u.reason]));
  const zonesOfSeat = (seatId: string, given: string[] | undefined): string[] => {
    if (given) return given;
    const seat = seatsById.get(seatId);
    return seat ? layout.zones.filter((z) => pointInPolygon(seat.position, z.outline)).map((z) => z.id) : [];
  };
  const bands = new Map(layout.zones.map((z) => [z.id, targetBand(z.target)]));
  const rows = result.seats
    .filter((s) => seatsById.has(s.id))
    .map((s) => {
      const zoneIds = zonesOfSeat(s.id, s.zoneIds);
      const before = s.inTargetBefore ?? zoneIds.every((z) => (bands.get(z) ? inBand(s.pmvBefore, bands.get(z)!) : true));
      return {
        zoneIds,
        seat: {
          id: s.id,
          label: s.label ?? seatsById.get(s.id)!.label,
          pmvBefore: s.pmvBefore,
          pmvAfter: s.pmvAfter,
          inTarget: s.inTarget,
          inTargetBefore: before,
          unreachable: reasons.get(s.id) ?? null,
        } satisfies BeforeAfterSeat,
      };
    });
  return layout.zones
    .map((z) => ({
      zoneId: z.id,
      name: z.name,
      target: z.target,
      band: bands.get(z.id)!,
      seats: rows.filter((r) => r.zoneIds.includes(z.id)).map((r) => r.seat),
    }))
    .filter((z) => z.seats.length > 0);
}

/** Output points of one panel as the performance API gives them. */
export interface CurvePoint {
  openingAngleDeg: number | null;
  totalW: number;
  radiantW: number;
  convectiveW: number;
}

/**
 * Σ output of the given panels with their louvers fully open (the largest allowed angle = the
 * last curve point, whose angles increase); a panel without louver adds its one point. Panels
 * missing from `curves` are skipped and counted in `missing`.
 */
export function allOpenTotalW(panelIds: readonly string[], curves: ReadonlyMap<string, readonly CurvePoint[]>): { totalW: number; missing: number } {
  let totalW = 0;
  let missing = 0;
  for (const id of panelIds) {
    const curve = curves.get(id);
    const last = curve?.[curve.length - 1];
    if (!last) missing += 1;
    else totalW += last.totalW;
  }
  return { totalW, missing };
}

/** One point of the polar plot in plot coordinates (x across the grooves, y along the face normal). */
export interface PolarPoint {
  /** In-plane exit angle from the face normal, degrees, −90…+90. */
  angleDeg: number;
  /** Radiant intensity relative to a black flat face: ε(θ)·cos θ. */
  intensity: number;
  x: number;
  y: number;
}

const RAD = Math.PI / 180;

function polarPoint(angleDeg: number, intensity: number): PolarPoint {
  return { angleDeg, intensity, x: intensity * Math.sin(angleDeg * RAD), y: intensity * Math.cos(angleDeg * RAD) };
}

/**
 * The directional emission of a louver setting for a polar plot: the 9 folded 10° bins
 * (0–10°, …, 80–90° from the normal, as tabulated) taken at their centres and mirrored to
 * −85…+85° (the cavity is symmetric about its bisector), closed by the two grazing points
 * (±90°, intensity 0). Intensity in a direction θ is the directional emissivity times cos θ
 * (Lambert's law for the projected area), so a flat face of emissivity ε draws ε·cos θ — a
 * circle through the origin.
 * @param directional 9 directional emissivities (dimensionless, 0…1), e.g. `louverFaceEmissivityAt(…).directional`.
 * @throws RangeError unless there are exactly 9 finite values.
 */
export function polarEmission(directional: readonly number[]): PolarPoint[] {
  if (directional.length !== GROOVE_DIRECTIONAL_BINS || directional.some((v) => !Number.isFinite(v))) {
    throw new RangeError(`directional must hold ${GROOVE_DIRECTIONAL_BINS} finite values`);
  }
  const centres = directional.map((_, k) => (k + 0.5) * GROOVE_BIN_WIDTH_DEG);
  const right = centres.map((deg, k) => polarPoint(deg, directional[k]! * Math.cos(deg * RAD)));
  const left = centres.map((deg, k) => polarPoint(-deg, directional[k]! * Math.cos(deg * RAD))).reverse();
  return [polarPoint(-90, 0), ...left, ...right, polarPoint(90, 0)];
}

/** A flat (Lambert) face of emissivity ε on the same angles as {@link polarEmission}. */
export function polarLambert(emissivity: number): PolarPoint[] {
  return polarEmission(new Array<number>(GROOVE_DIRECTIONAL_BINS).fill(emissivity));
}

/** Quarter, half, three-quarter and full rings of a polar plot scaled to `radius`, each as a half circle of points. */
export function polarRings(radius: number, steps = 36): { level: number; points: { x: number; y: number }[] }[] {
  return [0.25, 0.5, 0.75, 1].map((f) => ({
    level: f * radius,
    points: Array.from({ length: steps + 1 }, (_, i) => {
      const a = -90 + (180 * i) / steps;
      return { x: f * radius * Math.sin(a * RAD), y: f * radius * Math.cos(a * RAD) };
    }),
  }));
}

/** The sweep route's answer. */
export interface SweepView {
  anglesDeg: number[];
  seats: { id: string; label: string; pmv: number[] }[];
}

/** Rows for a line chart: one per angle, a key per seat id holding its PMV. */
export function sweepRows(sweep: Readonly<SweepView>): Array<Record<string, number>> {
  return sweep.anglesDeg.map((angle, i) => {
    const row: Record<string, number> = { angle };
    for (const s of sweep.seats) {
      const v = s.pmv[i];
      if (v !== undefined && Number.isFinite(v)) row[s.id] = v;
    }
    return row;
  });
}

/** Turndown text: "3.15 : 1", or a dash when there is nothing to turn down. */
export function turndownText(ratio: number | null | undefined): string {
  return ratio === null || ratio === undefined || !Number.isFinite(ratio) ? "—" : `${ratio.toFixed(2)} : 1`;
}
