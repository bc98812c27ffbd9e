import { describe, expect, test } from "vitest";
import { demoLayout } from "@/lib/demo/layout";
import { emptyLayout, layoutSchema, type Layout } from "@/lib/layout/schema";

/** The issue paths of a failed parse, joined with dots, sorted. */
function issuePaths(value: unknown): string[] {
  const result = layoutSchema.safeParse(value);
  if (result.success) return [];
  return result.error.issues.map((i) => i.path.join(".")).sort();
}

function edit(change: (layout: Layout) => void): Layout {
  const layout = demoLayout();
  change(layout);
  return layout;
}

describe("layoutSchema", () => {
  test("accepts the demo layout unchanged and the empty layout", () => {
    const demo = demoLayout();
    const parsed = layoutSchema.safeParse(demo);
    expect(parsed.success).toBe(true);
    expect(parsed.data).toEqual(demo);
    expect(layoutSchema.safeParse(emptyLayout()).success).toBe(true);
  });

  test("the demo layout is not trivially small", () => {
    const demo = demoLayout();
    expect(demo.rooms.length).toBeGreaterThan(1);
    expect(demo.panels.length).toBeGreaterThan(1);
    expect(demo.seats.length).toBeGreaterThan(1);
    expect(demo.panels.some((p) => p.louver !== null)).toBe(true);
  });

  test.each([
    {
      name: "a duplicate id within one kind",
      layout: () => edit((l) => { l.seats[1]!.id = l.seats[0]!.id; }),
      paths: ["seats.1.id"],
    },
    {
      name: "an id shared by two kinds (a seat named like a room)",
      layout: () => edit((l) => { l.seats[0]!.id = l.rooms[0]!.id; }),
      paths: ["seats.0.id"],
    },
    {
      name: "a panel in an unknown room",
      layout: () => edit((l) => { l.panels[2]!.roomId = "room-nowhere"; }),
      paths: ["panels.2.roomId"],
    },
    {
      name: "an opening in an unknown room",
      layout: () => edit((l) => { l.openings[0]!.roomId = "room-nowhere"; }),
      paths: ["openings.0.roomId"],
    },
    {
      name: "an opening on an edge its room does not have",
      layout: () => edit((l) => { l.openings[1]!.edgeIndex = l.rooms[0]!.outline.length; }),
      paths: ["openings.1.edgeIndex"],
    },
    {
      name: "a louver whose least angle exceeds its greatest",
      layout: () => edit((l) => { l.panels[0]!.louver = { ...l.panels[0]!.louver!, minOpeningAngleDeg: 170, maxOpeningAngleDeg: 120, openingAngleDeg: 150 }; }),
      paths: ["panels.0.louver.minOpeningAngleDeg", "panels.0.louver.openingAngleDeg"],
    },
    {
      name: "a louver opened beyond its range",
      layout: () => edit((l) => { l.panels[0]!.louver = { ...l.panels[0]!.louver!, minOpeningAngleDeg: 30, maxOpeningAngleDeg: 120, openingAngleDeg: 150 }; }),
      paths: ["panels.0.louver.openingAngleDeg"],
    },
    {
      name: "a PMV band whose lower limit is not below its upper",
      layout: () => edit((l) => { l.zones[1]!.target = { kind: "pmvBand", minPmv: 0.5, maxPmv: 0.5 }; }),
      paths: ["zones.1.target.minPmv"],
    },
  ])("rejects $name at $paths", ({ layout, paths }) => {
    expect(issuePaths(layout())).toEqual(paths);
  });

  test.each([
    { name: "an unknown field", change: (l: Record<string, unknown>) => { l.furniture = []; }, paths: [""] },
    { name: "another schema version", change: (l: Record<string, unknown>) => { l.schemaVersion = 2; }, paths: ["schemaVersion"] },
    { name: "a room with two corners", change: (l: Record<string, unknown>) => { (l.rooms as Layout["rooms"])[0]!.outline.splice(2); }, paths: ["rooms.0.outline"] },
    { name: "an id with spaces", change: (l: Record<string, unknown>) => { (l.seats as Layout["seats"])[0]!.id = "desk 1"; }, paths: ["seats.0.id"] },
    { name: "a non-finite coordinate", change: (l: Record<string, unknown>) => { (l.seats as Layout["seats"])[0]!.position.x = Number.POSITIVE_INFINITY; }, paths: ["seats.0.position.x"] },
    { name: "clo out of range", change: (l: Record<string, unknown>) => { (l.seats as Layout["seats"])[0]!.clo = 3; }, paths: ["seats.0.clo"] },
  ])("rejects $name", ({ change, paths }) => {
    const layout = demoLayout() as unknown as Record<string, unknown>;
    change(layout);
    expect(issuePaths(layout)).toEqual(paths);
  });
});
