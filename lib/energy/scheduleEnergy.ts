/**
 * Panel energy per day, week and year for zone schedules, with louvers and with louvers fixed
 * fully open.
 */
import { WEEKS_PER_YEAR, WH_PER_KWH } from "./constants";
import { energySaving } from "./energySaving";
import { assertValidSchedule } from "./schedule";
import { WEEKDAYS, type SchedulePeriod, type Weekday } from "./types";

/** Panel outputs during one period, W, one entry per panel (same panels in both arrays). */
export interface PeriodPanelOutputs {
  /** Output of each panel with the period's louver setting (fixed angle or optimiser's), W, finite. */
  withLouversW: ReadonlyArray<number>;
  /** Output of each panel with its louvers fixed fully open (180°), W, finite. */
  fullyOpenW: ReadonlyArray<number>;
}

/** Input of {@link zoneScheduleEnergy}. */
export interface ZoneEnergyInput {
  /** The zone's schedule (validated; may be empty). */
  periods: ReadonlyArray<Readonly<SchedulePeriod>>;
  /** Panel outputs for each period, same order and length as `periods`. */
  outputs: ReadonlyArray<Readonly<PeriodPanelOutputs>>;
}

/** Energy with louvers and with louvers fully open, Wh. */
export interface EnergyPairWh {
  /** With the scheduled louver settings, Wh. */
  withLouversWh: number;
  /** With louvers fixed fully open, Wh. */
  fullyOpenWh: number;
}

/** Energy of one period on each of its days. */
export interface PeriodEnergy extends EnergyPairWh {
  /** Index of the period in the schedule. */
  periodIndex: number;
  /** Period length, h. */
  durationH: number;
  /** Days the period repeats on. */
  days: ReadonlyArray<Weekday>;
  /** Σ panel outputs with louvers, W. */
  withLouversW: number;
  /** Σ panel outputs fully open, W. */
  fullyOpenW: number;
}

/** Annual energy and saving, kWh. */
export interface AnnualEnergy {
  /** With the scheduled louver settings, kWh/year. */
  withLouversKWh: number;
  /** With louvers fixed fully open, kWh/year. */
  fullyOpenKWh: number;
  /** fullyOpen − withLouvers, kWh/year. */
  savingKWh: number;
  /** Saving / fullyOpen × 100, %; NaN when the fully-open energy is 0. */
  savingPercent: number;
}

/** Energy of a zone (or a whole scenario). */
export interface ScheduleEnergy {
  /** Per period, Wh per occurrence (i.e. per day it applies to). */
  periods: PeriodEnergy[];
  /** Per weekday, Wh/day. */
  byDay: Record<Weekday, EnergyPairWh>;
  /** Per week, Wh/week (Σ of the seven days). */
  weekly: EnergyPairWh;
  /** Per year (weekly × 365/7), kWh/year. */
  annual: AnnualEnergy;
}

function emptyDays(): Record<Weekday, EnergyPairWh> {
  return {
    mon: { withLouversWh: 0, fullyOpenWh: 0 },
    tue: { withLouversWh: 0, fullyOpenWh: 0 },
    wed: { withLouversWh: 0, fullyOpenWh: 0 },
    thu: { withLouversWh: 0, fullyOpenWh: 0 },
    fri: { withLouversWh: 0, fullyOpenWh: 0 },
    sat: { withLouversWh: 0, fullyOpenWh: 0 },
    sun: { withLouversWh: 0, fullyOpenWh: 0 },
  };
}

function sumOutputs(values: ReadonlyArray<number>, name: string): number {
  let s = 0;
  for (let k = 0; k < values.length; k++) {
    const v = values[k] as number;
    if (!Number.isFinite(v)) {
      throw new RangeError(`${name}[${k}] must be a finite number, got ${String(v)}`);
    }
    s += v;
  }
  return s;
}

function weekAndYear(byDay: Readonly<Record<Weekday, EnergyPairWh>>): { weekly: EnergyPairWh; annual: AnnualEnergy } {
  let w = 0;
  let o = 0;
  for (const d of WEEKDAYS) {
    w += byDay[d].withLouversWh;
    o += byDay[d].fullyOpenWh;
  }
  const withLouversKWh = (w * WEEKS_PER_YEAR) / WH_PER_KWH;
  const fullyOpenKWh = (o * WEEKS_PER_YEAR) / WH_PER_KWH;
  const s = energySaving(withLouversKWh, fullyOpenKWh);
  return {
    weekly: { withLouversWh: w, fullyOpenWh: o },
    annual: { withLouversKWh, fullyOpenKWh, savingKWh: s.saving, savingPercent: s.savingPercent },
  };
}

