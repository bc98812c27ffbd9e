/**
 * Solar heat gain through glazing.
 */
import { assertNonNegative, assertUnitInterval } from "./assert";

/** One glazed element exposed to the sun. */
export interface GlazingSolarInput {
  /** Glazed area A, m², ≥ 0. */
  areaM2: number;
  /** Total solar energy transmittance g (g-value, SHGC), dimensionless, 0…1. */
  gValue: number;
  /** Solar irradiance on the glazing plane I_sol, W/m², ≥ 0 (given by the caller). */
  irradianceWm2: number;
  /** Shading reduction factor F_sh, dimensionless, 0…1; default 1 (unshaded). */
  shadingFactor?: number;
}

/**
 * Solar heat gain Φ_sol = Σ F_sh·g·A·I_sol, W (EN ISO 13790:2008 clause 11.3 form, frame
 * and sky-radiation terms omitted; clause number from memory) [5]. Counted as an instantaneous
 * sensible gain (no storage).
 *
 * @param glazing glazed elements (areaM2 ≥ 0, gValue 0…1, irradianceWm2 ≥ 0, shadingFactor 0…1).
 * @returns solar gain, W (0 for an empty list).
 * @throws RangeError for negative/non-finite values or factors outside 0…1.
 */
export function solarGainW(glazing: ReadonlyArray<Readonly<GlazingSolarInput>>): number {
  let sum = 0;
  for (let i = 0; i < glazing.length; i++) {
    const g = glazing[i] as Readonly<GlazingSolarInput>;
    assertNonNegative(g.areaM2, `glazing[${i}].areaM2`);
    assertUnitInterval(g.gValue, `glazing[${i}].gValue`);
    assertNonNegative(g.irradianceWm2, `glazing[${i}].irradianceWm2`);
    const fsh = g.shadingFactor ?? 1;
    assertUnitInterval(fsh, `glazing[${i}].shadingFactor`);
    sum += fsh * g.gValue * g.areaM2 * g.irradianceWm2;
  }
  return sum;
}
