import { describe, expect, it } from "vitest";
import {
  fourthPowerMean,
  horizontalRadiantAsymmetry,
  personMeanRadiantTemperature,
  planeRadiantTemperatures,
  radiantField,
  sphereMeanRadiantTemperature,
  type RadiantSurface,
  type Vec3,
} from "@/lib/viewfactor";

const [L, W, H] = [5, 4, 2.7];

/** Closed 5 × 4 × 2.7 m room; temperatures per face (°C). */
function room(t: { floor: number; ceiling: number; xMin: number; xMax: number; yMin: number; yMax: number }): RadiantSurface[] {
  return [
    { polygon: [[0, 0, 0], [L, 0, 0], [L, W, 0], [0, W, 0]], temperatureC: t.floor },
    { polygon: [[0, 0, H], [L, 0, H], [L, W, H], [0, W, H]], temperatureC: t.ceiling },
    { polygon: [[0, 0, 0], [0, W, 0], [0, W, H], [0, 0, H]], temperatureC: t.xMin },
    { polygon: [[L, 0, 0], [L, W, 0], [L, W, H], [L, 0, H]], temperatureC: t.xMax },
    { polygon: [[0, 0, 0], [L, 0, 0], [L, 0, H], [0, 0, H]], temperatureC: t.yMin },
    { polygon: [[0, W, 0], [L, W, 0], [L, W, H], [0, W, H]], temperatureC: t.yMax },
  ];
}
const uniform = (t: number): RadiantSurface[] => room({ floor: t, ceiling: t, xMin: t, xMax: t, yMin: t, yMax: t });
const seat: Vec3 = [2.1, 1.7, 0.6];

describe("radiantField in a uniform enclosure", () => {
  for (const posture of ["seated", "standing"] as const) {
    it(`${posture}: every plane radiant temperature and the MRTs equal the wall temperature, asymmetries are 0`, () => {
      const f = radiantField({ position: seat, facingRad: 0.4, posture, surfaces: uniform(23.5) });
      const t = f.planeRadiantTemperatures;
      for (const v of [t.upC, t.downC, t.frontC, t.backC, t.leftC, t.rightC, f.mrtC, f.sphereMrtC]) {
        expect(Math.abs(v - 23.5)).toBeLessThanOrEqual(1e-9);
      }
      for (const s of Object.values(t.viewFactorSums)) expect(Math.abs(s - 1)).toBeLessThanOrEqual(1e-12);
      expect(Math.abs(f.sphereViewFactorSum - 1)).toBeLessThanOrEqual(1e-12);
      expect(Math.abs(f.verticalAsymmetryC)).toBeLessThanOrEqual(1e-9);
      expect(Math.abs(f.frontBackAsymmetryC)).toBeLessThanOrEqual(1e-9);
      expect(Math.abs(f.leftRightAsymmetryC)).toBeLessThanOrEqual(1e-9);
      expect(f.horizontalAsymmetryMaxC).toBeLessThanOrEqual(1e-9);
    });
  }
});

