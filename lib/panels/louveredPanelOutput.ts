/**
 * Output of a panel with an adjustable louver (V-groove) cavity, from its apparent emissivity.
 */
import { assertMode, assertOrientation, assertUnitInterval } from "./assert";
import {
  combinePanelFluxes,
  panelConvectionLengthM,
  panelConvectiveFlux,
  panelRadiantFlux,
  type PanelOutput,
  type PanelOutputInput,
} from "./panelOutput";

/** Input of {@link louveredPanelOutput}: the flat-panel input plus the opening's apparent emissivity. */
export interface LouveredPanelOutputInput extends PanelOutputInput {
  /**
   * Apparent (effective) emissivity of the louver opening, dimensionless, 0…1, e.g. from a
   * V-groove cavity model at the current louver angle. `emissivity` stays the flat surface's.
   */
  apparentEmissivity: number;
}

/** Louvered-panel output with the scaling applied to the radiant part. */
export interface LouveredPanelOutput extends PanelOutput {
  /** Apparent / flat emissivity, dimensionless (NaN when the flat emissivity is 0). */
  radiantScale: number;
  /** Radiant part the flat panel would give at the same temperatures, W/m². */
  flatRadiantWm2: number;
}

/**
 * Output of a louvered panel per m² of projected opening area. Assumptions (documented, not
 * from a standard): the opening exchanges radiation like a flat grey surface of the apparent
 * emissivity ε_a at the panel temperature, so the radiant part is the flat panel's scaled by
 * ε_a/ε (q_r = ε_a·σ·(T_p⁴ − AUST⁴), the apparent-emissivity concept of cavity radiation [8]);
 * the convective part is the flat panel's, unchanged (ASHRAE Handbook correlations [3]).
 *
 * @param input flat-panel input (see {@link PanelOutputInput}) plus apparentEmissivity 0…1.
 * @returns output (signed per mode), the radiant scale ε_a/ε and the flat radiant part.
 * @throws RangeError as {@link panelOutput}, or for apparentEmissivity outside 0…1.
 */
export function louveredPanelOutput(input: Readonly<LouveredPanelOutputInput>): LouveredPanelOutput {
  assertOrientation(input.orientation);
  assertMode(input.mode);
  assertUnitInterval(input.apparentEmissivity, "apparentEmissivity");
  const lengthM = panelConvectionLengthM(input);
  const flatRadiant = panelRadiantFlux(input.surfaceC, input.austC, input.emissivity);
  const radiant = panelRadiantFlux(input.surfaceC, input.austC, input.apparentEmissivity);
  const convective = panelConvectiveFlux(input.orientation, input.surfaceC, input.airC, lengthM);
  const out = combinePanelFluxes(radiant, convective, input.mode, input.areaM2);
  return {
    ...out,
    radiantScale: input.emissivity === 0 ? Number.NaN : input.apparentEmissivity / input.emissivity,
    flatRadiantWm2: input.mode === "heating" ? flatRadiant : -flatRadiant,
  };
}
