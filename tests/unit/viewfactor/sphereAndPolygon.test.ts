import { describe, expect, it } from "vitest";
import {
  gaussLegendre01,
  polygonArea,
  polygonCentroid,
  polygonNormal,
  polygonSolidAngle,
  sphereToPolygon,
  type Vec3,
} from "@/lib/viewfactor";

describe("sphereToPolygon", () => {
  it("sees one face of a cube from its centre as exactly 1/6", () => {
    const face: Vec3[] = [[-1, -1, 1], [1, -1, 1], [1, 1, 1], [-1, 1, 1]];
    expect(sphereToPolygon([0, 0, 0], face)).toBeCloseTo(1 / 6, 15);
  });

  it("sees the octant triangle (1,0,0)-(0,1,0)-(0,0,1) from the origin as 1/8 of the sphere", () => {
    expect(sphereToPolygon([0, 0, 0], [[1, 0, 0], [0, 1, 0], [0, 0, 1]])).toBeCloseTo(1 / 8, 15);
  });

  it("does not depend on winding or start vertex", () => {
    const poly: Vec3[] = [[0.2, -0.3, 1], [1.4, 0.1, 1.3], [0.9, 1.2, 1.6], [-0.4, 0.8, 1.2]];
    const f = sphereToPolygon([0.1, 0.1, -0.5], poly);
    expect(sphereToPolygon([0.1, 0.1, -0.5], [...poly].reverse())).toBeCloseTo(f, 15);
    expect(sphereToPolygon([0.1, 0.1, -0.5], [poly[1], poly[2], poly[3], poly[0]] as Vec3[])).toBeCloseTo(f, 15);
  });

  it("is 0 for a point in the polygon's plane outside it, and tends to 1/2 just in front of a huge polygon", () => {
    const sq: Vec3[] = [[1, 1, 0], [2, 1, 0], [2, 2, 0], [1, 2, 0]];
    expect(sphereToPolygon([0, 0, 0], sq)).toBe(0);
    const huge: Vec3[] = [[-1e4, -1e4, 0], [1e4, -1e4, 0], [1e4, 1e4, 0], [-1e4, 1e4, 0]];
    expect(sphereToPolygon([0, 0, 1e-3], huge)).toBeCloseTo(0.5, 6);
  });

  it("polygonSolidAngle returns the solid angle in steradians (= 4π·F)", () => {
    const face: Vec3[] = [[-1, -1, 1], [1, -1, 1], [1, 1, 1], [-1, 1, 1]];
    expect(polygonSolidAngle([0, 0, 0], face)).toBeCloseTo((4 * Math.PI) / 6, 14);
  });

  it("throws RangeError for fewer than 3 vertices or non-finite input", () => {
    expect(() => sphereToPolygon([0, 0, 0], [[0, 0, 1], [1, 0, 1]])).toThrow(RangeError);
    expect(() => sphereToPolygon([Number.NaN, 0, 0], [[0, 0, 1], [1, 0, 1], [1, 1, 1]])).toThrow(RangeError);
    expect(() => sphereToPolygon([0, 0, 0], [[0, 0, 1], [1, 0, Number.POSITIVE_INFINITY], [1, 1, 1]])).toThrow(RangeError);
  });
});

describe("polygon helpers", () => {
  const rect: Vec3[] = [[0, 0, 1], [3, 0, 1], [3, 2, 1], [0, 2, 1]];

  it("polygonArea gives the area of a rectangle and a tilted triangle", () => {
    expect(polygonArea(rect)).toBeCloseTo(6, 14);
    // u = (1,0,1), v = (0,1,0): |u × v| / 2 = √2 / 2.
    expect(polygonArea([[0, 0, 0], [1, 0, 1], [0, 1, 0]])).toBeCloseTo(Math.SQRT2 / 2, 14);
  });

  it("polygonNormal follows the right-hand rule of the winding", () => {
    const up = polygonNormal(rect);
    const down = polygonNormal([...rect].reverse());
    expect(Math.abs(up[0]) + Math.abs(up[1]) + Math.abs(up[2] - 1)).toBeLessThanOrEqual(1e-15);
    expect(Math.abs(down[0]) + Math.abs(down[1]) + Math.abs(down[2] + 1)).toBeLessThanOrEqual(1e-15);
  });

  it("polygonCentroid gives the area centroid (trapezoid: known closed form)", () => {
    // Trapezoid with parallel sides 4 (y = 0) and 2 (y = 1): centroid y = h(b1 + 2b2)/(3(b1 + b2)) = 1·(4 + 4)/(3·6) = 4/9.
    const c = polygonCentroid([[0, 0, 0], [4, 0, 0], [3, 1, 0], [1, 1, 0]]);
    expect(c[0]).toBeCloseTo(2, 14);
    expect(c[1]).toBeCloseTo(4 / 9, 14);
    expect(c[2]).toBeCloseTo(0, 14);
  });

  it("throws RangeError for degenerate or malformed polygons", () => {
    expect(() => polygonArea([[0, 0, 0], [1, 0, 0]])).toThrow(RangeError);
    expect(() => polygonNormal([[0, 0, 0], [1, 0, 0], [2, 0, 0]])).toThrow(RangeError);
    expect(() => polygonCentroid([[0, 0, 0], [1, Number.NaN, 0], [2, 0, 0]])).toThrow(RangeError);
  });
});

describe("gaussLegendre01", () => {
  it("has weights summing to 1 and integrates x^(2n−1) exactly on [0, 1]", () => {
    for (const n of [1, 2, 4, 7, 12]) {
      const { nodes, weights } = gaussLegendre01(n);
      let wSum = 0;
      let integral = 0;
      for (let i = 0; i < n; i++) {
        wSum += weights[i] as number;
        integral += (weights[i] as number) * (nodes[i] as number) ** (2 * n - 1);
      }
      expect(wSum).toBeCloseTo(1, 14);
      expect(integral).toBeCloseTo(1 / (2 * n), 13);
    }
  });
  it("throws RangeError outside 1…256 points", () => {
    expect(() => gaussLegendre01(0)).toThrow(RangeError);
    expect(() => gaussLegendre01(2.5)).toThrow(RangeError);
  });
});
