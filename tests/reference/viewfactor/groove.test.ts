/**
 * V-groove (louver cavity) apparent emissivity checked against references
 * outside the Monte Carlo tracer:
 *
 * - Diffuse walls: the deterministic radiosity solver (grey diffuse enclosure
 *   theory with Hottel's crossed-string view factors — Hottel & Sarofim,
 *   "Radiative Transfer", 1967; Siegel & Howell, "Thermal Radiation Heat
 *   Transfer"). It shares no code with the tracer except the input checks
 *   and the bin edges.
 * - Specular walls: the unfolding (image) construction, itself checked here
 *   against a closed form implemented separately in this file: for
 *   α = 180°/n the images of the groove close into a regular 2n-gon, and the
 *   share of diffuse radiation entering the opening that leaves through the
 *   m-th image of the opening is the crossed-string view factor between two
 *   chords of that polygon (Hottel's crossed-string rule, same sources).
 * - Limits: flat surface (apparent emissivity = wall emissivity, Lambert
 *   directional shares: Lambert's cosine law, common practice), black walls
 *   (isothermal black enclosure: apparent emissivity 1, Kirchhoff — common
 *   practice), and the deep parallel-plate channel as the limit of the
 *   closing diffuse groove (computed with the crossed-string radiosity
 *   method, an independent solver for a different geometry).
 *
 * No published table of V-groove apparent emissivities (e.g. Sparrow & Lin
 * 1962) was available to read during development, so no published numbers
 * are used; every reference value below is computed independently.
 */
import { describe, expect, it } from "vitest";
import {
  grooveEmissivity,
  grooveEmissivityDiffuseRadiosity,
  grooveEmissivitySpecularUnfolded,
  lambertBinShares,
  parallelPlateChannelEmissivity,
  traceGroove,
} from "@/lib/viewfactor";
import { specularClosedForm } from "./grooveFormulas";

const ANGLES_DEG = [10, 20, 30, 45, 60, 90, 120, 150, 180];
const EMISSIVITIES = [0.1, 0.3, 0.5, 0.7, 0.9];
const GRID = ANGLES_DEG.flatMap((a) => EMISSIVITIES.map((e) => [a, e] as const));
const GRID_RAYS = 50_000;

/** Lambert shares of the folded 10° bins, computed here from sin differences (Lambert's cosine law, common practice). */
const LAMBERT = Array.from({ length: 9 }, (_, k) => Math.sin(((k + 1) * 10 * Math.PI) / 180) - Math.sin((k * 10 * Math.PI) / 180));

interface Comparison {
  label: string;
  mc: { hemispherical: number; standardError: number };
  ref: number;
}

/**
 * Table-wide 3-standard-error check. Each row must lie within 3 SE, except
 * that at most one row may lie between 3 and 4 SE: with 40 comparisons, one
 * excursion beyond 3 SE is roughly a 1-in-10 event even for an unbiased
 * estimator with an honest SE (two or more: about 1 in 200, if independent).
 * Specular rows at one angle share their ray paths (a specular path does not
 * depend on ε), so they are correlated. Bias and SE honesty are checked
 * separately over many seeds in tests/unit/viewfactor/groove.test.ts. Rows with zero SE (flat surface, whose
 * estimator has no variance) must match to 1e-12. The mean square z-score
 * of the rows with SE > 0 must stay below 2 (≈ 1 expected).
 */
function expectWithinStandardErrors(rows: readonly Comparison[]): void {
  expect(rows.length).toBeGreaterThan(0);
  let beyond3 = 0;
  let sumZ2 = 0;
  let counted = 0;
  for (const { label, mc, ref } of rows) {
    const diff = Math.abs(mc.hemispherical - ref);
    if (mc.standardError === 0) {
      expect(diff, label).toBeLessThanOrEqual(1e-12);
      continue;
    }
    const z = diff / mc.standardError;
    expect(z, label).toBeLessThanOrEqual(4);
    if (z > 3) beyond3++;
    sumZ2 += z * z;
    counted++;
  }
  expect(beyond3).toBeLessThanOrEqual(1);
  expect(sumZ2 / counted).toBeLessThan(2);
}

