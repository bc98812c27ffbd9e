/**
 * Behaviour of the V-groove apparent-emissivity API: output shape, defaults,
 * reproducibility, honest standard errors, input policy.
 */
import { describe, expect, it } from "vitest";
import {
  GROOVE_DEFAULT_RAYS,
  grooveEmissivity,
  grooveEmissivityDiffuseRadiosity,
  grooveEmissivitySpecularUnfolded,
  parallelPlateChannelEmissivity,
  traceGroove,
  type GrooveInput,
  type GrooveReflection,
} from "@/lib/viewfactor";

const REFLECTIONS: readonly GrooveReflection[] = ["diffuse", "specular"];

describe("grooveEmissivity: output shape", () => {
  it("returns 9 non-negative directional shares that sum to 1 and a hemispherical value in [ε, 1]", () => {
    for (const reflection of REFLECTIONS) {
      for (const [openingAngleDeg, wallEmissivity] of [
        [15, 0.2],
        [75, 0.6],
        [140, 0.9],
      ] as const) {
        const r = grooveEmissivity({ openingAngleDeg, wallEmissivity, reflection, rays: 20_000 });
        expect(r.directional).toHaveLength(9);
        r.directional.forEach((s) => expect(s).toBeGreaterThanOrEqual(0));
        expect(Math.abs(r.directional.reduce((a, b) => a + b, 0) - 1)).toBeLessThanOrEqual(1e-12);
        expect(r.hemispherical).toBeGreaterThanOrEqual(wallEmissivity - 4 * r.standardError);
        expect(r.hemispherical).toBeLessThanOrEqual(1);
        expect(r.standardError).toBeGreaterThan(0);
      }
    }
  });

  it("uses 200 000 rays by default and then reaches a standard error of 0.002 or better", () => {
    expect(GROOVE_DEFAULT_RAYS).toBe(200_000);
    for (const reflection of REFLECTIONS) {
      for (const wallEmissivity of [0.1, 0.5, 0.9]) {
        const r = grooveEmissivity({ openingAngleDeg: 30, wallEmissivity, reflection });
        expect(r.standardError).toBeLessThanOrEqual(0.002);
        expect(traceGroove({ openingAngleDeg: 30, wallEmissivity, reflection }).rays).toBe(200_000);
      }
    }
  });

  it("black walls absorb every entering ray at its first hit: exactly 1 with zero standard error", () => {
    for (const reflection of REFLECTIONS) {
      const r = grooveEmissivity({ openingAngleDeg: 40, wallEmissivity: 1, reflection, rays: 2_000 });
      expect(r.hemispherical).toBe(1);
      expect(r.standardError).toBe(0);
    }
  });

  it("a flat surface returns exactly ε with zero standard error", () => {
    for (const reflection of REFLECTIONS) {
      const r = grooveEmissivity({ openingAngleDeg: 180, wallEmissivity: 0.37, reflection, rays: 1_000 });
      expect(r.hemispherical).toBe(0.37);
      expect(r.standardError).toBe(0);
    }
  });
});

describe("grooveEmissivity: reproducibility", () => {
  it("the same seed gives the same result bit for bit", () => {
    for (const reflection of REFLECTIONS) {
      const input: GrooveInput = { openingAngleDeg: 33, wallEmissivity: 0.4, reflection, rays: 30_000, seed: 12345 };
      const a = grooveEmissivity(input);
      const b = grooveEmissivity({ ...input });
      expect(Object.is(a.hemispherical, b.hemispherical)).toBe(true);
      expect(Object.is(a.standardError, b.standardError)).toBe(true);
      expect(a.directional).toEqual(b.directional);
    }
  });

  it("the default seed is 1", () => {
    const a = grooveEmissivity({ openingAngleDeg: 50, wallEmissivity: 0.3, reflection: "diffuse", rays: 10_000 });
    const b = grooveEmissivity({ openingAngleDeg: 50, wallEmissivity: 0.3, reflection: "diffuse", rays: 10_000, seed: 1 });
    expect(a).toEqual(b);
  });

  it("different seeds give different results", () => {
    for (const reflection of REFLECTIONS) {
      const a = grooveEmissivity({ openingAngleDeg: 33, wallEmissivity: 0.4, reflection, rays: 30_000, seed: 1 });
      const b = grooveEmissivity({ openingAngleDeg: 33, wallEmissivity: 0.4, reflection, rays: 30_000, seed: 2 });
      expect(a.hemispherical).not.toBe(b.hemispherical);
    }
  });
});

describe("traceGroove: standard error is honest and the estimator unbiased", () => {
  it("over 100 seeds the spread of estimates matches the reported standard error (ratio 0.8–1.2) and the mean matches the reference", () => {
    const cases = [
      ["diffuse", 25, 0.3, grooveEmissivityDiffuseRadiosity({ openingAngleDeg: 25, wallEmissivity: 0.3 }).hemispherical],
      ["specular", 20, 0.5, grooveEmissivitySpecularUnfolded({ openingAngleDeg: 20, wallEmissivity: 0.5 }).hemispherical],
    ] as const;
    expect(cases.length).toBeGreaterThan(0);
    const seeds = Array.from({ length: 100 }, (_, i) => 1000 + i);
    for (const [reflection, openingAngleDeg, wallEmissivity, reference] of cases) {
      const runs = seeds.map((seed) => traceGroove({ openingAngleDeg, wallEmissivity, reflection, rays: 5_000, seed }));
      const values = runs.map((r) => r.hemispherical);
      const mean = values.reduce((a, b) => a + b, 0) / values.length;
      const sd = Math.sqrt(values.reduce((a, b) => a + (b - mean) ** 2, 0) / (values.length - 1));
      const meanSe = runs.reduce((a, r) => a + r.standardError, 0) / runs.length;
      expect(sd / meanSe).toBeGreaterThan(0.8);
      expect(sd / meanSe).toBeLessThan(1.2);
      // The mean of 100 runs has standard error sd/10; allow 4 of them.
      expect(Math.abs(mean - reference)).toBeLessThan((4 * sd) / 10);
    }
  });
});

