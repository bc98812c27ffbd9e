import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  characteristicOutput,
  flowReturnTemperatures,
  outputFromWaterFlow,
  standardSpecificOutput,
  surfaceTemperatureForSpecificOutput,
  waterDensity,
  waterFlow,
  waterSideForMeanWaterTemperature,
  waterSideForOutput,
  waterSpecificHeat,
  WATER_SPECIFIC_HEAT_J_KGK,
  type PanelMode,
  type PanelOrientation,
} from "@/lib/panels";

describe("waterFlow / outputFromWaterFlow", () => {
  it("round-trips output → flow → output", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 1e5, noNaN: true }), fc.double({ min: 0.5, max: 30, noNaN: true }), (q, dt) => {
        const f = waterFlow({ outputW: q, temperatureDropK: dt });
        expect(outputFromWaterFlow(f.massFlowKgS, dt)).toBeCloseTo(q, 6);
      }),
      { numRuns: 200 },
    );
  });

  it("halves the flow when the temperature drop doubles", () => {
    const a = waterFlow({ outputW: 800, temperatureDropK: 5 });
    const b = waterFlow({ outputW: 800, temperatureDropK: 10 });
    expect(b.massFlowKgS).toBeCloseTo(a.massFlowKgS / 2, 15);
  });

  it("keeps its units consistent (kg/h = 3600·kg/s, l/h = 3600·l/s)", () => {
    const f = waterFlow({ outputW: 1234, temperatureDropK: 7 });
    expect(f.massFlowKgH).toBeCloseTo(3600 * f.massFlowKgS, 12);
    expect(f.litresPerHour).toBeCloseTo(3600 * f.litresPerSecond, 12);
    expect(f.litresPerSecond).toBeCloseTo(1000 * f.volumeFlowM3S, 15);
  });

  it("uses 4186 J/(kg·K) by default", () => {
    expect(WATER_SPECIFIC_HEAT_J_KGK).toBe(4186);
    expect(waterFlow({ outputW: 4186, temperatureDropK: 1 }).massFlowKgS).toBeCloseTo(1, 15);
  });

  it("throws RangeError for a negative output or a non-positive drop", () => {
    expect(() => waterFlow({ outputW: -1, temperatureDropK: 5 })).toThrow(RangeError);
    expect(() => waterFlow({ outputW: 100, temperatureDropK: 0 })).toThrow(RangeError);
    expect(() => waterFlow({ outputW: Number.NaN, temperatureDropK: 5 })).toThrow(RangeError);
    expect(() => waterFlow({ outputW: 100, temperatureDropK: 5, densityKgM3: 0 })).toThrow(RangeError);
  });
});

describe("water property tables", () => {
  it("flags temperatures outside 0…100 °C and clamps to the end values", () => {
    expect(waterSpecificHeat(120)).toEqual({ value: waterSpecificHeat(100).value, withinRange: false });
    expect(waterDensity(-5).withinRange).toBe(false);
  });

  it("throws RangeError for a non-finite temperature", () => {
    expect(() => waterSpecificHeat(Number.NaN)).toThrow(RangeError);
  });
});

describe("flowReturnTemperatures", () => {
  it("keeps the arithmetic mean and the drop for both modes", () => {
    for (const mode of ["heating", "cooling"] as PanelMode[]) {
      const t = flowReturnTemperatures(40, 8, mode);
      expect((t.flowC + t.returnC) / 2).toBeCloseTo(40, 12);
      expect(Math.abs(t.flowC - t.returnC)).toBeCloseTo(8, 12);
    }
    expect(flowReturnTemperatures(40, 8, "heating").flowC).toBe(44);
  });

  it("throws RangeError for a negative drop or unknown mode", () => {
    expect(() => flowReturnTemperatures(40, -1)).toThrow(RangeError);
    expect(() => flowReturnTemperatures(40, 5, "venting" as PanelMode)).toThrow(RangeError);
  });
});

describe("water side of a panel through its characteristic", () => {
  const curve = { kWPerKn: 6.5, n: 1.25 };

  it("round-trips output → mean water temperature → output in heating and cooling", () => {
    for (const mode of ["heating", "cooling"] as PanelMode[]) {
      const p = waterSideForOutput({ curve, outputW: 450, roomC: 22, temperatureDropK: 5, mode });
      const back = waterSideForMeanWaterTemperature({ curve, meanWaterC: p.meanWaterC, roomC: 22, temperatureDropK: 5, mode });
      expect(back.outputW).toBeCloseTo(450, 9);
      expect(back.massFlowKgS).toBeCloseTo(p.massFlowKgS, 12);
      expect(characteristicOutput({ ...curve, meanWaterC: p.meanWaterC, roomC: 22, mode })).toBeCloseTo(450, 9);
    }
  });

  it("gives zero flow for water on the wrong side of the room temperature", () => {
    const p = waterSideForMeanWaterTemperature({ curve, meanWaterC: 18, roomC: 22, temperatureDropK: 5, mode: "heating" });
    expect(p.outputW).toBeLessThan(0);
    expect(p.massFlowKgS).toBe(0);
  });

  it("defaults c_p to the table value at the mean water temperature", () => {
    const p = waterSideForOutput({ curve, outputW: 1000, roomC: 20, temperatureDropK: 10, densityKgM3: 1000 });
    const cp = waterSpecificHeat(p.meanWaterC).value;
    expect(p.massFlowKgS).toBeCloseTo(1000 / (cp * 10), 15);
  });
});

describe("surfaceTemperatureForSpecificOutput", () => {
  it("inverts standardSpecificOutput for every orientation and mode", () => {
    const orientations: PanelOrientation[] = ["floor", "wall", "ceiling"];
    const modes: PanelMode[] = ["heating", "cooling"];
    for (const orientation of orientations) {
      for (const mode of modes) {
        for (const q of [-20, 0, 15, 60, 120]) {
          const surfaceC = surfaceTemperatureForSpecificOutput({ orientation, mode, specificOutputWm2: q, roomC: 21 });
          expect(standardSpecificOutput({ orientation, mode, surfaceC, roomC: 21 })).toBeCloseTo(q, 9);
        }
      }
    }
  });

  it("throws RangeError for an unknown orientation or a non-finite output", () => {
    expect(() =>
      surfaceTemperatureForSpecificOutput({ orientation: "roof" as PanelOrientation, mode: "heating", specificOutputWm2: 1, roomC: 20 }),
    ).toThrow(RangeError);
    expect(() =>
      surfaceTemperatureForSpecificOutput({ orientation: "floor", mode: "heating", specificOutputWm2: Number.NaN, roomC: 20 }),
    ).toThrow(RangeError);
  });
});
