import { describe, expect, test } from "vitest";
import {
  allOpenTotalW, bandText, beforeAfterByZone, inBand, polarEmission, polarLambert, polarRings, sweepRows, targetBand, turndownText, type OptimiseResultView,
} from "@/components/louvers/chart-data";
import { LAYOUT_SCHEMA_VERSION, type Layout } from "@/lib/layout/schema";

const square = (x0: number, y0: number, x1: number, y1: number) => [{ x: x0, y: y0 }, { x: x1, y: y0 }, { x: x1, y: y1 }, { x: x0, y: y1 }];

function layout(): Layout {
  return {
    schemaVersion: LAYOUT_SCHEMA_VERSION,
    rooms: [{ id: "r", name: "Room", outline: square(0, 0, 10, 10), ceilingHeightM: 3 }],
    openings: [],
    panels: [],
    seats: [
      { id: "a", label: "Desk A", position: { x: 1, y: 1 }, posture: "seated", facingDeg: 0, clo: null, met: null },
      { id: "b", label: "Desk B", position: { x: 6, y: 6 }, posture: "seated", facingDeg: 0, clo: null, met: null },
      { id: "c", label: "Desk C", position: { x: 5, y: 1 }, posture: "seated", facingDeg: 0, clo: null, met: null },
    ],
    zones: [
      { id: "z1", name: "South", outline: square(0, 0, 10, 5), target: { kind: "pmvBand", minPmv: -0.6, maxPmv: -0.3 } },
      { id: "z2", name: "North", outline: square(0, 5, 10, 10), target: { kind: "category", category: "B" } },
      { id: "z3", name: "Empty", outline: square(20, 20, 30, 30), target: { kind: "category", category: "A" } },
    ],
    underlay: null,
  };
}

describe("targetBand / inBand / bandText", () => {
  test.each([
    { category: "A" as const, limit: 0.2 },
    { category: "B" as const, limit: 0.5 },
    { category: "C" as const, limit: 0.7 },
  ])("category $category is the open interval ±$limit (ISO 7730 Table A.1)", ({ category, limit }) => {
    const band = targetBand({ kind: "category", category });
    expect(band).toEqual({ min: -limit, max: limit, strict: true });
    expect(inBand(limit, band)).toBe(false);
    expect(inBand(limit - 0.001, band)).toBe(true);
    expect(bandText({ kind: "category", category })).toBe(`category ${category}, |PMV| < ${limit}`);
  });

  test("a PMV band includes its limits and prints with signs", () => {
    const band = targetBand({ kind: "pmvBand", minPmv: -0.6, maxPmv: 0.25 });
    expect(band).toEqual({ min: -0.6, max: 0.25, strict: false });
    expect(inBand(-0.6, band)).toBe(true);
    expect(inBand(0.25, band)).toBe(true);
    expect(inBand(0.2501, band)).toBe(false);
    expect(bandText({ kind: "pmvBand", minPmv: -0.6, maxPmv: 0.25 })).toBe("-0.60 … +0.25");
  });
});

describe("beforeAfterByZone(result, layout)", () => {
  const result: OptimiseResultView = {
    panels: [],
    seats: [
      { id: "a", pmvBefore: -0.2, pmvAfter: -0.4, inTarget: true },
      { id: "b", pmvBefore: -0.7, pmvAfter: -0.55, inTarget: false },
      { id: "gone", pmvBefore: 0, pmvAfter: 0, inTarget: true },
    ],
    unreachable: [{ seatId: "b", reason: "needs more output than the panel gives fully open" }],
    totalOutputW: 0,
  };

  test("groups seats by the layout's zones (by position when the server gives no zone ids), skipping empty zones and unknown seats", () => {
    const zones = beforeAfterByZone(result, layout());
    expect(zones.map((z) => z.zoneId)).toEqual(["z1", "z2"]);
    expect(zones[0]!.seats.map((s) => s.id)).toEqual(["a"]);
    expect(zones[1]!.seats.map((s) => s.id)).toEqual(["b"]);
    expect(zones[0]!.seats[0]).toMatchObject({ label: "Desk A", pmvBefore: -0.2, pmvAfter: -0.4, inTarget: true, inTargetBefore: false, unreachable: null });
    expect(zones[1]!.seats[0]).toMatchObject({ inTargetBefore: false, unreachable: "needs more output than the panel gives fully open" });
    expect(zones[1]!.band).toEqual({ min: -0.5, max: 0.5, strict: true });
  });

  test("the server's zone ids, labels and before-flags win over the layout's", () => {
    const zones = beforeAfterByZone(
      { ...result, seats: [{ id: "c", pmvBefore: 0, pmvAfter: 0.1, inTarget: false, label: "Server label", zoneIds: ["z2"], inTargetBefore: true }] },
      layout(),
    );
    expect(zones.map((z) => z.zoneId)).toEqual(["z2"]);
    expect(zones[0]!.seats[0]).toMatchObject({ id: "c", label: "Server label", inTargetBefore: true });
  });
});

