/**
 * Louver cavity table checked against references outside the table code:
 *
 * - diffuse walls: an independent, finer radiosity solve (512 strips per wall, grey diffuse
 *   enclosure theory with Hottel's crossed-string view factors — Hottel & Sarofim,
 *   "Radiative Transfer", 1967; Siegel & Howell, "Thermal Radiation Heat Transfer"), and the
 *   Monte Carlo tracer, which shares no solver code with the radiosity method;
 * - specular walls: a closed form implemented separately in this file — for α = 180°/n the
 *   images of the groove close into a regular 2n-gon, the share of diffuse radiation entering
 *   the opening that leaves through the m-th image of the opening is the crossed-string view
 *   factor between two chords of that polygon, and such a ray was reflected min(m, 2n − m)
 *   times (image method for specular enclosures, Modest "Radiative Heat Transfer"; crossed
 *   strings, Hottel & Sarofim — the derivation is ours, computed independently here);
 * - limits: a flat surface has apparent emissivity = wall emissivity in every direction, and
 *   an isothermal black enclosure emits as a black body (Kirchhoff's law, common practice).
 *
 * No published table of V-groove apparent emissivities (e.g. Sparrow & Lin 1962) was
 * available to read, so no published numbers are used; every reference value below is
 * computed independently as stated.
 *
 * The table's own accuracy (stated in lib/panels/louverTable.ts) is asserted here: the
 * solver-error estimate, and the interpolation error at mid-steps against direct solves.
 */
import { describe, expect, it } from "vitest";
import {
  buildLouverTable,
  LOUVER_INTERPOLATION_TOLERANCE,
  louverEmissivityAt,
  type LouverFinish,
} from "@/lib/panels";
import { grooveEmissivityDiffuseRadiosity, grooveEmissivitySpecularUnfolded } from "@/lib/viewfactor";
import { specularClosedForm } from "@/tests/reference/viewfactor/grooveFormulas";

/** Direct (non-tabulated) apparent hemispherical emissivity from the finish's deterministic solver. */
function direct(finish: LouverFinish, openingAngleDeg: number, wallEmissivity: number): number {
  return finish === "diffuse"
    ? grooveEmissivityDiffuseRadiosity({ openingAngleDeg, wallEmissivity }).hemispherical
    : grooveEmissivitySpecularUnfolded({ openingAngleDeg, wallEmissivity }).hemispherical;
}

describe("diffuse louver table: solver accuracy", () => {
  const rows = [
    [0.05, 5],
    [0.05, 30],
    [0.5, 5],
    [0.5, 90],
    [0.9, 45],
  ] as const;

  it("matches an independent 512-strip radiosity solve within its stated solver error (crossed strings, Hottel & Sarofim)", () => {
    expect(rows.length).toBeGreaterThan(0);
    for (const [wallEmissivity, angle] of rows) {
      const table = buildLouverTable({ wallEmissivity, finish: "diffuse", minDeg: angle, maxDeg: angle + 5, stepDeg: 5 });
      const fine = grooveEmissivityDiffuseRadiosity({ openingAngleDeg: angle, wallEmissivity, strips: 512 });
      const err = table.solverError[0] as number;
      expect(err, `ε=${wallEmissivity}, ${angle}°`).toBeLessThan(1e-4);
      expect(Math.abs((table.hemispherical[0] as number) - fine.hemispherical), `ε=${wallEmissivity}, ${angle}°`).toBeLessThanOrEqual(err + 1e-12);
      expect(table.standardError[0]).toBe(0);
    }
  });

  it("keeps the solver-error estimate below 1e-4 over the whole default table (ε = 0.05, the hardest case)", () => {
    const table = buildLouverTable({ wallEmissivity: 0.05, finish: "diffuse" });
    expect(table.solverError.length).toBeGreaterThan(0);
    expect(Math.max(...table.solverError)).toBeLessThan(1e-4);
  });
});

describe("specular louver table: closed form at α = 180°/n (image polygon, crossed strings)", () => {
  it("matches the closed form to 1e-8 at 90°, 60°, 45°, 30°, 20°, 15°, 10° and 5° for ε = 0.1, 0.5, 0.9", () => {
    const ns = [2, 3, 4, 6, 9, 12, 18, 36];
    const emissivities = [0.1, 0.5, 0.9];
    expect(ns.length * emissivities.length).toBeGreaterThan(0);
    for (const e of emissivities) {
      const table = buildLouverTable({ wallEmissivity: e, finish: "specular" });
      expect(table.method).toBe("unfolding");
      for (const n of ns) {
        const i = table.anglesDeg.indexOf(180 / n);
        expect(i, `${180 / n}° tabulated`).toBeGreaterThanOrEqual(0);
        expect(table.hemispherical[i], `ε=${e}, α=${180 / n}°`).toBeCloseTo(specularClosedForm(n, e), 8);
      }
    }
  });
});

