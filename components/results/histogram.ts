/**
 * PMV distribution per zone: fixed-width bins aligned on multiples of the width, so the bins of
 * every zone line up and can share one axis.
 */
import type { ZoneTarget } from "@/lib/layout/schema";

export interface HistogramBin {
  /** Inclusive lower edge. */
  start: number;
  /** Exclusive upper edge (the last bin includes it). */
  end: number;
  /** "-0.50…-0.25". */
  label: string;
  count: number;
}

/** Smallest and largest bin width the chart offers (PMV units). */
export const MIN_BIN_WIDTH = 0.1;
export const MAX_BIN_WIDTH = 0.25;

const EPS = 1e-9;

function fmt(v: number): string {
  return (Object.is(v, -0) ? 0 : v).toFixed(2);
}

/** The edges covering `lo`…`hi` (and the extra range given) in steps of `width`. */
export function binEdges(lo: number, hi: number, width: number): number[] {
  if (!(width >= MIN_BIN_WIDTH - EPS && width <= MAX_BIN_WIDTH + EPS)) {
    throw new RangeError(`bin width ${width} is outside ${MIN_BIN_WIDTH}…${MAX_BIN_WIDTH}`);
  }
  if (!Number.isFinite(lo) || !Number.isFinite(hi) || lo > hi) throw new RangeError(`bad range ${lo}…${hi}`);
  const first = Math.floor(lo / width + EPS);
  let last = Math.ceil(hi / width - EPS);
  if (last <= first) last = first + 1;
  const edges: number[] = [];
  for (let i = first; i <= last; i += 1) edges.push(Number((i * width).toFixed(6)));
  return edges;
}

/** Counts `values` into bins on `edges`; a value on an inner edge goes to the bin above it. */
export function histogram(values: readonly number[], edges: readonly number[]): HistogramBin[] {
  const bins: HistogramBin[] = [];
  for (let i = 0; i + 1 < edges.length; i += 1) {
    const start = edges[i]!;
    const end = edges[i + 1]!;
    bins.push({ start, end, label: `${fmt(start)}…${fmt(end)}`, count: 0 });
  }
  if (bins.length === 0) return bins;
  const lo = bins[0]!.start;
  const hi = bins[bins.length - 1]!.end;
  const width = bins[0]!.end - bins[0]!.start;
  for (const v of values) {
    if (!Number.isFinite(v) || v > hi + EPS) continue;
    const index = Math.min(bins.length - 1, Math.floor((v - lo) / width + EPS));
    if (index < 0) continue;
    bins[index]!.count += 1;
  }
  return bins;
}

/** PMV band of an ISO 7730 category (Annex A, Table A.1) or the band a zone states. */
export function targetBand(target: ZoneTarget): { min: number; max: number } {
  if (target.kind === "pmvBand") return { min: target.minPmv, max: target.maxPmv };
  const half = { A: 0.2, B: 0.5, C: 0.7 }[target.category];
  return { min: -half, max: half };
}

export interface ZoneHistogram {
  zoneId: string;
  name: string;
  band: { min: number; max: number } | null;
  bins: HistogramBin[];
  /** Labels of the first and last bin overlapping the target band, for shading. */
  bandBins: { from: string; to: string } | null;
}

/**
 * One histogram per zone (plus one for seats in no zone when there are such seats), all on the
 * same edges, wide enough to show each zone's target band with a bin to spare on either side.
 */
export function zoneHistograms(
  seats: readonly { pmv: number; zoneIds: readonly string[] }[],
  zones: readonly { id: string; name: string; target: ZoneTarget }[],
  width: number,
): ZoneHistogram[] {
  const values = seats.map((s) => s.pmv).filter(Number.isFinite);
  const bands = zones.map((z) => targetBand(z.target));
  // One empty bin beyond the values and bands on each side, so the edges of the shaded band show.
  const lo = Math.min(...values, ...bands.map((b) => b.min), -0.5) - width;
  const hi = Math.max(...values, ...bands.map((b) => b.max), 0.5) + width;
  const edges = binEdges(lo, hi, width);
  const result: ZoneHistogram[] = zones.map((zone, i) => {
    const band = bands[i]!;
    const bins = histogram(
      seats.filter((s) => s.zoneIds.includes(zone.id)).map((s) => s.pmv),
      edges,
    );
    const inside = bins.filter((b) => b.end > band.min + EPS && b.start < band.max - EPS);
    return {
      zoneId: zone.id,
      name: zone.name,
      band,
      bins,
      bandBins: inside.length > 0 ? { from: inside[0]!.label, to: inside[inside.length - 1]!.label } : null,
    };
  });
  const loose = seats.filter((s) => s.zoneIds.length === 0);
  if (loose.length > 0) {
    result.push({ zoneId: "", name: "Seats in no zone", band: null, bins: histogram(loose.map((s) => s.pmv), edges), bandBins: null });
  }
  return result;
}
