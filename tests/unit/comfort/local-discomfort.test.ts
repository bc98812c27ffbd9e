import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  draughtRate,
  draughtRateDetailed,
  floorTemperatureDissatisfied,
  RADIANT_ASYMMETRY_KINDS,
  radiantAsymmetryDissatisfied,
  radiantAsymmetryDissatisfiedDetailed,
  verticalAirTemperatureDifferenceDissatisfied,
  verticalAirTemperatureDifferenceDissatisfiedDetailed,
  type RadiantAsymmetryKind,
} from "@/lib/comfort";

describe("draughtRate", () => {
  it("grows with air speed and falls with air temperature inside the model range", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 20, max: 26, noNaN: true }),
        fc.double({ min: 0.06, max: 0.45, noNaN: true }),
        fc.double({ min: 10, max: 60, noNaN: true }),
        (ta, v, tu) => {
          fc.pre(draughtRate(ta, v + 0.01, tu) < 100); // below the 100 % cap
          return draughtRate(ta, v + 0.01, tu) > draughtRate(ta, v, tu) && draughtRate(ta + 0.5, v, tu) < draughtRate(ta, v, tu);
        },
      ),
    );
  });

  it("is 0 when the air is at 34 °C or warmer", () => {
    expect(draughtRate(34, 0.3, 40)).toBe(0);
    expect(draughtRate(36, 0.3, 40)).toBe(0);
  });

  it("flags conditions outside 20…26 °C, < 0.5 m/s and Tu 10…60 %", () => {
    expect(draughtRateDetailed(22, 0.2, 40).withinRange).toBe(true);
    expect(draughtRateDetailed(18, 0.2, 40).withinRange).toBe(false);
    expect(draughtRateDetailed(22, 0.5, 40).withinRange).toBe(false);
    expect(draughtRateDetailed(22, 0.2, 70).withinRange).toBe(false);
  });

  it("throws RangeError for negative speed, Tu outside 0…100 % or NaN", () => {
    expect(() => draughtRate(22, -0.1, 40)).toThrow(RangeError);
    expect(() => draughtRate(22, 0.2, 101)).toThrow(RangeError);
    expect(() => draughtRate(Number.NaN, 0.2, 40)).toThrow(RangeError);
  });
});

describe("verticalAirTemperatureDifferenceDissatisfied", () => {
  it("grows with the head-to-ankle difference", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 7.9, noNaN: true }), (dt) =>
        verticalAirTemperatureDifferenceDissatisfied(dt + 0.1) > verticalAirTemperatureDifferenceDissatisfied(dt),
      ),
    );
  });

  it("flags differences outside 0…8 °C but still returns a value", () => {
    expect(verticalAirTemperatureDifferenceDissatisfiedDetailed(3).withinRange).toBe(true);
    const high = verticalAirTemperatureDifferenceDissatisfiedDetailed(8);
    expect(high.withinRange).toBe(false);
    expect(high.percent).toBeGreaterThan(50);
    expect(verticalAirTemperatureDifferenceDissatisfiedDetailed(-1).withinRange).toBe(false);
  });

  it("throws RangeError for a non-finite difference", () => {
    expect(() => verticalAirTemperatureDifferenceDissatisfied(Number.NaN)).toThrow(RangeError);
  });
});

describe("floorTemperatureDissatisfied", () => {
  it("stays between 5 % and 100 %", () => {
    fc.assert(
      fc.property(fc.double({ min: -20, max: 70, noNaN: true }), (t) => {
        const pd = floorTemperatureDissatisfied(t);
        return pd >= 5 && pd < 100;
      }),
    );
  });

  it("throws RangeError for a non-finite temperature", () => {
    expect(() => floorTemperatureDissatisfied(Number.NEGATIVE_INFINITY)).toThrow(RangeError);
  });
});

describe("radiantAsymmetryDissatisfied", () => {
  it("covers the four kinds", () => {
    expect(RADIANT_ASYMMETRY_KINDS.length).toBe(4);
  });

  it.each(RADIANT_ASYMMETRY_KINDS.map((k) => [k] as [RadiantAsymmetryKind]))(
    "is ≥ 0 and non-decreasing in Δt for %s",
    (kind) => {
      fc.assert(
        fc.property(fc.double({ min: 0, max: 40, noNaN: true }), (dt) => {
          const a = radiantAsymmetryDissatisfied(kind, dt);
          return a >= 0 && radiantAsymmetryDissatisfied(kind, dt + 0.5) >= a;
        }),
      );
    },
  );

  it("clamps the warm-wall curve to 0 % for small asymmetries", () => {
    expect(radiantAsymmetryDissatisfied("warmWall", 0)).toBe(0);
  });

  it("ranks the kinds as the standard's figure does: warm ceiling and cool wall are the least tolerated", () => {
    const at10 = (k: RadiantAsymmetryKind): number => radiantAsymmetryDissatisfied(k, 10);
    expect(at10("warmCeiling")).toBeGreaterThan(at10("coolCeiling"));
    expect(at10("coolWall")).toBeGreaterThan(at10("warmWall"));
  });

  it("flags asymmetries at or beyond each curve's limit", () => {
    expect(radiantAsymmetryDissatisfiedDetailed("warmCeiling", 22).withinRange).toBe(true);
    expect(radiantAsymmetryDissatisfiedDetailed("warmCeiling", 23).withinRange).toBe(false);
    expect(radiantAsymmetryDissatisfiedDetailed("coolWall", 15).withinRange).toBe(false);
    expect(radiantAsymmetryDissatisfiedDetailed("coolCeiling", 16).withinRange).toBe(false);
    expect(radiantAsymmetryDissatisfiedDetailed("warmWall", 34).withinRange).toBe(true);
  });

  it("throws RangeError for a negative asymmetry or an unknown kind", () => {
    expect(() => radiantAsymmetryDissatisfied("coolWall", -1)).toThrow(RangeError);
    expect(() => radiantAsymmetryDissatisfied("hotFloor" as RadiantAsymmetryKind, 3)).toThrow(RangeError);
  });
});