describe("radiantField asymmetries", () => {
  it("a warm ceiling gives a positive vertical asymmetry (warmer above)", () => {
    const f = radiantField({ position: seat, facingRad: 0, posture: "seated", surfaces: room({ floor: 20, ceiling: 35, xMin: 20, xMax: 20, yMin: 20, yMax: 20 }) });
    expect(f.verticalAsymmetryC).toBeGreaterThan(1);
    expect(f.planeRadiantTemperatures.upC).toBeGreaterThan(f.planeRadiantTemperatures.downC);
    expect(f.horizontalAsymmetryMaxC).toBeLessThan(0.5 * f.verticalAsymmetryC);
  });

  it("a warm floor gives a negative vertical asymmetry (warmer below)", () => {
    const f = radiantField({ position: seat, facingRad: 0, posture: "seated", surfaces: room({ floor: 30, ceiling: 21, xMin: 21, xMax: 21, yMin: 21, yMax: 21 }) });
    expect(f.verticalAsymmetryC).toBeLessThan(-1);
  });

  it("a cold wall in front shows up in front/back and in the horizontal maximum, warmer side facing away from it", () => {
    // Person faces +x toward the cold wall x = L.
    const f = radiantField({ position: seat, facingRad: 0, posture: "seated", surfaces: room({ floor: 21, ceiling: 21, xMin: 21, xMax: 8, yMin: 21, yMax: 21 }) });
    expect(f.frontBackAsymmetryC).toBeLessThan(-1);
    expect(f.horizontalAsymmetryMaxC).toBeGreaterThanOrEqual(Math.abs(f.frontBackAsymmetryC) - 1e-12);
    // Warmer side points away from the cold wall (−x, azimuth π) within the 5° sampling and the slight off-centre position.
    expect(Math.abs(f.horizontalAsymmetryWarmerAzimuthRad - Math.PI)).toBeLessThan((30 * Math.PI) / 180);
    expect(Math.abs(f.leftRightAsymmetryC)).toBeLessThan(Math.abs(f.frontBackAsymmetryC));
  });

  it("turning the person by 180° swaps front with back and left with right", () => {
    const surfaces = room({ floor: 20, ceiling: 27, xMin: 16, xMax: 24, yMin: 19, yMax: 22 });
    const a = radiantField({ position: seat, facingRad: 0.7, posture: "seated", surfaces });
    const b = radiantField({ position: seat, facingRad: 0.7 + Math.PI, posture: "seated", surfaces });
    expect(b.planeRadiantTemperatures.frontC).toBeCloseTo(a.planeRadiantTemperatures.backC, 12);
    expect(b.planeRadiantTemperatures.backC).toBeCloseTo(a.planeRadiantTemperatures.frontC, 12);
    expect(b.planeRadiantTemperatures.leftC).toBeCloseTo(a.planeRadiantTemperatures.rightC, 12);
    expect(b.frontBackAsymmetryC).toBeCloseTo(-a.frontBackAsymmetryC, 12);
    expect(b.leftRightAsymmetryC).toBeCloseTo(-a.leftRightAsymmetryC, 12);
    expect(b.mrtC).toBeCloseTo(a.mrtC, 12);
    expect(b.horizontalAsymmetryMaxC).toBeCloseTo(a.horizontalAsymmetryMaxC, 12);
  });

  it("left is the front direction turned +90° about the vertical (counter-clockwise from above)", () => {
    // Facing +x: left is +y. Make the y = W wall warm.
    const f = radiantField({ position: seat, facingRad: 0, posture: "seated", surfaces: room({ floor: 20, ceiling: 20, xMin: 20, xMax: 20, yMin: 20, yMax: 30 }) });
    expect(f.leftRightAsymmetryC).toBeGreaterThan(1);
  });

  it("horizontalRadiantAsymmetry matches the radiantField fields", () => {
    const surfaces = room({ floor: 20, ceiling: 27, xMin: 16, xMax: 24, yMin: 19, yMax: 22 });
    const f = radiantField({ position: seat, facingRad: 0.2, posture: "standing", surfaces });
    const h = horizontalRadiantAsymmetry(seat, surfaces);
    expect(h.maxC).toBe(f.horizontalAsymmetryMaxC);
    expect(h.warmerAzimuthRad).toBe(f.horizontalAsymmetryWarmerAzimuthRad);
  });
});

describe("planeRadiantTemperatures call forms and open surface sets", () => {
  it("gives the same result for the object form and the positional form", () => {
    const surfaces = room({ floor: 20, ceiling: 27, xMin: 16, xMax: 24, yMin: 19, yMax: 22 });
    expect(planeRadiantTemperatures({ position: seat, facingRad: 1.1, surfaces })).toEqual(planeRadiantTemperatures(seat, 1.1, surfaces));
  });

  it("normalises by the view-factor sum when the surfaces do not close, reports the sum, and gives NaN where nothing is seen", () => {
    const panel: RadiantSurface = { polygon: [[1, 1, 2.7], [3, 1, 2.7], [3, 3, 2.7], [1, 3, 2.7]], temperatureC: 35 };
    const t = planeRadiantTemperatures(seat, 0, [panel]);
    expect(t.viewFactorSums.up).toBeGreaterThan(0);
    expect(t.viewFactorSums.up).toBeLessThan(1);
    expect(t.upC).toBeCloseTo(35, 10);
    expect(t.viewFactorSums.down).toBe(0);
    expect(Number.isNaN(t.downC)).toBe(true);
  });
});

