/**
 * Orientation-aware radiant field at a seat: plane radiant temperatures in six
 * directions, the ISO 7726 weighted mean radiant temperature, and radiant
 * temperature asymmetry (vertical, front/back, left/right, horizontal maximum).
 */
import { CELSIUS_TO_KELVIN_OFFSET_K } from "./constants";
import { elementToPolygon } from "./elementToPolygon";
import { assertTemperatureC, sphereMeanRadiantTemperature, type RadiantSurface } from "./meanRadiantTemperature";
import type { Posture } from "./personAngleFactor";
import { assertPolygon } from "./polygon";
import type { Vec3 } from "./vec3";

/** Projected area factors of a person for the six directions (dimensionless). */
export interface ProjectedAreaFactors {
  /** Weight of t_pr(up) and of t_pr(down). */
  readonly upDown: number;
  /** Weight of t_pr(left) and of t_pr(right). */
  readonly leftRight: number;
  /** Weight of t_pr(front) and of t_pr(back). */
  readonly frontBack: number;
}

/**
 * Projected area factors for the six-direction mean radiant temperature,
 * ISO 7726:1998 Annex C [4]. Provenance: the values were confirmed in a
 * reproduction of the table (a measuring-instrument manual, [7]); the ISO
 * text itself was not available.
 */
export const ISO7726_PROJECTED_AREA_FACTORS: Readonly<Record<Posture, ProjectedAreaFactors>> = {
  seated: { upDown: 0.18, leftRight: 0.22, frontBack: 0.3 },
  standing: { upDown: 0.08, leftRight: 0.23, frontBack: 0.35 },
};

/** Input of the orientation-aware radiant-field functions. */
export interface RadiantFieldInput {
  /** Measuring point (centre of the body), m. */
  position: Vec3;
  /** Plan angle of the direction the person faces, rad, from +x toward +y (any finite value). */
  facingRad: number;
  /** Posture (selects the projected area factors). */
  posture: Posture;
  /** Enclosure surfaces (black), planar convex polygons with temperatures. */
  surfaces: ReadonlyArray<Readonly<RadiantSurface>>;
}

/** The six directions of a plane radiant temperature, relative to the person. */
export type RadiantDirection = "up" | "down" | "front" | "back" | "left" | "right";

/** Plane radiant temperature of one side of a small plane element. */
export interface PlaneRadiantTemperature {
  /** Plane radiant temperature, °C (NaN when nothing is seen: viewFactorSum = 0). */
  temperatureC: number;
  /** Sum of the element's view factors to the surfaces, dimensionless; 1 for a closed enclosure, < 1 when the surfaces do not close (the result is normalised by it). */
  viewFactorSum: number;
}

/** Plane radiant temperatures in the six directions. */
export interface PlaneRadiantTemperatures {
  /** t_pr facing +z, °C. */
  upC: number;
  /** t_pr facing −z, °C. */
  downC: number;
  /** t_pr facing the person's front, °C. */
  frontC: number;
  /** t_pr facing the person's back, °C. */
  backC: number;
  /** t_pr facing the person's left (front rotated +90° about +z), °C. */
  leftC: number;
  /** t_pr facing the person's right, °C. */
  rightC: number;
  /** Σ of the element's view factors for each direction (dimensionless). */
  viewFactorSums: Record<RadiantDirection, number>;
}

/** Orientation-aware radiant field at one point. */
export interface RadiantField {
  /** Plane radiant temperatures in the six directions. */
  planeRadiantTemperatures: PlaneRadiantTemperatures;
  /** Mean radiant temperature, °C: ISO 7726 Annex C weighting of the six plane radiant temperatures with the posture's projected area factors (linear in °C, as the standard writes it). */
  mrtC: number;
  /** Vertical radiant temperature asymmetry t_pr(up) − t_pr(down), °C (positive: warmer above, e.g. a warm ceiling). */
  verticalAsymmetryC: number;
  /** t_pr(front) − t_pr(back), °C, for the given facing. */
  frontBackAsymmetryC: number;
  /** t_pr(left) − t_pr(right), °C, for the given facing. */
  leftRightAsymmetryC: number;
  /** Largest |t_pr(θ) − t_pr(θ+π)| over horizontal directions θ sampled every 5°, °C (≥ 0). */
  horizontalAsymmetryMaxC: number;
  /** Plan angle (rad, [0, 2π), from +x toward +y) of the normal of the WARMER side at that maximum. */
  horizontalAsymmetryWarmerAzimuthRad: number;
  /** Sampled azimuth θ (rad, [0, π)) of the element normal at the maximum. */
  horizontalAsymmetryAzimuthRad: number;
  /** Signed t_pr(θ) − t_pr(θ+π) at that azimuth, °C (positive: the side facing θ is warmer). */
  horizontalAsymmetrySignedC: number;
  /** Mean radiant temperature of a small sphere at the same point (orientation-free), °C. */
  sphereMrtC: number;
  /** Σ of the sphere's view factors (1 for a closed enclosure). */
  sphereViewFactorSum: number;
}

