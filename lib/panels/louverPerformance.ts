/**
 * Output of a louvered panel against its opening angle, and the turndown ratio per panel and
 * per zone.
 *
 * Model: at each setting the face emits with the apparent hemispherical emissivity per unit
 * face area, ε_face(α) = s(α)·ε_a(α) (cavity table [8] × aperture share, louverAperture.ts,
 * interpolated node by node by louverFaceEmissivityAt so a monotone table gives a monotone curve),
 * and the radiant part is q_r = ε_face·σ·(T_p⁴ − AUST⁴) through {@link louveredPanelOutput}
 * [3], [8]; the convective part is the flat panel's, unchanged by the louver (an assumption:
 * the ASHRAE correlations [3] are for flat panels). Direction of the curve, for diffuse walls:
 * - "hinged-blades": ε_a·sin(α/2) is the power leaving a groove of fixed blade width, which
 *   grows as the blades open (they see less of each other) — output RISES with α, the most
 *   fully open, no radiant output closed;
 * - "full-face": ε_a alone, which a closing groove raises — output FALLS as α grows.
 */
import { turndownRatio } from "./turndownRatio";
import { louveredPanelOutput } from "./louveredPanelOutput";
import type { PanelOutputInput } from "./panelOutput";
import { LOUVER_DEFAULT_APERTURE, type LouverAperture } from "./louverAperture";
import { louverFaceEmissivityAt, type LouverEmissivity } from "./louverLookup";
import type { LouverTable } from "./louverTable";

/** One point of a louver output curve (signed per the panel's mode, see lib/panels index). */
export interface LouverOutputPoint {
  /** Louver setting: full opening angle, degrees. */
  openingAngleDeg: number;
  /** Total output of the panel, W. */
  totalW: number;
  /** Radiant part, W. */
  radiantW: number;
  /** Convective part, W. */
  convectiveW: number;
  /** Total specific output, W/m² of panel area. */
  totalWm2: number;
  /** Apparent hemispherical emissivity per unit face area used for the radiant part, 0…1. */
  faceEmissivity: number;
}

/** Input of {@link louverOutputCurve}. */
export interface LouverOutputCurveInput {
  /** The panel (temperatures °C, area m², lengths m); its emissivity is the table's wall emissivity. */
  panel: Readonly<Omit<PanelOutputInput, "emissivity">>;
  /** Cavity table of the panel's finish and wall emissivity. */
  table: Readonly<LouverTable>;
  /** Aperture model; default "hinged-blades". */
  aperture?: LouverAperture;
  /** Smallest allowed opening angle of the louver, degrees, [0, maxOpeningDeg]; default the table's smallest angle. */
  minOpeningDeg?: number;
  /** Largest allowed opening angle, degrees, [minOpeningDeg, 180]; default the table's largest angle. */
  maxOpeningDeg?: number;
  /** Angles to evaluate, degrees, each in the allowed range; default the allowed range's ends and the tabulated angles between them. */
  anglesDeg?: ReadonlyArray<number>;
}

/**
 * Output of a louvered panel at each louver setting (model in this file's header): radiant
 * part from the interpolated apparent emissivity via {@link louveredPanelOutput} [3], [8],
 * convective part unchanged; W and W/m².
 *
 * @param input see {@link LouverOutputCurveInput}.
 * @returns one point per angle, in increasing angle order.
 * @throws RangeError for invalid panel input (as panelOutput), an invalid range or angle, or an unknown aperture.
 */
