/**
 * Inside surface temperature of a building element from its U-value.
 *
 * Method: in steady state the heat flux through the element is q = U·(t_i − t_e) and the
 * same flux crosses the inside surface resistance, so
 *
 *   t_si = t_i − U·R_si·(t_i − t_e)                         (ISO 6946:2017, clause 6 and Annex A)
 *
 * with the conventional inside surface resistances of ISO 6946:2017 Table 7:
 * R_si = 0.10 m²K/W for upward heat flow, 0.13 for horizontal flow (walls, windows, within
 * ±30° of the horizontal) and 0.17 for downward flow.
 */

/** ISO 6946:2017 Table 7, inside surface resistance, m²K/W. */
export const R_SI_UPWARD_M2K_W = 0.1;
export const R_SI_HORIZONTAL_M2K_W = 0.13;
export const R_SI_DOWNWARD_M2K_W = 0.17;

/** Where the element sits: sets the direction of heat flow through it. */
export type ElementPosition = "wall" | "opening" | "ceiling" | "floor";

/**
 * Inside surface resistance for an element and the direction of heat flow (from the warmer
 * to the colder side): walls and openings horizontal; a ceiling with the room warmer than the
 * far side passes heat upward, a floor downward, and the reverse when the room is colder.
 */
export function insideSurfaceResistance(position: ElementPosition, insideC: number, outsideC: number): number {
  if (position === "wall" || position === "opening") return R_SI_HORIZONTAL_M2K_W;
  const roomWarmer = insideC >= outsideC;
  if (position === "ceiling") return roomWarmer ? R_SI_UPWARD_M2K_W : R_SI_DOWNWARD_M2K_W;
  return roomWarmer ? R_SI_DOWNWARD_M2K_W : R_SI_UPWARD_M2K_W;
}

export interface InsideSurfaceTemperatureInput {
  /** Thermal transmittance of the element, W/(m²K), > 0. */
  uValueWm2K: number;
  /** Inside (room air) temperature t_i, °C. */
  insideC: number;
  /** Temperature on the far side t_e, °C (outdoor design temperature). */
  outsideC: number;
  position: ElementPosition;
}

/**
 * t_si = t_i − U·R_si·(t_i − t_e), ISO 6946:2017 (see the file comment). U·R_si is capped at
 * 1: a U-value above 1/R_si is not physical (U includes R_si) and would put the surface
 * beyond the outdoor temperature.
 *
 * @returns inside surface temperature, °C.
 * @throws RangeError for a non-positive or non-finite U-value or non-finite temperatures.
 */
export function insideSurfaceTemperature(input: Readonly<InsideSurfaceTemperatureInput>): number {
  const { uValueWm2K, insideC, outsideC, position } = input;
  if (!(uValueWm2K > 0) || !Number.isFinite(uValueWm2K)) throw new RangeError("uValueWm2K must be finite and > 0");
  if (!Number.isFinite(insideC) || !Number.isFinite(outsideC)) throw new RangeError("temperatures must be finite");
  const rsi = insideSurfaceResistance(position, insideC, outsideC);
  const fraction = Math.min(1, uValueWm2K * rsi);
  return insideC - fraction * (insideC - outsideC);
}