describe("louver table limits (common practice: flat grey surface, isothermal black enclosure)", () => {
  it("gives the wall emissivity in every direction for the flat (180°) setting", () => {
    const finishes: LouverFinish[] = ["diffuse", "specular"];
    expect(finishes.length).toBeGreaterThan(0);
    for (const finish of finishes) {
      const t = buildLouverTable({ wallEmissivity: 0.3, finish, minDeg: 170, maxDeg: 180, stepDeg: 10 });
      const last = t.anglesDeg.length - 1;
      expect(t.anglesDeg[last]).toBe(180);
      expect(t.hemispherical[last]).toBeCloseTo(0.3, 12);
      for (const v of t.directionalEmissivity[last] as number[]) expect(v).toBeCloseTo(0.3, 12);
    }
  });

  it("gives 1 at every angle and in every direction for black walls", () => {
    const t = buildLouverTable({ wallEmissivity: 1, finish: "diffuse", stepDeg: 25 });
    expect(t.hemispherical.length).toBeGreaterThan(0);
    for (let i = 0; i < t.anglesDeg.length; i++) {
      expect(t.hemispherical[i]).toBeCloseTo(1, 6);
      for (const v of t.directionalEmissivity[i] as number[]) expect(v).toBeCloseTo(1, 6);
    }
  });
});

describe("Monte Carlo louver table vs deterministic table (independent solvers)", () => {
  it("agrees within 4 standard errors, and the directional bins within 0.02, for diffuse and specular walls", () => {
    const finishes: LouverFinish[] = ["diffuse", "specular"];
    expect(finishes.length).toBeGreaterThan(0);
    for (const finish of finishes) {
      const params = { wallEmissivity: 0.4, finish, minDeg: 20, maxDeg: 180, stepDeg: 40 } as const;
      const mc = buildLouverTable({ ...params, solver: "montecarlo", rays: 100_000, seed: 3 });
      const det = buildLouverTable(params);
      expect(mc.method).toBe("montecarlo");
      for (let i = 0; i < det.anglesDeg.length; i++) {
        const se = mc.standardError[i] as number;
        const diff = Math.abs((mc.hemispherical[i] as number) - (det.hemispherical[i] as number));
        const label = `${finish} ${det.anglesDeg[i]}°`;
        if (se === 0) expect(diff, label).toBeLessThan(1e-12);
        else expect(diff / se, label).toBeLessThanOrEqual(4);
        const dm = mc.directionalEmissivity[i] as number[];
        const dd = det.directionalEmissivity[i] as number[];
        for (let k = 0; k < 9; k++) expect(Math.abs((dm[k] as number) - (dd[k] as number)), `${label} bin ${k}`).toBeLessThan(0.02);
      }
    }
  });
});

describe("louver table interpolation error at the default steps (stated bound 0.005)", () => {
  const cases: ReadonlyArray<readonly [LouverFinish, number]> = [
    ["diffuse", 0.05],
    ["diffuse", 0.3],
    ["diffuse", 0.9],
    ["specular", 0.05],
    ["specular", 0.1],
    ["specular", 0.3],
    ["specular", 0.9],
  ];

  it.each(cases)("keeps the hemispherical error at every mid-step within 0.005 (%s walls, ε = %s)", (finish, wallEmissivity) => {
    expect(cases.length).toBeGreaterThan(0);
    const table = buildLouverTable({ wallEmissivity, finish });
    let maxErr = 0;
    for (let i = 0; i + 1 < table.anglesDeg.length; i++) {
      const mid = 0.5 * ((table.anglesDeg[i] as number) + (table.anglesDeg[i + 1] as number));
      const err = Math.abs(louverEmissivityAt(table, mid).hemispherical - direct(finish, mid, wallEmissivity));
      if (err > maxErr) maxErr = err;
    }
    expect(maxErr).toBeLessThanOrEqual(LOUVER_INTERPOLATION_TOLERANCE);
  });

  it("would not meet the bound with 5° steps for polished specular walls (why the specular default is 1°)", () => {
    const table = buildLouverTable({ wallEmissivity: 0.05, finish: "specular", stepDeg: 5 });
    const mid = 7.5;
    const err = Math.abs(louverEmissivityAt(table, mid).hemispherical - direct("specular", mid, 0.05));
    expect(err).toBeGreaterThan(LOUVER_INTERPOLATION_TOLERANCE);
  });
});
