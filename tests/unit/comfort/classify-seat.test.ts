import { describe, expect, it } from "vitest";
import { classifySeat, ppdFromPmv, type SeatComfortResults } from "@/lib/comfort";

function seat(pmv: number, extra: Partial<SeatComfortResults> = {}): SeatComfortResults {
  return { pmv, ppd: ppdFromPmv(pmv), ...extra };
}

describe("classifySeat — ISO 7730:2005 Annex A categories (Table A.1 limits)", () => {
  const bands: ReadonlyArray<{ pmv: number; category: "A" | "B" | "C" | null }> = [
    { pmv: 0, category: "A" },
    { pmv: 0.19, category: "A" },
    { pmv: -0.19, category: "A" },
    { pmv: 0.2, category: "B" },
    { pmv: 0.48, category: "B" },
    { pmv: 0.49, category: "B" },
    { pmv: -0.5, category: "C" },
    { pmv: 0.68, category: "C" },
    { pmv: 0.7, category: null },
    { pmv: -1.2, category: null },
  ];

  it.each(bands)("puts PMV $pmv (with its eq. (5) PPD) in category $category", ({ pmv, category }) => {
    expect(bands.length).toBeGreaterThan(0);
    expect(classifySeat(seat(pmv)).category).toBe(category);
  });

  it("reads Table A.1's PPD limits as eq. (5) at the PMV band edges, so PMV and PPD criteria agree", () => {
    // Table A.1 prints PPD < 10 % / < 15 % for B / C, the rounded eq. (5) values at PMV ±0.5 (10.2 %)
    // and ±0.7 (15.3 %). PMV 0.49 (PPD 10.02 %) is inside the B band and stays in B.
    expect(classifySeat(seat(0.49)).category).toBe("B");
    expect(classifySeat(seat(-0.69)).category).toBe("C");
    const justOutside = classifySeat({ pmv: 0.45, ppd: 10.3 });
    expect(justOutside.category).toBe("C");
    expect(justOutside.failuresForNextBetterCategory.map((f) => f.code)).toEqual(["ISO7730_PPD"]);
  });

  it("uses the given PPD, not one derived from the PMV", () => {
    const r = classifySeat({ pmv: 0, ppd: 6 });
    expect(r.category).toBe("B");
    expect(r.failuresForNextBetterCategory.map((f) => f.code)).toEqual(["ISO7730_PPD"]);
  });

  it("downgrades on the draught-rate limits 10 / 20 / 30 %", () => {
    expect(classifySeat(seat(0, { draughtRate: 9.9 })).category).toBe("A");
    expect(classifySeat(seat(0, { draughtRate: 10 })).category).toBe("B");
    expect(classifySeat(seat(0, { draughtRate: 20 })).category).toBe("C");
    expect(classifySeat(seat(0, { draughtRate: 30 })).category).toBe(null);
  });

  it("downgrades on the vertical air temperature difference through its PD (3 / 5 / 10 %)", () => {
    expect(classifySeat(seat(0, { verticalAirDeltaC: 2 })).category).toBe("A"); // PD 1.7 %
    expect(classifySeat(seat(0, { verticalAirDeltaC: 3 })).category).toBe("B"); // PD 3.9 %
    expect(classifySeat(seat(0, { verticalAirDeltaC: 4 })).category).toBe("C"); // PD 8.8 %
    expect(classifySeat(seat(0, { verticalAirDeltaC: 5 })).category).toBe(null); // PD 16.9 %
  });

  it("downgrades on the floor temperature through its PD (10 / 10 / 15 %)", () => {
    expect(classifySeat(seat(0, { floorC: 24 })).category).toBe("A");
    const warm = classifySeat(seat(0, { floorC: 29 })); // PD 12.1 %
    expect(warm.category).toBe("C");
    expect(warm.failuresForNextBetterCategory[0]?.code).toBe("ISO7730_FLOOR_TEMPERATURE");
    expect(classifySeat(seat(0, { floorC: 33 })).category).toBe(null);
  });

  it("downgrades on the worst radiant asymmetry through its PD (5 / 5 / 10 %)", () => {
    const r = classifySeat(
      seat(0, {
        radiantAsymmetry: [
          { kind: "coolWall", deltaC: 5 },
          { kind: "warmCeiling", deltaC: 6 },
        ],
      }),
    );
    expect(r.category).toBe("C"); // warm ceiling 6 °C → PD 8.8 %
    expect(r.percentDissatisfied.radiantAsymmetry).toBeCloseTo(radiantWarmCeiling(6), 10);
    expect(r.failuresForNextBetterCategory).toHaveLength(1);
    expect(r.failuresForNextBetterCategory[0]?.kind).toBe("warmCeiling");
  });

  it("lists every failed limit of the next better category with a code, limits and a message", () => {
    const r = classifySeat(seat(0.3, { draughtRate: 12 }));
    expect(r.category).toBe("B");
    expect(r.nextBetterCategory).toBe("A");
    const codes = r.failuresForNextBetterCategory.map((f) => f.code).sort();
    expect(codes).toEqual(["ISO7730_DRAUGHT_RATE", "ISO7730_PMV", "ISO7730_PPD"]);
    const pmv = r.failuresForNextBetterCategory.find((f) => f.code === "ISO7730_PMV");
    expect(pmv?.allowedMin).toBe(-0.2);
    expect(pmv?.allowedMax).toBe(0.2);
    expect(pmv?.value).toBe(0.3);
    for (const f of r.failuresForNextBetterCategory) {
      expect(f.message.length).toBeGreaterThan(0);
    }
  });

  it("has no next better category and no failures in category A", () => {
    const r = classifySeat(seat(0));
    expect(r.nextBetterCategory).toBe(null);
    expect(r.failuresForNextBetterCategory).toEqual([]);
  });

  it("reports category C's failures when no category is met", () => {
    const r = classifySeat(seat(1));
    expect(r.category).toBe(null);
    expect(r.nextBetterCategory).toBe("C");
    expect(r.failuresForNextBetterCategory.map((f) => f.code)).toContain("ISO7730_PMV");
  });
});

