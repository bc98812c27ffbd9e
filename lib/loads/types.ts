/**
 * Shared types of the room load functions.
 */

/** Building element kind (informational; every kind uses the same U·A law). */
export type SurfaceKind = "wall" | "window" | "door" | "roof" | "ceiling" | "floor";

/** What lies on the other side of an envelope element. */
export type SurfaceAdjacency = "outdoor" | "ground" | "unheated" | "heated";

/** One envelope element of a room. */
export interface EnvelopeSurface {
  /** Element kind. */
  kind: SurfaceKind;
  /** Area A_k, m², ≥ 0 (net area: a window's area belongs to the window, not the wall). */
  areaM2: number;
  /** Thermal transmittance U_k, W/(m²·K), ≥ 0. */
  uValueWm2K: number;
  /** Boundary on the other side. */
  adjacent: SurfaceAdjacency;
  /**
   * Temperature adjustment (correction) factor f_k, dimensionless, finite (usually 0…1.4);
   * overrides both the default of the adjacency and `adjacentC`.
   */
  adjustmentFactor?: number;
  /**
   * Known temperature on the other side, °C; when given (and no `adjustmentFactor`), the
   * factor is (θ_int − θ_adj)/(θ_int − θ_e) (EN ISO 13789 b-factor) [2].
   */
  adjacentC?: number;
}

/** Per-element result of a transmission calculation. */
export interface SurfaceTransmission {
  /** Element kind. */
  kind: SurfaceKind;
  /** Boundary on the other side. */
  adjacent: SurfaceAdjacency;
  /** Adjustment factor used, dimensionless. */
  adjustmentFactor: number;
  /** Heat transfer coefficient f_k·A_k·U_k, W/K. */
  heatTransferCoefficientWK: number;
  /**
   * Heat flow, W: loss from the room for the heat loss function (positive = heat leaves),
   * gain into the room for the cooling load function (positive = heat enters).
   */
  heatFlowW: number;
}
