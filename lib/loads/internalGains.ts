/**
 * Sensible internal heat gains: people, equipment and lighting.
 */
import { assertNonNegative } from "./assert";

/**
 * Sensible heat gain per person, W, for activities of ASHRAE Handbook — Fundamentals (SI)
 * ch. 18, Table 1 "Representative rates at which heat and moisture are given off by human
 * beings in different states of activity" (sensible column; values from memory) [3]; activity
 * levels as in ISO 8996 [4].
 */
export const PEOPLE_SENSIBLE_GAIN_W = {
  /** Seated at theater. */
  seatedAtRest: 65,
  /** Seated, very light work (offices, hotels, apartments). */
  seatedVeryLightWork: 70,
  /** Moderately active office work. */
  moderatelyActiveOfficeWork: 75,
  /** Standing, light work; walking (department store). */
  standingLightWork: 75,
  /** Walking, standing (bank). */
  walkingStanding: 75,
  /** Sedentary work (restaurant). */
  sedentaryRestaurant: 80,
  /** Light bench work (factory). */
  lightBenchWork: 80,
  /** Moderate dancing. */
  moderateDancing: 90,
  /** Walking 4.8 km/h; light machine work. */
  walkingLightMachineWork: 110,
  /** Heavy work. */
  heavyWork: 170,
  /** Heavy machine work; lifting. */
  heavyMachineWork: 185,
  /** Athletics. */
  athletics: 210,
} as const satisfies Readonly<Record<string, number>>;

/** Activity key of {@link PEOPLE_SENSIBLE_GAIN_W}. */
export type OccupantActivity = keyof typeof PEOPLE_SENSIBLE_GAIN_W;

/** Occupants of a room: a count and either a tabulated activity or an explicit sensible rate. */
export interface OccupantGainInput {
  /** Number of people, ≥ 0 (may be fractional for a diversity-weighted average). */
  count: number;
  /** Tabulated activity; default "seatedVeryLightWork" (office work). */
  activity?: OccupantActivity;
  /** Explicit sensible gain per person, W, ≥ 0; overrides `activity`. */
  sensibleWPerPerson?: number;
}

/** Input of {@link internalSensibleGains}. */
export interface InternalGainsInput {
  /** Occupants (optional). */
  people?: Readonly<OccupantGainInput>;
  /** Floor area the W/m² gains refer to, m², ≥ 0; required when a W/m² gain is given. */
  floorAreaM2?: number;
  /** Equipment sensible gain, W/m² of floor, ≥ 0. */
  equipmentWm2?: number;
  /** Lighting gain, W/m² of floor, ≥ 0. */
  lightingWm2?: number;
}

/** Sensible internal gains, W. */
export interface InternalGains {
  /** People, W. */
  peopleW: number;
  /** Equipment, W. */
  equipmentW: number;
  /** Lighting, W. */
  lightingW: number;
  /** Sum, W. */
  totalW: number;
}

/**
 * Steady sensible internal gains (ASHRAE Fundamentals ch. 18 [3]): people
 * count × sensible W/person (Table 1), equipment and lighting W/m² × floor area. The whole
 * sensible gain is counted at once (no radiant time series / storage).
 *
 * @param input people (count ≥ 0, activity or sensibleWPerPerson W ≥ 0), floorAreaM2 m² ≥ 0,
 *              equipmentWm2 and lightingWm2 W/m² ≥ 0.
 * @returns people, equipment, lighting and total W.
 * @throws RangeError for negative/non-finite values, an unknown activity, or a W/m² gain without floor area.
 */
export function internalSensibleGains(input: Readonly<InternalGainsInput>): InternalGains {
  let peopleW = 0;
  if (input.people !== undefined) {
    const p = input.people;
    assertNonNegative(p.count, "people.count");
    let rate: number;
    if (p.sensibleWPerPerson !== undefined) {
      assertNonNegative(p.sensibleWPerPerson, "people.sensibleWPerPerson");
      rate = p.sensibleWPerPerson;
    } else {
      const activity = p.activity ?? "seatedVeryLightWork";
      if (!Object.prototype.hasOwnProperty.call(PEOPLE_SENSIBLE_GAIN_W, activity)) {
        throw new RangeError(`people.activity is not a tabulated activity: ${String(activity)}`);
      }
      rate = PEOPLE_SENSIBLE_GAIN_W[activity];
    }
    peopleW = p.count * rate;
  }
  const perArea = input.equipmentWm2 !== undefined || input.lightingWm2 !== undefined;
  let area = 0;
  if (input.floorAreaM2 !== undefined) {
    assertNonNegative(input.floorAreaM2, "floorAreaM2");
    area = input.floorAreaM2;
  } else if (perArea) {
    throw new RangeError("floorAreaM2 is required with equipmentWm2 or lightingWm2");
  }
  let equipmentW = 0;
  if (input.equipmentWm2 !== undefined) {
    assertNonNegative(input.equipmentWm2, "equipmentWm2");
    equipmentW = input.equipmentWm2 * area;
  }
  let lightingW = 0;
  if (input.lightingWm2 !== undefined) {
    assertNonNegative(input.lightingWm2, "lightingWm2");
    lightingW = input.lightingWm2 * area;
  }
  return { peopleW, equipmentW, lightingW, totalW: peopleW + equipmentW + lightingW };
}
