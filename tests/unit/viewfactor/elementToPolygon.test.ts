import { describe, expect, it } from "vitest";
import { elementToPolygon, type Vec3 } from "@/lib/viewfactor";

const square = (z: number, s = 1): Vec3[] => [
  [-s, -s, z],
  [s, -s, z],
  [s, s, z],
  [-s, s, z],
];

describe("elementToPolygon: winding and normal length", () => {
  it("gives the same positive value for either winding and any start vertex", () => {
    const poly: Vec3[] = [[0.2, -0.3, 1], [1.4, 0.1, 1.3], [0.9, 1.2, 1.6], [-0.4, 0.8, 1.2]];
    const f = elementToPolygon([0, 0, 0], [0.1, 0.2, 1], poly);
    expect(f).toBeGreaterThan(0);
    expect(elementToPolygon([0, 0, 0], [0.1, 0.2, 1], [...poly].reverse())).toBeCloseTo(f, 14);
    expect(elementToPolygon([0, 0, 0], [0.1, 0.2, 1], [poly[2], poly[3], poly[0], poly[1]] as Vec3[])).toBeCloseTo(f, 14);
  });

  it("does not depend on the length of the normal", () => {
    const poly = square(2);
    expect(elementToPolygon([0.3, 0.1, 0], [0, 0, 7.5], poly)).toBeCloseTo(elementToPolygon([0.3, 0.1, 0], [0, 0, 1], poly), 14);
  });

  it("tends to 1 for a polygon covering almost the whole hemisphere", () => {
    const f = elementToPolygon([0, 0, 0], [0, 0, 1], square(0.001, 1000));
    expect(f).toBeGreaterThan(0.999999);
    expect(f).toBeLessThanOrEqual(1);
  });
});

describe("elementToPolygon: clipping to the element's plane", () => {
  it("returns 0 for a polygon wholly behind the element", () => {
    expect(elementToPolygon([0, 0, 0], [0, 0, 1], square(-1))).toBe(0);
  });

  it("returns 0 for a polygon in the element's plane", () => {
    expect(elementToPolygon([0, 0, 0], [0, 0, 1], square(0))).toBe(0);
  });

  it("returns 0 for a polygon behind that touches the plane at one edge", () => {
    const poly: Vec3[] = [[-1, 1, 0], [1, 1, 0], [1, 1, -2], [-1, 1, -2]];
    expect(elementToPolygon([0, 0, 0], [0, 0, 1], poly)).toBe(0);
  });

  it("a wall straddling the element's plane equals the view factor of its part in front", () => {
    // Element on a "floor" at z = 0 facing up; wall y = 1.5 spans z ∈ [−1, 2]: only z ∈ [0, 2] is seen.
    const straddling: Vec3[] = [[-1, 1.5, -1], [2, 1.5, -1], [2, 1.5, 2], [-1, 1.5, 2]];
    const frontPart: Vec3[] = [[-1, 1.5, 0], [2, 1.5, 0], [2, 1.5, 2], [-1, 1.5, 2]];
    const f = elementToPolygon([0, 0, 0], [0, 0, 1], straddling);
    expect(f).toBeGreaterThan(0);
    expect(Math.abs(f - elementToPolygon([0, 0, 0], [0, 0, 1], frontPart))).toBeLessThanOrEqual(1e-15);
  });

  it("a tilted triangle straddling a tilted element plane equals its hand-clipped front part", () => {
    const origin: Vec3 = [0.5, -0.2, 0.3];
    const n: Vec3 = [0.3, 0.4, Math.sqrt(1 - 0.25)];
    const h = (p: Vec3): number => n[0] * (p[0] - origin[0]) + n[1] * (p[1] - origin[1]) + n[2] * (p[2] - origin[2]);
    const A: Vec3 = [1.5, 0.5, 2.0]; // in front
    const B: Vec3 = [2.5, 1.0, -2.0]; // behind
    const C: Vec3 = [0.2, 2.5, -1.5]; // behind
    expect(h(A)).toBeGreaterThan(0);
    expect(h(B)).toBeLessThan(0);
    expect(h(C)).toBeLessThan(0);
    const cut = (p: Vec3, q: Vec3): Vec3 => {
      const t = h(p) / (h(p) - h(q));
      return [p[0] + t * (q[0] - p[0]), p[1] + t * (q[1] - p[1]), p[2] + t * (q[2] - p[2])];
    };
    const clipped: Vec3[] = [A, cut(A, B), cut(A, C)];
    const f = elementToPolygon(origin, n, [A, B, C]);
    expect(f).toBeGreaterThan(0);
    expect(Math.abs(f - elementToPolygon(origin, n, clipped))).toBeLessThanOrEqual(1e-14);
  });

  it("clips a polygon with many vertices (scratch storage grows) correctly", () => {
    const poly: Vec3[] = [];
    for (let k = 0; k < 40; k++) {
      const t = (2 * Math.PI * k) / 40;
      poly.push([Math.cos(t), 2, Math.sin(t)]);
    }
    const half: Vec3[] = [];
    for (let k = 0; k <= 20; k++) {
      const t = (Math.PI * k) / 20;
      half.push([Math.cos(t), 2, Math.sin(t)]);
    }
    const f = elementToPolygon([0, 0, 0], [0, 0, 1], poly);
    expect(Math.abs(f - elementToPolygon([0, 0, 0], [0, 0, 1], half))).toBeLessThanOrEqual(1e-14);
  });
});

describe("elementToPolygon: invalid input throws RangeError", () => {
  it("rejects fewer than 3 vertices", () => {
    expect(() => elementToPolygon([0, 0, 0], [0, 0, 1], [[0, 0, 1], [1, 0, 1]])).toThrow(RangeError);
  });
  it("rejects a zero or non-finite normal", () => {
    expect(() => elementToPolygon([0, 0, 0], [0, 0, 0], square(1))).toThrow(RangeError);
    expect(() => elementToPolygon([0, 0, 0], [0, Number.NaN, 1], square(1))).toThrow(RangeError);
  });
  it("rejects NaN or infinite coordinates", () => {
    expect(() => elementToPolygon([Number.NaN, 0, 0], [0, 0, 1], square(1))).toThrow(RangeError);
    expect(() => elementToPolygon([0, 0, 0], [0, 0, 1], [[0, 0, 1], [1, Number.NaN, 1], [1, 1, 1]])).toThrow(RangeError);
    expect(() => elementToPolygon([0, 0, 0], [0, 0, 1], [[0, 0, 1], [Number.POSITIVE_INFINITY, 0, 1], [1, 1, 1]])).toThrow(RangeError);
  });
});
