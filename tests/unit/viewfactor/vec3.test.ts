import { describe, expect, it } from "vitest";
import { addVec3, crossVec3, distanceVec3, dotVec3, isFiniteVec3, lengthVec3, normalizeVec3, scaleVec3, subVec3, vec3, type Vec3 } from "@/lib/viewfactor";

describe("vec3 helpers", () => {
  it("compute sums, differences, scaling, dot and cross products", () => {
    const a = vec3(1, 2, 3);
    const b: Vec3 = [4, -5, 6];
    expect(addVec3(a, b)).toEqual([5, -3, 9]);
    expect(subVec3(a, b)).toEqual([-3, 7, -3]);
    expect(scaleVec3(a, 2)).toEqual([2, 4, 6]);
    expect(dotVec3(a, b)).toBe(12);
    expect(crossVec3([1, 0, 0], [0, 1, 0])).toEqual([0, 0, 1]);
    expect(lengthVec3([3, 4, 12])).toBe(13);
    expect(distanceVec3([1, 1, 1], [4, 5, 1])).toBe(5);
  });

  it("write into the out argument instead of allocating", () => {
    const out: Vec3 = [0, 0, 0];
    expect(addVec3([1, 1, 1], [1, 2, 3], out)).toBe(out);
    expect(out).toEqual([2, 3, 4]);
    // cross may use out even when it aliases an input
    const a: Vec3 = [1, 0, 0];
    expect(crossVec3(a, [0, 1, 0], a)).toEqual([0, 0, 1]);
  });

  it("normalise to unit length and reject zero or non-finite vectors with RangeError", () => {
    const n = normalizeVec3([0, 3, 4]);
    expect(lengthVec3(n)).toBeCloseTo(1, 15);
    expect(() => normalizeVec3([0, 0, 0])).toThrow(RangeError);
    expect(() => normalizeVec3([Number.NaN, 0, 1])).toThrow(RangeError);
    expect(isFiniteVec3([1, 2, Number.POSITIVE_INFINITY])).toBe(false);
  });
});