describe("diffuse V-groove: Monte Carlo tracer vs deterministic radiosity solver (crossed-string view factors)", () => {
  it("agrees within 3 standard errors for opening angles 10°–180° and wall emissivities 0.1–0.9", () => {
    expect(GRID.length).toBeGreaterThan(0);
    expectWithinStandardErrors(
      GRID.map(([openingAngleDeg, wallEmissivity]) => {
        const mc = grooveEmissivity({ openingAngleDeg, wallEmissivity, reflection: "diffuse", rays: GRID_RAYS, seed: 7 });
        const ref = grooveEmissivityDiffuseRadiosity({ openingAngleDeg, wallEmissivity });
        return { label: `${openingAngleDeg}°, ε=${wallEmissivity}`, mc, ref: ref.hemispherical };
      }),
    );
  });

  it("agrees within 3 standard errors near the closed limit (2° and 5°)", () => {
    const rows = [
      [2, 0.2],
      [2, 0.6],
      [5, 0.4],
    ] as const;
    expect(rows.length).toBeGreaterThan(0);
    for (const [openingAngleDeg, wallEmissivity] of rows) {
      const mc = grooveEmissivity({ openingAngleDeg, wallEmissivity, reflection: "diffuse", rays: 50_000, seed: 3 });
      const ref = grooveEmissivityDiffuseRadiosity({ openingAngleDeg, wallEmissivity });
      expect(Math.abs(mc.hemispherical - ref.hemispherical)).toBeLessThanOrEqual(3 * mc.standardError);
    }
  });

  it("bin-averaged directional emissivities agree within 4 standard errors per bin", () => {
    const rows = [
      [20, 0.3],
      [60, 0.5],
      [120, 0.1],
    ] as const;
    expect(rows.length).toBeGreaterThan(0);
    for (const [openingAngleDeg, wallEmissivity] of rows) {
      const mc = traceGroove({ openingAngleDeg, wallEmissivity, reflection: "diffuse", rays: 200_000, seed: 11 });
      const ref = grooveEmissivityDiffuseRadiosity({ openingAngleDeg, wallEmissivity });
      for (let k = 0; k < 9; k++) {
        const tol = 4 * (mc.binStandardError[k] as number) + 1e-12; // a bin can have zero variance
        expect(Math.abs((mc.binEmissivity[k] as number) - (ref.binEmissivity[k] as number)), `bin ${k}`).toBeLessThanOrEqual(tol);
      }
    }
  });
});

describe("specular V-groove: unfolding construction vs crossed-string closed form on the image polygon (α = 180°/n)", () => {
  it("matches the closed form to 1e-8 for n = 1, 2, 3, 4, 6, 9, 18 and several wall emissivities", () => {
    const ns = [1, 2, 3, 4, 6, 9, 18];
    expect(ns.length).toBeGreaterThan(0);
    for (const n of ns) {
      for (const e of [0.05, 0.3, 0.8]) {
        const unfolded = grooveEmissivitySpecularUnfolded({ openingAngleDeg: 180 / n, wallEmissivity: e });
        expect(Math.abs(unfolded.hemispherical - specularClosedForm(n, e)), `α=${180 / n}°, ε=${e}`).toBeLessThanOrEqual(1e-8);
      }
    }
  });

  it("gives the 90° corner value 1 − ρ(2 − √2) − ρ²(√2 − 1) (closed form above, evaluated by hand)", () => {
    const e = 0.5;
    const rho = 1 - e;
    const expected = 1 - rho * (2 - Math.SQRT2) - rho * rho * (Math.SQRT2 - 1);
    expect(grooveEmissivitySpecularUnfolded({ openingAngleDeg: 90, wallEmissivity: e }).hemispherical).toBeCloseTo(expected, 12);
  });
});