export function louverOutputCurve(input: Readonly<LouverOutputCurveInput>): LouverOutputPoint[] {
  const { table, panel } = input;
  const aperture = input.aperture ?? LOUVER_DEFAULT_APERTURE;
  const first = table.anglesDeg[0];
  const last = table.anglesDeg[table.anglesDeg.length - 1];
  if (first === undefined || last === undefined) throw new RangeError("louver table has no angles");
  const lo = input.minOpeningDeg ?? first;
  const hi = input.maxOpeningDeg ?? last;
  if (!Number.isFinite(lo) || !Number.isFinite(hi) || lo < 0 || hi > 180 || lo > hi) {
    throw new RangeError(`need 0 ≤ minOpeningDeg ≤ maxOpeningDeg ≤ 180, got ${lo}, ${hi}`);
  }
  let angles: number[];
  if (input.anglesDeg !== undefined) {
    angles = [...input.anglesDeg].sort((a, b) => a - b);
    if (angles.length === 0) throw new RangeError("anglesDeg must not be empty");
    for (const a of angles) {
      if (!Number.isFinite(a) || a < lo || a > hi) throw new RangeError(`angle ${a} lies outside the allowed range [${lo}, ${hi}]`);
    }
  } else {
    angles = [lo];
    for (const a of table.anglesDeg) if (a > lo && a < hi) angles.push(a);
    if (hi > lo) angles.push(hi);
  }
  const out: LouverOutputPoint[] = [];
  const face: LouverEmissivity = { hemispherical: 0, directional: new Array<number>(9), withinTable: true };
  for (const openingAngleDeg of angles) {
    const faceEmissivity = louverFaceEmissivityAt(table, openingAngleDeg, aperture, face).hemispherical;
    const r = louveredPanelOutput({ ...panel, emissivity: table.wallEmissivity, apparentEmissivity: Math.min(1, faceEmissivity) });
    out.push({
      openingAngleDeg,
      totalW: r.totalW,
      radiantW: r.radiantWm2 * panel.areaM2,
      convectiveW: r.convectiveWm2 * panel.areaM2,
      totalWm2: r.totalWm2,
      faceEmissivity,
    });
  }
  return out;
}

function extremes(curve: ReadonlyArray<LouverOutputPoint>): [number, number] {
  if (curve.length === 0) throw new RangeError("an output curve must have at least one point");
  let lo = Number.POSITIVE_INFINITY;
  let hi = Number.NEGATIVE_INFINITY;
  for (const p of curve) {
    if (!Number.isFinite(p.totalW)) throw new RangeError(`output must be finite, got ${String(p.totalW)}`);
    if (p.totalW < lo) lo = p.totalW;
    if (p.totalW > hi) hi = p.totalW;
  }
  return [lo, hi];
}

/**
 * Turndown ratio of one louvered panel: highest / lowest total output over its curve (the
 * louver's allowed range), via {@link turndownRatio} (common practice). A panel whose lowest
 * output is ≤ 0 (it works against its mode somewhere in the range) has no turndown ratio: NaN.
 *
 * @param curve output curve from {@link louverOutputCurve}, at least one point, finite outputs.
 * @returns ratio ≥ 1 (dimensionless), or NaN when the lowest output is ≤ 0.
 * @throws RangeError for an empty curve or a non-finite output.
 */
export function louverTurndownRatio(curve: ReadonlyArray<LouverOutputPoint>): number {
  const [lo, hi] = extremes(curve);
  return lo > 0 ? turndownRatio([hi, lo]) : Number.NaN;
}

/**
 * Turndown ratio of a zone: the sum of its panels' highest outputs over the sum of their
 * lowest outputs, each panel over its own allowed range (common practice; via
 * {@link turndownRatio}). NaN when the summed lowest output is ≤ 0.
 *
 * @param curves one output curve per panel of the zone, at least one, each non-empty.
 * @returns ratio ≥ 1 (dimensionless), or NaN.
 * @throws RangeError for no curves, an empty curve or a non-finite output.
 */
export function zoneTurndownRatio(curves: ReadonlyArray<ReadonlyArray<LouverOutputPoint>>): number {
  if (curves.length === 0) throw new RangeError("a zone needs at least one panel curve");
  let sumLo = 0;
  let sumHi = 0;
  for (const c of curves) {
    const [lo, hi] = extremes(c);
    sumLo += lo;
    sumHi += hi;
  }
  return sumLo > 0 ? turndownRatio([sumHi, sumLo]) : Number.NaN;
}
