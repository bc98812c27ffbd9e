import { describe, expect, it } from "vitest";
import { WEEKS_PER_YEAR, zoneScheduleEnergy, type SchedulePeriod } from "@/lib/energy";

describe("zoneScheduleEnergy — hand-worked office week", () => {
  // Hand-worked example (no published example found for louver schedules). Energy of an
  // interval = output × duration (EN ISO 52016-1 interval sum, from memory); a year = 365/7
  // weeks (common Gregorian year, leap days ignored).
  // Two panels.
  //   P0 Mon–Fri 08–12, fixed 90°:  with louvers 300 + 200 = 500 W × 4 h = 2000 Wh;
  //                                 fully open  400 + 300 = 700 W × 4 h = 2800 Wh
  //   P1 Mon–Fri 13–17, automatic:  250 + 150 = 400 W × 4 h = 1600 Wh;  700 W × 4 h = 2800 Wh
  //   P2 Sat 09–13, fixed 180° (fully open): 700 W × 4 h = 2800 Wh in both cases
  //   Mon–Fri: 3600 Wh vs 5600 Wh;  Sat: 2800 vs 2800;  Sun: 0
  //   Week: 5 × 3600 + 2800 = 20 800 Wh vs 5 × 5600 + 2800 = 30 800 Wh
  //   Year: 20.8 kWh × 365/7 = 1084.571 kWh vs 30.8 × 365/7 = 1606.000 kWh
  //   Saving: 521.429 kWh = 10 000/30 800 = 32.468 %
  const periods: SchedulePeriod[] = [
    { days: ["mon", "tue", "wed", "thu", "fri"], startHour: 8, endHour: 12, louver: { mode: "fixed", openingAngleDeg: 90 } },
    { days: ["mon", "tue", "wed", "thu", "fri"], startHour: 13, endHour: 17, louver: { mode: "automatic" } },
    { days: ["sat"], startHour: 9, endHour: 13, louver: { mode: "fixed", openingAngleDeg: 180 } },
  ];
  const outputs = [
    { withLouversW: [300, 200], fullyOpenW: [400, 300] },
    { withLouversW: [250, 150], fullyOpenW: [400, 300] },
    { withLouversW: [400, 300], fullyOpenW: [400, 300] },
  ];
  const r = zoneScheduleEnergy({ periods, outputs });

  it("gives 3600/5600 Wh on a weekday, 2800/2800 Wh on Saturday and nothing on Sunday", () => {
    expect(r.byDay.mon.withLouversWh).toBeCloseTo(3600, 9);
    expect(r.byDay.fri.fullyOpenWh).toBeCloseTo(5600, 9);
    expect(r.byDay.sat).toEqual({ withLouversWh: 2800, fullyOpenWh: 2800 });
    expect(r.byDay.sun).toEqual({ withLouversWh: 0, fullyOpenWh: 0 });
  });

  it("gives 20 800 / 30 800 Wh a week and 1084.571 / 1606.000 kWh a year, a 521.429 kWh (32.468 %) saving", () => {
    expect(WEEKS_PER_YEAR).toBeCloseTo(52.142857, 6);
    expect(r.weekly.withLouversWh).toBeCloseTo(20800, 9);
    expect(r.weekly.fullyOpenWh).toBeCloseTo(30800, 9);
    expect(r.annual.withLouversKWh).toBeCloseTo(1084.571, 3);
    expect(r.annual.fullyOpenKWh).toBeCloseTo(1606.0, 3);
    expect(r.annual.savingKWh).toBeCloseTo(521.429, 3);
    expect(r.annual.savingPercent).toBeCloseTo(32.468, 3);
  });
});
