import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  dewPoint,
  dewPointDetailed,
  iso7730VaporPressurePa,
  MAGNUS_AERK_A_KPA,
  saturationVaporPressure,
} from "@/lib/comfort";

describe("saturationVaporPressure", () => {
  it("equals the Magnus A coefficient at 0 °C", () => {
    expect(saturationVaporPressure(0)).toBe(MAGNUS_AERK_A_KPA);
  });

  it("increases with temperature", () => {
    fc.assert(
      fc.property(fc.double({ min: -40, max: 49, noNaN: true }), fc.double({ min: 0.01, max: 1, noNaN: true }), (t, d) =>
        saturationVaporPressure(t + d) > saturationVaporPressure(t),
      ),
    );
  });

  it("throws RangeError for non-finite temperatures or at the formula's pole", () => {
    expect(() => saturationVaporPressure(Number.NaN)).toThrow(RangeError);
    expect(() => saturationVaporPressure(Number.POSITIVE_INFINITY)).toThrow(RangeError);
    expect(() => saturationVaporPressure(-243.04)).toThrow(RangeError);
  });
});

describe("dewPoint", () => {
  it("equals the air temperature at 100 % RH", () => {
    fc.assert(
      fc.property(fc.double({ min: -40, max: 50, noNaN: true }), (t) => Math.abs(dewPoint(t, 100) - t) < 1e-9),
    );
  });

  it("is the temperature whose saturation pressure equals the vapour pressure (round trip)", () => {
    fc.assert(
      fc.property(fc.double({ min: -20, max: 50, noNaN: true }), fc.double({ min: 1, max: 100, noNaN: true }), (t, rh) => {
        const pv = (rh / 100) * saturationVaporPressure(t);
        return Math.abs(saturationVaporPressure(dewPoint(t, rh)) / pv - 1) < 1e-9;
      }),
    );
  });

  it("rises with relative humidity and never exceeds the air temperature", () => {
    fc.assert(
      fc.property(fc.double({ min: -20, max: 50, noNaN: true }), fc.double({ min: 1, max: 99, noNaN: true }), (t, rh) => {
        const td = dewPoint(t, rh);
        return td < dewPoint(t, rh + 1) && td <= t;
      }),
    );
  });

  it("is −Infinity for perfectly dry air", () => {
    expect(dewPoint(20, 0)).toBe(Number.NEGATIVE_INFINITY);
    expect(dewPointDetailed(20, 0).withinRange).toBe(false);
  });

  it("flags air or dew-point temperatures outside −40…50 °C", () => {
    expect(dewPointDetailed(20, 50).withinRange).toBe(true);
    expect(dewPointDetailed(55, 50).withinRange).toBe(false);
    expect(dewPointDetailed(-30, 5).withinRange).toBe(false);
  });

  it("throws RangeError for RH outside 0…100 % or a non-finite temperature", () => {
    expect(() => dewPoint(20, -1)).toThrow(RangeError);
    expect(() => dewPoint(20, 101)).toThrow(RangeError);
    expect(() => dewPoint(Number.NaN, 50)).toThrow(RangeError);
  });
});

describe("iso7730VaporPressurePa", () => {
  it("scales linearly with relative humidity and is 0 for dry air", () => {
    expect(iso7730VaporPressurePa(22, 0)).toBe(0);
    expect(iso7730VaporPressurePa(22, 60)).toBeCloseTo(2 * iso7730VaporPressurePa(22, 30), 9);
  });

  it("throws RangeError for RH outside 0…100 %", () => {
    expect(() => iso7730VaporPressurePa(22, 120)).toThrow(RangeError);
  });
});
