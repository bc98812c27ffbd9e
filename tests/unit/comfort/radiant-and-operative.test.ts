import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  meanRadiantTemperature,
  meanRadiantTemperatureDetailed,
  meanRadiantTemperatureLinear,
  operativeAirWeight,
  operativeTemperature,
  operativeTemperatureDetailed,
} from "@/lib/comfort";

const part = fc.record({
  angleFactor: fc.double({ min: 0.001, max: 1, noNaN: true }),
  temperatureC: fc.double({ min: -20, max: 80, noNaN: true }),
});

describe("meanRadiantTemperature", () => {
  it("returns the temperature of a single surface", () => {
    expect(meanRadiantTemperature([{ angleFactor: 0.3, temperatureC: 21.5 }])).toBeCloseTo(21.5, 10);
  });

  it("lies between the coldest and the warmest surface and never below the linear mean", () => {
    fc.assert(
      fc.property(fc.array(part, { minLength: 1, maxLength: 8 }), (parts) => {
        const mrt = meanRadiantTemperature(parts);
        const lin = meanRadiantTemperatureLinear(parts);
        const ts = parts.map((p) => p.temperatureC);
        return mrt >= Math.min(...ts) - 1e-9 && mrt <= Math.max(...ts) + 1e-9 && mrt >= lin - 1e-9;
      }),
    );
  });

  it("does not depend on the order of the surfaces", () => {
    fc.assert(
      fc.property(fc.array(part, { minLength: 2, maxLength: 8 }), (parts) => {
        const reversed = [...parts].reverse();
        return Math.abs(meanRadiantTemperature(parts) - meanRadiantTemperature(reversed)) < 1e-9;
      }),
    );
  });

  it("reports the raw angle-factor sum", () => {
    const r = meanRadiantTemperatureDetailed([
      { angleFactor: 0.4, temperatureC: 20 },
      { angleFactor: 0.4, temperatureC: 22 },
    ]);
    expect(r.angleFactorSum).toBeCloseTo(0.8, 12);
  });

  const bad: ReadonlyArray<[string, Array<{ angleFactor: number; temperatureC: number }>]> = [
    ["an empty list", []],
    ["a negative angle factor", [{ angleFactor: -0.1, temperatureC: 20 }]],
    ["a NaN angle factor", [{ angleFactor: Number.NaN, temperatureC: 20 }]],
    ["all-zero angle factors", [{ angleFactor: 0, temperatureC: 20 }]],
    ["a temperature below absolute zero", [{ angleFactor: 1, temperatureC: -300 }]],
    ["an infinite temperature", [{ angleFactor: 1, temperatureC: Number.POSITIVE_INFINITY }]],
  ];

  it.each(bad)("throws RangeError for %s", (_label, parts) => {
    expect(bad.length).toBeGreaterThan(0);
    expect(() => meanRadiantTemperature(parts)).toThrow(RangeError);
    expect(() => meanRadiantTemperatureLinear(parts)).toThrow(RangeError);
  });
});

describe("operativeTemperature", () => {
  it("uses A = 0.5, 0.6, 0.7 below 0.2, from 0.2 to 0.6 and above 0.6 m/s", () => {
    expect(operativeAirWeight(0.1)).toBe(0.5);
    expect(operativeAirWeight(0.2)).toBe(0.6);
    expect(operativeAirWeight(0.6)).toBe(0.6);
    expect(operativeAirWeight(0.8)).toBe(0.7);
  });

  it("equals the common value when air and radiant temperatures are equal", () => {
    fc.assert(
      fc.property(fc.double({ min: -10, max: 50, noNaN: true }), fc.double({ min: 0, max: 2, noNaN: true }), (t, v) =>
        Math.abs(operativeTemperature(t, t, v) - t) < 1e-9,
      ),
    );
  });

  it("flags air speeds above 1 m/s and keeps A = 0.7 there", () => {
    const r = operativeTemperatureDetailed(20, 30, 1.5);
    expect(r.withinRange).toBe(false);
    expect(r.airWeight).toBe(0.7);
    expect(r.operativeC).toBeCloseTo(23, 12);
    expect(operativeTemperatureDetailed(20, 30, 1).withinRange).toBe(true);
  });

  it("throws RangeError for a negative speed or non-finite temperatures", () => {
    expect(() => operativeTemperature(20, 20, -0.1)).toThrow(RangeError);
    expect(() => operativeTemperature(Number.NaN, 20, 0.1)).toThrow(RangeError);
    expect(() => operativeTemperature(20, Number.POSITIVE_INFINITY, 0.1)).toThrow(RangeError);
  });
});
