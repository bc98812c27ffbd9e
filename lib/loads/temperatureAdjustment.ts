/**
 * Temperature adjustment (correction) factors of envelope elements.
 */
import { assertFinite, assertTemperatureC } from "./assert";
import type { EnvelopeSurface, SurfaceAdjacency } from "./types";

/**
 * Default temperature correction factors f_k of the EN 12831:2003 simplified method,
 * clause 9 (thermal bridges insulated; values from memory) [1]: to the exterior 1.00,
 * through an unheated space 0.80, through the ground 0.30. "heated" (an adjoining room heated
 * to the same temperature) has no temperature difference and so 0 — give `adjacentC` or an
 * explicit factor when the neighbour is kept at another temperature.
 */
export const HEATING_ADJUSTMENT_FACTORS: Readonly<Record<SurfaceAdjacency, number>> = {
  outdoor: 1,
  unheated: 0.8,
  ground: 0.3,
  heated: 0,
};

/**
 * Default adjustment factors for the summer sensible gain: the same b-factors as in winter
 * (EN ISO 13789 coefficients apply to heat loss and heat gain alike [2]), except the ground,
 * whose gain is neglected (ASHRAE Fundamentals ch. 18 practice for slab-on-grade floors,
 * from memory) [3].
 */
export const COOLING_ADJUSTMENT_FACTORS: Readonly<Record<SurfaceAdjacency, number>> = {
  outdoor: 1,
  unheated: 0.8,
  ground: 0,
  heated: 0,
};

/**
 * Adjustment factor of a boundary at a known temperature,
 * b = (θ_int − θ_adj)/(θ_int − θ_e) (EN ISO 13789 [2]; EN 12831 [1] uses the same form).
 *
 * @param indoorC   design indoor temperature θ_int, °C (> −273.15).
 * @param adjacentC temperature on the other side θ_adj, °C (> −273.15).
 * @param outdoorC  design outdoor temperature θ_e, °C (> −273.15).
 * @returns b, dimensionless; NaN when θ_int = θ_e (no design difference to scale by).
 * @throws RangeError for non-finite or sub-absolute-zero temperatures.
 */
export function adjustmentFactorForTemperature(indoorC: number, adjacentC: number, outdoorC: number): number {
  assertTemperatureC(indoorC, "indoorC");
  assertTemperatureC(adjacentC, "adjacentC");
  assertTemperatureC(outdoorC, "outdoorC");
  const design = indoorC - outdoorC;
  return design === 0 ? Number.NaN : (indoorC - adjacentC) / design;
}

/**
 * The factor used for one element: its explicit `adjustmentFactor`, else the b-factor of its
 * `adjacentC`, else the default of its adjacency from `defaults` [1][2].
 *
 * @param surface  envelope element (adjustmentFactor finite; adjacentC °C).
 * @param indoorC  indoor temperature, °C.
 * @param outdoorC outdoor temperature, °C.
 * @param defaults default factors per adjacency.
 * @returns factor, dimensionless; NaN only when `adjacentC` is given and θ_int = θ_e.
 * @throws RangeError for a non-finite factor or temperature, or an unknown adjacency.
 */
export function surfaceAdjustmentFactor(
  surface: Readonly<EnvelopeSurface>,
  indoorC: number,
  outdoorC: number,
  defaults: Readonly<Record<SurfaceAdjacency, number>>,
): number {
  if (surface.adjustmentFactor !== undefined) {
    assertFinite(surface.adjustmentFactor, "adjustmentFactor");
    return surface.adjustmentFactor;
  }
  if (surface.adjacentC !== undefined) {
    return adjustmentFactorForTemperature(indoorC, surface.adjacentC, outdoorC);
  }
  const f = defaults[surface.adjacent];
  if (f === undefined) {
    throw new RangeError(`adjacent must be "outdoor", "ground", "unheated" or "heated", got ${String(surface.adjacent)}`);
  }
  return f;
}
