import { describe, expect, it } from "vitest";
import {
  buildLouverTable,
  louverOutputCurve,
  louverTurndownRatio,
  panelOutput,
  zoneTurndownRatio,
  type LouverAperture,
  type LouverOutputCurveInput,
  type LouverOutputPoint,
} from "@/lib/panels";

type Panel = LouverOutputCurveInput["panel"];

const HEATED_CEILING: Panel = { orientation: "ceiling", mode: "heating", surfaceC: 35, airC: 20, austC: 19, areaM2: 2, equivalentDiameterM: 1.2 };
const COOLED_CEILING: Panel = { orientation: "ceiling", mode: "cooling", surfaceC: 17, airC: 26, austC: 27, areaM2: 2, equivalentDiameterM: 1.2 };
const HEATED_WALL: Panel = { orientation: "wall", mode: "heating", surfaceC: 45, airC: 20, austC: 18, areaM2: 1.5, heightM: 0.6 };

// Diffuse wall emissivities from polished metal to black paint; 10° steps keep the test quick.
const EMISSIVITIES = [0.05, 0.1, 0.3, 0.5, 0.7, 0.9, 1];
const TABLES = EMISSIVITIES.map((wallEmissivity) => buildLouverTable({ wallEmissivity, finish: "diffuse", stepDeg: 10 }));
const DENSE_ANGLES = Array.from({ length: 361 }, (_, i) => i * 0.5); // 0–180° in 0.5° steps, between and on tabulated angles

function totals(curve: ReadonlyArray<LouverOutputPoint>): number[] {
  return curve.map((p) => p.totalW);
}

describe("louverOutputCurve: output against opening angle (diffuse walls)", () => {
  const panels: ReadonlyArray<[string, Panel]> = [
    ["heated ceiling", HEATED_CEILING],
    ["cooled ceiling", COOLED_CEILING],
    ["heated wall", HEATED_WALL],
  ];

  it.each(panels)("rises strictly with the opening angle for hinged blades (%s, ε 0.05–1)", (_label, panel) => {
    expect(panels.length).toBeGreaterThan(0);
    expect(TABLES.length).toBeGreaterThan(0);
    for (const table of TABLES) {
      const curve = louverOutputCurve({ panel, table, minOpeningDeg: 0, maxOpeningDeg: 180, anglesDeg: DENSE_ANGLES });
      const t = totals(curve);
      for (let i = 1; i < t.length; i++) expect(t[i] as number, `ε=${table.wallEmissivity}, ${curve[i]?.openingAngleDeg}°`).toBeGreaterThan(t[i - 1] as number);
    }
  });

  it.each(panels)("falls with the opening angle for a full face, where a closing groove raises the apparent emissivity (%s)", (_label, panel) => {
    for (const table of TABLES) {
      const curve = louverOutputCurve({ panel, table, aperture: "full-face" });
      const t = totals(curve);
      for (let i = 1; i < t.length; i++) {
        if (table.wallEmissivity === 1) expect(t[i] as number).toBeCloseTo(t[i - 1] as number, 6); // black walls: no cavity effect
        else expect(t[i] as number, `ε=${table.wallEmissivity}, ${curve[i]?.openingAngleDeg}°`).toBeLessThan(t[i - 1] as number);
      }
    }
  });

  it("leaves the convective part unchanged and splits the total into radiant + convective, in W and W/m²", () => {
    const curve = louverOutputCurve({ panel: HEATED_CEILING, table: TABLES[5]! });
    expect(curve.length).toBeGreaterThan(0);
    const conv = curve[0]!.convectiveW;
    for (const p of curve) {
      expect(p.convectiveW).toBeCloseTo(conv, 12);
      expect(p.totalW).toBeCloseTo(p.radiantW + p.convectiveW, 10);
      expect(p.totalWm2).toBeCloseTo(p.totalW / HEATED_CEILING.areaM2, 12);
    }
  });

  it("gives the flat panel's output (wall emissivity) fully open, with either aperture model", () => {
    const flat = panelOutput({ ...HEATED_CEILING, emissivity: 0.7 });
    const aps: LouverAperture[] = ["hinged-blades", "full-face"];
    for (const aperture of aps) {
      const curve = louverOutputCurve({ panel: HEATED_CEILING, table: TABLES[4]!, aperture });
      const last = curve[curve.length - 1]!;
      expect(last.openingAngleDeg).toBe(180);
      expect(last.totalW).toBeCloseTo(flat.totalW, 10);
    }
  });

  it("gives only the convective part when hinged blades are closed", () => {
    const [closed] = louverOutputCurve({ panel: HEATED_CEILING, table: TABLES[5]!, minOpeningDeg: 0, anglesDeg: [0] });
    expect(closed!.radiantW).toBe(0);
    expect(closed!.totalW).toBeCloseTo(closed!.convectiveW, 12);
  });

  it("evaluates the allowed range's ends and the tabulated angles between them by default", () => {
    const curve = louverOutputCurve({ panel: HEATED_CEILING, table: TABLES[0]!, minOpeningDeg: 12, maxOpeningDeg: 100 });
    expect(curve.map((p) => p.openingAngleDeg)).toEqual([12, 15, 25, 35, 45, 55, 65, 75, 85, 95, 100]);
  });

  it("throws RangeError for an angle outside the allowed range, an inverted range or an empty angle list", () => {
    const table = TABLES[0]!;
    expect(() => louverOutputCurve({ panel: HEATED_CEILING, table, minOpeningDeg: 20, anglesDeg: [10] })).toThrow(RangeError);
    expect(() => louverOutputCurve({ panel: HEATED_CEILING, table, minOpeningDeg: 90, maxOpeningDeg: 30 })).toThrow(RangeError);
    expect(() => louverOutputCurve({ panel: HEATED_CEILING, table, anglesDeg: [] })).toThrow(RangeError);
    expect(() => louverOutputCurve({ panel: { ...HEATED_CEILING, areaM2: 0 }, table })).toThrow(RangeError);
  });
});