describe("specular V-groove: Monte Carlo tracer vs unfolding construction", () => {
  it("agrees within 3 standard errors for opening angles 10°–180° and wall emissivities 0.1–0.9", () => {
    expect(GRID.length).toBeGreaterThan(0);
    expectWithinStandardErrors(
      GRID.map(([openingAngleDeg, wallEmissivity]) => {
        const mc = grooveEmissivity({ openingAngleDeg, wallEmissivity, reflection: "specular", rays: GRID_RAYS, seed: 7 });
        const ref = grooveEmissivitySpecularUnfolded({ openingAngleDeg, wallEmissivity });
        return { label: `${openingAngleDeg}°, ε=${wallEmissivity}`, mc, ref: ref.hemispherical };
      }),
    );
  });

  it("agrees within 3 standard errors at angles that are not 180°/n (7°, 37°, 100°, 170°)", () => {
    const rows = [
      [7, 0.2],
      [37, 0.5],
      [100, 0.3],
      [170, 0.6],
    ] as const;
    expect(rows.length).toBeGreaterThan(0);
    for (const [openingAngleDeg, wallEmissivity] of rows) {
      const mc = grooveEmissivity({ openingAngleDeg, wallEmissivity, reflection: "specular", rays: 50_000, seed: 5 });
      const ref = grooveEmissivitySpecularUnfolded({ openingAngleDeg, wallEmissivity });
      expect(Math.abs(mc.hemispherical - ref.hemispherical)).toBeLessThanOrEqual(3 * mc.standardError);
    }
  });

  it("bin-averaged directional emissivities agree within 4 standard errors per bin", () => {
    const rows = [
      [30, 0.3],
      [90, 0.5],
      [137, 0.2],
    ] as const;
    expect(rows.length).toBeGreaterThan(0);
    for (const [openingAngleDeg, wallEmissivity] of rows) {
      const mc = traceGroove({ openingAngleDeg, wallEmissivity, reflection: "specular", rays: 200_000, seed: 13 });
      const ref = grooveEmissivitySpecularUnfolded({ openingAngleDeg, wallEmissivity });
      for (let k = 0; k < 9; k++) {
        const tol = 4 * (mc.binStandardError[k] as number) + 1e-12; // a bin can have zero variance
        expect(Math.abs((mc.binEmissivity[k] as number) - (ref.binEmissivity[k] as number)), `bin ${k}`).toBeLessThanOrEqual(tol);
      }
    }
  });
});

describe("flat surface (180°): apparent emissivity = wall emissivity, Lambert directional shares (common practice)", () => {
  it("the radiosity solver and the unfolding construction return exactly ε", () => {
    for (const e of EMISSIVITIES) {
      expect(grooveEmissivityDiffuseRadiosity({ openingAngleDeg: 180, wallEmissivity: e }).hemispherical).toBe(e);
      expect(grooveEmissivitySpecularUnfolded({ openingAngleDeg: 180, wallEmissivity: e }).hemispherical).toBe(e);
    }
  });

  it("the tracer returns ε within 3 standard errors (its estimator has zero variance: exactly ε)", () => {
    for (const reflection of ["diffuse", "specular"] as const) {
      for (const e of EMISSIVITIES) {
        const r = grooveEmissivity({ openingAngleDeg: 180, wallEmissivity: e, reflection, rays: 20_000 });
        expect(Math.abs(r.hemispherical - e)).toBeLessThanOrEqual(3 * r.standardError);
      }
    }
  });

  it("the tracer's directional shares reproduce sin(10°(k+1)) − sin(10°k)", () => {
    for (const reflection of ["diffuse", "specular"] as const) {
      const r = grooveEmissivity({ openingAngleDeg: 180, wallEmissivity: 0.4, reflection, rays: 20_000 });
      expect(r.directional).toHaveLength(9);
      r.directional.forEach((s, k) => expect(Math.abs(s - (LAMBERT[k] as number))).toBeLessThanOrEqual(1e-12));
    }
  });

  it("a nearly flat groove (179°) gives Lambert shares within 4 standard errors of its bin emissivities", () => {
    const r = traceGroove({ openingAngleDeg: 179, wallEmissivity: 0.5, reflection: "diffuse", rays: 100_000 });
    const lambert = lambertBinShares();
    for (let k = 0; k < 9; k++) {
      // share_k = w_k·e_k / Σ w_j e_j; propagate the bin standard error (dominant term).
      const tol = 4 * ((LAMBERT[k] as number) * (r.binStandardError[k] as number)) / r.hemispherical + 1e-4;
      expect(Math.abs((r.directional[k] as number) - (lambert[k] as number))).toBeLessThanOrEqual(tol);
    }
  });
});

