/**
 * Lookup in a louver cavity table: apparent emissivity at any opening angle by linear
 * interpolation in angle between the tabulated angles — per unit opening width (the cavity,
 * {@link louverEmissivityAt}) or per unit panel face area (cavity × aperture share,
 * {@link louverFaceEmissivityAt}).
 */
import { GROOVE_DIRECTIONAL_BINS } from "../viewfactor";
import { LOUVER_DEFAULT_APERTURE, louverApertureShare, type LouverAperture } from "./louverAperture";
import type { LouverTable } from "./louverTable";

/** Apparent emissivity of a louver setting. */
export interface LouverEmissivity {
  /** Apparent hemispherical emissivity, dimensionless, 0…1. */
  hemispherical: number;
  /** Apparent directional emissivity per folded 10° exit-angle bin (0–10°, …, 80–90°), 9 values, dimensionless. */
  directional: number[];
  /**
   * false when the angle lay outside the tabulated range and the nearest tabulated cavity
   * values were used (below minDeg, including 0° = closed; or above maxDeg).
   */
  withinTable: boolean;
}

function assertAngle(openingAngleDeg: number): void {
  if (typeof openingAngleDeg !== "number" || !Number.isFinite(openingAngleDeg) || openingAngleDeg < 0 || openingAngleDeg > 180) {
    throw new RangeError(`openingAngleDeg must be a finite number in [0, 180], got ${String(openingAngleDeg)}`);
  }
}

/**
 * Shared core: linear interpolation in angle of scale(α_i)·value_i between the neighbouring
 * tabulated angles; outside the tabulated range, scale(α)·value at the nearest end. With
 * scale ≡ 1 this is the cavity lookup; with the aperture share it interpolates the face values
 * node by node, so monotone node values give a monotone curve.
 */
function lookup(table: Readonly<LouverTable>, x: number, aperture: LouverAperture | null, out: LouverEmissivity | undefined): LouverEmissivity {
  const angles = table.anglesDeg;
  const n = angles.length;
  if (n === 0 || table.hemispherical.length !== n || table.directionalEmissivity.length !== n) {
    throw new RangeError("louver table arrays must be non-empty and of equal length");
  }
  const r: LouverEmissivity = out ?? { hemispherical: 0, directional: new Array<number>(GROOVE_DIRECTIONAL_BINS), withinTable: true };
  const first = angles[0] as number;
  const last = angles[n - 1] as number;
  let i0: number;
  let i1: number;
  let w: number;
  let s0: number;
  let s1: number;
  if (x <= first || n === 1 || x >= last) {
    // At or beyond an end: that end's cavity values, scaled at the actual angle.
    i0 = x >= last ? n - 1 : 0;
    i1 = i0;
    w = 0;
    s0 = aperture === null ? 1 : louverApertureShare(x, aperture);
    s1 = s0;
    r.withinTable = x >= first && x <= last;
  } else {
    // Binary search for angles[i0] ≤ x < angles[i0 + 1].
    let lo = 0;
    let hi = n - 1;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if ((angles[mid] as number) <= x) lo = mid;
      else hi = mid;
    }
    i0 = lo;
    i1 = lo + 1;
    const a0 = angles[i0] as number;
    const a1 = angles[i1] as number;
    w = (x - a0) / (a1 - a0);
    s0 = aperture === null ? 1 : louverApertureShare(a0, aperture);
    s1 = aperture === null ? 1 : louverApertureShare(a1, aperture);
    r.withinTable = true;
  }
  const c0 = (1 - w) * s0;
  const c1 = w * s1;
  r.hemispherical = c0 * (table.hemispherical[i0] as number) + c1 * (table.hemispherical[i1] as number);
  const d0 = table.directionalEmissivity[i0] as number[];
  const d1 = table.directionalEmissivity[i1] as number[];
  if (d0.length !== GROOVE_DIRECTIONAL_BINS || d1.length !== GROOVE_DIRECTIONAL_BINS) {
    throw new RangeError(`louver table directional rows must have ${GROOVE_DIRECTIONAL_BINS} bins`);
  }
  for (let k = 0; k < GROOVE_DIRECTIONAL_BINS; k++) r.directional[k] = c0 * (d0[k] as number) + c1 * (d1[k] as number);
  return r;
}

/**
 * Apparent emissivity of the louver cavity (per unit opening width) at an opening angle,
 * linear in angle between the two neighbouring tabulated angles (hemispherical and each
 * directional bin). Outside the tabulated range the values of the nearest end are used and
 * `withinTable` is false; in particular 0° (fully closed) takes the values at the smallest
 * tabulated angle — the cavity itself has no closed state; whether a closed louver still
 * emits is decided by the aperture model ({@link louverFaceEmissivityAt}). Interpolation
 * error at the default steps: ≤ 0.005 in the hemispherical value (see louverTable.ts).
 *
 * @param table a table from buildLouverTable (not mutated).
 * @param openingAngleDeg full opening angle, degrees, [0, 180].
 * @param out optional record to fill (its `directional` array of length ≥ 9 is reused), avoids allocation.
 * @returns hemispherical and 9 directional apparent emissivities, dimensionless.
 * @throws RangeError for a non-finite angle or one outside [0, 180], or a malformed table.
 */
export function louverEmissivityAt(table: Readonly<LouverTable>, openingAngleDeg: number, out?: LouverEmissivity): LouverEmissivity {
  assertAngle(openingAngleDeg);
  return lookup(table, openingAngleDeg, null, out);
}

/**
 * Emissivity of the louvered face per unit PANEL area at an opening angle: the cavity values
 * times the aperture share s(α) ({@link louverApertureShare}; modelling assumption stated in
 * louverAperture.ts). Interpolated node by node — linear in angle between s(α_i)·ε_i and
 * s(α_{i+1})·ε_{i+1} — so the face curve is monotone wherever the tabulated face values are
 * (the product of two separately interpolated factors need not be). Below the smallest
 * tabulated angle: s(α) times the smallest angle's cavity values, which for hinged blades
 * falls to 0 at 0° (closed: no emission); above the largest: s(α) times its values.
 *
 * @param table a table from buildLouverTable (not mutated).
 * @param openingAngleDeg full opening angle, degrees, [0, 180].
 * @param aperture aperture model; default "hinged-blades".
 * @param out optional record to fill, avoids allocation.
 * @returns hemispherical and 9 directional emissivities per unit face area, dimensionless, 0…1.
 * @throws RangeError as {@link louverEmissivityAt}, or for an unknown aperture model.
 */
export function louverFaceEmissivityAt(
  table: Readonly<LouverTable>,
  openingAngleDeg: number,
  aperture: LouverAperture = LOUVER_DEFAULT_APERTURE,
  out?: LouverEmissivity,
): LouverEmissivity {
  assertAngle(openingAngleDeg);
  louverApertureShare(openingAngleDeg, aperture); // validates the model
  return lookup(table, openingAngleDeg, aperture, out);
}
