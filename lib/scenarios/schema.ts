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
});

export const scenarioName = z.string().trim().min(1, "enter a name").max(80);

export const scenarioInput = z.strictObject({ name: scenarioName, conditions: scenarioConditions });

export const scenarioParams = z.strictObject({
  projectId: z.uuid("not a project id"),
  scenarioId: z.uuid("not a scenario id"),
});

export type ScenarioConditions = z.infer<typeof scenarioConditions>;
export type ScenarioInput = z.infer<typeof scenarioInput>;

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
    surfaces: {
      exteriorWalls: { kind: "uValue", uValueWm2K: 0.3 },
      interiorWalls: null,
      floor: null,
      ceiling: null,
      openings: { kind: "uValue", uValueWm2K: 1.4 },
    },
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
    surfaces: {
      exteriorWalls: { kind: "uValue", uValueWm2K: 0.3 },
      interiorWalls: null,
      floor: null,
      ceiling: null,
      openings: { kind: "uValue", uValueWm2K: 1.4 },
    },
  },
};
