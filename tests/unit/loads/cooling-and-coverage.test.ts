import { describe, expect, it } from "vitest";
import {
  internalSensibleGains,
  loadCoverage,
  roomSensibleCoolingLoad,
  solarGainW,
  type OccupantActivity,
} from "@/lib/loads";

describe("roomSensibleCoolingLoad", () => {
  const base = {
    surfaces: [{ kind: "wall" as const, areaM2: 10, uValueWm2K: 0.5, adjacent: "outdoor" as const }],
    volumeM3: 30,
    airChangesPerHour: 1,
    indoorC: 26,
  };

  it("adds its four parts to the total", () => {
    const r = roomSensibleCoolingLoad({
      ...base,
      outdoorC: 30,
      people: { count: 3 },
      floorAreaM2: 12,
      equipmentWm2: 5,
      glazing: [{ areaM2: 2, gValue: 0.6, irradianceWm2: 300 }],
    });
    expect(r.totalW).toBeCloseTo(r.transmissionW + r.ventilationW + r.internalW + r.solarW, 9);
    expect(r.internalW).toBeCloseTo(3 * 70 + 60, 9);
  });

  it("turns transmission and ventilation negative when it is cooler outside", () => {
    const r = roomSensibleCoolingLoad({ ...base, outdoorC: 20 });
    expect(r.transmissionW).toBeLessThan(0);
    expect(r.ventilationW).toBeLessThan(0);
  });

  it("ignores ground contact by default but honours an explicit factor", () => {
    const ground = { kind: "floor" as const, areaM2: 20, uValueWm2K: 0.4, adjacent: "ground" as const };
    expect(roomSensibleCoolingLoad({ ...base, surfaces: [ground], outdoorC: 32 }).transmissionW).toBe(0);
    expect(
      roomSensibleCoolingLoad({ ...base, surfaces: [{ ...ground, adjustmentFactor: 0.5 }], outdoorC: 32 }).transmissionW,
    ).toBeCloseTo(24, 9);
  });

  it("throws RangeError for programmer errors", () => {
    expect(() => roomSensibleCoolingLoad({ ...base, outdoorC: Number.NaN })).toThrow(RangeError);
    expect(() => roomSensibleCoolingLoad({ ...base, outdoorC: 30, equipmentWm2: 5 })).toThrow(RangeError);
    expect(() => roomSensibleCoolingLoad({ ...base, outdoorC: 30, people: { count: -1 } })).toThrow(RangeError);
    expect(() =>
      roomSensibleCoolingLoad({ ...base, outdoorC: 30, people: { count: 1, activity: "juggling" as OccupantActivity } }),
    ).toThrow(RangeError);
    expect(() => solarGainW([{ areaM2: 1, gValue: 1.2, irradianceWm2: 100 }])).toThrow(RangeError);
  });
});

describe("internalSensibleGains", () => {
  it("prefers an explicit sensible rate over the tabulated activity", () => {
    expect(internalSensibleGains({ people: { count: 2, activity: "athletics", sensibleWPerPerson: 50 } }).peopleW).toBe(100);
  });

  it("is zero without occupants or W/m² gains", () => {
    expect(internalSensibleGains({})).toEqual({ peopleW: 0, equipmentW: 0, lightingW: 0, totalW: 0 });
  });
});

describe("loadCoverage", () => {
  it("reports 80 % coverage, a 200 W shortfall and a warning for 800 W against 1000 W", () => {
    const c = loadCoverage({ loadW: 1000, panelOutputsW: [500, 300] });
    expect(c.coveragePercent).toBeCloseTo(80, 12);
    expect(c.shortfallW).toBeCloseTo(200, 12);
    expect(c.warning).toBe(true);
  });

  it("does not warn at exactly 100 % or above", () => {
    expect(loadCoverage({ loadW: 1000, panelOutputsW: [600, 400] }).warning).toBe(false);
    const over = loadCoverage({ loadW: 1000, panelOutputsW: [900, 400] });
    expect(over.warning).toBe(false);
    expect(over.shortfallW).toBe(0);
    expect(over.coveragePercent).toBeCloseTo(130, 12);
  });

  it("warns with 0 % when the room has no panels", () => {
    const c = loadCoverage({ loadW: 500, panelOutputsW: [] });
    expect(c.coveragePercent).toBe(0);
    expect(c.shortfallW).toBe(500);
    expect(c.warning).toBe(true);
  });

  it("flags a room with no load instead of dividing by zero", () => {
    const c = loadCoverage({ loadW: 0, panelOutputsW: [100] });
    expect(c.noLoad).toBe(true);
    expect(c.coveragePercent).toBeNaN();
    expect(c.warning).toBe(false);
  });

  it("throws RangeError for non-finite values", () => {
    expect(() => loadCoverage({ loadW: Number.NaN, panelOutputsW: [] })).toThrow(RangeError);
    expect(() => loadCoverage({ loadW: 100, panelOutputsW: [Number.POSITIVE_INFINITY] })).toThrow(RangeError);
  });
});
