import { describe, expect, it } from "vitest";
import { surfaceToSurface, type Vec3 } from "@/lib/viewfactor";

const floor: Vec3[] = [[0, 0, 0], [2, 0, 0], [2, 1.5, 0], [0, 1.5, 0]];
const ceiling: Vec3[] = [[0.5, 0.2, 1], [2.5, 0.2, 1], [2.5, 1.7, 1], [0.5, 1.7, 1]];

describe("surfaceToSurface", () => {
  it("does not depend on the winding of either polygon", () => {
    const f = surfaceToSurface(floor, ceiling);
    expect(f).toBeGreaterThan(0);
    // Reversing a changes its fan triangulation, hence the quadrature points: agreement to the quadrature accuracy.
    expect(Math.abs(surfaceToSurface([...floor].reverse(), ceiling) - f)).toBeLessThanOrEqual(1e-9);
    expect(Math.abs(surfaceToSurface(floor, [...ceiling].reverse()) - f)).toBeLessThanOrEqual(1e-14);
  });

  it("is 0 between coplanar polygons", () => {
    expect(surfaceToSurface(floor, [[3, 0, 0], [4, 0, 0], [4, 1, 0], [3, 1, 0]])).toBe(0);
  });

  it("counts only the part of the receiver in front of the emitter", () => {
    // Wall crossing the floor's plane: only its upper half (z ≥ 0) is seen.
    const wall: Vec3[] = [[0, 2, -1], [2, 2, -1], [2, 2, 1], [0, 2, 1]];
    const upper: Vec3[] = [[0, 2, 0], [2, 2, 0], [2, 2, 1], [0, 2, 1]];
    expect(surfaceToSurface(floor, wall)).toBeCloseTo(surfaceToSurface(floor, upper), 6);
  });

  it("gets closer to the converged value as the tolerance is tightened", () => {
    const wall: Vec3[] = [[0, 0, 0], [2, 0, 0], [2, 0, 1], [0, 0, 1]];
    const ref = surfaceToSurface(floor, wall, { tolerance: 1e-11, maxDepth: 16 });
    const coarse = Math.abs(surfaceToSurface(floor, wall, { tolerance: 1e-3, maxDepth: 1 }) - ref);
    const fine = Math.abs(surfaceToSurface(floor, wall) - ref);
    expect(fine).toBeLessThanOrEqual(coarse);
    expect(fine).toBeLessThan(1e-7);
  });

  it("throws RangeError for invalid polygons or options", () => {
    expect(() => surfaceToSurface([[0, 0, 0], [1, 0, 0]], ceiling)).toThrow(RangeError);
    expect(() => surfaceToSurface([[0, 0, 0], [1, 0, 0], [2, 0, 0]], ceiling)).toThrow(RangeError);
    expect(() => surfaceToSurface(floor, ceiling, { tolerance: 0 })).toThrow(RangeError);
    expect(() => surfaceToSurface(floor, ceiling, { maxDepth: 40 })).toThrow(RangeError);
  });
});