/** Azimuth step of the horizontal-asymmetry search, rad (5°). */
export const HORIZONTAL_ASYMMETRY_STEP_RAD = (5 * Math.PI) / 180;

/**
 * Plane radiant temperature on one side of a small plane element with normal
 * `normal` at `position` (ISO 7726:1998 definition [4]): view factors by the
 * exact contour integral ({@link elementToPolygon}, [1]), fourth-power form
 * t_pr = (Σ F_i (t_i + 273.15)⁴ / Σ F_i)^{1/4} − 273.15, normalised by Σ F_i
 * when the surfaces do not close the hemisphere.
 *
 * @param position element position, m.
 * @param normal   direction the element faces (non-zero, any length).
 * @param surfaces planar convex polygons (m) with temperatures (°C, > −273.15).
 * @returns t_pr (°C; NaN if nothing is seen) and the view-factor sum.
 * @throws RangeError for invalid polygons, normal, position or temperatures.
 */
export function planeRadiantTemperature(
  position: Readonly<Vec3>,
  normal: Readonly<Vec3>,
  surfaces: ReadonlyArray<Readonly<RadiantSurface>>,
): PlaneRadiantTemperature {
  let fSum = 0;
  let t4Sum = 0;
  for (let i = 0; i < surfaces.length; i++) {
    const s = surfaces[i] as Readonly<RadiantSurface>;
    const f = elementToPolygon(position, normal, s.polygon);
    const tK = s.temperatureC + CELSIUS_TO_KELVIN_OFFSET_K;
    const t2 = tK * tK;
    fSum += f;
    t4Sum += f * t2 * t2;
  }
  const temperatureC = fSum > 0 ? Math.sqrt(Math.sqrt(t4Sum / fSum)) - CELSIUS_TO_KELVIN_OFFSET_K : Number.NaN;
  return { temperatureC, viewFactorSum: fSum };
}

function validateField(position: Readonly<Vec3>, facingRad: number, surfaces: ReadonlyArray<Readonly<RadiantSurface>>): void {
  if (!Array.isArray(position) || position.length !== 3 || !position.every((v) => Number.isFinite(v))) {
    throw new RangeError("position must be a finite [x, y, z]");
  }
  if (!Number.isFinite(facingRad)) {
    throw new RangeError("facingRad must be finite");
  }
  if (!Array.isArray(surfaces)) {
    throw new RangeError("surfaces must be an array");
  }
  for (let i = 0; i < surfaces.length; i++) {
    const s = surfaces[i] as Readonly<RadiantSurface>;
    assertPolygon(s.polygon, `surfaces[${i}].polygon`);
    assertTemperatureC(s.temperatureC);
  }
}

/**
 * Plane radiant temperatures in the six directions up, down, front, back,
 * left, right (ISO 7726:1998 [4]) for a person at `position` facing
 * `facingRad`; see {@link planeRadiantTemperature}.
 *
 * Call as `planeRadiantTemperatures({ position, facingRad, surfaces })` (a
 * {@link RadiantFieldInput} is accepted; posture is not used) or
 * `planeRadiantTemperatures(position, facingRad, surfaces)`.
 *
 * @param input     object form: { position (m), facingRad (rad, finite), surfaces }.
 * @param position  positional form: point, m (finite).
 * @param facingRad positional form: plan angle of the front direction, rad from +x toward +y (finite).
 * @param surfaces  positional form: planar convex polygons (m) with temperatures (°C, > −273.15).
 * @throws RangeError for invalid input.
 */
