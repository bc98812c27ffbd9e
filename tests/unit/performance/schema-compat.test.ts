import { describe, expect, test } from "vitest";
import { demoLayout } from "@/lib/demo/layout";
import { layoutSchema } from "@/lib/layout/schema";
import { LOAD_DEFAULTS, scenarioConditions, SUMMER_DESIGN, WINTER_DESIGN, withLoadDefaults } from "@/lib/scenarios/schema";

describe("old documents still validate (schemaVersion 1)", () => {
  test("a layout whose zones have no schedule", () => {
    const layout = demoLayout();
    const old = { ...layout, zones: layout.zones.map(({ schedule: _s, ...z }) => z) };
    const parsed = layoutSchema.safeParse(old);
    expect(parsed.success).toBe(true);
    expect(parsed.data!.zones.every((z) => z.schedule === undefined)).toBe(true);
  });

  test("scenario conditions without the load fields parse, and withLoadDefaults fills them in", () => {
    const { airChangesPerHour: _a, internalGains: _g, waterTemperatureDropK: _w, ...old } = SUMMER_DESIGN.conditions;
    const parsed = scenarioConditions.parse(old);
    expect(parsed.airChangesPerHour).toBeUndefined();
    const resolved = withLoadDefaults(parsed);
    expect(resolved.airChangesPerHour).toBe(0.5);
    expect(resolved.internalGains).toEqual(LOAD_DEFAULTS.internalGains);
    expect(resolved.waterTemperatureDropK).toEqual({ heating: 5, cooling: 3 });
  });

  test("given values win over the defaults", () => {
    expect(withLoadDefaults(SUMMER_DESIGN.conditions).airChangesPerHour).toBe(0.7);
    expect(withLoadDefaults(WINTER_DESIGN.conditions).internalGains).toEqual(LOAD_DEFAULTS.internalGains);
  });
});

describe("new fields are validated", () => {
  test("the demo layout's schedules parse", () => {
    const parsed = layoutSchema.parse(demoLayout());
    expect(parsed.zones.find((z) => z.id === "zone-core")!.schedule!.periods).toHaveLength(2);
  });

  test("overlapping periods are named at the period", () => {
    const layout = demoLayout();
    layout.zones[0]!.schedule = {
      periods: [
        { days: ["mon"], startHour: 8, endHour: 12, louver: { mode: "automatic" } },
        { days: ["mon", "tue"], startHour: 11, endHour: 14, louver: { mode: "fixed", openingAngleDeg: 200 } },
      ],
    };
    const result = layoutSchema.safeParse(layout);
    expect(result.success).toBe(false);
    const paths = result.error!.issues.map((i) => i.path.join("."));
    expect(paths).toContain("zones.0.schedule.periods.1.louver.openingAngleDeg");
  });

  test("bad load fields are refused with their paths", () => {
    const bad = { ...WINTER_DESIGN.conditions, airChangesPerHour: -1, waterTemperatureDropK: { heating: 0, cooling: 3 }, internalGains: { occupants: { kind: "density" }, sensibleWPerPerson: 70, equipmentWm2: 0, lightingWm2: 0 } };
    const result = scenarioConditions.safeParse(bad);
    expect(result.success).toBe(false);
    const paths = result.error!.issues.map((i) => i.path.join(".")).sort();
    expect(paths).toEqual(["airChangesPerHour", "internalGains.occupants.personsPerM2", "waterTemperatureDropK.heating"]);
  });
});
