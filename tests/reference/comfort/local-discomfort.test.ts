import { describe, expect, it } from "vitest";
import {
  draughtRate,
  floorTemperatureDissatisfied,
  ISO7730_CATEGORY_LIMITS,
  ppdFromPmv,
  radiantAsymmetryDissatisfied,
  verticalAirTemperatureDifferenceDissatisfied,
  type RadiantAsymmetryKind,
} from "@/lib/comfort";

/**
 * Reference values in this file are either
 * - read from ISO 7730:2005 tables (stated per check; from memory where marked), or
 * - computed here, independently of the library, from the equations as printed in
 *   ISO 7730:2005 clause 6 (transcribed from public sources) — marked "eq. as printed".
 */

describe("ppdFromPmv against ISO 7730:2005 eq. (5) and Table A.1", () => {
  it("gives the minimum of 5 % at PMV 0 (eq. (5): 100 − 95)", () => {
    expect(ppdFromPmv(0)).toBeCloseTo(5, 12);
  });

  // Table A.1 pairs each PMV band with a PPD limit: ±0.2 ↔ < 6 %, ±0.5 ↔ < 10 %, ±0.7 ↔ < 15 %.
  // The table rounds, so the band edges land within 0.5 % of the PPD limits.
  const pairs: ReadonlyArray<{ pmv: number; ppd: number }> = [
    { pmv: 0.2, ppd: 6 },
    { pmv: 0.5, ppd: 10 },
    { pmv: 0.7, ppd: 15 },
  ];

  it.each(pairs)("maps the Table A.1 PMV band edge ±$pmv to about $ppd % (within 0.5 %)", ({ pmv, ppd }) => {
    expect(pairs.length).toBeGreaterThan(0);
    expect(Math.abs(ppdFromPmv(pmv) - ppd)).toBeLessThanOrEqual(0.5);
    expect(Math.abs(ppdFromPmv(-pmv) - ppd)).toBeLessThanOrEqual(0.5);
  });

  it("reads about 26 % at PMV ±1 and 77 % at PMV ±2 (ISO 7730:2005 Figure 1 curve, from memory)", () => {
    expect(Math.abs(ppdFromPmv(1) - 26)).toBeLessThanOrEqual(0.5);
    expect(Math.abs(ppdFromPmv(-2) - 77)).toBeLessThanOrEqual(0.5);
  });
});

describe("verticalAirTemperatureDifferenceDissatisfied (ISO 7730:2005 eq. (7))", () => {
  // ISO 7730:2005 Table A.3 (from memory): Δt < 2 / 3 / 4 °C for categories A / B / C; the
  // PD limits of Table A.1 are 3 / 5 / 10 %. The Δt limits must stay inside the PD limits.
  const rows: ReadonlyArray<{ cat: "A" | "B" | "C"; deltaC: number }> = [
    { cat: "A", deltaC: 2 },
    { cat: "B", deltaC: 3 },
    { cat: "C", deltaC: 4 },
  ];

  it.each(rows)("keeps the Table A.3 limit Δt = $deltaC °C of category $cat below its Table A.1 PD limit", (row) => {
    expect(rows.length).toBeGreaterThan(0);
    expect(verticalAirTemperatureDifferenceDissatisfied(row.deltaC)).toBeLessThan(
      ISO7730_CATEGORY_LIMITS[row.cat].verticalPd,
    );
  });

  it("matches the equation as printed at 1, 3 and 5 °C (computed independently)", () => {
    for (const dt of [1, 3, 5]) {
      const ref = 100 / (1 + Math.exp(5.76 - 0.856 * dt));
      expect(verticalAirTemperatureDifferenceDissatisfied(dt)).toBeCloseTo(ref, 10);
    }
    // Hand value at 3 °C: 100 / (1 + e^3.192) = 3.947 %.
    expect(verticalAirTemperatureDifferenceDissatisfied(3)).toBeCloseTo(3.947, 3);
  });
});