describe("turndown ratio", () => {
  it("is highest over lowest output and above 1 for every diffuse finish and both aperture models (ε < 1)", () => {
    const aps: LouverAperture[] = ["hinged-blades", "full-face"];
    expect(TABLES.length * aps.length).toBeGreaterThan(0);
    for (const table of TABLES) {
      for (const aperture of aps) {
        const curve = louverOutputCurve({ panel: HEATED_CEILING, table, aperture });
        const t = totals(curve);
        const ratio = louverTurndownRatio(curve);
        expect(ratio).toBeCloseTo(Math.max(...t) / Math.min(...t), 12);
        if (aperture === "hinged-blades" || table.wallEmissivity < 1) expect(ratio, `ε=${table.wallEmissivity}, ${aperture}`).toBeGreaterThan(1);
      }
    }
  });

  it("is NaN when the panel works against its mode somewhere in the range", () => {
    // A "heating" panel colder than the air and surroundings: negative output.
    const curve = louverOutputCurve({ panel: { ...HEATED_CEILING, surfaceC: 15 }, table: TABLES[3]! });
    expect(Number.isNaN(louverTurndownRatio(curve))).toBe(true);
  });

  it("for a zone, is the summed highest over the summed lowest outputs — between its panels' own ratios", () => {
    const a = louverOutputCurve({ panel: HEATED_CEILING, table: TABLES[5]! });
    const b = louverOutputCurve({ panel: HEATED_WALL, table: TABLES[1]!, minOpeningDeg: 30, maxOpeningDeg: 150 });
    const zone = zoneTurndownRatio([a, b]);
    const [ta, tb] = [totals(a), totals(b)];
    expect(zone).toBeCloseTo((Math.max(...ta) + Math.max(...tb)) / (Math.min(...ta) + Math.min(...tb)), 12);
    expect(zone).toBeGreaterThanOrEqual(Math.min(louverTurndownRatio(a), louverTurndownRatio(b)));
    expect(zone).toBeLessThanOrEqual(Math.max(louverTurndownRatio(a), louverTurndownRatio(b)));
    expect(zoneTurndownRatio([a])).toBeCloseTo(louverTurndownRatio(a), 12);
  });

  it("throws RangeError for an empty curve or a zone without panels", () => {
    expect(() => louverTurndownRatio([])).toThrow(RangeError);
    expect(() => zoneTurndownRatio([])).toThrow(RangeError);
    expect(() => zoneTurndownRatio([[]])).toThrow(RangeError);
  });
});
