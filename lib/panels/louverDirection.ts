/**
 * Directional emission of a louvered panel toward a point (a seat's body centre): the exit
 * angle in the plane across the grooves, the directional apparent emissivity for it, and the
 * panel's effective radiant temperature seen from that direction.
 *
 * Geometry. The louver grooves run along the unit axis a (in the panel plane); the face
 * normal n is the groove bisector. For an infinitely long groove the fate of a ray depends
 * only on its direction projected on the cross-section plane (the plane perpendicular to a):
 * a wall parallel to a keeps the axial component of a ray on reflection, diffusely or
 * specularly, so the apparent directional emissivity is a function of the projected (in-plane)
 * angle θ alone — the same reduction the cavity solvers use ([8], [14], lib/viewfactor
 * groove-trace.ts). With b = n × a (in the panel plane, across the grooves),
 *   θ = atan2(|d·b|, d·n),
 * folded to 0–90° by the groove's mirror symmetry. A direction ALONG the grooves (d in the
 * plane spanned by n and a) has θ = 0 whatever its tilt: it looks straight down the slots
 * into the groove vertices. A direction across the grooves tilted far from the normal has θ
 * near 90°: it grazes the openings and sees mostly the blade tips.
 */
import { GROOVE_BIN_WIDTH_DEG, GROOVE_DIRECTIONAL_BINS, type Vec3 } from "../viewfactor";
import { CELSIUS_TO_KELVIN_OFFSET_K } from "../comfort";
import { assertFinite, assertTemperatureC, assertUnitInterval } from "./assert";
import { LOUVER_DEFAULT_APERTURE, type LouverAperture } from "./louverAperture";
import { louverFaceEmissivityAt } from "./louverLookup";
import type { LouverTable } from "./louverTable";

/** Tolerance on unit length and on the orthogonality of normal and axis, dimensionless. */
const UNIT_TOLERANCE = 1e-6;

const RAD_TO_DEG = 180 / Math.PI;

function assertVec3(v: Readonly<Vec3>, name: string): void {
  if (!Array.isArray(v) || v.length !== 3) throw new RangeError(`${name} must be a 3-vector`);
  assertFinite(v[0], `${name}[0]`);
  assertFinite(v[1], `${name}[1]`);
  assertFinite(v[2], `${name}[2]`);
}

function assertUnit(v: Readonly<Vec3>, name: string): void {
  assertVec3(v, name);
  const len = Math.sqrt(v[0] * v[0] + v[1] * v[1] + v[2] * v[2]);
  if (Math.abs(len - 1) > UNIT_TOLERANCE) throw new RangeError(`${name} must be a unit vector, got length ${len}`);
}

/**
 * In-plane exit angle of a direction from a louvered panel: the angle between the direction
 * projected on the plane perpendicular to the groove axis and the face normal (groove
 * bisector), folded to 0–90° (geometry in this file's header; the in-plane reduction of the
 * infinitely long groove [8], [14]).
 *
 * @param normal unit face normal n, pointing into the room (|n| = 1 ± 1e-6).
 * @param axis unit groove axis a, in the panel plane (|a| = 1 ± 1e-6, |a·n| ≤ 1e-6).
 * @param direction direction d from the panel point toward the target, any non-zero length (m or unitless).
 * @returns θ in degrees, 0…90; 90 for a direction in the panel plane; NaN when the direction
 *   points behind the face (d·n < 0: the face is not visible from there).
 * @throws RangeError for non-finite components, non-unit or non-orthogonal normal/axis, or a zero direction.
 */
