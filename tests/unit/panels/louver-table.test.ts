import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  buildLouverTable,
  LOUVER_DEFAULT_STEP_DEG,
  louverApertureShare,
  louverEmissivityAt,
  louverFaceEmissivityAt,
  louverTableKey,
  type LouverEmissivity,
  type LouverTableParams,
} from "@/lib/panels";

// A coarse diffuse table keeps these behaviour tests fast; accuracy is in tests/reference/panels.
const TABLE = buildLouverTable({ wallEmissivity: 0.2, finish: "diffuse", stepDeg: 25 });

describe("louverTableKey", () => {
  it("gives the same key for defaults left out and written out", () => {
    const implicit = louverTableKey({ wallEmissivity: 0.9, finish: "diffuse" });
    const explicit = louverTableKey({ wallEmissivity: 0.9, finish: "diffuse", stepDeg: 5, minDeg: 5, maxDeg: 180, solver: "deterministic" });
    expect(implicit).toBe(explicit);
    expect(louverTableKey({ wallEmissivity: 0.9, finish: "specular" })).toContain(`s${LOUVER_DEFAULT_STEP_DEG.specular}`);
  });

  it("changes with every parameter that changes the values, and carries rays and seed only for Monte Carlo", () => {
    const base: LouverTableParams = { wallEmissivity: 0.9, finish: "diffuse" };
    const variants: LouverTableParams[] = [
      { ...base, wallEmissivity: 0.8 },
      { ...base, finish: "specular" },
      { ...base, stepDeg: 2.5 },
      { ...base, minDeg: 10 },
      { ...base, maxDeg: 170 },
      { ...base, solver: "montecarlo" },
      { ...base, solver: "montecarlo", rays: 50_000 },
      { ...base, solver: "montecarlo", seed: 2 },
    ];
    expect(variants.length).toBeGreaterThan(0);
    const keys = new Set([louverTableKey(base), ...variants.map((v) => louverTableKey(v))]);
    expect(keys.size).toBe(variants.length + 1);
    expect(louverTableKey({ ...base, rays: 50_000, seed: 9 })).toBe(louverTableKey(base));
  });

  it("is stored in the table it describes", () => {
    expect(TABLE.key).toBe(louverTableKey({ wallEmissivity: 0.2, finish: "diffuse", stepDeg: 25 }));
  });
});

