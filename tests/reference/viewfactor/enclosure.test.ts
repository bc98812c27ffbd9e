/**
 * View-factor algebra (summation rule and reciprocity; e.g. Modest,
 * "Radiative Heat Transfer", ch. 4, "view factor algebra" — general theory,
 * chapter from memory) checked as fast-check properties.
 */
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { elementToPolygon, polygonArea, sphereToPolygon, surfaceToSurface, type Vec3 } from "@/lib/viewfactor";

/** The six faces of the box [0,L]×[0,W]×[0,H] (m), with deliberately mixed windings. */
function boxFaces(L: number, W: number, H: number): Vec3[][] {
  return [
    [[0, 0, 0], [L, 0, 0], [L, W, 0], [0, W, 0]],
    [[0, 0, H], [0, W, H], [L, W, H], [L, 0, H]],
    [[0, 0, 0], [L, 0, 0], [L, 0, H], [0, 0, H]],
    [[0, W, 0], [0, W, H], [L, W, H], [L, W, 0]],
    [[0, 0, 0], [0, W, 0], [0, W, H], [0, 0, H]],
    [[L, 0, 0], [L, 0, H], [L, W, H], [L, W, 0]],
  ];
}

const dim = fc.double({ min: 0.2, max: 30, noNaN: true });
const frac = fc.double({ min: 0.01, max: 0.99, noNaN: true });
const angle = fc.double({ min: -Math.PI, max: Math.PI, noNaN: true });

describe("summation rule: a closed box seen from any inside point", () => {
  it("the six faces' view factors from a plane element with any normal sum to 1 (1e-9)", () => {
    fc.assert(
      fc.property(dim, dim, dim, frac, frac, frac, angle, fc.double({ min: -1, max: 1, noNaN: true }), (L, W, H, fx, fy, fz, az, cosPolar) => {
        const p: Vec3 = [fx * L, fy * W, fz * H];
        const s = Math.sqrt(1 - cosPolar * cosPolar);
        const normal: Vec3 = [2.5 * s * Math.cos(az), 2.5 * s * Math.sin(az), 2.5 * cosPolar]; // non-unit on purpose
        const sum = boxFaces(L, W, H).reduce((acc, face) => acc + elementToPolygon(p, normal, face), 0);
        expect(Math.abs(sum - 1)).toBeLessThanOrEqual(1e-9);
      }),
      { numRuns: 300 },
    );
  });

  it("the six faces' view factors from a small sphere sum to 1 (1e-9)", () => {
    fc.assert(
      fc.property(dim, dim, dim, frac, frac, frac, (L, W, H, fx, fy, fz) => {
        const p: Vec3 = [fx * L, fy * W, fz * H];
        const sum = boxFaces(L, W, H).reduce((acc, face) => acc + sphereToPolygon(p, face), 0);
        expect(Math.abs(sum - 1)).toBeLessThanOrEqual(1e-9);
      }),
      { numRuns: 300 },
    );
  });

  it("the faces of a box split into many panels still sum to 1 for the element (1e-9)", () => {
    const [L, W, H] = [6, 4, 3];
    const panels: Vec3[][] = [];
    const n = 5;
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < n; j++) {
        const [x0, x1, y0, y1] = [(i * L) / n, ((i + 1) * L) / n, (j * W) / n, ((j + 1) * W) / n];
        panels.push([[x0, y0, 0], [x1, y0, 0], [x1, y1, 0], [x0, y1, 0]]);
        panels.push([[x0, y0, H], [x1, y0, H], [x1, y1, H], [x0, y1, H]]);
      }
    }
    for (const face of boxFaces(L, W, H).slice(2)) panels.push(face);
    expect(panels.length).toBeGreaterThan(0);
    const sum = panels.reduce((acc, face) => acc + elementToPolygon([1.3, 2.2, 0.6], [0.3, -1, 0.2], face), 0);
    expect(Math.abs(sum - 1)).toBeLessThanOrEqual(1e-9);
  });

  it("surfaceToSurface from one face of a box to the other five sums to 1 (1e-8: five catalogue configurations at 1e-9 each)", () => {
    const faces = boxFaces(3, 2, 1.5);
    for (let i = 0; i < faces.length; i++) {
      let sum = 0;
      for (let j = 0; j < faces.length; j++) {
        if (j !== i) sum += surfaceToSurface(faces[i] as Vec3[], faces[j] as Vec3[]);
      }
      expect(Math.abs(sum - 1)).toBeLessThanOrEqual(1e-8);
    }
  });
});