export function louverExitAngleDeg(normal: Readonly<Vec3>, axis: Readonly<Vec3>, direction: Readonly<Vec3>): number {
  assertUnit(normal, "normal");
  assertUnit(axis, "axis");
  assertVec3(direction, "direction");
  const an = axis[0] * normal[0] + axis[1] * normal[1] + axis[2] * normal[2];
  if (Math.abs(an) > UNIT_TOLERANCE) throw new RangeError(`axis must lie in the panel plane (axis·normal = ${an})`);
  const [dx, dy, dz] = direction;
  if (dx === 0 && dy === 0 && dz === 0) throw new RangeError("direction must be non-zero");
  const dn = dx * normal[0] + dy * normal[1] + dz * normal[2];
  if (dn < 0) return Number.NaN;
  // b = n × a, across the grooves in the panel plane.
  const bx = normal[1] * axis[2] - normal[2] * axis[1];
  const by = normal[2] * axis[0] - normal[0] * axis[2];
  const bz = normal[0] * axis[1] - normal[1] * axis[0];
  const db = Math.abs(dx * bx + dy * by + dz * bz);
  if (dn === 0) return 90;
  return Math.atan2(db, dn) * RAD_TO_DEG;
}

/**
 * Directional apparent emissivity for an exit angle, from the 9 bin values of a louver
 * setting: the bin values are taken at the bin centres (5°, 15°, …, 85°) and interpolated
 * linearly in θ between neighbouring centres; constant at the first bin's value on 0–5° (the
 * distribution is even in θ, so its slope at 0° is zero) and at the last bin's value on
 * 85–90° (no extrapolation toward grazing). Continuous in θ; the bin averages are preserved
 * only approximately (exactly where the directional curve is linear across three bins).
 *
 * @param tableAtAngle the setting's emissivities, `directional` of 9 values in 0…1 (e.g. from
 *   louverEmissivityAt or {@link louverFaceEmissivityAt}).
 * @param exitAngleDeg folded in-plane exit angle θ, degrees, [0, 90].
 * @returns directional emissivity, dimensionless, 0…1.
 * @throws RangeError for θ outside [0, 90] or not finite, or a directional array not of length 9.
 */
export function louverDirectionalEmissivity(tableAtAngle: Readonly<{ directional: ReadonlyArray<number> }>, exitAngleDeg: number): number {
  const d = tableAtAngle.directional;
  if (d.length !== GROOVE_DIRECTIONAL_BINS) throw new RangeError(`directional must have ${GROOVE_DIRECTIONAL_BINS} values, got ${d.length}`);
  if (typeof exitAngleDeg !== "number" || !Number.isFinite(exitAngleDeg) || exitAngleDeg < 0 || exitAngleDeg > 90) {
    throw new RangeError(`exitAngleDeg must be a finite number in [0, 90], got ${String(exitAngleDeg)}`);
  }
  const half = 0.5 * GROOVE_BIN_WIDTH_DEG;
  if (exitAngleDeg <= half) return d[0] as number;
  const lastCentre = (GROOVE_DIRECTIONAL_BINS - 1) * GROOVE_BIN_WIDTH_DEG + half;
  if (exitAngleDeg >= lastCentre) return d[GROOVE_DIRECTIONAL_BINS - 1] as number;
  const u = (exitAngleDeg - half) / GROOVE_BIN_WIDTH_DEG;
  const k = Math.min(Math.floor(u), GROOVE_DIRECTIONAL_BINS - 2);
  const w = u - k;
  const a = d[k] as number;
  return a + w * ((d[k + 1] as number) - a);
}

/** Input of {@link louverEffectiveTemperatureC}. */
export interface LouverEffectiveTemperatureInput {
  /** Panel (cavity wall) surface temperature, °C, > −273.15. */
  surfaceC: number;
  /** Temperature of the room surroundings the panel reflects (mean radiant / unheated surface temperature), °C, > −273.15. */
  surroundingsC: number;
  /** Emissivity of the panel toward the direction considered, dimensionless, 0…1 (a flat panel: its emissivity). */
  directionalEmissivity: number;
}

