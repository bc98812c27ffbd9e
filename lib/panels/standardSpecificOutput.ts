/**
 * Specific thermal output of embedded surface heating/cooling from the standard total
 * heat exchange coefficients (EN 1264-5 / ISO 11855-2).
 */
import { assertFinite, assertMode, assertOrientation } from "./assert";
import type { PanelMode, PanelOrientation } from "./types";

/** Total (radiant + convective) surface-to-room exchange law q = a·Δθ^n. */
export interface SurfaceExchangeLaw {
  /** Coefficient a, W/(m²·K^n). */
  coefficient: number;
  /** Exponent n, dimensionless. */
  exponent: number;
}

/**
 * Standard total heat exchange laws between an embedded heating/cooling surface and the
 * room, EN 1264-5 and ISO 11855-2 [1][2] (values from memory): floor heating
 * q = 8.92·Δθ^1.1; wall heating and wall cooling 8 W/(m²K); ceiling heating 6 W/(m²K);
 * floor cooling 7 W/(m²K); ceiling cooling 10.8 W/(m²K). Δθ is the mean surface
 * temperature minus the room (design operative) temperature for heating, and the reverse
 * for cooling.
 */
export const STANDARD_SURFACE_EXCHANGE: Readonly<
  Record<PanelMode, Readonly<Record<PanelOrientation, Readonly<SurfaceExchangeLaw>>>>
> = {
  heating: {
    floor: { coefficient: 8.92, exponent: 1.1 },
    wall: { coefficient: 8, exponent: 1 },
    ceiling: { coefficient: 6, exponent: 1 },
  },
  cooling: {
    floor: { coefficient: 7, exponent: 1 },
    wall: { coefficient: 8, exponent: 1 },
    ceiling: { coefficient: 10.8, exponent: 1 },
  },
};

/** Input of {@link standardSpecificOutput}. */
export interface StandardSpecificOutputInput {
  /** Surface the system is embedded in. */
  orientation: PanelOrientation;
  /** Operating mode (sets the sign convention of the result). */
  mode: PanelMode;
  /** Mean surface temperature θ_S,m, °C. */
  surfaceC: number;
  /** Room (design indoor, operative) temperature θ_i, °C. */
  roomC: number;
}

/**
 * Specific thermal output, W/m² of active surface, from the standard total heat exchange
 * laws of EN 1264-5 / ISO 11855-2 [1][2] ({@link STANDARD_SURFACE_EXCHANGE}):
 * q = a · sign(Δθ)·|Δθ|^n with Δθ = θ_S,m − θ_i (heating) or θ_i − θ_S,m (cooling).
 * Heating output is positive heat into the room, cooling output positive cooling capacity;
 * a surface on the wrong side of the room temperature gives a negative value.
 *
 * @param input orientation, mode, surfaceC °C (finite), roomC °C (finite).
 * @returns specific output, W/m².
 * @throws RangeError for an unknown orientation/mode or non-finite temperatures.
 */
export function standardSpecificOutput(input: Readonly<StandardSpecificOutputInput>): number {
  assertOrientation(input.orientation);
  assertMode(input.mode);
  assertFinite(input.surfaceC, "surfaceC");
  assertFinite(input.roomC, "roomC");
  const law = STANDARD_SURFACE_EXCHANGE[input.mode][input.orientation];
  const delta = input.mode === "heating" ? input.surfaceC - input.roomC : input.roomC - input.surfaceC;
  const magnitude = law.exponent === 1 ? Math.abs(delta) : Math.pow(Math.abs(delta), law.exponent);
  return law.coefficient * (delta < 0 ? -magnitude : magnitude);
}
