import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  louveredPanelOutput,
  panelConvectiveFlux,
  panelOutput,
  standardSpecificOutput,
  turndownRatio,
  type PanelOutputInput,
} from "@/lib/panels";

const HEATED_CEILING: PanelOutputInput = {
  orientation: "ceiling",
  mode: "heating",
  surfaceC: 35,
  airC: 20,
  austC: 19,
  emissivity: 0.9,
  areaM2: 2,
  equivalentDiameterM: 1.2,
};

describe("panelOutput", () => {
  it("adds radiant and convective parts and scales by area", () => {
    const r = panelOutput(HEATED_CEILING);
    expect(r.totalWm2).toBeCloseTo(r.radiantWm2 + r.convectiveWm2, 12);
    expect(r.totalW).toBeCloseTo(r.totalWm2 * 2, 12);
    expect(r.radiantShare).toBeCloseTo(r.radiantWm2 / r.totalWm2, 12);
  });

  it("reports cooling as positive capacity and heating as positive output", () => {
    const cooling = panelOutput({ ...HEATED_CEILING, mode: "cooling", surfaceC: 16, airC: 26, austC: 27 });
    expect(cooling.totalWm2).toBeGreaterThan(0);
    expect(cooling.radiantWm2).toBeGreaterThan(0);
    expect(cooling.convectiveWm2).toBeGreaterThan(0);
    const wrongSide = panelOutput({ ...HEATED_CEILING, mode: "cooling" });
    expect(wrongSide.totalWm2).toBeCloseTo(-panelOutput(HEATED_CEILING).totalWm2, 12);
  });

  it("gives no output when panel, air and surroundings share one temperature", () => {
    const r = panelOutput({ ...HEATED_CEILING, surfaceC: 21, airC: 21, austC: 21 });
    expect(r.totalWm2).toBe(0);
    expect(Number.isNaN(r.radiantShare)).toBe(true);
  });

  it("uses the stable correlation for a warm ceiling and the buoyant one for a cool ceiling", () => {
    const warm = panelConvectiveFlux("ceiling", 30, 20, 1);
    const cool = panelConvectiveFlux("ceiling", 10, 20, 1);
    expect(warm).toBeCloseTo(0.2 * 10 ** 1.25, 12);
    expect(cool).toBeCloseTo(-2.42 * 10 ** 1.31, 12);
    expect(panelConvectiveFlux("floor", 30, 20, 1)).toBeCloseTo(2.42 * 10 ** 1.31, 12);
    expect(panelConvectiveFlux("wall", 30, 20, 1)).toBeCloseTo(1.87 * 10 ** 1.32, 12);
  });

  it("defaults the convective length to √area (square panel)", () => {
    const explicit = panelOutput({ ...HEATED_CEILING, equivalentDiameterM: Math.sqrt(2) });
    const defaulted = panelOutput({ ...HEATED_CEILING, equivalentDiameterM: undefined });
    expect(defaulted.convectiveWm2).toBeCloseTo(explicit.convectiveWm2, 12);
  });

  it("grows with surface temperature in heating", () => {
    fc.assert(
      fc.property(fc.double({ min: 21, max: 60, noNaN: true }), fc.double({ min: 0.1, max: 5, noNaN: true }), (t, d) =>
        panelOutput({ ...HEATED_CEILING, surfaceC: t + d }).totalWm2 > panelOutput({ ...HEATED_CEILING, surfaceC: t }).totalWm2,
      ),
    );
  });

  const bad: ReadonlyArray<[string, Partial<PanelOutputInput>]> = [
    ["an emissivity above 1", { emissivity: 1.1 }],
    ["a zero area", { areaM2: 0 }],
    ["a negative equivalent diameter", { equivalentDiameterM: -1 }],
    ["a temperature below absolute zero", { austC: -300 }],
    ["a NaN air temperature", { airC: Number.NaN }],
    ["an unknown orientation", { orientation: "roof" as PanelOutputInput["orientation"] }],
    ["an unknown mode", { mode: "idle" as PanelOutputInput["mode"] }],
  ];

  it.each(bad)("throws RangeError for %s", (_label, patch) => {
    expect(bad.length).toBeGreaterThan(0);
    expect(() => panelOutput({ ...HEATED_CEILING, ...patch })).toThrow(RangeError);
  });
});

describe("standardSpecificOutput", () => {
  it("is negative when the surface is on the wrong side of the room temperature", () => {
    expect(standardSpecificOutput({ orientation: "floor", mode: "heating", surfaceC: 18, roomC: 20 })).toBeLessThan(0);
    expect(standardSpecificOutput({ orientation: "ceiling", mode: "cooling", surfaceC: 28, roomC: 26 })).toBeLessThan(0);
  });

  it("throws RangeError for non-finite temperatures", () => {
    expect(() => standardSpecificOutput({ orientation: "wall", mode: "heating", surfaceC: Number.NaN, roomC: 20 })).toThrow(
      RangeError,
    );
  });
});

describe("louveredPanelOutput", () => {
  it("scales only the radiant part by apparent / flat emissivity", () => {
    const flat = panelOutput(HEATED_CEILING);
    const louvered = louveredPanelOutput({ ...HEATED_CEILING, apparentEmissivity: 0.45 });
    expect(louvered.radiantScale).toBeCloseTo(0.5, 12);
    expect(louvered.radiantWm2).toBeCloseTo(flat.radiantWm2 * 0.5, 10);
    expect(louvered.convectiveWm2).toBeCloseTo(flat.convectiveWm2, 12);
    expect(louvered.flatRadiantWm2).toBeCloseTo(flat.radiantWm2, 12);
  });

  it("equals the flat panel when the apparent emissivity equals the surface emissivity", () => {
    const flat = panelOutput(HEATED_CEILING);
    const same = louveredPanelOutput({ ...HEATED_CEILING, apparentEmissivity: 0.9 });
    expect(same.totalWm2).toBeCloseTo(flat.totalWm2, 12);
  });

  it("throws RangeError for an apparent emissivity outside 0…1", () => {
    expect(() => louveredPanelOutput({ ...HEATED_CEILING, apparentEmissivity: 1.2 })).toThrow(RangeError);
  });
});

describe("turndownRatio", () => {
  it("divides the highest by the lowest output", () => {
    expect(turndownRatio([120, 40, 80])).toBe(3);
    expect(turndownRatio([50])).toBe(1);
  });

  it("is at least 1 for any positive outputs", () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: 0.01, max: 1e4, noNaN: true }), { minLength: 1, maxLength: 10 }), (qs) =>
        turndownRatio(qs) >= 1,
      ),
    );
  });

  it("throws RangeError for an empty list, a non-positive lowest output or NaN", () => {
    expect(() => turndownRatio([])).toThrow(RangeError);
    expect(() => turndownRatio([100, 0])).toThrow(RangeError);
    expect(() => turndownRatio([100, -5])).toThrow(RangeError);
    expect(() => turndownRatio([100, Number.NaN])).toThrow(RangeError);
  });
});