describe("traceGroove: counts", () => {
  it("counts ray–wall hits: exactly one per ray on a flat surface, more in a narrow groove", () => {
    const flat = traceGroove({ openingAngleDeg: 180, wallEmissivity: 0.5, reflection: "diffuse", rays: 1_000 });
    expect(flat.bounces).toBe(flat.rays);
    const narrow = traceGroove({ openingAngleDeg: 10, wallEmissivity: 0.5, reflection: "diffuse", rays: 1_000 });
    expect(narrow.bounces).toBeGreaterThan(2 * narrow.rays);
  });

  it("gives each 10° bin at least 2 rays, so tiny ray counts still return a finite result", () => {
    const r = traceGroove({ openingAngleDeg: 60, wallEmissivity: 0.5, reflection: "diffuse", rays: 1 });
    expect(r.rays).toBe(18);
    expect(Number.isFinite(r.hemispherical)).toBe(true);
    expect(Number.isFinite(r.standardError)).toBe(true);
  });
});

describe("input policy: programmer errors throw RangeError", () => {
  const ok: GrooveInput = { openingAngleDeg: 60, wallEmissivity: 0.5, reflection: "diffuse", rays: 100 };

  it.each([0, -10, 180.0001, 360, Number.NaN, Number.POSITIVE_INFINITY])("rejects opening angle %s°", (openingAngleDeg) => {
    expect(() => grooveEmissivity({ ...ok, openingAngleDeg })).toThrow(RangeError);
    expect(() => grooveEmissivityDiffuseRadiosity({ openingAngleDeg, wallEmissivity: 0.5 })).toThrow(RangeError);
    expect(() => grooveEmissivitySpecularUnfolded({ openingAngleDeg, wallEmissivity: 0.5 })).toThrow(RangeError);
  });

  it.each([0, -0.1, 1.0001, Number.NaN])("rejects wall emissivity %s", (wallEmissivity) => {
    expect(() => grooveEmissivity({ ...ok, wallEmissivity })).toThrow(RangeError);
    expect(() => grooveEmissivityDiffuseRadiosity({ openingAngleDeg: 60, wallEmissivity })).toThrow(RangeError);
    expect(() => grooveEmissivitySpecularUnfolded({ openingAngleDeg: 60, wallEmissivity })).toThrow(RangeError);
    expect(() => parallelPlateChannelEmissivity({ wallEmissivity })).toThrow(RangeError);
  });

  it.each([0, -5, 1.5, Number.NaN, Number.POSITIVE_INFINITY])("rejects ray count %s", (rays) => {
    expect(() => grooveEmissivity({ ...ok, rays })).toThrow(RangeError);
  });

  it("rejects a non-integer seed and an unknown reflection law", () => {
    expect(() => grooveEmissivity({ ...ok, seed: 0.5 })).toThrow(RangeError);
    expect(() => grooveEmissivity({ ...ok, reflection: "glossy" as GrooveReflection })).toThrow(RangeError);
  });

  it("rejects bad strip counts, bad channel depths and too small angles for the unfolding construction", () => {
    expect(() => grooveEmissivityDiffuseRadiosity({ openingAngleDeg: 60, wallEmissivity: 0.5, strips: 7 })).toThrow(RangeError);
    expect(() => grooveEmissivityDiffuseRadiosity({ openingAngleDeg: 60, wallEmissivity: 0.5, strips: 2 })).toThrow(RangeError);
    expect(() => parallelPlateChannelEmissivity({ wallEmissivity: 0.5, depthToWidth: 0.5 })).toThrow(RangeError);
    expect(() => grooveEmissivitySpecularUnfolded({ openingAngleDeg: 0.005, wallEmissivity: 0.5 })).toThrow(RangeError);
  });

  it("accepts the edges of the valid ranges: 180°, ε = 1, 1 ray, seed 0 and negative seeds", () => {
    expect(() => grooveEmissivity({ ...ok, openingAngleDeg: 180 })).not.toThrow();
    expect(() => grooveEmissivity({ ...ok, wallEmissivity: 1 })).not.toThrow();
    expect(() => grooveEmissivity({ ...ok, rays: 1 })).not.toThrow();
    expect(() => grooveEmissivity({ ...ok, seed: 0 })).not.toThrow();
    expect(() => grooveEmissivity({ ...ok, seed: -42 })).not.toThrow();
  });
});

describe("deterministic solvers: output shape", () => {
  it("radiosity and unfolding results have 9 shares summing to 1", () => {
    const d = grooveEmissivityDiffuseRadiosity({ openingAngleDeg: 45, wallEmissivity: 0.3 });
    const s = grooveEmissivitySpecularUnfolded({ openingAngleDeg: 45, wallEmissivity: 0.3 });
    for (const r of [d, s]) {
      expect(r.directional).toHaveLength(9);
      expect(Math.abs(r.directional.reduce((a, b) => a + b, 0) - 1)).toBeLessThanOrEqual(1e-12);
      expect(r.binEmissivity).toHaveLength(9);
    }
  });

  it("the radiosity solver reports the two meshes it extrapolates from", () => {
    const r = grooveEmissivityDiffuseRadiosity({ openingAngleDeg: 45, wallEmissivity: 0.3, strips: 64 });
    expect(r.strips).toBe(64);
    expect(r.hemispherical).toBeCloseTo(r.hemisphericalFine + (r.hemisphericalFine - r.hemisphericalCoarse) / 3, 15);
  });
});
