/**
 * Local discomfort caused by warm or cool floors, ISO 7730:2005 clause 6.4.
 */
import { assertFinite } from "./assert";

/**
 * Percentage dissatisfied due to the floor surface temperature (people wearing light indoor
 * shoes), ISO 7730:2005 clause 6.4, equation (8) [1]:
 * PD = 100 − 94·exp(−1.387 + 0.118·t_f − 0.0025·t_f²). Minimum ≈ 5.5 % near 23.6 °C; the
 * value is always below 100 %. No validity range is stated with the equation (from memory),
 * so no flag is returned.
 *
 * Note: with this equation PD < 10 % holds for about 19.2…28.0 °C, while ISO 7730:2005
 * Table A.4 lists 19…29 °C for categories A and B; {@link classifySeat} uses the PD limits
 * of Table A.1.
 *
 * @param floorC floor surface temperature, °C, finite.
 * @returns PD, %.
 * @throws RangeError if floorC is non-finite.
 */
export function floorTemperatureDissatisfied(floorC: number): number {
  assertFinite(floorC, "floorC");
  return 100 - 94 * Math.exp(-1.387 + 0.118 * floorC - 0.0025 * floorC * floorC);
}