/**
 * Panel energy of one zone for its schedule: each period's energy per occurrence is
 * E = Σ_panels Φ·Δt (constant output over the period, the interval sum of EN ISO 52016-1's
 * hourly method [3]) in Wh; a weekday's energy is the sum over the periods on that day; the
 * week is the sum of the seven days; the year is the week × 365/7 (a common year, leap days
 * ignored [4]) in kWh. Computed twice — with the scheduled louver settings and with louvers
 * fixed fully open — with the saving in kWh and %. Outside the periods the panels are taken
 * as off (no energy).
 *
 * @param input periods (a valid schedule, see scheduleIssues; may be empty → all zeros) and
 *              outputs (one entry per period, withLouversW and fullyOpenW of equal length, W finite).
 * @returns per-period Wh, per-day Wh, weekly Wh and annual kWh with the saving.
 * @throws RangeError for an invalid schedule (e.g. overlapping periods), mismatched lengths or non-finite outputs.
 */
export function zoneScheduleEnergy(input: Readonly<ZoneEnergyInput>): ScheduleEnergy {
  assertValidSchedule(input.periods);
  if (input.outputs.length !== input.periods.length) {
    throw new RangeError(`outputs must have one entry per period (${input.periods.length}), got ${input.outputs.length}`);
  }
  const byDay = emptyDays();
  const periods: PeriodEnergy[] = [];
  for (let i = 0; i < input.periods.length; i++) {
    const p = input.periods[i] as Readonly<SchedulePeriod>;
    const out = input.outputs[i] as Readonly<PeriodPanelOutputs>;
    if (out.withLouversW.length !== out.fullyOpenW.length) {
      throw new RangeError(
        `outputs[${i}]: withLouversW (${out.withLouversW.length}) and fullyOpenW (${out.fullyOpenW.length}) must list the same panels`,
      );
    }
    const withLouversW = sumOutputs(out.withLouversW, `outputs[${i}].withLouversW`);
    const fullyOpenW = sumOutputs(out.fullyOpenW, `outputs[${i}].fullyOpenW`);
    const durationH = p.endHour - p.startHour;
    const e: PeriodEnergy = {
      periodIndex: i,
      durationH,
      days: p.days,
      withLouversW,
      fullyOpenW,
      withLouversWh: withLouversW * durationH,
      fullyOpenWh: fullyOpenW * durationH,
    };
    periods.push(e);
    for (const d of p.days) {
      byDay[d].withLouversWh += e.withLouversWh;
      byDay[d].fullyOpenWh += e.fullyOpenWh;
    }
  }
  return { periods, byDay, ...weekAndYear(byDay) };
}

/** Energy of a scenario: its zones and their sum. */
export interface ScenarioEnergy {
  /** Per zone, in input order. */
  zones: ScheduleEnergy[];
  /** Σ zones per weekday, Wh/day. */
  byDay: Record<Weekday, EnergyPairWh>;
  /** Σ zones per week, Wh/week. */
  weekly: EnergyPairWh;
  /** Σ zones per year with the saving, kWh/year. */
  annual: AnnualEnergy;
}

/**
 * Energy of a scenario: {@link zoneScheduleEnergy} for each zone, summed per day; week and
 * year as for one zone [3][4].
 *
 * @param zones the zones' schedules and outputs (may be empty → all zeros).
 * @returns per-zone results and the scenario totals.
 * @throws RangeError as {@link zoneScheduleEnergy}.
 */
export function scenarioEnergy(zones: ReadonlyArray<Readonly<ZoneEnergyInput>>): ScenarioEnergy {
  const results = zones.map((z) => zoneScheduleEnergy(z));
  const byDay = emptyDays();
  for (const r of results) {
    for (const d of WEEKDAYS) {
      byDay[d].withLouversWh += r.byDay[d].withLouversWh;
      byDay[d].fullyOpenWh += r.byDay[d].fullyOpenWh;
    }
  }
  return { zones: results, byDay, ...weekAndYear(byDay) };
}
