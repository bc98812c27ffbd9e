/**
 * The zone schedule editor's form values and their conversion to the layout's `zone.schedule`.
 * The form's schema converts the values and pipes them into `zoneScheduleSchema`
 * (lib/energy/schedule-schema.ts) — the schema the server applies when the layout is saved — so
 * an error carries that schema's path (`periods.1`, `periods.0.endHour`…) and lands on the
 * matching period or input.
 */
import { z } from "zod";
import { zoneScheduleSchema, type ZoneSchedule } from "@/lib/energy/schedule-schema";
import { WEEKDAYS, type Weekday } from "@/lib/energy/types";

export interface SchedulePeriodForm {
  /** Checked days (checkbox values). */
  days: Weekday[];
  startHour: number;
  endHour: number;
  louverMode: "fixed" | "automatic";
  /** Kept while "automatic" is chosen, so switching back shows the last angle. */
  openingAngleDeg: number;
}

export interface ScheduleForm {
  periods: SchedulePeriodForm[];
}

/** A new period: weekdays, 08–18 h, automatic louvers. */
export const NEW_PERIOD: Readonly<SchedulePeriodForm> = Object.freeze({
  days: ["mon", "tue", "wed", "thu", "fri"] as Weekday[],
  startHour: 8,
  endHour: 18,
  louverMode: "automatic" as const,
  openingAngleDeg: 180,
});

/** The form values of a zone's schedule (none → no periods). */
export function scheduleToForm(schedule: Readonly<ZoneSchedule> | undefined): ScheduleForm {
  return {
    periods: (schedule?.periods ?? []).map((p) => ({
      days: [...p.days],
      startHour: p.startHour,
      endHour: p.endHour,
      louverMode: p.louver.mode,
      openingAngleDeg: p.louver.mode === "fixed" ? p.louver.openingAngleDeg : 180,
    })),
  };
}

/** Days in week order (checkboxes report them in click order), each once. */
function orderedDays(days: readonly Weekday[]): Weekday[] {
  return WEEKDAYS.filter((d) => days.includes(d));
}

/**
 * The schedule the values describe, unvalidated. An empty period list means "no schedule"
 * (`undefined`), as a layout saved before schedules existed.
 */
export function formToSchedule(values: Readonly<ScheduleForm>): ZoneSchedule | undefined {
  if (values.periods.length === 0) return undefined;
  return {
    periods: values.periods.map((p) => ({
      days: orderedDays(Array.isArray(p.days) ? p.days : []),
      startHour: p.startHour,
      endHour: p.endHour,
      louver: p.louverMode === "fixed" ? { mode: "fixed" as const, openingAngleDeg: p.openingAngleDeg } : { mode: "automatic" as const },
    })),
  };
}

/** Form values in, a validated schedule (or undefined for none) out; errors at the layout schema's paths. */
export const scheduleFormSchema = z
  .custom<ScheduleForm>(() => true)
  .transform((values) => formToSchedule(values))
  .pipe(zoneScheduleSchema.optional());

