/**
 * Zone schedules and panel energy: occupancy periods per weekday with a louver setting,
 * their validation (pure functions; a zod boundary schema in schedule-schema.ts), and the
 * panel energy per period, day, week and year with louvers and with louvers fixed fully open,
 * with the saving. References [n] are listed in lib/energy/REFERENCES.md.
 *
 * Conventions: hours of the day 0…24, periods are half-open [start, end); a year counts
 * 365/7 weeks (`WEEKS_PER_YEAR`); energy is the panels' thermal output (W) times time, Wh per
 * day/week and kWh per year; panels are off outside the periods.
 *
 * Invalid-input policy (all functions of this folder): a programmer error — NaN or
 * ±Infinity, hours outside 0 ≤ start < end ≤ 24, overlapping periods on a common day, unknown
 * or repeated days, a fixed angle outside (0, 180]°, outputs not matching the periods in
 * number — throws `RangeError` (`scheduleIssues` lists the problems without throwing, for
 * forms). A valid input with no meaningful ratio is flagged by NaN: the saving percentage when
 * the fully-open energy is 0.
 */
export { WEEKDAYS, type LouverSetting, type SchedulePeriod, type Weekday } from "./types";
export { DAYS_PER_YEAR, DAYS_PER_WEEK, WEEKS_PER_YEAR, WH_PER_KWH } from "./constants";
export {
  HOURS_PER_DAY,
  periodDurationH,
  scheduleIssues,
  assertValidSchedule,
  occupiedHoursByDay,
  type ScheduleIssue,
  type ScheduleIssueCode,
} from "./schedule";
export { energySaving, type EnergySaving } from "./energySaving";
export {
  zoneScheduleEnergy,
  scenarioEnergy,
  type AnnualEnergy,
  type EnergyPairWh,
  type PeriodEnergy,
  type PeriodPanelOutputs,
  type ScenarioEnergy,
  type ScheduleEnergy,
  type ZoneEnergyInput,
} from "./scheduleEnergy";
