/**
 * Design conditions ("scenarios") of a project, SI units. One zod schema shared by the route
 * handlers, the service and the scenario form.
 */
import { z } from "zod";
import { surfaceThermal } from "@/lib/layout/schema";

const finite = z.number().finite();

export const panelModeSchema = z.enum(["heating", "cooling"]);

/**
 * How the inside temperature of a class of room surfaces is known: given directly, or from a
 * U-value with the far side at the outdoor temperature (see surface-temperature.ts).
 */
export { surfaceThermal };
export type SurfaceThermal = z.infer<typeof surfaceThermal>;

export const scenarioConditions = z.strictObject({
  /** Room air temperature, °C (uniform over the floor). */
  airTemperatureC: finite.min(5).max(40),
  relativeHumidityPercent: finite.min(0).max(100),
  /** Relative air speed at the occupants, m/s. */
  airSpeedMps: finite.min(0).max(2),
  /** Clothing insulation for seats without their own value, clo. */
  defaultClo: finite.min(0).max(2),
  /** Metabolic rate for seats without their own value, met. */
  defaultMet: finite.min(0.8).max(4),
  /** Outdoor design temperature, °C: the far side of every surface given by a U-value. */
  outdoorTemperatureC: finite.min(-50).max(55),
  /** Which panel modes run; panels of other modes are off. */
  activeModes: z
    .array(panelModeSchema)
    .max(2)
    .refine((modes) => new Set(modes).size === modes.length, { message: "list each mode once" }),
  surfaces: z.strictObject({
    exteriorWalls: surfaceThermal,
    /** null = at the air temperature. */
    interiorWalls: surfaceThermal.nullable(),
    /** null = at the air temperature. */
    floor: surfaceThermal.nullable(),
    /** null = at the air temperature. */
    ceiling: surfaceThermal.nullable(),
    /** Openings without their own thermal data. */
    openings: surfaceThermal,
  }),
  // Room loads and the water side (GET /loads, /energy). Optional so scenarios saved before they
  // existed still parse; `withLoadDefaults` fills in LOAD_DEFAULTS where they are read.
  /** Outdoor air changes per hour for the ventilation part of the room loads, 1/h (default 0.5). */
  airChangesPerHour: finite.min(0).max(20).optional(),
  /** Sensible internal gains counted in the summer (cooling) load; default LOAD_DEFAULTS.internalGains. */
  internalGains: z
    .strictObject({
      /** Occupants: one per seat drawn in the room, or a density per m² of floor. */
      occupants: z.discriminatedUnion("kind", [
        z.strictObject({ kind: z.literal("seats") }),
        z.strictObject({ kind: z.literal("density"), personsPerM2: finite.min(0).max(2) }),
      ]),
      /** Sensible gain per person, W (70 W: seated, very light office work, ASHRAE Fundamentals ch. 18 Table 1). */
      sensibleWPerPerson: finite.min(0).max(300),
      /** Equipment, W/m² of floor. */
      equipmentWm2: finite.min(0).max(200),
      /** Lighting, W/m² of floor. */
      lightingWm2: finite.min(0).max(100),
    })
    .optional(),
  /** Design temperature drop |flow − return| of water-supplied panels, K (defaults 5 heating, 3 cooling). */
  waterTemperatureDropK: z.strictObject({ heating: finite.min(0.5).max(40), cooling: finite.min(0.5).max(20) }).optional(),
});

export const scenarioName = z.string().trim().min(1, "enter a name").max(80);

export const scenarioInput = z.strictObject({ name: scenarioName, conditions: scenarioConditions });

export const scenarioParams = z.strictObject({
  projectId: z.uuid("not a project id"),
  scenarioId: z.uuid("not a scenario id"),
});

export type ScenarioConditions = z.infer<typeof scenarioConditions>;
export type ScenarioInput = z.infer<typeof scenarioInput>;
export type InternalGainsConditions = NonNullable<ScenarioConditions["internalGains"]>;

/**
 * What an absent load field means (scenarios saved before the fields existed have none):
 * 0.5 air changes per hour (a common minimum for occupied rooms, EN 12831 practice), one person
 * per seat at 70 W sensible with no equipment or lighting gains, and water temperature drops of
 * 5 K heating / 3 K cooling (usual design drops for radiant panels).
 */
/**
 * Defaults of the load fields, all common practice for offices rather than values of one
 * standard: 0.5 outdoor air changes per hour; one person per seat at 70 W sensible (seated, very
 * light work: ASHRAE Fundamentals ch. 18 Table 1, from memory); no equipment or lighting unless
 * entered; water temperature drops of 5 K (heating) and 3 K (cooling) for radiant panels.
 */
export const LOAD_DEFAULTS: Readonly<LoadFields> = {
  airChangesPerHour: 0.5,
  internalGains: { occupants: { kind: "seats" }, sensibleWPerPerson: 70, equipmentWm2: 0, lightingWm2: 0 },
  waterTemperatureDropK: { heating: 5, cooling: 3 },
};

type LoadFields = Required<Pick<ScenarioConditions, "airChangesPerHour" | "internalGains" | "waterTemperatureDropK">>;

/** Conditions with every optional load field filled in from LOAD_DEFAULTS. */
export type ResolvedScenarioConditions = ScenarioConditions & LoadFields;

export function withLoadDefaults(conditions: ScenarioConditions): ResolvedScenarioConditions {
  return {
    ...conditions,
    airChangesPerHour: conditions.airChangesPerHour ?? LOAD_DEFAULTS.airChangesPerHour,
    internalGains: conditions.internalGains ?? LOAD_DEFAULTS.internalGains,
    waterTemperatureDropK: conditions.waterTemperatureDropK ?? LOAD_DEFAULTS.waterTemperatureDropK,
  };
}

/**
 * The building both design scenarios describe: exterior walls and glazing from their U-values
 * (invented, typical of a recent office), the other surfaces at the air temperature.
 */
const OFFICE_ENVELOPE: ScenarioConditions["surfaces"] = {
  exteriorWalls: { kind: "uValue", uValueWm2K: 0.3 },
  interiorWalls: null,
  floor: null,
  ceiling: null,
  openings: { kind: "uValue", uValueWm2K: 1.4 },
};

/** The two design scenarios every new demo project gets (invented values typical of an office). */
export const WINTER_DESIGN: ScenarioInput = {
  name: "Winter design",
  conditions: {
    airTemperatureC: 20,
    relativeHumidityPercent: 40,
    airSpeedMps: 0.1,
    defaultClo: 1.0,
    defaultMet: 1.2,
    outdoorTemperatureC: -8,
    activeModes: ["heating"],
    surfaces: OFFICE_ENVELOPE,
    airChangesPerHour: 0.5,
    waterTemperatureDropK: { heating: 5, cooling: 3 },
  },
};

export const SUMMER_DESIGN: ScenarioInput = {
  name: "Summer design",
  conditions: {
    airTemperatureC: 26,
    relativeHumidityPercent: 50,
    airSpeedMps: 0.15,
    defaultClo: 0.5,
    defaultMet: 1.2,
    outdoorTemperatureC: 32,
    activeModes: ["cooling"],
    surfaces: OFFICE_ENVELOPE,
    airChangesPerHour: 0.7,
    // Open-plan office: one person per desk, about 10 W/m² of IT equipment and 8 W/m² of LED lighting (invented, typical values).
    internalGains: { occupants: { kind: "seats" }, sensibleWPerPerson: 70, equipmentWm2: 10, lightingWm2: 8 },
    waterTemperatureDropK: { heating: 5, cooling: 3 },
  },
};