describe("buildLouverTable", () => {
  it("tabulates minDeg, minDeg + step, … and ends exactly at maxDeg", () => {
    expect(TABLE.anglesDeg).toEqual([5, 30, 55, 80, 105, 130, 155, 180]);
    expect(TABLE.hemispherical).toHaveLength(8);
    expect(TABLE.standardError).toEqual(new Array(8).fill(0));
    for (const row of TABLE.directionalEmissivity) expect(row).toHaveLength(9);
    expect(buildLouverTable({ wallEmissivity: 0.2, finish: "specular", minDeg: 10, maxDeg: 40, stepDeg: 7 }).anglesDeg).toEqual([10, 17, 24, 31, 38, 40]);
  });

  it("uses the radiosity solver for diffuse walls and the unfolding construction for specular walls", () => {
    expect(TABLE.method).toBe("radiosity");
    expect(buildLouverTable({ wallEmissivity: 0.2, finish: "specular", stepDeg: 45 }).method).toBe("unfolding");
  });

  it("is a plain record that survives a JSON round trip unchanged", () => {
    const copy = JSON.parse(JSON.stringify(TABLE)) as typeof TABLE;
    expect(copy).toEqual(TABLE);
    expect(louverEmissivityAt(copy, 42)).toEqual(louverEmissivityAt(TABLE, 42));
  });

  it("is deterministic, including the Monte Carlo table for a fixed seed", () => {
    const p: LouverTableParams = { wallEmissivity: 0.5, finish: "specular", solver: "montecarlo", rays: 5000, stepDeg: 60, minDeg: 60 };
    expect(buildLouverTable(p)).toEqual(buildLouverTable(p));
  });

  it("gives a cavity emissivity that falls as diffuse grooves open (cavity effect)", () => {
    for (let i = 1; i < TABLE.hemispherical.length; i++) {
      expect(TABLE.hemispherical[i] as number).toBeLessThan(TABLE.hemispherical[i - 1] as number);
    }
  });

  const bad: ReadonlyArray<[string, LouverTableParams]> = [
    ["a zero wall emissivity", { wallEmissivity: 0, finish: "diffuse" }],
    ["a wall emissivity above 1", { wallEmissivity: 1.1, finish: "diffuse" }],
    ["a NaN wall emissivity", { wallEmissivity: Number.NaN, finish: "diffuse" }],
    ["an unknown finish", { wallEmissivity: 0.5, finish: "matte" as LouverTableParams["finish"] }],
    ["a zero step", { wallEmissivity: 0.5, finish: "diffuse", stepDeg: 0 }],
    ["minDeg ≥ maxDeg", { wallEmissivity: 0.5, finish: "diffuse", minDeg: 90, maxDeg: 90 }],
    ["maxDeg above 180", { wallEmissivity: 0.5, finish: "diffuse", maxDeg: 181 }],
    ["minDeg below 0.5°", { wallEmissivity: 0.5, finish: "diffuse", minDeg: 0 }],
    ["too many angles", { wallEmissivity: 0.5, finish: "diffuse", stepDeg: 0.01 }],
    ["a non-integer ray count", { wallEmissivity: 0.5, finish: "diffuse", solver: "montecarlo", rays: 1000.5 }],
    ["an unknown solver", { wallEmissivity: 0.5, finish: "diffuse", solver: "exact" as LouverTableParams["solver"] }],
  ];

  it.each(bad)("throws RangeError for %s", (_label, params) => {
    expect(bad.length).toBeGreaterThan(0);
    expect(() => buildLouverTable(params)).toThrow(RangeError);
    expect(() => louverTableKey(params)).toThrow(RangeError);
  });
});

describe("louverEmissivityAt", () => {
  it("returns the tabulated values at tabulated angles", () => {
    const r = louverEmissivityAt(TABLE, 55);
    expect(r.hemispherical).toBe(TABLE.hemispherical[2]);
    expect(r.directional).toEqual(TABLE.directionalEmissivity[2]);
    expect(r.withinTable).toBe(true);
  });

  it("interpolates linearly in angle between tabulated angles", () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 6 }), fc.double({ min: 0, max: 1, noNaN: true }), (i, w) => {
        const a0 = TABLE.anglesDeg[i] as number;
        const a1 = TABLE.anglesDeg[i + 1] as number;
        const r = louverEmissivityAt(TABLE, a0 + w * (a1 - a0));
        const h0 = TABLE.hemispherical[i] as number;
        const h1 = TABLE.hemispherical[i + 1] as number;
        const d0 = TABLE.directionalEmissivity[i] as number[];
        const d1 = TABLE.directionalEmissivity[i + 1] as number[];
        expect(r.hemispherical).toBeCloseTo(h0 + w * (h1 - h0), 10);
        expect(r.directional[4]).toBeCloseTo((d0[4] as number) + w * ((d1[4] as number) - (d0[4] as number)), 10);
      }),
    );
  });

  it("holds the smallest tabulated angle's values below it, down to 0° (closed), and flags them", () => {
    const closed = louverEmissivityAt(TABLE, 0);
    expect(closed.hemispherical).toBe(TABLE.hemispherical[0]);
    expect(closed.directional).toEqual(TABLE.directionalEmissivity[0]);
    expect(closed.withinTable).toBe(false);
    expect(louverEmissivityAt(TABLE, 3).withinTable).toBe(false);
  });

  it("holds the largest tabulated angle's values above a table that ends before 180°, flagged", () => {
    const t = buildLouverTable({ wallEmissivity: 0.2, finish: "specular", minDeg: 30, maxDeg: 90, stepDeg: 30 });
    const r = louverEmissivityAt(t, 120);
    expect(r.hemispherical).toBe(t.hemispherical[2]);
    expect(r.withinTable).toBe(false);
  });

  it("fills and returns a caller-supplied record without allocating a new one", () => {
    const out: LouverEmissivity = { hemispherical: 0, directional: new Array<number>(9).fill(0), withinTable: false };
    const dir = out.directional;
    const r = louverEmissivityAt(TABLE, 77, out);
    expect(r).toBe(out);
    expect(r.directional).toBe(dir);
    expect(r).toEqual(louverEmissivityAt(TABLE, 77));
  });

  const badAngles: ReadonlyArray<[string, number]> = [
    ["a negative angle", -1],
    ["an angle above 180°", 180.5],
    ["NaN", Number.NaN],
    ["Infinity", Number.POSITIVE_INFINITY],
  ];

  it.each(badAngles)("throws RangeError for %s", (_label, angle) => {
    expect(badAngles.length).toBeGreaterThan(0);
    expect(() => louverEmissivityAt(TABLE, angle)).toThrow(RangeError);
  });

  it("throws RangeError for a malformed table", () => {
    expect(() => louverEmissivityAt({ ...TABLE, hemispherical: [] }, 40)).toThrow(RangeError);
    expect(() => louverEmissivityAt({ ...TABLE, directionalEmissivity: TABLE.directionalEmissivity.map((r) => r.slice(0, 8)) }, 40)).toThrow(RangeError);
  });
});

