import { describe, expect, it } from "vitest";
import { scenarioInput, SUMMER_DESIGN, WINTER_DESIGN } from "@/lib/scenarios/schema";

const paths = (value: unknown) => {
  const r = scenarioInput.safeParse(value);
  return r.success ? [] : r.error.issues.map((i) => i.path.join("."));
};

describe("scenarioInput", () => {
  it.each([WINTER_DESIGN, SUMMER_DESIGN])("accepts the demo scenario $name", (scenario) => {
    expect(scenarioInput.parse(scenario)).toEqual(scenario);
  });

  it("takes either a surface temperature or a U-value per surface class, and null for 'at the air temperature'", () => {
    const surfaces = { ...WINTER_DESIGN.conditions.surfaces, floor: { kind: "surfaceTemperature", surfaceTemperatureC: 24 }, ceiling: null };
    expect(paths({ ...WINTER_DESIGN, conditions: { ...WINTER_DESIGN.conditions, surfaces } })).toEqual([]);
    expect(paths({ ...WINTER_DESIGN, conditions: { ...WINTER_DESIGN.conditions, surfaces: { ...surfaces, exteriorWalls: null } } })).toEqual([
      "conditions.surfaces.exteriorWalls",
    ]);
    expect(paths({ ...WINTER_DESIGN, conditions: { ...WINTER_DESIGN.conditions, surfaces: { ...surfaces, floor: { kind: "uValue", surfaceTemperatureC: 20 } } } })).toContain(
      "conditions.surfaces.floor.uValueWm2K",
    );
  });

  it("names each out-of-range value and refuses a mode listed twice", () => {
    const conditions = { ...WINTER_DESIGN.conditions, relativeHumidityPercent: -1, airSpeedMps: 3, defaultMet: 0.5, activeModes: ["cooling", "cooling"] };
    expect(paths({ ...WINTER_DESIGN, conditions }).sort()).toEqual(
      ["conditions.activeModes", "conditions.airSpeedMps", "conditions.defaultMet", "conditions.relativeHumidityPercent"].sort(),
    );
    expect(paths({ ...WINTER_DESIGN, conditions: { ...WINTER_DESIGN.conditions, activeModes: [] } })).toEqual([]);
  });
});