describe("mean number of wall hits per entering ray = wall length / opening width = 1/sin(α/2)", () => {
  // Derived here (not read in a document): both diffuse and specular reflection preserve the
  // isotropic blackbody field of an isothermal cavity, in which the rate of wall hits is
  // (wall length)·πI and the rate of entries through the opening is (opening width)·πI; so an
  // entering ray hits the walls 2L / W = 1/sin(α/2) times on average, whatever the reflection
  // law. With ε = 1e-6 Russian roulette never ends a path early.
  it("holds for the tracer within 2 % for diffuse and specular walls at 30°, 60° and 120°", () => {
    const rows = [30, 60, 120];
    expect(rows.length).toBeGreaterThan(0);
    for (const reflection of ["diffuse", "specular"] as const) {
      for (const openingAngleDeg of rows) {
        const r = traceGroove({ openingAngleDeg, wallEmissivity: 1e-6, reflection, rays: 100_000, seed: 21 });
        const expected = 1 / Math.sin((openingAngleDeg * Math.PI) / 360);
        expect(Math.abs(r.bounces / r.rays / expected - 1), `${reflection} ${openingAngleDeg}°`).toBeLessThan(0.02);
      }
    }
  });
});

describe("black walls (ε = 1): an isothermal black cavity emits as a blackbody (common practice)", () => {
  it("all three methods give apparent emissivity 1", () => {
    for (const a of [5, 30, 90, 150]) {
      expect(grooveEmissivityDiffuseRadiosity({ openingAngleDeg: a, wallEmissivity: 1 }).hemispherical).toBeCloseTo(1, 12);
      expect(grooveEmissivitySpecularUnfolded({ openingAngleDeg: a, wallEmissivity: 1 }).hemispherical).toBeCloseTo(1, 12);
      expect(grooveEmissivity({ openingAngleDeg: a, wallEmissivity: 1, reflection: "diffuse", rays: 5_000 }).hemispherical).toBe(1);
    }
  });
});

describe("radiosity solver convergence in the strip count (Galerkin, second order; Richardson extrapolation)", () => {
  it("successive differences shrink by a factor 4 ± 0.3 per doubling, and the extrapolated value is stable to 1e-7", () => {
    const cases = [
      [10, 0.1],
      [60, 0.5],
      [150, 0.9],
    ] as const;
    expect(cases.length).toBeGreaterThan(0);
    for (const [openingAngleDeg, wallEmissivity] of cases) {
      const fine = [64, 128, 256, 512].map((strips) => grooveEmissivityDiffuseRadiosity({ openingAngleDeg, wallEmissivity, strips }));
      const f = fine.map((r) => r.hemisphericalFine);
      const d1 = (f[1] as number) - (f[0] as number);
      const d2 = (f[2] as number) - (f[1] as number);
      const d3 = (f[3] as number) - (f[2] as number);
      expect(d1 / d2).toBeGreaterThan(3.7);
      expect(d1 / d2).toBeLessThan(4.3);
      expect(d2 / d3).toBeGreaterThan(3.7);
      expect(d2 / d3).toBeLessThan(4.3);
      expect(Math.abs((fine[2] as { hemispherical: number }).hemispherical - (fine[3] as { hemispherical: number }).hemispherical)).toBeLessThan(1e-7);
    }
  });
});

