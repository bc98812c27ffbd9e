/**
 * Boundary schema of a zone schedule (zod): shape checks plus the rules of
 * {@link scheduleIssues} (hours 0 ≤ start < end ≤ 24, days, louver angle, no overlaps).
 */
import { z } from "zod";
import { scheduleIssues } from "./schedule";
import { WEEKDAYS, type SchedulePeriod, type Weekday } from "./types";

// Strict objects throughout: an unknown key is a 400 naming it, never silently dropped.
const weekdaySchema = z.enum(WEEKDAYS as [Weekday, ...Weekday[]]);

/** Louver setting of a period. */
export const louverSettingSchema = z.discriminatedUnion("mode", [
  z.strictObject({ mode: z.literal("fixed"), openingAngleDeg: z.number().finite().gt(0).lte(180) }),
  z.strictObject({ mode: z.literal("automatic") }),
]);

/** One occupancy period (per-period checks only; overlaps are checked on the schedule). */
export const schedulePeriodSchema = z.strictObject({
  days: z.array(weekdaySchema).min(1),
  startHour: z.number().finite().min(0).max(24),
  endHour: z.number().finite().min(0).max(24),
  louver: louverSettingSchema,
});

/** A zone schedule: its periods, validated together (no overlaps on a common day). */
export const zoneScheduleSchema = z
  .strictObject({ periods: z.array(schedulePeriodSchema).max(50) })
  .superRefine((value, ctx) => {
    for (const issue of scheduleIssues(value.periods)) {
      ctx.addIssue({ code: "custom", path: ["periods", issue.periodIndex], message: issue.message });
    }
  });

/** Parsed zone schedule. */
export type ZoneSchedule = z.infer<typeof zoneScheduleSchema>;

// Compile-time check: a parsed period is a SchedulePeriod.
const _periodCheck: (p: z.infer<typeof schedulePeriodSchema>) => SchedulePeriod = (p) => p;
void _periodCheck;
