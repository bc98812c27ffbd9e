import { describe, expect, it } from "vitest";
import { assertValidSchedule, occupiedHoursByDay, periodDurationH, scheduleIssues, type SchedulePeriod } from "@/lib/energy";
import { zoneScheduleSchema } from "@/lib/energy/schedule-schema";

const auto = { mode: "automatic" } as const;

describe("scheduleIssues", () => {
  it("accepts an empty schedule and back-to-back periods", () => {
    expect(scheduleIssues([])).toEqual([]);
    const periods: SchedulePeriod[] = [
      { days: ["mon", "tue"], startHour: 8, endHour: 12, louver: auto },
      { days: ["mon"], startHour: 12, endHour: 17.5, louver: { mode: "fixed", openingAngleDeg: 90 } },
    ];
    expect(scheduleIssues(periods)).toEqual([]);
  });

  it("rejects periods that overlap on a common day", () => {
    const periods: SchedulePeriod[] = [
      { days: ["mon", "wed"], startHour: 8, endHour: 12, louver: auto },
      { days: ["tue", "wed"], startHour: 11, endHour: 14, louver: auto },
    ];
    const issues = scheduleIssues(periods);
    expect(issues).toHaveLength(1);
    expect(issues[0]).toMatchObject({ code: "overlap", periodIndex: 1, otherPeriodIndex: 0, day: "wed" });
    expect(() => assertValidSchedule(periods)).toThrow(RangeError);
  });

  it("allows overlapping hours on different days", () => {
    expect(
      scheduleIssues([
        { days: ["mon"], startHour: 8, endHour: 12, louver: auto },
        { days: ["tue"], startHour: 9, endHour: 11, louver: auto },
      ]),
    ).toEqual([]);
  });

  it("rejects hours outside 0 ≤ start < end ≤ 24, missing or repeated days and bad angles", () => {
    const bad: SchedulePeriod[] = [
      { days: ["mon"], startHour: 10, endHour: 10, louver: auto },
      { days: ["mon"], startHour: -1, endHour: 3, louver: auto },
      { days: ["mon"], startHour: 20, endHour: 25, louver: auto },
      { days: [], startHour: 1, endHour: 2, louver: auto },
      { days: ["sun", "sun"], startHour: 1, endHour: 2, louver: auto },
      { days: ["sat"], startHour: 1, endHour: 2, louver: { mode: "fixed", openingAngleDeg: 0 } },
      { days: ["fri"], startHour: Number.NaN, endHour: 2, louver: auto },
    ];
    const codes = scheduleIssues(bad).map((i) => i.code);
    expect(codes).toEqual(["invalid-hours", "invalid-hours", "invalid-hours", "no-days", "duplicate-day", "invalid-louver", "invalid-hours"]);
  });
});

describe("durations", () => {
  it("measures a period and sums occupied hours per day", () => {
    const periods: SchedulePeriod[] = [
      { days: ["mon", "fri"], startHour: 7.5, endHour: 12, louver: auto },
      { days: ["mon"], startHour: 13, endHour: 24, louver: auto },
    ];
    expect(periodDurationH(periods[0]!)).toBe(4.5);
    expect(occupiedHoursByDay(periods)).toEqual({ mon: 15.5, tue: 0, wed: 0, thu: 0, fri: 4.5, sat: 0, sun: 0 });
    expect(() => periodDurationH({ days: ["mon"], startHour: 5, endHour: 4, louver: auto })).toThrow(RangeError);
  });
});

describe("zoneScheduleSchema", () => {
  it("parses a valid schedule", () => {
    const r = zoneScheduleSchema.safeParse({
      periods: [{ days: ["mon"], startHour: 8, endHour: 17, louver: { mode: "fixed", openingAngleDeg: 120 } }],
    });
    expect(r.success).toBe(true);
  });

  it("rejects overlapping periods with the path of the offending period", () => {
    const r = zoneScheduleSchema.safeParse({
      periods: [
        { days: ["mon"], startHour: 8, endHour: 12, louver: { mode: "automatic" } },
        { days: ["mon"], startHour: 9, endHour: 10, louver: { mode: "automatic" } },
      ],
    });
    expect(r.success).toBe(false);
    expect(r.error?.issues.map((i) => i.path)).toContainEqual(["periods", 1]);
  });

  it("rejects unknown days, start ≥ end and out-of-range angles", () => {
    const bad = [
      { days: ["moon"], startHour: 8, endHour: 9, louver: { mode: "automatic" } },
      { days: ["mon"], startHour: 9, endHour: 8, louver: { mode: "automatic" } },
      { days: ["mon"], startHour: 8, endHour: 9, louver: { mode: "fixed", openingAngleDeg: 181 } },
      { days: ["mon"], startHour: 8, endHour: 9, louver: { mode: "sometimes" } },
    ];
    expect(bad.length).toBeGreaterThan(0);
    for (const p of bad) {
      expect(zoneScheduleSchema.safeParse({ periods: [p] }).success).toBe(false);
    }
  });
});
