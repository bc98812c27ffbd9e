import { describe, expect, it } from "vitest";
import {
  insideSurfaceResistance,
  insideSurfaceTemperature,
  R_SI_DOWNWARD_M2K_W,
  R_SI_HORIZONTAL_M2K_W,
  R_SI_UPWARD_M2K_W,
} from "@/lib/scenarios/surface-temperature";

describe("insideSurfaceTemperature (ISO 6946:2017, t_si = t_i − U·R_si·(t_i − t_e))", () => {
  it("worked example: a window U = 1.4 W/m²K, 20 °C inside, −10 °C outside → 20 − 1.4·0.13·30 = 14.54 °C", () => {
    expect(insideSurfaceTemperature({ uValueWm2K: 1.4, insideC: 20, outsideC: -10, position: "opening" })).toBeCloseTo(14.54, 10);
  });

  it("uses the Table 7 resistances 0.10 / 0.13 / 0.17 m²K/W by the direction of heat flow", () => {
    expect([R_SI_UPWARD_M2K_W, R_SI_HORIZONTAL_M2K_W, R_SI_DOWNWARD_M2K_W]).toEqual([0.1, 0.13, 0.17]);
    expect(insideSurfaceResistance("wall", 20, -10)).toBe(0.13);
    expect(insideSurfaceResistance("ceiling", 20, -10)).toBe(0.1); // heat flows up through a roof in winter
    expect(insideSurfaceResistance("ceiling", 26, 32)).toBe(0.17); // and down in summer
    expect(insideSurfaceResistance("floor", 20, -10)).toBe(0.17);
    expect(insideSurfaceResistance("floor", 26, 32)).toBe(0.1);
  });

  it("a roof U = 0.25 in winter: 20 − 0.25·0.10·28 = 19.3 °C; in summer the inside surface is warmer than the air", () => {
    expect(insideSurfaceTemperature({ uValueWm2K: 0.25, insideC: 20, outsideC: -8, position: "ceiling" })).toBeCloseTo(19.3, 10);
    expect(insideSurfaceTemperature({ uValueWm2K: 0.25, insideC: 26, outsideC: 32, position: "ceiling" })).toBeCloseTo(26 + 0.25 * 0.17 * 6, 10);
  });

  it("never puts the surface beyond the outdoor temperature (U·R_si capped at 1)", () => {
    expect(insideSurfaceTemperature({ uValueWm2K: 10, insideC: 20, outsideC: -10, position: "floor" })).toBe(-10);
  });

  it("throws RangeError for a non-positive U-value or a non-finite temperature", () => {
    expect(() => insideSurfaceTemperature({ uValueWm2K: 0, insideC: 20, outsideC: 0, position: "wall" })).toThrow(RangeError);
    expect(() => insideSurfaceTemperature({ uValueWm2K: 1, insideC: Number.NaN, outsideC: 0, position: "wall" })).toThrow(RangeError);
  });
});
