/**
 * Steady-state transmission through the envelope elements of a room.
 */
import { assertNonNegative, assertTemperatureC } from "./assert";
import { surfaceAdjustmentFactor } from "./temperatureAdjustment";
import type { EnvelopeSurface, SurfaceAdjacency, SurfaceKind, SurfaceTransmission } from "./types";

const KINDS: ReadonlySet<string> = new Set<SurfaceKind>(["wall", "window", "door", "roof", "ceiling", "floor"]);

/** Which way the heat flow is reported. */
export type TransmissionDirection = "loss" | "gain";

/**
 * Transmission heat flow through each element, Φ_k = f_k·A_k·U_k·(θ_int − θ_e) (EN 12831:2003
 * clause 9 [1], EN ISO 13789 [2]) — or A_k·U_k·(θ_int − θ_adj) when the element's `adjacentC`
 * is known — reported as a loss (positive = heat leaves the room) or as a gain (the negative:
 * positive = heat enters; ASHRAE Fundamentals ch. 18 conduction q = U·A·Δt [3]).
 *
 * @param surfaces  envelope elements (areaM2 ≥ 0, uValueWm2K ≥ 0, known kind and adjacency).
 * @param indoorC   indoor design temperature, °C (> −273.15).
 * @param outdoorC  outdoor design temperature, °C (> −273.15).
 * @param defaults  default adjustment factors per adjacency.
 * @param direction "loss" (heating) or "gain" (cooling).
 * @returns per-element results in input order (factor and W/K are NaN only for an element with
 *          `adjacentC` when θ_int = θ_e; its heat flow stays defined).
 * @throws RangeError for an unknown kind/adjacency, a negative or non-finite area or U-value,
 *         or non-finite temperatures/factors.
 */
export function surfaceTransmissions(
  surfaces: ReadonlyArray<Readonly<EnvelopeSurface>>,
  indoorC: number,
  outdoorC: number,
  defaults: Readonly<Record<SurfaceAdjacency, number>>,
  direction: TransmissionDirection,
): SurfaceTransmission[] {
  assertTemperatureC(indoorC, "indoorC");
  assertTemperatureC(outdoorC, "outdoorC");
  const sign = direction === "loss" ? 1 : -1;
  const out: SurfaceTransmission[] = new Array<SurfaceTransmission>(surfaces.length);
  for (let i = 0; i < surfaces.length; i++) {
    const s = surfaces[i] as Readonly<EnvelopeSurface>;
    if (!KINDS.has(s.kind)) {
      throw new RangeError(`surfaces[${i}].kind must be wall, window, door, roof, ceiling or floor, got ${String(s.kind)}`);
    }
    assertNonNegative(s.areaM2, `surfaces[${i}].areaM2`);
    assertNonNegative(s.uValueWm2K, `surfaces[${i}].uValueWm2K`);
    const f = surfaceAdjustmentFactor(s, indoorC, outdoorC, defaults);
    const au = s.areaM2 * s.uValueWm2K;
    const h = f * au;
    const loss =
      s.adjustmentFactor === undefined && s.adjacentC !== undefined ? au * (indoorC - s.adjacentC) : h * (indoorC - outdoorC);
    out[i] = { kind: s.kind, adjacent: s.adjacent, adjustmentFactor: f, heatTransferCoefficientWK: h, heatFlowW: sign * loss };
  }
  return out;
}
