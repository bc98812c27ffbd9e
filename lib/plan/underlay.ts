/** The floor-plan image under the plan: its placement in plan metres. */
import type { Layout, PlanPoint } from "@/lib/layout/schema";
import { distance } from "@/lib/plan/geometry";

export type Underlay = NonNullable<Layout["underlay"]>;

/** A fresh underlay: 1 px = 2 cm until calibrated, top-left corner at the plan origin. */
export function newUnderlay(imageId: string): Underlay {
  return { imageId, metresPerPixel: 0.02, origin: { x: 0, y: 0 }, opacity: 0.5, visible: true };
}

/**
 * Rescales the underlay so that the points `a` and `b` (plan metres, as currently drawn) lie
 * `realDistanceM` apart; `a` stays where it is.
 */
export function calibrateUnderlay(underlay: Underlay, a: PlanPoint, b: PlanPoint, realDistanceM: number): Underlay {
  const drawn = distance(a, b);
  if (!(drawn > 0) || !(realDistanceM > 0) || !Number.isFinite(realDistanceM)) throw new RangeError("two distinct points and a positive distance are needed");
  const ratio = realDistanceM / drawn;
  return {
    ...underlay,
    metresPerPixel: underlay.metresPerPixel * ratio,
    origin: { x: a.x + (underlay.origin.x - a.x) * ratio, y: a.y + (underlay.origin.y - a.y) * ratio },
  };
}
