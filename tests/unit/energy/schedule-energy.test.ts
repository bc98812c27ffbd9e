import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  WEEKDAYS,
  WEEKS_PER_YEAR,
  energySaving,
  scenarioEnergy,
  zoneScheduleEnergy,
  type PeriodPanelOutputs,
  type SchedulePeriod,
  type Weekday,
} from "@/lib/energy";

/** Random valid zone: disjoint hour slots (so no overlap on any day), random day subsets, 0–4 panels. */
const zoneArb = fc
  .record({
    cuts: fc.uniqueArray(fc.integer({ min: 0, max: 48 }), { minLength: 0, maxLength: 10 }),
    panels: fc.integer({ min: 0, max: 4 }),
    seed: fc.array(
      fc.record({
        days: fc.subarray([...WEEKDAYS], { minLength: 1 }),
        w: fc.array(fc.double({ min: 0, max: 2000, noNaN: true }), { minLength: 4, maxLength: 4 }),
        o: fc.array(fc.double({ min: 0, max: 2000, noNaN: true }), { minLength: 4, maxLength: 4 }),
      }),
      { minLength: 5, maxLength: 5 },
    ),
  })
  .map(({ cuts, panels, seed }) => {
    const hours = [...cuts].sort((a, b) => a - b).map((c) => c / 2);
    const periods: SchedulePeriod[] = [];
    const outputs: PeriodPanelOutputs[] = [];
    for (let i = 0; i + 1 < hours.length && periods.length < seed.length; i += 2) {
      const s = seed[periods.length]!;
      periods.push({ days: s.days as Weekday[], startHour: hours[i]!, endHour: hours[i + 1]!, louver: { mode: "automatic" } });
      outputs.push({ withLouversW: s.w.slice(0, panels), fullyOpenW: s.o.slice(0, panels) });
    }
    return { periods, outputs };
  });

describe("zoneScheduleEnergy", () => {
  it("energy figures add up across schedule periods, days, the week and the year", () => {
    fc.assert(
      fc.property(zoneArb, (zone) => {
        const r = zoneScheduleEnergy(zone);
        // Σ over periods of (energy per occurrence × number of days) = Σ over days = week.
        let fromPeriodsW = 0;
        let fromPeriodsO = 0;
        for (const p of r.periods) {
          fromPeriodsW += p.withLouversWh * p.days.length;
          fromPeriodsO += p.fullyOpenWh * p.days.length;
          expect(p.withLouversWh).toBeCloseTo(p.withLouversW * p.durationH, 6);
        }
        const days = WEEKDAYS.reduce((s, d) => s + r.byDay[d].withLouversWh, 0);
        expect(days).toBeCloseTo(fromPeriodsW, 6);
        expect(r.weekly.withLouversWh).toBeCloseTo(fromPeriodsW, 6);
        expect(r.weekly.fullyOpenWh).toBeCloseTo(fromPeriodsO, 6);
        // Each day = Σ of the periods on that day.
        for (const d of WEEKDAYS) {
          const onDay = r.periods.filter((p) => p.days.includes(d)).reduce((s, p) => s + p.fullyOpenWh, 0);
          expect(r.byDay[d].fullyOpenWh).toBeCloseTo(onDay, 6);
        }
        // Year = week × 365/7, in kWh; saving = open − louvers.
        expect(r.annual.withLouversKWh).toBeCloseTo((r.weekly.withLouversWh * WEEKS_PER_YEAR) / 1000, 6);
        expect(r.annual.fullyOpenKWh).toBeCloseTo((r.weekly.fullyOpenWh * WEEKS_PER_YEAR) / 1000, 6);
        expect(r.annual.savingKWh).toBeCloseTo(r.annual.fullyOpenKWh - r.annual.withLouversKWh, 6);
      }),
      { numRuns: 300 },
    );
  });

  it("gives zero energy for a zero-length (empty) schedule", () => {
    const r = zoneScheduleEnergy({ periods: [], outputs: [] });
    expect(r.weekly).toEqual({ withLouversWh: 0, fullyOpenWh: 0 });
    expect(r.annual.withLouversKWh).toBe(0);
    expect(r.annual.fullyOpenKWh).toBe(0);
    expect(r.annual.savingKWh).toBe(0);
    expect(r.annual.savingPercent).toBeNaN();
    for (const d of WEEKDAYS) {
      expect(r.byDay[d]).toEqual({ withLouversWh: 0, fullyOpenWh: 0 });
    }
  });

  it("gives zero energy when the panels have no outputs", () => {
    const r = zoneScheduleEnergy({
      periods: [{ days: ["mon"], startHour: 8, endHour: 18, louver: { mode: "automatic" } }],
      outputs: [{ withLouversW: [], fullyOpenW: [] }],
    });
    expect(r.weekly.withLouversWh).toBe(0);
  });

  it("rejects overlapping periods", () => {
    expect(() =>
      zoneScheduleEnergy({
        periods: [
          { days: ["mon"], startHour: 8, endHour: 12, louver: { mode: "automatic" } },
          { days: ["mon", "tue"], startHour: 11, endHour: 13, louver: { mode: "fixed", openingAngleDeg: 90 } },
        ],
        outputs: [
          { withLouversW: [1], fullyOpenW: [1] },
          { withLouversW: [1], fullyOpenW: [1] },
        ],
      }),
    ).toThrow(RangeError);
  });

  it("throws RangeError when outputs do not match the periods", () => {
    const periods: SchedulePeriod[] = [{ days: ["mon"], startHour: 8, endHour: 12, louver: { mode: "automatic" } }];
    expect(() => zoneScheduleEnergy({ periods, outputs: [] })).toThrow(RangeError);
    expect(() => zoneScheduleEnergy({ periods, outputs: [{ withLouversW: [1, 2], fullyOpenW: [1] }] })).toThrow(RangeError);
    expect(() => zoneScheduleEnergy({ periods, outputs: [{ withLouversW: [Number.NaN], fullyOpenW: [1] }] })).toThrow(RangeError);
  });
});

describe("scenarioEnergy", () => {
  it("sums its zones day by day, and the week and year follow", () => {
    fc.assert(
      fc.property(fc.array(zoneArb, { maxLength: 4 }), (zones) => {
        const r = scenarioEnergy(zones);
        for (const d of WEEKDAYS) {
          const sum = r.zones.reduce((s, z) => s + z.byDay[d].withLouversWh, 0);
          expect(r.byDay[d].withLouversWh).toBeCloseTo(sum, 6);
        }
        const annual = r.zones.reduce((s, z) => s + z.annual.fullyOpenKWh, 0);
        expect(r.annual.fullyOpenKWh).toBeCloseTo(annual, 6);
      }),
      { numRuns: 100 },
    );
  });

  it("is all zeros for a scenario without zones", () => {
    expect(scenarioEnergy([]).annual.withLouversKWh).toBe(0);
  });
});

describe("energySaving", () => {
  it("reports the saving and its percentage of the baseline", () => {
    expect(energySaving(75, 100)).toEqual({ saving: 25, savingPercent: 25 });
  });

  it("throws RangeError for non-finite energies", () => {
    expect(() => energySaving(Number.NaN, 1)).toThrow(RangeError);
  });
});