describe("radiant field: invalid input throws RangeError", () => {
  const surfaces = uniform(21);
  it("rejects non-finite position or facing", () => {
    expect(() => radiantField({ position: [Number.NaN, 1, 1], facingRad: 0, posture: "seated", surfaces })).toThrow(RangeError);
    expect(() => radiantField({ position: seat, facingRad: Number.POSITIVE_INFINITY, posture: "seated", surfaces })).toThrow(RangeError);
  });
  it("rejects bad polygons, temperatures at or below absolute zero, and unknown postures", () => {
    expect(() => radiantField({ position: seat, facingRad: 0, posture: "seated", surfaces: [{ polygon: [[0, 0, 0], [1, 0, 0]], temperatureC: 20 }] })).toThrow(RangeError);
    expect(() => radiantField({ position: seat, facingRad: 0, posture: "seated", surfaces: [{ polygon: [[0, 0, 0], [1, 0, 0], [1, 1, 0]], temperatureC: -300 }] })).toThrow(RangeError);
    expect(() => radiantField({ position: seat, facingRad: 0, posture: "reclining" as "seated", surfaces })).toThrow(RangeError);
  });
});

describe("mean radiant temperature helpers", () => {
  it("fourthPowerMean weights in the fourth power of absolute temperature and normalises by Σw", () => {
    const m = fourthPowerMean([0.25, 0.25], [10, 30]);
    const expected = ((283.15 ** 4 + 303.15 ** 4) / 2) ** 0.25 - 273.15;
    expect(m.temperatureC).toBeCloseTo(expected, 10);
    expect(m.weightSum).toBeCloseTo(0.5, 15);
    expect(m.temperatureC).toBeGreaterThan(20); // fourth-power mean exceeds the linear mean
  });

  it("fourthPowerMean returns NaN when all weights are 0 and throws RangeError for bad input", () => {
    expect(Number.isNaN(fourthPowerMean([0, 0], [20, 30]).temperatureC)).toBe(true);
    expect(() => fourthPowerMean([1], [20, 30])).toThrow(RangeError);
    expect(() => fourthPowerMean([-0.1], [20])).toThrow(RangeError);
    expect(() => fourthPowerMean([1], [-273.15])).toThrow(RangeError);
  });

  it("personMeanRadiantTemperature returns the wall temperature in a uniform room and reports Σ F ≈ 1", () => {
    const r = personMeanRadiantTemperature({ position: seat, posture: "seated" }, uniform(22));
    expect(r.mrtC).toBeCloseTo(22, 10);
    expect(Math.abs(r.factorSum - 1)).toBeLessThan(0.06);
    expect(r.factors).toHaveLength(6);
  });

  it("with a warm ceiling the person MRT lies between the surface temperatures and the small-sphere view factors still close (Σ F = 1)", () => {
    const warm = room({ floor: 20, ceiling: 35, xMin: 20, xMax: 20, yMin: 20, yMax: 20 });
    const seated = personMeanRadiantTemperature({ position: seat, posture: "seated" }, warm).mrtC;
    expect(seated).toBeGreaterThan(20);
    expect(seated).toBeLessThan(35);
    const sphere = sphereMeanRadiantTemperature(seat, warm);
    expect(Math.abs(sphere.factorSum - 1)).toBeLessThanOrEqual(1e-12);
    expect(sphere.mrtC).toBeGreaterThan(20);
  });
});

describe("horizontal asymmetry reporting", () => {
  it("reports the sampled azimuth and the signed difference consistently with the warmer side", () => {
    // Warm wall at y = W (plan direction +y, azimuth π/2).
    const f = radiantField({ position: [2.5, 2, 0.6], facingRad: 0, posture: "seated", surfaces: room({ floor: 20, ceiling: 20, xMin: 20, xMax: 20, yMin: 20, yMax: 32 }) });
    expect(f.horizontalAsymmetryAzimuthRad).toBeGreaterThanOrEqual(0);
    expect(f.horizontalAsymmetryAzimuthRad).toBeLessThan(Math.PI);
    expect(Math.abs(f.horizontalAsymmetrySignedC)).toBe(f.horizontalAsymmetryMaxC);
    expect(f.horizontalAsymmetryAzimuthRad).toBeCloseTo(Math.PI / 2, 10); // centred seat: symmetric about the y axis
    expect(f.horizontalAsymmetrySignedC).toBeGreaterThan(0);
    expect(f.horizontalAsymmetryWarmerAzimuthRad).toBeCloseTo(Math.PI / 2, 10);
  });
});
