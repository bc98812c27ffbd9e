import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  buildLouverTable,
  louverDirectionalEmissivity,
  louverEffectiveTemperatureC,
  louverEmissivityToward,
  louverExitAngleDeg,
  type LouverAperture,
} from "@/lib/panels";
import type { Vec3 } from "@/lib/viewfactor";

const DOWN: Vec3 = [0, 0, -1]; // ceiling panel facing the room
const X: Vec3 = [1, 0, 0];
const Y: Vec3 = [0, 1, 0];

describe("louverExitAngleDeg", () => {
  it("is 0° straight out of the face and for any direction along the grooves, whatever its tilt", () => {
    expect(louverExitAngleDeg(DOWN, X, [0, 0, -2])).toBe(0);
    expect(louverExitAngleDeg(DOWN, X, [5, 0, -1])).toBe(0);
    expect(louverExitAngleDeg(DOWN, X, [-50, 0, -1])).toBe(0);
  });

  it("is the tilt from the normal for a direction across the grooves", () => {
    expect(louverExitAngleDeg(DOWN, X, [0, 1, -1])).toBeCloseTo(45, 12);
    expect(louverExitAngleDeg(DOWN, X, [0, -Math.sqrt(3), -1])).toBeCloseTo(60, 12);
  });

  it("projects a general direction on the plane across the grooves", () => {
    // d = (3, 1, −1): the axial part (3) is dropped; (0, 1, −1) is 45° from the normal.
    expect(louverExitAngleDeg(DOWN, X, [3, 1, -1])).toBeCloseTo(45, 12);
  });

  it("is 90° in the panel plane and NaN behind the face", () => {
    expect(louverExitAngleDeg(DOWN, X, [0, 1, 0])).toBe(90);
    expect(louverExitAngleDeg(DOWN, X, [1, 0, 0])).toBe(90);
    expect(Number.isNaN(louverExitAngleDeg(DOWN, X, [0, 0, 1]))).toBe(true);
  });

  it("stays in 0–90°, ignores the direction's length and the axis sign, and is mirror-symmetric across the grooves", () => {
    const comp = fc.double({ min: -10, max: 10, noNaN: true });
    fc.assert(
      fc.property(comp, comp, fc.double({ min: -10, max: -1e-3, noNaN: true }), fc.double({ min: 0.01, max: 100, noNaN: true }), (x, y, z, s) => {
        const t = louverExitAngleDeg(DOWN, X, [x, y, z]);
        expect(t).toBeGreaterThanOrEqual(0);
        expect(t).toBeLessThanOrEqual(90);
        expect(louverExitAngleDeg(DOWN, X, [s * x, s * y, s * z])).toBeCloseTo(t, 9);
        expect(louverExitAngleDeg(DOWN, [-1, 0, 0], [x, y, z])).toBeCloseTo(t, 12);
        expect(louverExitAngleDeg(DOWN, X, [x, -y, z])).toBeCloseTo(t, 12);
      }),
    );
  });

  it("works for a wall panel with vertical grooves", () => {
    // Wall facing +x, grooves vertical (axis z): a seat level with it off to the side at 30° across the grooves.
    expect(louverExitAngleDeg([1, 0, 0], [0, 0, 1], [Math.cos(Math.PI / 6), Math.sin(Math.PI / 6), -0.7])).toBeCloseTo(30, 10);
  });

  const bad: ReadonlyArray<[string, Vec3, Vec3, Vec3]> = [
    ["a non-unit normal", [0, 0, -2], X, [0, 0, -1]],
    ["a non-unit axis", DOWN, [2, 0, 0], [0, 0, -1]],
    ["an axis out of the panel plane", DOWN, [Math.SQRT1_2, 0, -Math.SQRT1_2], [0, 0, -1]],
    ["a zero direction", DOWN, X, [0, 0, 0]],
    ["a NaN component", DOWN, X, [Number.NaN, 0, -1]],
  ];

  it.each(bad)("throws RangeError for %s", (_label, n, a, d) => {
    expect(bad.length).toBeGreaterThan(0);
    expect(() => louverExitAngleDeg(n, a, d)).toThrow(RangeError);
  });
});

