/**
 * Validation and durations of zone occupancy schedules.
 */
import { WEEKDAYS, type SchedulePeriod, type Weekday } from "./types";

const DAY_SET: ReadonlySet<string> = new Set<string>(WEEKDAYS);

/** Hours in a day, h (ISO 80000-3) [2]. */
export const HOURS_PER_DAY = 24;

/** Why a schedule is invalid. */
export type ScheduleIssueCode = "invalid-hours" | "no-days" | "unknown-day" | "duplicate-day" | "invalid-louver" | "overlap";

/** One problem found in a schedule. */
export interface ScheduleIssue {
  /** Kind of problem. */
  code: ScheduleIssueCode;
  /** Index of the offending period. */
  periodIndex: number;
  /** For "overlap": the earlier period it overlaps. */
  otherPeriodIndex?: number;
  /** For "overlap", "unknown-day", "duplicate-day": the day concerned. */
  day?: string;
  /** Human-readable description. */
  message: string;
}

/**
 * Length of one period on one day, h: endHour − startHour (hours of the day as in ISO 8601,
 * 0…24) [1].
 *
 * @param period period with 0 ≤ startHour < endHour ≤ 24.
 * @returns duration, h.
 * @throws RangeError when the hours are non-finite or out of order/range.
 */
export function periodDurationH(period: Readonly<SchedulePeriod>): number {
  if (!hoursValid(period.startHour, period.endHour)) {
    throw new RangeError(
      `period hours must satisfy 0 ≤ startHour < endHour ≤ 24, got ${String(period.startHour)}–${String(period.endHour)}`,
    );
  }
  return period.endHour - period.startHour;
}

function hoursValid(start: number, end: number): boolean {
  return Number.isFinite(start) && Number.isFinite(end) && start >= 0 && start < end && end <= HOURS_PER_DAY;
}

/**
 * All problems of a schedule: hours outside 0 ≤ start < end ≤ 24, a period without days,
 * unknown or repeated days, a fixed louver angle outside (0, 180], and periods that overlap on
 * a common day (half-open intervals [start, end): a period may start when another ends).
 *
 * @param periods the zone's periods (may be empty: an empty schedule is valid).
 * @returns the issues, empty when the schedule is valid.
 */
export function scheduleIssues(periods: ReadonlyArray<Readonly<SchedulePeriod>>): ScheduleIssue[] {
  const issues: ScheduleIssue[] = [];
  const usable: boolean[] = new Array<boolean>(periods.length).fill(false);
  for (let i = 0; i < periods.length; i++) {
    const p = periods[i] as Readonly<SchedulePeriod>;
    let ok = true;
    if (!hoursValid(p.startHour, p.endHour)) {
      issues.push({
        code: "invalid-hours",
        periodIndex: i,
        message: `period ${i}: hours must satisfy 0 ≤ start < end ≤ 24, got ${String(p.startHour)}–${String(p.endHour)}`,
      });
      ok = false;
    }
    if (!Array.isArray(p.days) || p.days.length === 0) {
      issues.push({ code: "no-days", periodIndex: i, message: `period ${i}: at least one day is required` });
      ok = false;
    } else {
      const seen = new Set<string>();
      for (const d of p.days) {
        if (!DAY_SET.has(d)) {
          issues.push({ code: "unknown-day", periodIndex: i, day: String(d), message: `period ${i}: unknown day ${String(d)}` });
          ok = false;
        } else if (seen.has(d)) {
          issues.push({ code: "duplicate-day", periodIndex: i, day: d, message: `period ${i}: day ${d} listed twice` });
          ok = false;
        }
        seen.add(d);
      }
    }
    const louver = p.louver;
    if (louver === null || typeof louver !== "object" || (louver.mode !== "fixed" && louver.mode !== "automatic")) {
      issues.push({ code: "invalid-louver", periodIndex: i, message: `period ${i}: louver mode must be "fixed" or "automatic"` });
    } else if (
      louver.mode === "fixed" &&
      !(Number.isFinite(louver.openingAngleDeg) && louver.openingAngleDeg > 0 && louver.openingAngleDeg <= 180)
    ) {
      issues.push({
        code: "invalid-louver",
        periodIndex: i,
        message: `period ${i}: fixed opening angle must be in (0, 180] degrees, got ${String(louver.openingAngleDeg)}`,
      });
    }
    usable[i] = ok;
  }
  for (let i = 0; i < periods.length; i++) {
    if (!usable[i]) continue;
    const a = periods[i] as Readonly<SchedulePeriod>;
    for (let j = 0; j < i; j++) {
      if (!usable[j]) continue;
      const b = periods[j] as Readonly<SchedulePeriod>;
      if (!(a.startHour < b.endHour && b.startHour < a.endHour)) continue;
      const common = a.days.find((d) => b.days.includes(d));
      if (common !== undefined) {
        issues.push({
          code: "overlap",
          periodIndex: i,
          otherPeriodIndex: j,
          day: common,
          message: `period ${i} overlaps period ${j} on ${common}`,
        });
      }
    }
  }
  return issues;
}

/**
 * Throws unless the schedule is valid (see {@link scheduleIssues}).
 *
 * @param periods the zone's periods.
 * @throws RangeError listing the problems.
 */
export function assertValidSchedule(periods: ReadonlyArray<Readonly<SchedulePeriod>>): void {
  const issues = scheduleIssues(periods);
  if (issues.length > 0) {
    throw new RangeError(`invalid schedule: ${issues.map((x) => x.message).join("; ")}`);
  }
}

/**
 * Occupied hours of each weekday, h (sum of the lengths of the periods on that day).
 *
 * @param periods a valid schedule (see {@link scheduleIssues}).
 * @returns hours per day, Monday first.
 * @throws RangeError for an invalid schedule.
 */
export function occupiedHoursByDay(periods: ReadonlyArray<Readonly<SchedulePeriod>>): Record<Weekday, number> {
  assertValidSchedule(periods);
  const out: Record<Weekday, number> = { mon: 0, tue: 0, wed: 0, thu: 0, fri: 0, sat: 0, sun: 0 };
  for (const p of periods) {
    const h = p.endHour - p.startHour;
    for (const d of p.days) {
      out[d] += h;
    }
  }
  return out;
}
