/**
 * Mean radiant temperature from view/angle factors (fourth-power form).
 */
import { CELSIUS_TO_KELVIN_OFFSET_K } from "./constants";
import { personToRectangle, type PersonPlacement } from "./personAngleFactor";
import { assertPolygon } from "./polygon";
import { sphereToPolygon } from "./sphereToPolygon";
import type { Vec3 } from "./vec3";

/** A black (ε ≈ 1) enclosure surface at a uniform temperature. */
export interface RadiantSurface {
  /** Planar convex polygon, m, either winding. */
  polygon: ReadonlyArray<Readonly<Vec3>>;
  /** Surface temperature, °C (> −273.15). */
  temperatureC: number;
}

/** Result of a fourth-power radiant-temperature average. */
export interface FourthPowerMean {
  /** Radiant temperature, °C; NaN when the weights sum to 0. */
  temperatureC: number;
  /** Sum of the weights (view or angle factors), dimensionless; ≈ 1 for a closed enclosure. */
  weightSum: number;
}

/**
 * Fourth-power weighted mean of surface temperatures, normalised by the sum
 * of the weights: T = (Σ w_i T_i⁴ / Σ w_i)^{1/4}, T in K (ISO 7726:1998
 * Annex C, mean radiant temperature from angle factors, and the plane radiant
 * temperature from view factors of a plane element [4]). With weights that
 * sum to 1 (a closed enclosure) this is the standard's formula unchanged; the
 * normalisation makes an open set of surfaces (Σ w < 1) behave as if the
 * unseen part were at the weighted mean.
 *
 * @param weights       view or angle factors, dimensionless, ≥ 0, same length as temperaturesC.
 * @param temperaturesC surface temperatures, °C, > −273.15.
 * @returns temperature (°C; NaN if Σw = 0) and Σw.
 * @throws RangeError for mismatched lengths, negative or non-finite weights, or temperatures that are non-finite or ≤ −273.15 °C.
 */
export function fourthPowerMean(weights: ArrayLike<number>, temperaturesC: ArrayLike<number>): FourthPowerMean {
  if (weights.length !== temperaturesC.length) {
    throw new RangeError("fourthPowerMean: weights and temperatures differ in length");
  }
  let wSum = 0;
  let t4Sum = 0;
  for (let i = 0; i < weights.length; i++) {
    const w = weights[i] as number;
    const tC = temperaturesC[i] as number;
    if (!(w >= 0) || !Number.isFinite(w)) {
      throw new RangeError("fourthPowerMean: weights must be finite and ≥ 0");
    }
    assertTemperatureC(tC);
    const tK = tC + CELSIUS_TO_KELVIN_OFFSET_K;
    const t2 = tK * tK;
    wSum += w;
    t4Sum += w * t2 * t2;
  }
  const temperatureC = wSum > 0 ? Math.sqrt(Math.sqrt(t4Sum / wSum)) - CELSIUS_TO_KELVIN_OFFSET_K : Number.NaN;
  return { temperatureC, weightSum: wSum };
}

/** Throws RangeError unless `temperatureC` is finite and above absolute zero. */
export function assertTemperatureC(temperatureC: number): void {
  if (!Number.isFinite(temperatureC) || !(temperatureC > -CELSIUS_TO_KELVIN_OFFSET_K)) {
    throw new RangeError("temperature must be finite and above −273.15 °C");
  }
}

/** Mean radiant temperature and the factors it was computed from. */
export interface MeanRadiantTemperatureResult {
  /** Mean radiant temperature, °C (NaN when the factors sum to 0). */
  mrtC: number;
  /** Sum of the factors, dimensionless (≈ 1 for a closed enclosure; reported because the result is normalised by it). */
  factorSum: number;
  /** Factor of each surface, in input order, dimensionless. */
  factors: number[];
}

/**
 * Orientation-free mean radiant temperature for a person: angle factors by
 * the ISO 7726:1998 Annex C relation ({@link personToRectangle}, [4], [5]),
 * fourth-power form T_r⁴ = Σ F_p−i T_i⁴, normalised by Σ F_p−i (the published
 * fit does not sum exactly to 1 for a closed room).
 *
 * @param person   body centre (m) and posture.
 * @param surfaces vertical/horizontal rectangles with temperatures (°C); every surface must be a rectangle accepted by personToRectangle.
 * @returns MRT (°C), the sum of the angle factors and each factor.
 * @throws RangeError as personToRectangle, or for invalid temperatures.
 */
export function personMeanRadiantTemperature(
  person: Readonly<PersonPlacement>,
  surfaces: ReadonlyArray<Readonly<RadiantSurface>>,
): MeanRadiantTemperatureResult {
  return mrtFromFactors(surfaces, (s) => personToRectangle(person, s.polygon));
}

/**
 * Mean radiant temperature of a small sphere (e.g. a globe-thermometer-like
 * point, orientation-free): view factors F_i = Ω_i/4π ({@link sphereToPolygon},
 * Van Oosterom & Strackee [3]), fourth-power form normalised by Σ F_i [4].
 *
 * @param center   sphere centre, m.
 * @param surfaces planar convex polygons (m) with temperatures (°C).
 * @returns MRT (°C), the sum of the view factors (1 for a closed enclosure) and each factor.
 * @throws RangeError for invalid polygons, a non-finite centre or invalid temperatures.
 */
export function sphereMeanRadiantTemperature(
  center: Readonly<Vec3>,
  surfaces: ReadonlyArray<Readonly<RadiantSurface>>,
): MeanRadiantTemperatureResult {
  return mrtFromFactors(surfaces, (s, i) => {
    assertPolygon(s.polygon, `surfaces[${i}].polygon`);
    return sphereToPolygon(center, s.polygon);
  });
}

/** Each surface's factor from `factorOf`, then the normalised fourth-power mean of their temperatures. */
function mrtFromFactors(
  surfaces: ReadonlyArray<Readonly<RadiantSurface>>,
  factorOf: (surface: Readonly<RadiantSurface>, index: number) => number,
): MeanRadiantTemperatureResult {
  const factors = surfaces.map(factorOf);
  const m = fourthPowerMean(factors, surfaces.map((s) => s.temperatureC));
  return { mrtC: m.temperatureC, factorSum: m.weightSum, factors };
}
