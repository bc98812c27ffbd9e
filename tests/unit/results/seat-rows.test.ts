import { describe, expect, it } from "vitest";
import { NO_FILTER, NO_ZONE, filterSeatRows, sortSeatRows, toSeatRows } from "@/components/results/seat-rows";
import { seatResult, zoneResult } from "./fixtures";

const zones = [zoneResult({ id: "z-win", name: "Window band" }), zoneResult({ id: "z-core", name: "Core" })];
const seats = [
  seatResult({ id: "s10", label: "Desk 10", pmv: 0.3, zoneIds: ["z-win"], category: "B" }),
  seatResult({ id: "s2", label: "Desk 2", pmv: -0.6, zoneIds: ["z-win", "z-core"], category: "C" }),
  seatResult({ id: "s1", label: "Desk 1", pmv: 0.1, zoneIds: ["z-core"], category: "A" }),
  seatResult({ id: "s3", label: "Lobby", pmv: -0.9, zoneIds: [], category: null, ashrae55: { compliant: false, failing: [{ code: "pmv", message: "PMV outside -0.5…+0.5" }] } }),
];
const rows = toSeatRows(seats, zones);

describe("toSeatRows(seats, zones)", () => {
  it("names the zones of each seat and marks seats in no zone", () => {
    expect(rows.map((r) => r.zoneNames)).toEqual(["Window band", "Window band, Core", "Core", NO_ZONE]);
    expect(rows[3]!.ashraeFailing).toEqual(["PMV outside -0.5…+0.5"]);
    expect(rows[3]!.ashrae55).toBe(false);
  });
});

describe("sortSeatRows(rows, sort)", () => {
  it("sorts by PMV ascending and descending", () => {
    expect(sortSeatRows(rows, { key: "pmv", direction: "asc" }).map((r) => r.pmv)).toEqual([-0.9, -0.6, 0.1, 0.3]);
    expect(sortSeatRows(rows, { key: "pmv", direction: "desc" }).map((r) => r.pmv)).toEqual([0.3, 0.1, -0.6, -0.9]);
  });

  it("sorts labels in natural order (Desk 2 before Desk 10)", () => {
    expect(sortSeatRows(rows, { key: "label", direction: "asc" }).map((r) => r.label)).toEqual(["Desk 1", "Desk 2", "Desk 10", "Lobby"]);
  });

  it("puts seats outside every category last when sorting by category", () => {
    expect(sortSeatRows(rows, { key: "category", direction: "asc" }).map((r) => r.category)).toEqual(["A", "B", "C", null]);
  });

  it("does not change the input", () => {
    const before = rows.map((r) => r.id);
    sortSeatRows(rows, { key: "pmv", direction: "asc" });
    expect(rows.map((r) => r.id)).toEqual(before);
  });
});

describe("filterSeatRows(rows, filter)", () => {
  it("keeps everything with no filter", () => {
    expect(filterSeatRows(rows, NO_FILTER)).toHaveLength(4);
  });

  it("filters by zone, including seats in several zones", () => {
    expect(filterSeatRows(rows, { ...NO_FILTER, zoneId: "z-core" }).map((r) => r.id)).toEqual(["s2", "s1"]);
    expect(filterSeatRows(rows, { ...NO_FILTER, zoneId: NO_ZONE }).map((r) => r.id)).toEqual(["s3"]);
  });

  it("filters by category and by text in label or zone name, case-insensitively", () => {
    expect(filterSeatRows(rows, { ...NO_FILTER, category: "C" }).map((r) => r.id)).toEqual(["s2"]);
    expect(filterSeatRows(rows, { ...NO_FILTER, category: "none" }).map((r) => r.id)).toEqual(["s3"]);
    expect(filterSeatRows(rows, { ...NO_FILTER, text: "WINDOW" }).map((r) => r.id)).toEqual(["s10", "s2"]);
    expect(filterSeatRows(rows, { ...NO_FILTER, text: "lob" }).map((r) => r.id)).toEqual(["s3"]);
  });

  it("combines filters", () => {
    expect(filterSeatRows(rows, { zoneId: "z-win", category: "B", text: "desk" }).map((r) => r.id)).toEqual(["s10"]);
  });
});
