/**
 * Aperture model of a louvered panel face: how much of the panel's face is cavity opening at
 * a given opening angle, and the resulting emissivity per unit panel (face) area.
 *
 * The cavity table gives emissivities per unit OPENING width. What a louver setting does to
 * the panel as a whole depends on the construction; no standard defines it, so the two
 * constructions are stated here as modelling assumptions (not from a published source):
 *
 * - "hinged-blades" (default): the face is a row of V-grooves formed by pairs of isothermal
 *   blades of fixed width b, hinged at the groove vertices at a fixed pitch 2b. Fully open
 *   (180°) the blades lie flat and tile the face; at opening angle α each groove's opening is
 *   the chord 2b·sin(α/2) in the plane of the blade tips, and the rest of each pitch opens
 *   onto the blades' backs, assumed insulated (no net radiant output). Opening share
 *   s = sin(α/2); closed (0°) → s = 0, no radiant output through the face. Output rises with
 *   the opening angle, fully open gives the most — the usual sense of a louver.
 * - "full-face": the openings fill the face at every angle (grooves of fixed pitch whose
 *   depth changes with α); s = 1, the face emits as the cavity's apparent emissivity [8].
 *   Output then FALLS as the louver opens (a closing groove raises the apparent emissivity),
 *   and the model has no closed state (0° takes the smallest tabulated angle's values).
 *
 * Because the openings all lie in the plane of the blade tips and nothing stands above it,
 * the projected opening share seen from any direction is the same s, so the directional
 * emissivity per unit face area is s·ε_dir(θ) too (see louverFaceEmissivityAt).
 */

/** Aperture model of the louvered face (see the file header). */
export type LouverAperture = "hinged-blades" | "full-face";

/** Default aperture model. */
export const LOUVER_DEFAULT_APERTURE: LouverAperture = "hinged-blades";

/**
 * Share of the panel face that is cavity opening at an opening angle: sin(α/2) for hinged
 * blades, 1 for a full face (modelling assumptions stated in this file's header).
 *
 * @param openingAngleDeg full opening angle α, degrees, [0, 180].
 * @param aperture aperture model; default "hinged-blades".
 * @returns opening share, dimensionless, 0…1.
 * @throws RangeError for an angle outside [0, 180] or not finite, or an unknown aperture model.
 */
export function louverApertureShare(openingAngleDeg: number, aperture: LouverAperture = LOUVER_DEFAULT_APERTURE): number {
  if (typeof openingAngleDeg !== "number" || !Number.isFinite(openingAngleDeg) || openingAngleDeg < 0 || openingAngleDeg > 180) {
    throw new RangeError(`openingAngleDeg must be a finite number in [0, 180], got ${String(openingAngleDeg)}`);
  }
  if (aperture === "full-face") return 1;
  if (aperture !== "hinged-blades") throw new RangeError(`aperture must be "hinged-blades" or "full-face", got ${String(aperture)}`);
  return openingAngleDeg === 180 ? 1 : Math.sin((openingAngleDeg * Math.PI) / 360);
}
