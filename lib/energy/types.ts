/**
 * Shared types of zone schedules.
 */

/** Day of the week (ISO 8601 order, Monday first) [1]. */
export type Weekday = "mon" | "tue" | "wed" | "thu" | "fri" | "sat" | "sun";

/** The seven days, Monday first [1]. */
export const WEEKDAYS: ReadonlyArray<Weekday> = ["mon", "tue", "wed", "thu", "fri", "sat", "sun"];

/** Louver setting during an occupancy period. */
export type LouverSetting =
  | {
      /** A fixed opening. */
      mode: "fixed";
      /** Full opening angle, degrees, (0, 180]; 180 = fully open (flat). */
      openingAngleDeg: number;
    }
  | {
      /** Chosen per period by the caller (e.g. the louver optimiser). */
      mode: "automatic";
    };

/** One occupancy period of a zone schedule, repeated on each of its days. */
export interface SchedulePeriod {
  /** Days the period applies to, at least one, no repeats. */
  days: ReadonlyArray<Weekday>;
  /** Start, hours after midnight, 0 ≤ startHour < endHour. */
  startHour: number;
  /** End, hours after midnight, startHour < endHour ≤ 24. */
  endHour: number;
  /** Louver setting during the period. */
  louver: LouverSetting;
}