describe("floorTemperatureDissatisfied (ISO 7730:2005 eq. (8))", () => {
  it("has its minimum of about 5.5 % near 23.6 °C (vertex of the quadratic exponent, computed by hand)", () => {
    let best = Number.POSITIVE_INFINITY;
    let bestT = 0;
    for (let t = 10; t <= 40; t += 0.01) {
      const pd = floorTemperatureDissatisfied(t);
      if (pd < best) {
        best = pd;
        bestT = t;
      }
    }
    expect(Math.abs(bestT - 23.6)).toBeLessThan(0.02);
    expect(Math.abs(best - 5.49)).toBeLessThan(0.01);
  });

  it("gives about 10–12 % at the Table A.4 limits 19 and 29 °C of categories A/B (from memory; the table rounds)", () => {
    expect(floorTemperatureDissatisfied(19)).toBeGreaterThan(9.5);
    expect(floorTemperatureDissatisfied(19)).toBeLessThan(12.5);
    expect(floorTemperatureDissatisfied(29)).toBeGreaterThan(9.5);
    expect(floorTemperatureDissatisfied(29)).toBeLessThan(12.5);
  });

  it("matches the equation as printed at 15, 25 and 35 °C (computed independently)", () => {
    for (const t of [15, 25, 35]) {
      const ref = 100 - 94 * Math.exp(-1.387 + 0.118 * t - 0.0025 * t * t);
      expect(floorTemperatureDissatisfied(t)).toBeCloseTo(ref, 10);
    }
  });
});

describe("draughtRate (ISO 7730:2005 eq. (6))", () => {
  // Reference: eq. (6) as printed, evaluated here: DR = (34 − ta)(v − 0.05)^0.62 (0.37·v·Tu + 3.14).
  const rows: ReadonlyArray<{ ta: number; v: number; tu: number; dr: number }> = [
    { ta: 20, v: 0.15, tu: 40, dr: 18.0008 },
    { ta: 23, v: 0.2, tu: 30, dr: 18.1859 },
    { ta: 26, v: 0.1, tu: 10, dr: 4.38287 },
  ];

  it.each(rows)("gives $dr % at $ta °C, $v m/s, Tu $tu % (eq. as printed, hand-evaluated)", (row) => {
    expect(rows.length).toBeGreaterThan(0);
    expect(Math.abs(draughtRate(row.ta, row.v, row.tu) - row.dr)).toBeLessThan(1e-3);
  });

  it("is 0 for mean air speeds up to 0.05 m/s (clause 6.2: v < 0.05 m/s → 0.05 m/s)", () => {
    expect(draughtRate(22, 0, 40)).toBe(0);
    expect(draughtRate(22, 0.05, 40)).toBe(0);
  });

  it("is capped at 100 % (clause 6.2: DR > 100 % → 100 %)", () => {
    expect(draughtRate(10, 3, 80)).toBe(100);
  });
});

describe("radiantAsymmetryDissatisfied (ISO 7730:2005 clause 6.5)", () => {
  // Reference: the four curves as printed, evaluated here.
  const printed: Record<RadiantAsymmetryKind, (dt: number) => number> = {
    warmCeiling: (dt) => 100 / (1 + Math.exp(2.84 - 0.174 * dt)) - 5.5,
    coolWall: (dt) => 100 / (1 + Math.exp(6.61 - 0.345 * dt)),
    coolCeiling: (dt) => 100 / (1 + Math.exp(9.93 - 0.5 * dt)),
    warmWall: (dt) => 100 / (1 + Math.exp(3.72 - 0.052 * dt)) - 3.5,
  };
  const rows: ReadonlyArray<{ kind: RadiantAsymmetryKind; deltaC: number }> = [
    { kind: "warmCeiling", deltaC: 5 },
    { kind: "warmCeiling", deltaC: 20 },
    { kind: "coolWall", deltaC: 10 },
    { kind: "coolCeiling", deltaC: 14 },
    { kind: "warmWall", deltaC: 23 },
    { kind: "warmWall", deltaC: 30 },
  ];

  it.each(rows)("follows the printed $kind curve at $deltaC °C", ({ kind, deltaC }) => {
    expect(rows.length).toBeGreaterThan(0);
    expect(radiantAsymmetryDissatisfied(kind, deltaC)).toBeCloseTo(printed[kind](deltaC), 10);
  });

  it("keeps the ASHRAE 55 limits for cool wall (10 °C), cool ceiling (14 °C) and warm wall (23 °C) at about 5 % or less (limits from memory)", () => {
    expect(radiantAsymmetryDissatisfied("coolWall", 10)).toBeLessThan(5);
    expect(radiantAsymmetryDissatisfied("coolCeiling", 14)).toBeLessThan(5.1);
    expect(radiantAsymmetryDissatisfied("warmWall", 23)).toBeLessThan(5);
  });

  it("starts the warm-ceiling curve at about 0 % for no asymmetry (the −5.5 offset, clause 6.5)", () => {
    expect(radiantAsymmetryDissatisfied("warmCeiling", 0)).toBeLessThan(0.05);
  });
});