describe("classifySeat — ASHRAE 55 compliance", () => {
  it("complies for a neutral seat with no local values", () => {
    const r = classifySeat(seat(0.1));
    expect(r.ashrae55.compliant).toBe(true);
    expect(r.ashrae55.failures).toEqual([]);
  });

  it("fails at PMV ±0.5 (band −0.5 < PMV < +0.5)", () => {
    expect(classifySeat(seat(0.49)).ashrae55.compliant).toBe(true);
    const r = classifySeat(seat(-0.5));
    expect(r.ashrae55.compliant).toBe(false);
    expect(r.ashrae55.failures[0]?.code).toBe("ASHRAE55_PMV");
  });

  it("applies the radiant-asymmetry limits 5 / 10 / 14 / 23 °C per kind", () => {
    const ok = classifySeat(
      seat(0, {
        radiantAsymmetry: [
          { kind: "warmCeiling", deltaC: 4.9 },
          { kind: "coolWall", deltaC: 9.9 },
          { kind: "coolCeiling", deltaC: 13.9 },
          { kind: "warmWall", deltaC: 22.9 },
        ],
      }),
    );
    expect(ok.ashrae55.compliant).toBe(true);
    const bad = classifySeat(
      seat(0, {
        radiantAsymmetry: [
          { kind: "warmCeiling", deltaC: 5 },
          { kind: "coolWall", deltaC: 10 },
          { kind: "coolCeiling", deltaC: 14 },
          { kind: "warmWall", deltaC: 23 },
        ],
      }),
    );
    expect(bad.ashrae55.failures.map((f) => f.kind)).toEqual(["warmCeiling", "coolWall", "coolCeiling", "warmWall"]);
    expect(bad.ashrae55.failures.every((f) => f.code === "ASHRAE55_RADIANT_ASYMMETRY")).toBe(true);
  });

  it("accepts floor temperatures from 19 to 29 °C inclusive", () => {
    expect(classifySeat(seat(0, { floorC: 19 })).ashrae55.compliant).toBe(true);
    expect(classifySeat(seat(0, { floorC: 29 })).ashrae55.compliant).toBe(true);
    const cold = classifySeat(seat(0, { floorC: 18.9 }));
    expect(cold.ashrae55.failures[0]?.code).toBe("ASHRAE55_FLOOR_TEMPERATURE");
    expect(cold.ashrae55.failures[0]?.allowedMin).toBe(19);
    expect(classifySeat(seat(0, { floorC: 29.1 })).ashrae55.compliant).toBe(false);
  });

  it("limits the vertical difference to < 3 °C seated and < 4 °C standing", () => {
    expect(classifySeat(seat(0, { verticalAirDeltaC: 2.9 })).ashrae55.compliant).toBe(true);
    expect(classifySeat(seat(0, { verticalAirDeltaC: 3 })).ashrae55.failures[0]?.code).toBe(
      "ASHRAE55_VERTICAL_AIR_TEMPERATURE",
    );
    expect(classifySeat(seat(0, { verticalAirDeltaC: 3.5, posture: "standing" })).ashrae55.compliant).toBe(true);
    expect(classifySeat(seat(0, { verticalAirDeltaC: 4, posture: "standing" })).ashrae55.compliant).toBe(false);
  });
});

describe("classifySeat input policy", () => {
  it("throws RangeError for non-finite PMV/PPD, a negative draught rate or a negative asymmetry", () => {
    expect(() => classifySeat({ pmv: Number.NaN, ppd: 5 })).toThrow(RangeError);
    expect(() => classifySeat({ pmv: 0, ppd: Number.POSITIVE_INFINITY })).toThrow(RangeError);
    expect(() => classifySeat(seat(0, { draughtRate: -1 }))).toThrow(RangeError);
    expect(() => classifySeat(seat(0, { radiantAsymmetry: [{ kind: "coolWall", deltaC: -2 }] }))).toThrow(RangeError);
    expect(() => classifySeat(seat(0, { floorC: Number.NaN }))).toThrow(RangeError);
  });
});

/** Warm-ceiling curve as printed in ISO 7730:2005 clause 6.5 (for the PD assertion above). */
function radiantWarmCeiling(dt: number): number {
  return 100 / (1 + Math.exp(2.84 - 0.174 * dt)) - 5.5;
}
