/**
 * Seatwise's own diverging comfort palette: cool blue below PMV 0, a pale neutral around 0,
 * warm orange above. Used for heatmap cells, seat markers and the legend alike.
 */
const COOL: readonly [number, number, number] = [38, 99, 168];
const NEUTRAL: readonly [number, number, number] = [236, 238, 228];
const WARM: readonly [number, number, number] = [214, 98, 28];

export const PMV_LEGEND_TICKS = [-3, -2, -1, 0, 1, 2, 3] as const;

function mix(a: readonly number[], b: readonly number[], t: number): string {
  const c = a.map((v, i) => Math.round(v + (b[i]! - v) * t));
  return `rgb(${c[0]}, ${c[1]}, ${c[2]})`;
}

/** Colour for a PMV value; values beyond ±3 take the end colours. */
export function pmvColour(pmv: number): string {
  if (!Number.isFinite(pmv)) return "rgb(200, 200, 200)";
  const t = Math.max(-3, Math.min(3, pmv)) / 3;
  return t < 0 ? mix(NEUTRAL, COOL, -t) : mix(NEUTRAL, WARM, t);
}

export interface MrtScale {
  midC: number;
  /** Temperature difference drawn at full colour, K. */
  spanK: number;
}

/** A symmetric MRT scale around the middle of the values given (at least ±2 K). */
export function mrtScale(values: readonly (number | null)[]): MrtScale {
  const finite = values.filter((v): v is number => v !== null && Number.isFinite(v));
  if (finite.length === 0) return { midC: 20, spanK: 2 };
  const min = Math.min(...finite);
  const max = Math.max(...finite);
  return { midC: (min + max) / 2, spanK: Math.max(2, (max - min) / 2) };
}

export function mrtColour(mrtC: number, scale: MrtScale): string {
  return pmvColour(((mrtC - scale.midC) / scale.spanK) * 3);
}

/** "+0.4" / "−1.2" / "0.0": PMV rounded to 0.1 with a real minus sign. */
export function formatPmv(pmv: number): string {
  if (!Number.isFinite(pmv)) return "—";
  // Half away from zero, so −1.25 and +1.25 round alike.
  const r = (Math.sign(pmv) * Math.round(Math.abs(pmv) * 10)) / 10;
  if (r === 0) return "0.0";
  return `${r > 0 ? "+" : "−"}${Math.abs(r).toFixed(1)}`;
}
