/**
 * Seatwise view-factor geometry: view factors between planar elements,
 * small spheres, persons and polygons; plane radiant temperatures, mean
 * radiant temperature and radiant asymmetry at a seat. Sources: REFERENCES.md.
 *
 * Conventions: coordinates in metres, right-handed, z up; a polygon is a
 * planar convex polygon given as its vertices in order (either winding);
 * temperatures in °C; angles in radians; plan angles from +x toward +y.
 *
 * Invalid-input policy (the whole folder):
 * - a programmer error — NaN or non-finite numbers, a wrong array length
 *   (polygon with < 3 vertices, a "rectangle" that is not 4 vertices), a zero
 *   normal, an unknown posture, a temperature at or below absolute zero, or a
 *   geometry the method cannot represent (a person in the plane of a
 *   rectangle, a rectangle neither vertical nor horizontal) — throws
 *   `RangeError`;
 * - a physically valid input outside a model's published range returns a
 *   result, flagged where relevant: a surface set that does not close the
 *   field of view is normalised by, and reports, the sum of its factors
 *   (`viewFactorSum`, `factorSum`); nothing seen gives NaN temperatures.
 */
export * from "./vec3";
export * from "./polygon";
export * from "./constants";
export * from "./elementToPolygon";
export * from "./sphereToPolygon";
export * from "./surfaceToSurface";
export * from "./gaussLegendre";
export * from "./personAngleFactor";
export * from "./meanRadiantTemperature";
export * from "./radiantField";
export * from "./groove";