describe("allOpenTotalW(panelIds, curves)", () => {
  test("sums each panel's last (largest-angle) point and counts panels without a curve", () => {
    const curves = new Map([
      ["p1", [{ openingAngleDeg: 30, totalW: 77, radiantW: 60, convectiveW: 17 }, { openingAngleDeg: 180, totalW: 243, radiantW: 229, convectiveW: 14 }]],
      ["p2", [{ openingAngleDeg: null, totalW: 100, radiantW: 80, convectiveW: 20 }]],
    ]);
    expect(allOpenTotalW(["p1", "p2"], curves)).toEqual({ totalW: 343, missing: 0 });
    expect(allOpenTotalW(["p1", "p3"], curves)).toEqual({ totalW: 243, missing: 1 });
    expect(allOpenTotalW([], curves)).toEqual({ totalW: 0, missing: 0 });
  });
});

describe("polarEmission(directional)", () => {
  const directional = [0.9, 0.88, 0.85, 0.8, 0.74, 0.66, 0.55, 0.42, 0.3];

  test("mirrors the 9 bins to −85…+85° between two grazing zeros, intensity ε(θ)·cos θ", () => {
    const points = polarEmission(directional);
    expect(points).toHaveLength(20);
    expect(points.map((p) => p.angleDeg)).toEqual([-90, -85, -75, -65, -55, -45, -35, -25, -15, -5, 5, 15, 25, 35, 45, 55, 65, 75, 85, 90]);
    expect(points[0]!.intensity).toBe(0);
    expect(points[19]!.intensity).toBe(0);
    const at15 = points.find((p) => p.angleDeg === 15)!;
    expect(at15.intensity).toBeCloseTo(0.88 * Math.cos((15 * Math.PI) / 180), 12);
    expect(at15.x).toBeCloseTo(at15.intensity * Math.sin((15 * Math.PI) / 180), 12);
    expect(at15.y).toBeCloseTo(at15.intensity * Math.cos((15 * Math.PI) / 180), 12);
    for (let k = 0; k < 10; k += 1) {
      expect(points[k]!.intensity).toBeCloseTo(points[19 - k]!.intensity, 12);
      expect(points[k]!.x).toBeCloseTo(-points[19 - k]!.x, 12);
    }
  });

  test("a flat face draws a circle through the origin: r = ε·cos θ, so x² + (y − ε/2)² = (ε/2)²", () => {
    for (const p of polarLambert(0.93)) expect(p.x * p.x + (p.y - 0.465) ** 2).toBeCloseTo(0.465 ** 2, 12);
  });

  test("a directional emissivity constant in θ is Lambertian: the same curve as a flat face", () => {
    const louver = polarEmission(new Array(9).fill(0.5));
    const flat = polarLambert(0.5);
    expect(louver).toEqual(flat);
  });

  test("refuses anything but 9 finite values", () => {
    expect(() => polarEmission([0.5, 0.5])).toThrow(RangeError);
    expect(() => polarEmission([...directional.slice(0, 8), Number.NaN])).toThrow(RangeError);
  });

  test("rings are half circles at ¼, ½, ¾ and 1 of the radius", () => {
    const rings = polarRings(2, 12);
    expect(rings.map((r) => r.level)).toEqual([0.5, 1, 1.5, 2]);
    for (const r of rings) {
      expect(r.points).toHaveLength(13);
      for (const p of r.points) {
        expect(Math.hypot(p.x, p.y)).toBeCloseTo(r.level, 12);
        expect(p.y).toBeGreaterThanOrEqual(-1e-12);
      }
    }
  });
});

describe("sweepRows / turndownText", () => {
  test("one row per angle with each seat's PMV under its id; missing or non-finite values are left out", () => {
    const rows = sweepRows({ anglesDeg: [30, 90, 180], seats: [{ id: "a", label: "A", pmv: [-0.5, -0.4, -0.3] }, { id: "b", label: "B", pmv: [0.1, Number.NaN] }] });
    expect(rows).toEqual([{ angle: 30, a: -0.5, b: 0.1 }, { angle: 90, a: -0.4 }, { angle: 180, a: -0.3 }]);
  });

  test("turndown prints as a ratio, or a dash without one", () => {
    expect(turndownText(3.1473)).toBe("3.15 : 1");
    expect(turndownText(null)).toBe("—");
    expect(turndownText(Number.POSITIVE_INFINITY)).toBe("—");
  });
});
