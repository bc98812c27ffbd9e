import { describe, expect, it } from "vitest";
import type { Panel } from "@/lib/layout/schema";
import { panelFormSchema, panelToForm, roomFormSchema, roomToForm, seatFormSchema, seatToForm, zoneFormSchema, zoneToForm } from "@/lib/plan/forms";
import type { Zone } from "@/lib/layout/schema";
import { describeLayoutPath } from "@/lib/plan/paths";
import { sampleLayout } from "./helpers";

const panel = (): Panel => sampleLayout().panels[0]!;

describe("properties forms", () => {
  it("panelToForm → panelFormSchema round-trips a panel unchanged in SI", () => {
    const p = panel();
    const parsed = panelFormSchema(p, "si").safeParse(panelToForm(p, "si"));
    expect(parsed.success && parsed.data).toEqual(p);
  });

  it("IP values typed in the form are stored in SI", () => {
    const p = panel();
    const form = panelToForm(p, "ip");
    expect(form.widthM).toBeCloseTo(3.281, 3);
    expect(form.supply.surfaceTemperatureC).toBeCloseTo(89.6, 6);
    const parsed = panelFormSchema(p, "ip").parse({ ...form, supply: { ...form.supply, surfaceTemperatureC: 113 }, mountingHeightM: 9 });
    expect(parsed.supply).toEqual({ kind: "surface", surfaceTemperatureC: 45 });
    expect(parsed.mountingHeightM).toBeCloseTo(2.7432, 9);
  });

  it("switching the supply to water drops the surface fields and keeps the characteristic", () => {
    const p = panel();
    const form = panelToForm(p, "si");
    const parsed = panelFormSchema(p, "si").parse({ ...form, supply: { ...form.supply, kind: "water", meanWaterTemperatureC: 40, characteristic: { kWm2PerKn: 6, n: 1.2 } } });
    expect(parsed.supply).toEqual({ kind: "water", meanWaterTemperatureC: 40, characteristic: { kWm2PerKn: 6, n: 1.2 } });
  });

  it("louvers off store null; a louver angle outside its range is refused on its own field", () => {
    const p = panel();
    const form = panelToForm(p, "si");
    expect(panelFormSchema(p, "si").parse({ ...form, louverOn: false }).louver).toBeNull();
    const bad = panelFormSchema(p, "si").safeParse({ ...form, louverOn: true, louver: { ...form.louver, openingAngleDeg: 10, minOpeningAngleDeg: 30 } });
    expect(bad.success).toBe(false);
    expect(bad.error!.issues.map((i) => i.path.join("."))).toContain("louver.openingAngleDeg");
  });

  it("a blank required number and an out-of-range temperature are named by their paths", () => {
    const p = panel();
    const form = panelToForm(p, "si");
    const bad = panelFormSchema(p, "si").safeParse({ ...form, widthM: Number.NaN, supply: { ...form.supply, surfaceTemperatureC: 200 } });
    expect(bad.success).toBe(false);
    const paths = bad.error!.issues.map((i) => i.path.join("."));
    expect(paths).toEqual(expect.arrayContaining(["widthM", "supply.surfaceTemperatureC"]));
  });

  it("a room keeps its id and outline; a 1 m ceiling is refused", () => {
    const room = sampleLayout().rooms[0]!;
    expect(roomFormSchema(room, "si").parse({ ...roomToForm(room, "si"), name: "Studio" })).toEqual({ ...room, name: "Studio" });
    const bad = roomFormSchema(room, "si").safeParse({ ...roomToForm(room, "si"), ceilingHeightM: 1 });
    expect(bad.error!.issues[0]!.path).toEqual(["ceilingHeightM"]);
  });

  it("blank clo and met mean the scenario's default (null)", () => {
    const seat = { ...sampleLayout().seats[0]!, clo: 0.7, met: 1.1 };
    const parsed = seatFormSchema(seat, "si").parse({ ...seatToForm(seat, "si"), clo: null, met: null });
    expect(parsed).toMatchObject({ clo: null, met: null, position: seat.position });
  });
});

describe("zone properties form", () => {
  it("applying name and target keeps the zone's schedule (edited in its own form)", () => {
    const zone: Zone = {
      id: "z1",
      name: "Window desks",
      outline: [{ x: 0, y: 0 }, { x: 4, y: 0 }, { x: 4, y: 3 }],
      target: { kind: "category", category: "B" },
      schedule: { periods: [{ days: ["mon", "tue"], startHour: 8, endHour: 18, louver: { mode: "automatic" } }] },
    };
    const applied = zoneFormSchema(zone).parse({ ...zoneToForm(zone), name: "Window row" });
    expect(applied.name).toBe("Window row");
    expect(applied.schedule).toEqual(zone.schedule);
    const { schedule: _dropped, ...withoutSchedule } = zone;
    expect("schedule" in zoneFormSchema(withoutSchedule).parse(zoneToForm(withoutSchedule))).toBe(false);
  });
});

describe("describeLayoutPath", () => {
  it("names the element of a layout error path by its label", () => {
    const layout = sampleLayout();
    expect(describeLayoutPath(layout, "layout.panels.0.supply.surfaceTemperatureC")).toBe("Panel “P-1” · supply.surfaceTemperatureC");
    expect(describeLayoutPath(layout, "rooms.0.name")).toBe("Room “Room A” · name");
    expect(describeLayoutPath(layout, "seats.5.label")).toBe("Seat “#6” · label");
    expect(describeLayoutPath(layout, "message")).toBe("message");
  });
});