/**
 * Effective radiant temperature of a panel seen from one direction: a grey surface whose
 * emissivity toward that direction is ε emits ε·σT_p⁴ and, by Kirchhoff's law, reflects
 * (1 − ε) of the radiation it receives from the room, taken as black-body radiation at the
 * surroundings' temperature T_surr, so its intensity is that of a black body at
 *   T_eff = (ε·T_p⁴ + (1 − ε)·T_surr⁴)^(1/4)   (kelvin)
 * (radiosity of a grey surface [8], [14]; the room as black surroundings, as in the panel
 * radiant flux [3]). A flat panel uses its emissivity, a louvered one the directional
 * apparent emissivity per unit face area — one function for both.
 *
 * @param input.surfaceC panel surface temperature, °C, > −273.15
 * @param input.surroundingsC surroundings temperature, °C, > −273.15
 * @param input.directionalEmissivity emissivity toward the direction, 0…1
 * @returns effective radiant temperature, °C, between surroundingsC and surfaceC.
 * @throws RangeError for non-finite or sub-absolute-zero temperatures or an emissivity outside 0…1.
 */
export function louverEffectiveTemperatureC(input: Readonly<LouverEffectiveTemperatureInput>): number {
  assertTemperatureC(input.surfaceC, "surfaceC");
  assertTemperatureC(input.surroundingsC, "surroundingsC");
  assertUnitInterval(input.directionalEmissivity, "directionalEmissivity");
  const e = input.directionalEmissivity;
  const tp = input.surfaceC + CELSIUS_TO_KELVIN_OFFSET_K;
  const ts = input.surroundingsC + CELSIUS_TO_KELVIN_OFFSET_K;
  const tp2 = tp * tp;
  const ts2 = ts * ts;
  return Math.pow(e * tp2 * tp2 + (1 - e) * ts2 * ts2, 0.25) - CELSIUS_TO_KELVIN_OFFSET_K;
}

/** Input of {@link louverEmissivityToward}. */
export interface LouverTowardInput {
  /** Cavity table of the panel's finish and wall emissivity. */
  table: Readonly<LouverTable>;
  /** Louver setting: full opening angle, degrees, [0, 180]. */
  openingAngleDeg: number;
  /** Aperture model; default "hinged-blades". */
  aperture?: LouverAperture;
  /** Unit face normal into the room. */
  normal: Readonly<Vec3>;
  /** Unit groove axis in the panel plane. */
  axis: Readonly<Vec3>;
  /** Point on the panel (e.g. its centre), m. */
  panelPoint: Readonly<Vec3>;
  /** Target point (e.g. a seat's body centre), m; must differ from panelPoint. */
  targetPoint: Readonly<Vec3>;
}

/** Result of {@link louverEmissivityToward}. */
export interface LouverToward {
  /** Folded in-plane exit angle, degrees, 0…90 (NaN when not visible). */
  exitAngleDeg: number;
  /** Directional emissivity per unit face area toward the target, 0…1 (0 when not visible). */
  emissivity: number;
  /** false when the target lies behind the face. */
  visible: boolean;
}

/**
 * Emissivity of a louvered panel per unit face area toward a target point at a louver
 * setting: table lookup per unit face area ({@link louverFaceEmissivityAt}), exit angle ({@link louverExitAngleDeg}) and bin
 * interpolation ({@link louverDirectionalEmissivity}). A target behind the face gets 0 and
 * `visible: false`.
 *
 * @param input see {@link LouverTowardInput} (angles in degrees, points in m).
 * @returns exit angle (degrees), emissivity (0…1) and visibility.
 * @throws RangeError as the functions it combines, or when the target equals the panel point.
 */
export function louverEmissivityToward(input: Readonly<LouverTowardInput>): LouverToward {
  assertVec3(input.panelPoint, "panelPoint");
  assertVec3(input.targetPoint, "targetPoint");
  const d: Vec3 = [
    input.targetPoint[0] - input.panelPoint[0],
    input.targetPoint[1] - input.panelPoint[1],
    input.targetPoint[2] - input.panelPoint[2],
  ];
  const theta = louverExitAngleDeg(input.normal, input.axis, d);
  const face = louverFaceEmissivityAt(input.table, input.openingAngleDeg, input.aperture ?? LOUVER_DEFAULT_APERTURE);
  if (Number.isNaN(theta)) return { exitAngleDeg: theta, emissivity: 0, visible: false };
  return { exitAngleDeg: theta, emissivity: louverDirectionalEmissivity(face, theta), visible: true };
}