describe("reciprocity A_a·F_ab = A_b·F_ba for surfaceToSurface", () => {
  /** surfaceToSurface is accurate to an absolute 1e-7 on F (its doc comment), so A_a·F_ab − A_b·F_ba is bounded by 1e-7·(A_a + A_b). */
  const bound = (areaA: number, areaB: number): number => 1e-7 * (areaA + areaB);

  it("holds for offset parallel rectangles of random size (within the stated absolute accuracy)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.1, max: 5, noNaN: true }),
        fc.double({ min: 0.1, max: 5, noNaN: true }),
        fc.double({ min: 0.1, max: 5, noNaN: true }),
        fc.double({ min: 0.1, max: 5, noNaN: true }),
        fc.double({ min: -3, max: 3, noNaN: true }),
        fc.double({ min: -3, max: 3, noNaN: true }),
        fc.double({ min: 0.1, max: 4, noNaN: true }),
        (a1, b1, a2, b2, dx, dy, c) => {
          const A: Vec3[] = [[0, 0, 0], [a1, 0, 0], [a1, b1, 0], [0, b1, 0]];
          const B: Vec3[] = [[dx, dy, c], [dx + a2, dy, c], [dx + a2, dy + b2, c], [dx, dy + b2, c]];
          const left = polygonArea(A) * surfaceToSurface(A, B);
          const right = polygonArea(B) * surfaceToSurface(B, A);
          expect(Math.abs(left - right)).toBeLessThanOrEqual(bound(polygonArea(A), polygonArea(B)));
        },
      ),
      { numRuns: 25 },
    );
  });

  it("holds for a floor rectangle and a wall rectangle with gaps and offsets (within the stated absolute accuracy)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.1, max: 5, noNaN: true }),
        fc.double({ min: 0.1, max: 5, noNaN: true }),
        fc.double({ min: 0, max: 2, noNaN: true }),
        fc.double({ min: -3, max: 3, noNaN: true }),
        fc.double({ min: 0.1, max: 5, noNaN: true }),
        fc.double({ min: 0, max: 2, noNaN: true }),
        fc.double({ min: 0.1, max: 3, noNaN: true }),
        (l, w, gap, x0, len, z0, h) => {
          const floor: Vec3[] = [[0, 0, 0], [l, 0, 0], [l, w, 0], [0, w, 0]];
          const y = w + gap;
          const wall: Vec3[] = [[x0, y, z0], [x0 + len, y, z0], [x0 + len, y, z0 + h], [x0, y, z0 + h]];
          const left = polygonArea(floor) * surfaceToSurface(floor, wall);
          const right = polygonArea(wall) * surfaceToSurface(wall, floor);
          expect(Math.abs(left - right)).toBeLessThanOrEqual(bound(polygonArea(floor), polygonArea(wall)));
        },
      ),
      { numRuns: 25 },
    );
  });

  it("holds between a triangle and a hexagon in tilted planes (within the stated absolute accuracy)", () => {
    const tri: Vec3[] = [[0, 0, 0], [2, 0, 0.3], [0.5, 1.5, 0]];
    const hex: Vec3[] = [];
    for (let k = 0; k < 6; k++) {
      const t = (k * Math.PI) / 3;
      hex.push([1 + 0.8 * Math.cos(t), 0.5 + 0.8 * Math.sin(t), 2 + 0.2 * Math.cos(t)]);
    }
    const left = polygonArea(tri) * surfaceToSurface(tri, hex);
    const right = polygonArea(hex) * surfaceToSurface(hex, tri);
    expect(left).toBeGreaterThan(0);
    expect(Math.abs(left - right)).toBeLessThanOrEqual(bound(polygonArea(tri), polygonArea(hex)));
  });
});
