import { describe, expect, it } from "vitest";
import { binEdges, histogram, targetBand, zoneHistograms } from "@/components/results/histogram";

describe("binEdges(lo, hi, width)", () => {
  it("aligns edges on multiples of the width and covers the range", () => {
    expect(binEdges(-0.33, 0.12, 0.25)).toEqual([-0.5, -0.25, 0, 0.25]);
    expect(binEdges(-0.2, 0.2, 0.1)).toEqual([-0.2, -0.1, 0, 0.1, 0.2]);
  });

  it("gives one bin when the range is a single point", () => {
    expect(binEdges(0.3, 0.3, 0.1)).toHaveLength(2);
  });

  it.each([0.05, 0.3, Number.NaN])("refuses a bin width of %s", (w) => {
    expect(() => binEdges(0, 1, w)).toThrow(RangeError);
  });
});

describe("histogram(values, edges)", () => {
  const edges = [-0.5, -0.25, 0, 0.25, 0.5];

  it("counts each value once; a value on an inner edge goes to the bin above", () => {
    const bins = histogram([-0.5, -0.3, -0.25, 0, 0.1, 0.24, 0.5], edges);
    expect(bins.map((b) => b.count)).toEqual([2, 1, 3, 1]);
    expect(bins.reduce((n, b) => n + b.count, 0)).toBe(7);
  });

  it("ignores values outside the edges and non-finite values", () => {
    expect(histogram([-0.9, 0.9, Number.NaN, 0.1], edges).map((b) => b.count)).toEqual([0, 0, 1, 0]);
  });

  it("labels bins by their edges", () => {
    expect(histogram([], edges).map((b) => b.label)).toEqual(["-0.50…-0.25", "-0.25…0.00", "0.00…0.25", "0.25…0.50"]);
  });
});

describe("targetBand(target)", () => {
  it("uses the ISO 7730 Table A.1 PMV limits for categories and the stated band otherwise", () => {
    expect(targetBand({ kind: "category", category: "A" })).toEqual({ min: -0.2, max: 0.2 });
    expect(targetBand({ kind: "category", category: "B" })).toEqual({ min: -0.5, max: 0.5 });
    expect(targetBand({ kind: "category", category: "C" })).toEqual({ min: -0.7, max: 0.7 });
    expect(targetBand({ kind: "pmvBand", minPmv: -0.3, maxPmv: 0.1 })).toEqual({ min: -0.3, max: 0.1 });
  });
});

describe("zoneHistograms(seats, zones, width)", () => {
  const zones = [
    { id: "z1", name: "Window", target: { kind: "category" as const, category: "A" as const } },
    { id: "z2", name: "Core", target: { kind: "pmvBand" as const, minPmv: -1, maxPmv: 0 } },
  ];
  const seats = [
    { pmv: 0.05, zoneIds: ["z1"] },
    { pmv: 0.15, zoneIds: ["z1", "z2"] },
    { pmv: -0.8, zoneIds: ["z2"] },
    { pmv: 1.2, zoneIds: [] },
  ];

  it("gives one series per zone on shared edges, plus seats in no zone", () => {
    const result = zoneHistograms(seats, zones, 0.25);
    expect(result.map((h) => h.name)).toEqual(["Window", "Core", "Seats in no zone"]);
    const labels = result[0]!.bins.map((b) => b.label);
    for (const h of result) expect(h.bins.map((b) => b.label)).toEqual(labels);
    expect(result.map((h) => h.bins.reduce((n, b) => n + b.count, 0))).toEqual([2, 2, 1]);
    // Lowest band edge −1 and highest value 1.2, each with one spare bin: −1.25 … 1.5.
    expect(result[0]!.bins[0]!.start).toBe(-1.25);
    expect(result[0]!.bins[result[0]!.bins.length - 1]!.end).toBe(1.5);
  });

  it("names the first and last bin of each zone's target band for shading", () => {
    const [win, core, loose] = zoneHistograms(seats, zones, 0.1);
    expect(win!.bandBins).toEqual({ from: "-0.20…-0.10", to: "0.10…0.20" });
    expect(core!.bandBins).toEqual({ from: "-1.00…-0.90", to: "-0.10…0.00" });
    expect(loose!.bandBins).toBeNull();
    // The spare bins keep the band from filling the whole axis.
    expect(win!.bandBins!.from).not.toBe(win!.bins[0]!.label);
    expect(win!.bandBins!.to).not.toBe(win!.bins[win!.bins.length - 1]!.label);
  });
});
