import { describe, expect, it } from "vitest";
import { personAngleFactorCorner, personToRectangle, rectangleFrame, type Vec3 } from "@/lib/viewfactor";

const seated = (position: Vec3) => ({ position, posture: "seated" as const });
const wallY0: Vec3[] = [[0, 0, 0], [4, 0, 0], [4, 0, 2.7], [0, 0, 2.7]];

describe("personToRectangle: geometry handling", () => {
  it("gives a ceiling rectangle the same factor whatever vertex it starts from or its winding", () => {
    const ceiling: Vec3[] = [[0.5, 1, 2.7], [3.5, 1, 2.7], [3.5, 2.2, 2.7], [0.5, 2.2, 2.7]];
    const person = seated([1.1, 0.3, 0.6]);
    const base = personToRectangle(person, ceiling);
    expect(base).toBeGreaterThan(0);
    const rotated = [...ceiling.slice(1), ceiling[0]!];
    expect(personToRectangle(person, rotated)).toBeCloseTo(base, 14);
    expect(personToRectangle(person, [...ceiling].reverse())).toBeCloseTo(base, 14);
  });

  it("gives the same factor from either side of the wall", () => {
    const front = personToRectangle(seated([1.2, 1.5, 0.6]), wallY0);
    const back = personToRectangle(seated([1.2, -1.5, 0.6]), wallY0);
    expect(front).toBeGreaterThan(0);
    expect(back).toBeCloseTo(front, 14);
  });

  it("accepts a vertical rectangle whose first edge is the vertical one (a is still the horizontal side)", () => {
    const verticalFirst: Vec3[] = [[0, 0, 0], [0, 0, 2.7], [4, 0, 2.7], [4, 0, 0]];
    expect(personToRectangle(seated([1.2, 1.5, 0.6]), verticalFirst)).toBeCloseTo(personToRectangle(seated([1.2, 1.5, 0.6]), wallY0), 14);
    const frame = rectangleFrame(verticalFirst);
    expect(frame.orientation).toBe("vertical");
    expect(frame.aLength).toBeCloseTo(4, 14);
    expect(frame.bLength).toBeCloseTo(2.7, 14);
  });

  it("is invariant to rotating the room in plan", () => {
    const phi = 0.83;
    const rot = (p: Vec3): Vec3 => [p[0] * Math.cos(phi) - p[1] * Math.sin(phi), p[0] * Math.sin(phi) + p[1] * Math.cos(phi), p[2]];
    const person: Vec3 = [1.2, 1.5, 0.6];
    const floor: Vec3[] = [[0, 0, 0], [4, 0, 0], [4, 3, 0], [0, 3, 0]];
    expect(personToRectangle(seated(rot(person)), wallY0.map(rot))).toBeCloseTo(personToRectangle(seated(person), wallY0), 13);
    expect(personToRectangle(seated(rot(person)), floor.map(rot))).toBeCloseTo(personToRectangle(seated(person), floor), 13);
  });

  it("labels a horizontal rectangle's side a as the edge from vertex 0 to vertex 1", () => {
    const frame = rectangleFrame([[0, 0, 3], [5, 0, 3], [5, 2, 3], [0, 2, 3]]);
    expect(frame.orientation).toBe("horizontal");
    expect(frame.aLength).toBeCloseTo(5, 14);
    expect(frame.bLength).toBeCloseTo(2, 14);
  });

  it("never returns a negative factor for a far, thin panel (the fit is slightly non-monotonic there)", () => {
    const strip: Vec3[] = [[30, 0, 0.6], [50, 0, 0.6], [50, 0, 0.62], [30, 0, 0.62]];
    const f = personToRectangle(seated([0, 1, 0.6]), strip);
    expect(f).toBeGreaterThanOrEqual(0);
    expect(f).toBeLessThan(1e-3);
  });

  it("uses the standing constants for a standing person", () => {
    const s = personToRectangle({ position: [0, 1, 1.0], posture: "standing" }, [[0, 0, 1.0], [2, 0, 1.0], [2, 0, 3.0], [0, 0, 3.0]]);
    expect(s).toBeCloseTo(personAngleFactorCorner(2, 2, "standing", "vertical"), 14);
  });
});

describe("personToRectangle: invalid input throws RangeError", () => {
  it("rejects a person in the plane of the rectangle (c ≈ 0)", () => {
    expect(() => personToRectangle(seated([1, 0, 0.6]), wallY0)).toThrow(RangeError);
    expect(() => personToRectangle(seated([1, 1, 0]), [[0, 0, 0], [3, 0, 0], [3, 3, 0], [0, 3, 0]])).toThrow(RangeError);
  });
  it("rejects a tilted rectangle", () => {
    expect(() => personToRectangle(seated([1, 1, 0.6]), [[0, 0, 0], [2, 0, 0], [2, 1, 1], [0, 1, 1]])).toThrow(RangeError);
  });
  it("rejects a vertical rectangle rotated within its plane (no horizontal edge)", () => {
    const c = Math.cos(0.3);
    const s = Math.sin(0.3);
    const rect: Vec3[] = [[0, 0, 1], [c, 0, 1 + s], [c - s, 0, 1 + s + c], [-s, 0, 1 + c]];
    expect(() => personToRectangle(seated([0, 1, 1]), rect)).toThrow(RangeError);
  });
  it("rejects a non-rectangular quadrilateral and a wrong vertex count", () => {
    expect(() => personToRectangle(seated([1, 1, 1]), [[0, 0, 0], [2, 0, 0], [2.5, 1, 0], [0.5, 1, 0]])).toThrow(RangeError);
    expect(() => personToRectangle(seated([1, 1, 1]), [[0, 0, 0], [2, 0, 0], [2, 1, 0]])).toThrow(RangeError);
  });
  it("rejects non-finite positions and unknown postures", () => {
    expect(() => personToRectangle(seated([Number.NaN, 1, 0.6]), wallY0)).toThrow(RangeError);
    expect(() => personToRectangle({ position: [1, 1, 0.6], posture: "lying" as "seated" }, wallY0)).toThrow(RangeError);
  });
  it("personAngleFactorCorner rejects negative or non-finite ratios", () => {
    expect(() => personAngleFactorCorner(-1, 1, "seated", "vertical")).toThrow(RangeError);
    expect(() => personAngleFactorCorner(1, Number.NaN, "seated", "vertical")).toThrow(RangeError);
  });
});