describe("trend as the groove closes", () => {
  it("diffuse (deterministic solver): apparent emissivity rises monotonically as the opening angle falls from 180° to 2°", () => {
    for (const e of [0.1, 0.5, 0.9]) {
      let previous = -Infinity;
      for (let a = 180; a >= 2; a -= 2) {
        const v = grooveEmissivityDiffuseRadiosity({ openingAngleDeg: a, wallEmissivity: e, strips: 64 }).hemispherical;
        expect(v, `${a}°, ε=${e}`).toBeGreaterThan(previous);
        previous = v;
      }
    }
  });

  it("specular (unfolding construction): apparent emissivity rises monotonically as the opening angle falls from 180° to 1°", () => {
    for (const e of [0.1, 0.5, 0.9]) {
      let previous = -Infinity;
      for (let a = 180; a >= 1; a -= 1) {
        const v = grooveEmissivitySpecularUnfolded({ openingAngleDeg: a, wallEmissivity: e }).hemispherical;
        expect(v, `${a}°, ε=${e}`).toBeGreaterThan(previous);
        previous = v;
      }
    }
  });

  it("specular grooves tend to 1 as they close (many reflections)", () => {
    for (const e of [0.05, 0.1, 0.3]) {
      const gaps = [4, 2, 1, 0.5].map((a) => 1 - grooveEmissivitySpecularUnfolded({ openingAngleDeg: a, wallEmissivity: e }).hemispherical);
      for (let i = 1; i < gaps.length; i++) expect(gaps[i] as number).toBeLessThan(gaps[i - 1] as number);
      expect(gaps[gaps.length - 1] as number).toBeLessThan(0.01);
    }
  });

  it("the deep parallel-plate channel limit is below 1 for ε < 1 and converged in depth (200 vs 400 widths: 1e-5)", () => {
    for (const e of [0.1, 0.3, 0.5, 0.9]) {
      const c200 = parallelPlateChannelEmissivity({ wallEmissivity: e, depthToWidth: 200 });
      const c400 = parallelPlateChannelEmissivity({ wallEmissivity: e, depthToWidth: 400 });
      expect(c200.hemispherical).toBeLessThan(1);
      expect(c200.lowerBound).toBeLessThanOrEqual(c200.upperBound);
      expect(Math.abs(c200.hemispherical - c400.hemispherical)).toBeLessThan(1e-5);
    }
  });

  it("diffuse grooves approach the channel limit from below, the gap shrinking in proportion to the angle", () => {
    for (const e of [0.1, 0.5, 0.9]) {
      const limit = parallelPlateChannelEmissivity({ wallEmissivity: e }).hemispherical;
      const v = [4, 2, 1].map((a) => grooveEmissivityDiffuseRadiosity({ openingAngleDeg: a, wallEmissivity: e }).hemispherical);
      const [v4, v2, v1] = v as [number, number, number];
      expect(v4).toBeLessThan(v2);
      expect(v2).toBeLessThan(v1);
      expect(v1).toBeLessThan(limit);
      // Gap ∝ α: halving the angle halves the gap (ratio 2 ± 0.15).
      const ratio = (limit - v2) / (limit - v1);
      expect(ratio).toBeGreaterThan(1.85);
      expect(ratio).toBeLessThan(2.15);
      // Linear extrapolation of (2°, 1°) to α = 0 lands on the channel limit.
      expect(Math.abs(2 * v1 - v2 - limit)).toBeLessThan(1e-4);
    }
  });
});
