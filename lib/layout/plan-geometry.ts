/**
 * Plan-geometry primitives (metres, plan coordinates of the layout), shared by the editor
 * (lib/plan) and the computation (lib/compute). Pure functions.
 */
import type { PlanPoint } from "@/lib/layout/schema";

export interface Bounds {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

/** Signed area of a plan polygon (shoelace), m²: positive for counter-clockwise corners. */
export function signedArea(outline: ReadonlyArray<PlanPoint>): number {
  let sum = 0;
  for (let i = 0; i < outline.length; i++) {
    const a = outline[i]!;
    const b = outline[(i + 1) % outline.length]!;
    sum += a.x * b.y - b.x * a.y;
  }
  return sum / 2;
}

export function polygonArea(outline: ReadonlyArray<PlanPoint>): number {
  return Math.abs(signedArea(outline));
}

/** Distance from point p to the segment a–b, m. */
export function distanceToSegment(p: PlanPoint, a: PlanPoint, b: PlanPoint): number {
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const len2 = dx * dx + dy * dy;
  const t = len2 === 0 ? 0 : Math.max(0, Math.min(1, ((p.x - a.x) * dx + (p.y - a.y) * dy) / len2));
  return Math.hypot(p.x - (a.x + t * dx), p.y - (a.y + t * dy));
}

/**
 * Point in polygon by ray casting (even–odd rule); a point within `toleranceM` of an edge counts
 * as inside (0: the ray test alone).
 */
export function pointInPolygon(p: PlanPoint, outline: ReadonlyArray<PlanPoint>, toleranceM = 1e-9): boolean {
  let inside = false;
  const n = outline.length;
  for (let i = 0, j = n - 1; i < n; j = i++) {
    const a = outline[i]!;
    const b = outline[j]!;
    if (toleranceM > 0 && distanceToSegment(p, a, b) <= toleranceM) return true;
    if (a.y > p.y !== b.y > p.y && p.x < ((b.x - a.x) * (p.y - a.y)) / (b.y - a.y) + a.x) inside = !inside;
  }
  return inside;
}

export function boundsOf(points: ReadonlyArray<PlanPoint>): Bounds {
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const p of points) {
    minX = Math.min(minX, p.x);
    minY = Math.min(minY, p.y);
    maxX = Math.max(maxX, p.x);
    maxY = Math.max(maxY, p.y);
  }
  return { minX, minY, maxX, maxY };
}