export function planeRadiantTemperatures(
  input: Readonly<Pick<RadiantFieldInput, "position" | "facingRad" | "surfaces">>,
): PlaneRadiantTemperatures;
export function planeRadiantTemperatures(
  position: Readonly<Vec3>,
  facingRad: number,
  surfaces: ReadonlyArray<Readonly<RadiantSurface>>,
): PlaneRadiantTemperatures;
export function planeRadiantTemperatures(
  inputOrPosition: Readonly<Pick<RadiantFieldInput, "position" | "facingRad" | "surfaces">> | Readonly<Vec3>,
  facingRad?: number,
  surfaces?: ReadonlyArray<Readonly<RadiantSurface>>,
): PlaneRadiantTemperatures {
  if (Array.isArray(inputOrPosition)) {
    validateField(inputOrPosition as Readonly<Vec3>, facingRad as number, surfaces as ReadonlyArray<Readonly<RadiantSurface>>);
    return sixDirections(inputOrPosition as Readonly<Vec3>, facingRad as number, surfaces as ReadonlyArray<Readonly<RadiantSurface>>);
  }
  const input = inputOrPosition as Readonly<Pick<RadiantFieldInput, "position" | "facingRad" | "surfaces">>;
  validateField(input.position, input.facingRad, input.surfaces);
  return sixDirections(input.position, input.facingRad, input.surfaces);
}

function sixDirections(
  position: Readonly<Vec3>,
  facingRad: number,
  surfaces: ReadonlyArray<Readonly<RadiantSurface>>,
): PlaneRadiantTemperatures {
  const cf = Math.cos(facingRad);
  const sf = Math.sin(facingRad);
  const up = planeRadiantTemperature(position, [0, 0, 1], surfaces);
  const down = planeRadiantTemperature(position, [0, 0, -1], surfaces);
  const front = planeRadiantTemperature(position, [cf, sf, 0], surfaces);
  const back = planeRadiantTemperature(position, [-cf, -sf, 0], surfaces);
  const left = planeRadiantTemperature(position, [-sf, cf, 0], surfaces);
  const right = planeRadiantTemperature(position, [sf, -cf, 0], surfaces);
  return {
    upC: up.temperatureC,
    downC: down.temperatureC,
    frontC: front.temperatureC,
    backC: back.temperatureC,
    leftC: left.temperatureC,
    rightC: right.temperatureC,
    viewFactorSums: {
      up: up.viewFactorSum,
      down: down.viewFactorSum,
      front: front.viewFactorSum,
      back: back.viewFactorSum,
      left: left.viewFactorSum,
      right: right.viewFactorSum,
    },
  };
}

/**
 * ISO 7726:1998 Annex C mean radiant temperature from six plane radiant
 * temperatures [4]:
 *   t_r = [w_ud (t_up + t_down) + w_lr (t_left + t_right) + w_fb (t_front + t_back)] / [2 (w_ud + w_lr + w_fb)],
 * with the posture's projected area factors ({@link ISO7726_PROJECTED_AREA_FACTORS}).
 * @param tpr     the six plane radiant temperatures, °C.
 * @param posture 'seated' or 'standing'.
 * @returns mean radiant temperature, °C.
 * @throws RangeError for an unknown posture.
 */
export function weightedMeanRadiantTemperature(
  tpr: Readonly<Pick<PlaneRadiantTemperatures, "upC" | "downC" | "frontC" | "backC" | "leftC" | "rightC">>,
  posture: Posture,
): number {
  const w = ISO7726_PROJECTED_AREA_FACTORS[posture];
  if (w === undefined || (posture !== "seated" && posture !== "standing")) {
    throw new RangeError(`unknown posture: ${String(posture)}`);
  }
  return (
    (w.upDown * (tpr.upC + tpr.downC) + w.leftRight * (tpr.leftC + tpr.rightC) + w.frontBack * (tpr.frontC + tpr.backC)) /
    (2 * (w.upDown + w.leftRight + w.frontBack))
  );
}

/** Largest horizontal radiant asymmetry over sampled azimuths. */
export interface HorizontalAsymmetry {
  /** max_θ |t_pr(θ) − t_pr(θ+π)|, °C (≥ 0). */
  maxC: number;
  /** Plan angle of the warmer side's normal at the maximum, rad in [0, 2π). */
  warmerAzimuthRad: number;
  /** Sampled azimuth θ of the element normal at the maximum, rad in [0, π). */
  azimuthRad: number;
  /** t_pr(θ) − t_pr(θ+π) at that azimuth, °C (sign tells which side is warmer). */
  signedC: number;
}

