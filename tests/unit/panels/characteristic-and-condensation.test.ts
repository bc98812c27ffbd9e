import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { dewPoint } from "@/lib/comfort";
import {
  characteristicOutput,
  characteristicTemperatureDifference,
  condensationMargin,
  DEFAULT_CONDENSATION_SAFETY_MARGIN_K,
  logarithmicMeanTemperatureDifference,
  meanWaterTemperatureForOutput,
} from "@/lib/panels";

const curve = fc.record({
  kWPerKn: fc.double({ min: 0.5, max: 50, noNaN: true }),
  n: fc.double({ min: 1, max: 1.5, noNaN: true }),
});

describe("characteristicOutput and its inverses", () => {
  it("round-trips output → ΔT → output", () => {
    fc.assert(
      fc.property(curve, fc.double({ min: 0.5, max: 60, noNaN: true }), (c, dt) => {
        const q = characteristicOutput({ ...c, meanWaterC: 20 + dt, roomC: 20 });
        const back = characteristicTemperatureDifference({ ...c, outputW: q });
        return Math.abs(back - dt) < 1e-9 * Math.max(1, dt);
      }),
    );
  });

  it("round-trips the mean water temperature for an output in heating and cooling", () => {
    fc.assert(
      fc.property(
        curve,
        fc.double({ min: 1, max: 2000, noNaN: true }),
        fc.constantFrom("heating" as const, "cooling" as const),
        (c, q, mode) => {
          const tw = meanWaterTemperatureForOutput({ ...c, outputW: q, roomC: 24, mode });
          const again = characteristicOutput({ ...c, meanWaterC: tw, roomC: 24, mode });
          return Math.abs(again / q - 1) < 1e-9 && (mode === "heating" ? tw > 24 : tw < 24);
        },
      ),
    );
  });

  it("reports cooling capacity as positive for water colder than the room", () => {
    expect(characteristicOutput({ kWPerKn: 10, n: 1, meanWaterC: 17, roomC: 26, mode: "cooling" })).toBeCloseTo(90, 12);
    expect(characteristicOutput({ kWPerKn: 10, n: 1, meanWaterC: 17, roomC: 26 })).toBeCloseTo(-90, 12);
  });

  it("accepts flow/return with an arithmetic or logarithmic mean", () => {
    const base = { kWPerKn: 5, n: 1.2, flowC: 45, returnC: 35, roomC: 20 };
    const arith = characteristicOutput(base);
    const log = characteristicOutput({ ...base, meanMethod: "logarithmic" });
    expect(arith).toBeCloseTo(5 * 20 ** 1.2, 9);
    expect(log).toBeLessThan(arith); // log-mean ≤ arithmetic mean
  });

  it("takes the log-mean as the common value when flow equals return", () => {
    expect(logarithmicMeanTemperatureDifference(40, 40, 20)).toBe(20);
  });

  it("throws RangeError for water temperatures on both sides of the room, bad coefficients or NaN", () => {
    expect(() => logarithmicMeanTemperatureDifference(30, 15, 20)).toThrow(RangeError);
    expect(() => characteristicOutput({ kWPerKn: 0, n: 1.3, meanWaterC: 50, roomC: 20 })).toThrow(RangeError);
    expect(() => characteristicOutput({ kWPerKn: 1, n: -1, meanWaterC: 50, roomC: 20 })).toThrow(RangeError);
    expect(() => characteristicOutput({ kWPerKn: 1, n: 1.3, meanWaterC: Number.NaN, roomC: 20 })).toThrow(RangeError);
    expect(() => characteristicTemperatureDifference({ kWPerKn: 1, n: 1.3, outputW: Number.POSITIVE_INFINITY })).toThrow(
      RangeError,
    );
  });
});

describe("condensationMargin", () => {
  it("is the surface temperature minus the room dew point", () => {
    const r = condensationMargin({ surfaceC: 18, airC: 26, rhPercent: 50 });
    expect(r.dewPointC).toBeCloseTo(dewPoint(26, 50), 12);
    expect(r.marginK).toBeCloseTo(18 - dewPoint(26, 50), 12);
    expect(r.withinRange).toBe(true);
  });

  it("flags a risk at or below the default 2 K safety margin", () => {
    expect(DEFAULT_CONDENSATION_SAFETY_MARGIN_K).toBe(2);
    const td = dewPoint(26, 50);
    expect(condensationMargin({ surfaceC: td + 2.01, airC: 26, rhPercent: 50 }).risk).toBe(false);
    expect(condensationMargin({ surfaceC: td + 1.99, airC: 26, rhPercent: 50 }).risk).toBe(true);
    expect(condensationMargin({ surfaceC: td - 1, airC: 26, rhPercent: 50 }).marginK).toBeCloseTo(-1, 12);
  });

  it("honours a custom safety margin", () => {
    const td = dewPoint(24, 60);
    expect(condensationMargin({ surfaceC: td + 1.5, airC: 24, rhPercent: 60, safetyMarginK: 1 }).risk).toBe(false);
  });

  it("has no risk in perfectly dry air", () => {
    const r = condensationMargin({ surfaceC: 5, airC: 24, rhPercent: 0 });
    expect(r.marginK).toBe(Number.POSITIVE_INFINITY);
    expect(r.risk).toBe(false);
  });

  it("throws RangeError for RH outside 0…100 %, a negative margin or NaN", () => {
    expect(() => condensationMargin({ surfaceC: 18, airC: 26, rhPercent: 110 })).toThrow(RangeError);
    expect(() => condensationMargin({ surfaceC: 18, airC: 26, rhPercent: 50, safetyMarginK: -1 })).toThrow(RangeError);
    expect(() => condensationMargin({ surfaceC: Number.NaN, airC: 26, rhPercent: 50 })).toThrow(RangeError);
  });
});