describe("louverDirectionalEmissivity", () => {
  const setting = { directional: [0.9, 0.8, 0.7, 0.6, 0.5, 0.4, 0.3, 0.2, 0.1] };

  it("returns the bin value at each bin centre and interpolates linearly between centres", () => {
    for (let k = 0; k < 9; k++) expect(louverDirectionalEmissivity(setting, 10 * k + 5)).toBeCloseTo(setting.directional[k] as number, 12);
    expect(louverDirectionalEmissivity(setting, 20)).toBeCloseTo(0.75, 12);
    expect(louverDirectionalEmissivity(setting, 47.5)).toBeCloseTo(0.475, 12); // centres 45° (0.5) and 55° (0.4), a quarter of the way
  });

  it("is flat on 0–5° and 85–90° (no extrapolation)", () => {
    expect(louverDirectionalEmissivity(setting, 0)).toBe(0.9);
    expect(louverDirectionalEmissivity(setting, 3)).toBe(0.9);
    expect(louverDirectionalEmissivity(setting, 88)).toBe(0.1);
    expect(louverDirectionalEmissivity(setting, 90)).toBe(0.1);
  });

  it("is continuous in the exit angle", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 89.99, noNaN: true }), (t) => {
        expect(Math.abs(louverDirectionalEmissivity(setting, t + 0.01) - louverDirectionalEmissivity(setting, t))).toBeLessThanOrEqual(0.01 * 0.01 + 1e-12);
      }),
    );
  });

  it("throws RangeError for an angle outside 0–90°, NaN, or not 9 bins", () => {
    expect(() => louverDirectionalEmissivity(setting, 91)).toThrow(RangeError);
    expect(() => louverDirectionalEmissivity(setting, Number.NaN)).toThrow(RangeError);
    expect(() => louverDirectionalEmissivity({ directional: [1, 2] }, 10)).toThrow(RangeError);
  });
});

describe("louverEffectiveTemperatureC", () => {
  it("is the surface temperature for ε = 1 and the surroundings for ε = 0", () => {
    expect(louverEffectiveTemperatureC({ surfaceC: 40, surroundingsC: 20, directionalEmissivity: 1 })).toBeCloseTo(40, 10);
    expect(louverEffectiveTemperatureC({ surfaceC: 40, surroundingsC: 20, directionalEmissivity: 0 })).toBeCloseTo(20, 10);
  });

  it("rises with the emissivity toward a heated panel and falls toward a cooled one", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 0.99, noNaN: true }), fc.double({ min: 0.001, max: 0.01, noNaN: true }), (e, de) => {
        const warm = (x: number): number => louverEffectiveTemperatureC({ surfaceC: 35, surroundingsC: 21, directionalEmissivity: x });
        const cool = (x: number): number => louverEffectiveTemperatureC({ surfaceC: 16, surroundingsC: 26, directionalEmissivity: x });
        expect(warm(e + de)).toBeGreaterThan(warm(e));
        expect(cool(e + de)).toBeLessThan(cool(e));
      }),
    );
  });

  it("throws RangeError for an emissivity outside 0–1 or a temperature below absolute zero", () => {
    expect(() => louverEffectiveTemperatureC({ surfaceC: 40, surroundingsC: 20, directionalEmissivity: 1.2 })).toThrow(RangeError);
    expect(() => louverEffectiveTemperatureC({ surfaceC: -300, surroundingsC: 20, directionalEmissivity: 0.5 })).toThrow(RangeError);
    expect(() => louverEffectiveTemperatureC({ surfaceC: 40, surroundingsC: Number.NaN, directionalEmissivity: 0.5 })).toThrow(RangeError);
  });
});

/*
 * The required behaviour. A heated ceiling panel (normal straight down) at 2.7 m, seats'
 * body centres at 0.6 m. Its grooves first run along x.
 * - Seat BELOW: straight under the panel — looks straight into the slots (θ = 0).
 * - Seat ALONG: 6 m off along x, i.e. along the grooves — its line of sight runs down the
 *   slots, so projected on the plane across the grooves it still points along the bisector
 *   (θ = 0): it is "in line with the openings" and looks into the groove vertices.
 * - Seat ACROSS: 6 m off along y, across the grooves — its line of sight is tilted 70.7° from
 *   the bisector in the plane across the grooves: it grazes the openings and sees mostly the
 *   blade tips near the rims.
 * With diffuse walls the apparent directional emissivity falls toward grazing, so BELOW and
 * ALONG see a hotter panel than ACROSS. Turning the grooves 90° in plan (axis y) swaps the
 * roles of ALONG and ACROSS. Both seats are equally far from the panel and equally tilted from
 * its normal: only the groove orientation differs.
 */