describe("louver aperture model", () => {
  it("opens the hinged-blade face as sin(α/2): none closed, all fully open", () => {
    expect(louverApertureShare(0)).toBe(0);
    expect(louverApertureShare(60)).toBeCloseTo(0.5, 12);
    expect(louverApertureShare(180)).toBe(1);
    expect(louverApertureShare(60, "full-face")).toBe(1);
    expect(louverApertureShare(0, "full-face")).toBe(1);
  });

  it("makes a closed hinged-blade louver emit nothing, while a full-face louver keeps the smallest tabulated angle's values", () => {
    const hinged = louverFaceEmissivityAt(TABLE, 0, "hinged-blades");
    expect(hinged.hemispherical).toBe(0);
    expect(hinged.directional.every((v) => v === 0)).toBe(true);
    expect(hinged.withinTable).toBe(false);
    const full = louverFaceEmissivityAt(TABLE, 0, "full-face");
    expect(full.hemispherical).toBe(TABLE.hemispherical[0]);
    expect(full).toEqual(louverEmissivityAt(TABLE, 0));
  });

  it("scales every direction by the same share at a tabulated angle (the openings lie in one plane)", () => {
    const cavity = louverEmissivityAt(TABLE, 130);
    const face = louverFaceEmissivityAt(TABLE, 130);
    const s = Math.sin((65 * Math.PI) / 180);
    for (let k = 0; k < 9; k++) expect(face.directional[k]).toBeCloseTo(s * (cavity.directional[k] as number), 12);
    expect(face.hemispherical).toBeCloseTo(s * cavity.hemispherical, 12);
  });

  it("interpolates the face values node by node between tabulated angles", () => {
    const s0 = Math.sin((15 * Math.PI) / 180);
    const s1 = Math.sin((27.5 * Math.PI) / 180);
    const expected = 0.4 * s0 * (TABLE.hemispherical[1] as number) + 0.6 * s1 * (TABLE.hemispherical[2] as number);
    expect(louverFaceEmissivityAt(TABLE, 45).hemispherical).toBeCloseTo(expected, 12);
  });

  it("scales the smallest tabulated angle's cavity values by the share below it, reaching 0 when closed", () => {
    expect(louverFaceEmissivityAt(TABLE, 2).hemispherical).toBeCloseTo(Math.sin(Math.PI / 180) * (TABLE.hemispherical[0] as number), 12);
  });

  it("throws RangeError for an unknown aperture model or an angle outside 0–180°", () => {
    expect(() => louverApertureShare(90, "slats" as "full-face")).toThrow(RangeError);
    expect(() => louverApertureShare(-5)).toThrow(RangeError);
    expect(() => louverApertureShare(Number.NaN)).toThrow(RangeError);
    expect(() => louverFaceEmissivityAt(TABLE, 90, "slats" as "full-face")).toThrow(RangeError);
  });
});