/**
 * Horizontal radiant temperature asymmetry (ISO 7726 definition: the
 * difference between the plane radiant temperatures of the two opposite sides
 * of a small plane element [4]; ISO 7730:2005 clause 6.5 uses the largest such
 * difference for walls/windows [10]): the largest |t_pr(θ) − t_pr(θ+π)| over
 * vertical elements whose normal azimuth θ is sampled every 5° in [0, π).
 *
 * @param position point, m.
 * @param surfaces planar convex polygons (m) with temperatures (°C).
 * @throws RangeError for invalid input.
 */
export function horizontalRadiantAsymmetry(
  position: Readonly<Vec3>,
  surfaces: ReadonlyArray<Readonly<RadiantSurface>>,
): HorizontalAsymmetry {
  validateField(position, 0, surfaces);
  return horizontalAsymmetryUnchecked(position, surfaces);
}

function horizontalAsymmetryUnchecked(
  position: Readonly<Vec3>,
  surfaces: ReadonlyArray<Readonly<RadiantSurface>>,
): HorizontalAsymmetry {
  const steps = Math.round(Math.PI / HORIZONTAL_ASYMMETRY_STEP_RAD);
  let maxC = -1;
  let warmerAzimuthRad = 0;
  let azimuthRad = 0;
  let signedC = Number.NaN;
  const n: Vec3 = [0, 0, 0];
  for (let k = 0; k < steps; k++) {
    const theta = k * HORIZONTAL_ASYMMETRY_STEP_RAD;
    n[0] = Math.cos(theta);
    n[1] = Math.sin(theta);
    const forward = planeRadiantTemperature(position, n, surfaces).temperatureC;
    n[0] = -n[0];
    n[1] = -n[1];
    const backward = planeRadiantTemperature(position, n, surfaces).temperatureC;
    const diff = forward - backward;
    if (Math.abs(diff) > maxC) {
      maxC = Math.abs(diff);
      warmerAzimuthRad = diff >= 0 ? theta : theta + Math.PI;
      azimuthRad = theta;
      signedC = diff;
    }
  }
  if (maxC < 0) maxC = Number.NaN; // every difference was NaN (nothing seen)
  return { maxC, warmerAzimuthRad, azimuthRad, signedC };
}

/**
 * Orientation-aware radiant field at a seat: six plane radiant temperatures
 * (ISO 7726 [4], view factors by contour integration [1]), the ISO 7726
 * projected-area-weighted MRT, vertical asymmetry t_pr(up) − t_pr(down),
 * front/back and left/right differences for the given facing, the largest
 * horizontal asymmetry over azimuths (5° steps) with the warmer side's
 * azimuth, and the small-sphere MRT (Van Oosterom & Strackee solid angles [3]).
 *
 * @param input position (m), facingRad (rad from +x toward +y), posture, surfaces (polygons in m, temperatures in °C).
 * @returns see {@link RadiantField}; temperatures in °C.
 * @throws RangeError for invalid input (non-finite numbers, bad polygons, temperature ≤ −273.15 °C, unknown posture).
 */
export function radiantField(input: Readonly<RadiantFieldInput>): RadiantField {
  validateField(input.position, input.facingRad, input.surfaces);
  const tpr = sixDirections(input.position, input.facingRad, input.surfaces);
  const mrtC = weightedMeanRadiantTemperature(tpr, input.posture);
  const horizontal = horizontalAsymmetryUnchecked(input.position, input.surfaces);
  const sphere = sphereMeanRadiantTemperature(input.position, input.surfaces);
  return {
    planeRadiantTemperatures: tpr,
    mrtC,
    verticalAsymmetryC: tpr.upC - tpr.downC,
    frontBackAsymmetryC: tpr.frontC - tpr.backC,
    leftRightAsymmetryC: tpr.leftC - tpr.rightC,
    horizontalAsymmetryMaxC: horizontal.maxC,
    horizontalAsymmetryWarmerAzimuthRad: horizontal.warmerAzimuthRad,
    horizontalAsymmetryAzimuthRad: horizontal.azimuthRad,
    horizontalAsymmetrySignedC: horizontal.signedC,
    sphereMrtC: sphere.mrtC,
    sphereViewFactorSum: sphere.factorSum,
  };
}
