/**
 * Radiant and convective output of a heating/cooling panel.
 */
import { CELSIUS_TO_KELVIN_OFFSET_K } from "../comfort";
import {
  assertMode,
  assertOrientation,
  assertPositive,
  assertTemperatureC,
  assertUnitInterval,
} from "./assert";
import { STEFAN_BOLTZMANN_W_M2K4 } from "./constants";
import type { PanelMode, PanelOrientation } from "./types";

/** Input of {@link panelOutput}. */
export interface PanelOutputInput {
  /** Surface the panel is mounted in. */
  orientation: PanelOrientation;
  /** Operating mode (sets the sign convention of the result). */
  mode: PanelMode;
  /** Panel surface temperature t_p, °C. */
  surfaceC: number;
  /** Room air temperature t_a near the panel, °C. */
  airC: number;
  /** Area-weighted temperature of the other (unheated/uncooled) room surfaces, AUST, °C. */
  austC: number;
  /** Hemispherical emissivity of the panel surface, dimensionless, 0…1. */
  emissivity: number;
  /** Panel area, m², > 0. */
  areaM2: number;
  /**
   * Equivalent diameter D_e = 4·area/perimeter, m, > 0 (ceiling and floor correlations);
   * default √area (a square panel).
   */
  equivalentDiameterM?: number;
  /** Panel height H, m, > 0 (wall correlation); default √area (a square panel). */
  heightM?: number;
}

/** Output of a panel; all fluxes per m² of panel area, signed per {@link PanelMode}. */
export interface PanelOutput {
  /** Total specific output, W/m². */
  totalWm2: number;
  /** Radiant part, W/m². */
  radiantWm2: number;
  /** Convective part, W/m². */
  convectiveWm2: number;
  /** Radiant part / total, dimensionless; NaN when the total is 0. */
  radiantShare: number;
  /** Total output of the panel, W (totalWm2 · areaM2). */
  totalW: number;
}

/**
 * Radiant flux from the panel into the room, W/m² (positive = panel warmer):
 * q_r = ε·σ·(T_p⁴ − AUST⁴) — the panel exchanging with black room surfaces at AUST, the
 * form of the ASHRAE Handbook panel chapter with σ·ε written out [3] (σ: CODATA 2018 [6]).
 *
 * @param surfaceC   panel surface temperature, °C (> −273.15).
 * @param austC      area-weighted temperature of the other surfaces, °C (> −273.15).
 * @param emissivity panel emissivity, dimensionless, 0…1.
 * @returns radiant flux into the room, W/m².
 * @throws RangeError for non-finite or sub-absolute-zero temperatures, emissivity outside 0…1.
 */
export function panelRadiantFlux(surfaceC: number, austC: number, emissivity: number): number {
  assertTemperatureC(surfaceC, "surfaceC");
  assertTemperatureC(austC, "austC");
  assertUnitInterval(emissivity, "emissivity");
  const tp = surfaceC + CELSIUS_TO_KELVIN_OFFSET_K;
  const tu = austC + CELSIUS_TO_KELVIN_OFFSET_K;
  const tp2 = tp * tp;
  const tu2 = tu * tu;
  return emissivity * STEFAN_BOLTZMANN_W_M2K4 * (tp2 * tp2 - tu2 * tu2);
}

/**
 * Natural-convection flux from the panel into the room air, W/m² (positive = panel
 * warmer), ASHRAE Handbook — HVAC Systems and Equipment, panel heating and cooling chapter,
 * SI correlations (from memory) [3], chosen by the actual direction of heat flow:
 *
 * - ceiling warmer than air (stable): q_c = 0.20·(t_p − t_a)^1.25 / D_e^0.25;
 * - floor warmer or ceiling cooler than air (unstable): q_c = 2.42·|t_p − t_a|^1.31 / D_e^0.08;
 * - wall: q_c = 1.87·|t_p − t_a|^1.32 / H^0.05;
 * - floor cooler than air (stable): the ceiling-heating correlation, by the symmetry of the
 *   buoyant boundary layer (assumption; the chapter gives no floor-cooling correlation).
 *
 * @param orientation panel orientation.
 * @param surfaceC    panel surface temperature, °C, finite.
 * @param airC        air temperature, °C, finite.
 * @param lengthM     D_e (ceiling, floor) or H (wall), m, > 0.
 * @returns convective flux into the room, W/m².
 * @throws RangeError for an unknown orientation, non-finite temperatures or lengthM ≤ 0.
 */
