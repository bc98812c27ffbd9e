import { describe, expect, test } from "vitest";
import { formToSchedule, NEW_PERIOD, scheduleFormSchema, scheduleToForm, type ScheduleForm } from "@/components/louvers/schedule-form";
import type { ZoneSchedule } from "@/lib/energy/schedule-schema";

const WEEK = ["mon", "tue", "wed", "thu", "fri"] as const;

const schedule: ZoneSchedule = {
  periods: [
    { days: [...WEEK], startHour: 8, endHour: 12, louver: { mode: "fixed", openingAngleDeg: 120 } },
    { days: [...WEEK], startHour: 13, endHour: 18, louver: { mode: "automatic" } },
  ],
};

function paths(values: ScheduleForm): string[] {
  const parsed = scheduleFormSchema.safeParse(values);
  return parsed.success ? [] : parsed.error.issues.map((i) => i.path.join(".")).sort();
}

describe("scheduleToForm / formToSchedule", () => {
  test("round-trips a schedule; an automatic period keeps a default angle in the form only", () => {
    const form = scheduleToForm(schedule);
    expect(form.periods[1]).toEqual({ days: [...WEEK], startHour: 13, endHour: 18, louverMode: "automatic", openingAngleDeg: 180 });
    expect(formToSchedule(form)).toEqual(schedule);
  });

  test("no periods is no schedule, both ways", () => {
    expect(scheduleToForm(undefined)).toEqual({ periods: [] });
    expect(formToSchedule({ periods: [] })).toBeUndefined();
    const parsed = scheduleFormSchema.safeParse({ periods: [] });
    expect(parsed.success && parsed.data).toBeUndefined();
  });

  test("days come out in week order, each once, whatever order the boxes were ticked in", () => {
    const out = formToSchedule({ periods: [{ ...NEW_PERIOD, days: ["fri", "mon", "wed", "mon"] }] });
    expect(out!.periods[0]!.days).toEqual(["mon", "wed", "fri"]);
  });
});

describe("scheduleFormSchema (the layout's zoneScheduleSchema behind the form)", () => {
  test("accepts the demo-like schedule", () => {
    expect(paths(scheduleToForm(schedule))).toEqual([]);
  });

  test.each([
    { name: "end before start", change: { startHour: 12, endHour: 9 }, path: "periods.0" },
    { name: "an hour past 24", change: { endHour: 25 }, path: "periods.0.endHour" },
    { name: "a blank start", change: { startHour: Number.NaN }, path: "periods.0.startHour" },
    { name: "no day ticked", change: { days: [] }, path: "periods.0.days" },
    { name: "a fixed angle of 0°", change: { louverMode: "fixed" as const, openingAngleDeg: 0 }, path: "periods.0.louver.openingAngleDeg" },
    { name: "a fixed angle over 180°", change: { louverMode: "fixed" as const, openingAngleDeg: 181 }, path: "periods.0.louver.openingAngleDeg" },
  ])("names the field for $name", ({ change, path }) => {
    const values: ScheduleForm = { periods: [{ ...NEW_PERIOD, days: [...NEW_PERIOD.days], ...change }] };
    expect(paths(values)).toContain(path);
  });

  test("an out-of-range angle is no error while the period is automatic", () => {
    expect(paths({ periods: [{ ...NEW_PERIOD, days: ["mon"], louverMode: "automatic", openingAngleDeg: 500 }] })).toEqual([]);
  });

  test("two periods overlapping on a common day name the later period", () => {
    const values: ScheduleForm = {
      periods: [
        { ...NEW_PERIOD, days: ["mon", "tue"], startHour: 8, endHour: 12 },
        { ...NEW_PERIOD, days: ["tue"], startHour: 11, endHour: 14 },
      ],
    };
    const found = paths(values);
    expect(found.length).toBeGreaterThan(0);
    expect(found.every((p) => p.startsWith("periods.1") || p.startsWith("periods.0"))).toBe(true);
    // Not overlapping once the second period moves to Wednesday.
    expect(paths({ periods: [values.periods[0]!, { ...values.periods[1]!, days: ["wed"] }] })).toEqual([]);
  });
});
