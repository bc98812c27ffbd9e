import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  HEATING_ADJUSTMENT_FACTORS,
  adjustmentFactorForTemperature,
  roomDesignHeatLoss,
  ventilationFlowM3S,
  ventilationHeatLossW,
  type EnvelopeSurface,
  type SurfaceAdjacency,
} from "@/lib/loads";

const wall = (areaM2: number, uValueWm2K: number, adjacent: SurfaceAdjacency = "outdoor"): EnvelopeSurface => ({
  kind: "wall",
  areaM2,
  uValueWm2K,
  adjacent,
});

describe("roomDesignHeatLoss", () => {
  it("scales linearly with the indoor–outdoor difference", () => {
    const base = { surfaces: [wall(10, 0.3), wall(5, 0.5, "unheated")], volumeM3: 40, airChangesPerHour: 0.5, indoorC: 20 };
    const a = roomDesignHeatLoss({ ...base, outdoorC: 0 });
    const b = roomDesignHeatLoss({ ...base, outdoorC: -20 });
    expect(b.totalW).toBeCloseTo(2 * a.totalW, 9);
    expect(b.transmissionW).toBeCloseTo(2 * a.transmissionW, 9);
  });

  it("adds transmission and ventilation to the total and sums the elements into the transmission", () => {
    fc.assert(
      fc.property(
        fc.array(
          fc.record({
            areaM2: fc.double({ min: 0, max: 50, noNaN: true }),
            uValueWm2K: fc.double({ min: 0, max: 6, noNaN: true }),
            adjacent: fc.constantFrom<SurfaceAdjacency>("outdoor", "ground", "unheated", "heated"),
          }),
          { maxLength: 8 },
        ),
        fc.double({ min: 0, max: 500, noNaN: true }),
        fc.double({ min: 0, max: 5, noNaN: true }),
        (els, volumeM3, n) => {
          const r = roomDesignHeatLoss({
            surfaces: els.map((e) => ({ kind: "wall" as const, ...e })),
            volumeM3,
            airChangesPerHour: n,
            indoorC: 20,
            outdoorC: -12,
          });
          const sum = r.bySurface.reduce((s, x) => s + x.heatFlowW, 0);
          expect(r.transmissionW).toBeCloseTo(sum, 6);
          expect(r.totalW).toBeCloseTo(r.transmissionW + r.ventilationW, 6);
          expect(r.transmissionW).toBeGreaterThanOrEqual(0);
        },
      ),
      { numRuns: 200 },
    );
  });

  it("uses the adjacency defaults 1 / 0.8 / 0.3 / 0 and an explicit factor when given", () => {
    expect(HEATING_ADJUSTMENT_FACTORS).toEqual({ outdoor: 1, unheated: 0.8, ground: 0.3, heated: 0 });
    const r = roomDesignHeatLoss({
      surfaces: [wall(1, 1, "ground"), { ...wall(1, 1, "ground"), adjustmentFactor: 0.5 }],
      volumeM3: 0,
      airChangesPerHour: 0,
      indoorC: 20,
      outdoorC: 10,
    });
    expect(r.bySurface[0]!.heatFlowW).toBeCloseTo(3, 12);
    expect(r.bySurface[1]!.heatFlowW).toBeCloseTo(5, 12);
  });

  it("returns negative losses when it is warmer outside than inside", () => {
    const r = roomDesignHeatLoss({ surfaces: [wall(10, 1)], volumeM3: 10, airChangesPerHour: 1, indoorC: 20, outdoorC: 25 });
    expect(r.totalW).toBeLessThan(0);
  });

  it("gives zero for an empty room description", () => {
    const r = roomDesignHeatLoss({ surfaces: [], volumeM3: 0, airChangesPerHour: 0, indoorC: 20, outdoorC: -10 });
    expect(r.totalW).toBe(0);
    expect(r.bySurface).toEqual([]);
  });

  it("throws RangeError for programmer errors", () => {
    const ok = { surfaces: [wall(10, 0.3)], volumeM3: 30, airChangesPerHour: 0.5, indoorC: 20, outdoorC: -10 };
    expect(() => roomDesignHeatLoss({ ...ok, indoorC: Number.NaN })).toThrow(RangeError);
    expect(() => roomDesignHeatLoss({ ...ok, volumeM3: -1 })).toThrow(RangeError);
    expect(() => roomDesignHeatLoss({ ...ok, airChangesPerHour: Number.POSITIVE_INFINITY })).toThrow(RangeError);
    expect(() => roomDesignHeatLoss({ ...ok, surfaces: [wall(-1, 0.3)] })).toThrow(RangeError);
    expect(() => roomDesignHeatLoss({ ...ok, surfaces: [wall(1, Number.NaN)] })).toThrow(RangeError);
    expect(() =>
      roomDesignHeatLoss({ ...ok, surfaces: [{ ...wall(1, 1), kind: "chimney" as unknown as EnvelopeSurface["kind"] }] }),
    ).toThrow(RangeError);
    expect(() =>
      roomDesignHeatLoss({ ...ok, surfaces: [{ ...wall(1, 1), adjacent: "sea" as unknown as SurfaceAdjacency }] }),
    ).toThrow(RangeError);
    expect(() => roomDesignHeatLoss({ ...ok, reheat: { floorAreaM2: 10, reheatFactorWm2: -1 } })).toThrow(RangeError);
    expect(() => roomDesignHeatLoss({ ...ok, volumetricHeatCapacityWhM3K: 0 })).toThrow(RangeError);
  });
});

describe("ventilation helpers", () => {
  it("converts n·V from m³/h to m³/s", () => {
    expect(ventilationFlowM3S(360, 0.5)).toBeCloseTo(0.05, 12);
  });

  it("computes 0.34·n·V·Δθ", () => {
    expect(ventilationHeatLossW(100, 1, 20, 0)).toBeCloseTo(680, 9);
  });
});

describe("adjustmentFactorForTemperature", () => {
  it("is 1 for a neighbour at the outdoor temperature and 0 for one at the indoor temperature", () => {
    expect(adjustmentFactorForTemperature(20, -10, -10)).toBe(1);
    expect(adjustmentFactorForTemperature(20, 20, -10)).toBe(0);
  });

  it("flags a zero design difference with NaN", () => {
    expect(adjustmentFactorForTemperature(20, 15, 20)).toBeNaN();
  });

  it("keeps the heat flow of a neighbour with a known temperature when indoor equals outdoor", () => {
    const r = roomDesignHeatLoss({
      surfaces: [{ ...wall(2, 1, "heated"), adjacentC: 15 }],
      volumeM3: 0,
      airChangesPerHour: 0,
      indoorC: 20,
      outdoorC: 20,
    });
    expect(r.transmissionW).toBeCloseTo(10, 12);
    expect(r.bySurface[0]!.adjustmentFactor).toBeNaN();
  });
});