export function panelConvectiveFlux(
  orientation: PanelOrientation,
  surfaceC: number,
  airC: number,
  lengthM: number,
): number {
  assertOrientation(orientation);
  assertTemperatureC(surfaceC, "surfaceC");
  assertTemperatureC(airC, "airC");
  assertPositive(lengthM, "lengthM");
  const d = surfaceC - airC;
  const ad = Math.abs(d);
  if (ad === 0) {
    return 0;
  }
  let magnitude: number;
  if (orientation === "wall") {
    magnitude = (1.87 * Math.pow(ad, 1.32)) / Math.pow(lengthM, 0.05);
  } else {
    // Unstable (buoyant) layer: a warm floor or a cool ceiling.
    const unstable = (orientation === "floor") === (d > 0);
    magnitude = unstable
      ? (2.42 * Math.pow(ad, 1.31)) / Math.pow(lengthM, 0.08)
      : (0.2 * Math.pow(ad, 1.25)) / Math.pow(lengthM, 0.25);
  }
  return d > 0 ? magnitude : -magnitude;
}

/** Default characteristic length, m: √area, i.e. D_e and H of a square panel. */
function defaultLengthM(areaM2: number): number {
  return Math.sqrt(areaM2);
}

/**
 * Combines radiant and convective fluxes into the room into a {@link PanelOutput} with the
 * mode's sign convention. Internal helper shared with the louvered panel.
 *
 * @param radiantIntoRoom    radiant flux into the room, W/m².
 * @param convectiveIntoRoom convective flux into the room, W/m².
 * @param mode               operating mode.
 * @param areaM2             panel area, m².
 * @returns the output record.
 */
export function combinePanelFluxes(
  radiantIntoRoom: number,
  convectiveIntoRoom: number,
  mode: PanelMode,
  areaM2: number,
): PanelOutput {
  const sign = mode === "heating" ? 1 : -1;
  const radiantWm2 = sign * radiantIntoRoom;
  const convectiveWm2 = sign * convectiveIntoRoom;
  const totalWm2 = radiantWm2 + convectiveWm2;
  return {
    totalWm2,
    radiantWm2,
    convectiveWm2,
    radiantShare: totalWm2 === 0 ? Number.NaN : radiantWm2 / totalWm2,
    totalW: totalWm2 * areaM2,
  };
}

/**
 * Characteristic length for the convective correlation of the orientation: D_e for ceiling
 * and floor, H for walls, each defaulting to √area.
 *
 * @param input panel input (areaM2 > 0; optional lengths > 0).
 * @returns length, m.
 * @throws RangeError for a non-positive area or length.
 */
export function panelConvectionLengthM(input: Readonly<PanelOutputInput>): number {
  assertPositive(input.areaM2, "areaM2");
  const given = input.orientation === "wall" ? input.heightM : input.equivalentDiameterM;
  if (given !== undefined) {
    assertPositive(given, input.orientation === "wall" ? "heightM" : "equivalentDiameterM");
    return given;
  }
  return defaultLengthM(input.areaM2);
}

/**
 * Output of a heating or cooling panel split into radiant and convective parts:
 * radiant q_r = ε·σ·(T_p⁴ − AUST⁴) ({@link panelRadiantFlux}) and natural convection from the
 * ASHRAE Handbook panel-chapter correlations ({@link panelConvectiveFlux}) [3]. Heating
 * output is positive heat into the room, cooling output positive cooling capacity
 * (see {@link PanelMode}).
 *
 * @param input orientation; mode; surfaceC, airC, austC °C (> −273.15); emissivity 0…1;
 *              areaM2 > 0; equivalentDiameterM > 0 and heightM > 0 (optional, default √area).
 * @returns total, radiant and convective W/m², radiant share and total W.
 * @throws RangeError for unknown orientation/mode, invalid temperatures, emissivity, area or lengths.
 */
export function panelOutput(input: Readonly<PanelOutputInput>): PanelOutput {
  assertOrientation(input.orientation);
  assertMode(input.mode);
  const lengthM = panelConvectionLengthM(input);
  const radiant = panelRadiantFlux(input.surfaceC, input.austC, input.emissivity);
  const convective = panelConvectiveFlux(input.orientation, input.surfaceC, input.airC, lengthM);
  return combinePanelFluxes(radiant, convective, input.mode, input.areaM2);
}
