/** Grid snapping in plan metres. */
import type { PlanPoint } from "@/lib/layout/schema";

export interface GridSettings {
  enabled: boolean;
  /** Grid spacing, m. */
  sizeM: number;
}

export const GRID_SIZES_M = [0.05, 0.1, 0.25, 0.5, 1] as const;
export const DEFAULT_GRID: GridSettings = { enabled: true, sizeM: 0.25 };

/** Rounds away float noise (0.1 + 0.2) so snapped values save as the numbers people typed. */
function clean(value: number): number {
  // `|| 0` turns -0 into 0.
  return Math.round(value * 1e6) / 1e6 || 0;
}

export function snapValue(value: number, grid: GridSettings): number {
  if (!grid.enabled || grid.sizeM <= 0) return value;
  return clean(Math.round(value / grid.sizeM) * grid.sizeM);
}

export function snapPoint(p: PlanPoint, grid: GridSettings): PlanPoint {
  return { x: snapValue(p.x, grid), y: snapValue(p.y, grid) };
}

/**
 * The move that lands `anchor` (the dragged element's reference point) on the grid after a raw
 * drag of (dx, dy): the others in a multi-selection move by the same amount.
 */
export function snapDelta(anchor: PlanPoint, dx: number, dy: number, grid: GridSettings): PlanPoint {
  if (!grid.enabled) return { x: dx, y: dy };
  const target = snapPoint({ x: anchor.x + dx, y: anchor.y + dy }, grid);
  return { x: clean(target.x - anchor.x), y: clean(target.y - anchor.y) };
}