describe("directional emission toward seats (louvered ceiling panel)", () => {
  const panelPoint: Vec3 = [0, 0, 2.7];
  const below: Vec3 = [0, 0, 0.6];
  const seatOnX: Vec3 = [6, 0, 0.6];
  const seatOnY: Vec3 = [0, 6, 0.6];
  const emissivities = [0.05, 0.3, 0.9];
  const angles = [30, 60, 90, 120];
  const apertures: LouverAperture[] = ["hinged-blades", "full-face"];
  const tables = emissivities.map((wallEmissivity) => buildLouverTable({ wallEmissivity, finish: "diffuse", stepDeg: 15 }));

  const teff = (tableIndex: number, openingAngleDeg: number, aperture: LouverAperture, axis: Vec3, seat: Vec3, surfaceC: number, surroundingsC: number): number => {
    const toward = louverEmissivityToward({ table: tables[tableIndex]!, openingAngleDeg, aperture, normal: DOWN, axis, panelPoint, targetPoint: seat });
    expect(toward.visible).toBe(true);
    return louverEffectiveTemperatureC({ surfaceC, surroundingsC, directionalEmissivity: toward.emissivity });
  };

  it("gives a seat in line with the openings (below, or off along the grooves) a hotter panel than a seat off across the grooves, and the reverse after the grooves turn 90° in plan", () => {
    expect(tables.length * angles.length * apertures.length).toBeGreaterThan(0);
    for (let t = 0; t < tables.length; t++) {
      for (const a of angles) {
        for (const ap of apertures) {
          const label = `ε=${emissivities[t]}, ${a}°, ${ap}`;
          // Grooves along x: the seat on x is along the grooves, the seat on y across them.
          const belowX = teff(t, a, ap, X, below, 40, 20);
          const alongX = teff(t, a, ap, X, seatOnX, 40, 20);
          const acrossX = teff(t, a, ap, X, seatOnY, 40, 20);
          expect(alongX, label).toBeGreaterThan(acrossX);
          expect(belowX, label).toBeGreaterThan(acrossX);
          expect(alongX, label).toBeCloseTo(belowX, 12);
          // Grooves turned to y: the seat on y is now along the grooves, the seat on x across.
          const onXTurned = teff(t, a, ap, Y, seatOnX, 40, 20);
          const onYTurned = teff(t, a, ap, Y, seatOnY, 40, 20);
          expect(onYTurned, label).toBeGreaterThan(onXTurned);
          expect(onYTurned, label).toBeCloseTo(alongX, 12);
          expect(onXTurned, label).toBeCloseTo(acrossX, 12);
        }
      }
    }
  });

  it("gives the in-line seat the colder panel when the panel cools", () => {
    for (let t = 0; t < tables.length; t++) {
      expect(teff(t, 60, "hinged-blades", X, seatOnX, 16, 26)).toBeLessThan(teff(t, 60, "hinged-blades", X, seatOnY, 16, 26));
    }
  });

  it("gives a seat at a grazing angle across the grooves less than a seat at a moderate angle", () => {
    const moderate = teff(0, 60, "hinged-blades", X, [0, 1.5, 0.6], 40, 20); // θ ≈ 35.5°
    const grazing = teff(0, 60, "hinged-blades", X, [0, 20, 0.6], 40, 20); // θ ≈ 84°
    expect(moderate).toBeGreaterThan(grazing);
  });

  it("makes the fully open (flat) setting the same toward every seat, as a flat panel of the wall emissivity", () => {
    const flat = louverEffectiveTemperatureC({ surfaceC: 40, surroundingsC: 20, directionalEmissivity: 0.3 });
    for (const seat of [below, seatOnX, seatOnY]) expect(teff(1, 180, "hinged-blades", X, seat, 40, 20)).toBeCloseTo(flat, 12);
  });

  it("reports a seat behind the face as not visible, with no emission toward it", () => {
    const r = louverEmissivityToward({ table: tables[0]!, openingAngleDeg: 60, normal: DOWN, axis: X, panelPoint, targetPoint: [0, 0, 3.5] });
    expect(r.visible).toBe(false);
    expect(r.emissivity).toBe(0);
    expect(Number.isNaN(r.exitAngleDeg)).toBe(true);
  });

  it("makes a closed hinged-blade louver invisible in temperature: the seat sees the surroundings", () => {
    expect(teff(0, 0, "hinged-blades", X, below, 40, 20)).toBeCloseTo(20, 12);
  });
});
