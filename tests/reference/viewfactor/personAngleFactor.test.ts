/**
 * Person-to-rectangle angle factors against the ISO 7726:1998 Annex C
 * analytical relation (Fanger's diagrams in closed form):
 *   F = Fmax·(1 − exp(−(a/c)/τ))·(1 − exp(−(b/c)/γ)), τ = A + B·a/c, γ = C + D·b/c + E·a/c.
 * The relation and its constants are coded here separately from the library.
 *
 * Provenance of the constants: FROM MEMORY — not read in ISO 7726 or the
 * original paper (no copy was available); the checks below therefore test
 * that the library implements the relation and its decomposition rules
 * faithfully, not that the constants are right.
 */
import { describe, expect, it } from "vitest";
import { personToRectangle, type Vec3 } from "@/lib/viewfactor";

/** ISO 7726:1998 Annex C constants table (from memory): [Fmax, A, B, C, D, E]. */
const TABLE = {
  seated: {
    vertical: [0.118, 1.216, 0.169, 0.717, 0.087, 0.052],
    horizontal: [0.116, 1.396, 0.13, 0.951, 0.08, 0.055],
  },
  standing: {
    vertical: [0.12, 1.242, 0.167, 0.616, 0.082, 0.051],
    horizontal: [0.116, 1.595, 0.128, 1.226, 0.046, 0.044],
  },
} as const;

type Posture = keyof typeof TABLE;
type Orientation = "vertical" | "horizontal";

/** The published relation for a rectangle with a corner opposite the person. */
function relation(posture: Posture, orientation: Orientation, aOverC: number, bOverC: number): number {
  const [fMax, A, B, C, D, E] = TABLE[posture][orientation];
  const tau = A + B * aOverC;
  const gamma = C + D * bOverC + E * aOverC;
  return fMax * (1 - Math.exp(-aOverC / tau)) * (1 - Math.exp(-bOverC / gamma));
}

const POSTURES: readonly Posture[] = ["seated", "standing"];
const CENTRE_HEIGHT_M: Record<Posture, number> = { seated: 0.6, standing: 1.0 };

/** (a, b, c) in m for corner-opposite checks. */
const ABC: ReadonlyArray<readonly [number, number, number]> = [
  [1, 1, 1],
  [0.5, 2, 1.5],
  [3, 0.4, 0.8],
  [4, 2.1, 2],
  [0.2, 0.2, 3],
  [10, 5, 1],
];

/** A vertical rectangle of horizontal side a (along plan direction φ) and vertical side b, with its lower corner at `corner`. */
function wall(corner: Vec3, phiRad: number, a: number, b: number): Vec3[] {
  const [ux, uy] = [Math.cos(phiRad), Math.sin(phiRad)];
  const [x, y, z] = corner;
  return [
    [x, y, z],
    [x + a * ux, y + a * uy, z],
    [x + a * ux, y + a * uy, z + b],
    [x, y, z + b],
  ];
}

describe("personToRectangle at corner-opposite positions equals the ISO 7726 Annex C relation (1e-9)", () => {
  it("has rows", () => {
    expect(ABC.length).toBeGreaterThan(0);
  });
  for (const posture of POSTURES) {
    for (const [a, b, c] of ABC) {
      for (const phi of [0, 0.6, 2.3]) {
        it(`${posture}, vertical wall in plan direction ${phi} rad: a=${a}, b=${b}, c=${c}`, () => {
          // Person at distance c in front of the wall's lower-left corner, at the corner's height.
          const corner: Vec3 = [1, 2, CENTRE_HEIGHT_M[posture]];
          const n: Vec3 = [-Math.sin(phi), Math.cos(phi), 0];
          const person: Vec3 = [corner[0] + c * n[0], corner[1] + c * n[1], corner[2]];
          const rect = wall(corner, phi, a, b);
          const expected = relation(posture, "vertical", a / c, b / c);
          expect(Math.abs(personToRectangle({ position: person, posture }, rect) - expected)).toBeLessThanOrEqual(1e-9);
          // Reversed winding and a different start vertex describe the same wall.
          const reversed = [...rect].reverse();
          const rotated = [rect[2], rect[3], rect[0], rect[1]] as Vec3[];
          expect(Math.abs(personToRectangle({ position: person, posture }, reversed) - expected)).toBeLessThanOrEqual(1e-9);
          expect(Math.abs(personToRectangle({ position: person, posture }, rotated) - expected)).toBeLessThanOrEqual(1e-9);
        });
      }
      it(`${posture}, wall extending DOWN from the corner opposite the person (same relation): a=${a}, b=${b}, c=${c}`, () => {
        const top: Vec3 = [0, 0, 2.5];
        const rect = wall([0, 0, 2.5 - b], 0, a, b);
        const person: Vec3 = [0, c, top[2]];
        const expected = relation(posture, "vertical", a / c, b / c);
        expect(Math.abs(personToRectangle({ position: person, posture }, rect) - expected)).toBeLessThanOrEqual(1e-9);
      });
      for (const phi of [0, 1.1]) {
        it(`${posture}, horizontal rectangle (ceiling above, floor below, rotated ${phi} rad in plan): a=${a}, b=${b}, c=${c}`, () => {
          const [ux, uy] = [Math.cos(phi), Math.sin(phi)];
          const person: Vec3 = [2, -1, CENTRE_HEIGHT_M[posture]];
          // A horizontal rectangle: the library averages both labellings of its sides (the person turns
          // about the vertical axis, so neither side is the standard's "a"); each labelling alone is
          // within 0.003 of the average.
          const at = (z: number): Vec3[] => [
            [person[0], person[1], z],
            [person[0] + a * ux, person[1] + a * uy, z],
            [person[0] + a * ux - b * uy, person[1] + a * uy + b * ux, z],
            [person[0] - b * uy, person[1] + b * ux, z],
          ];
          const expected = 0.5 * (relation(posture, "horizontal", a / c, b / c) + relation(posture, "horizontal", b / c, a / c));
          expect(Math.abs(personToRectangle({ position: person, posture }, at(person[2] + c)) - expected)).toBeLessThanOrEqual(1e-9);
          expect(Math.abs(personToRectangle({ position: person, posture }, at(person[2] - c)) - expected)).toBeLessThanOrEqual(1e-9);
          expect(Math.abs(personToRectangle({ position: person, posture }, at(person[2] + c)) - relation(posture, "horizontal", a / c, b / c))).toBeLessThanOrEqual(0.005);
        });
      }
    }
  }
});

describe("ISO 7726 Annex C decomposition into rectangles with a corner at the foot of the perpendicular", () => {
  const posture: Posture = "seated";
  const person: Vec3 = [1.2, 1.5, 0.6];

  it("foot inside a wall: the result is the sum of the four quadrant rectangles of the relation", () => {
    // Wall in the plane y = 0, x ∈ [0, 4], z ∈ [0, 2.7]; foot at (1.2, 0, 0.6), c = 1.5.
    const rect = wall([0, 0, 0], 0, 4, 2.7);
    const c = 1.5;
    const quadrants =
      relation(posture, "vertical", 1.2 / c, 0.6 / c) +
      relation(posture, "vertical", 2.8 / c, 0.6 / c) +
      relation(posture, "vertical", 1.2 / c, 2.1 / c) +
      relation(posture, "vertical", 2.8 / c, 2.1 / c);
    expect(Math.abs(personToRectangle({ position: person, posture }, rect) - quadrants)).toBeLessThanOrEqual(1e-12);
  });

  it("foot inside a wall: the library agrees with itself over the four quadrant sub-walls", () => {
    const whole = personToRectangle({ position: person, posture }, wall([0, 0, 0], 0, 4, 2.7));
    const parts =
      personToRectangle({ position: person, posture }, wall([0, 0, 0], 0, 1.2, 0.6)) +
      personToRectangle({ position: person, posture }, wall([1.2, 0, 0], 0, 2.8, 0.6)) +
      personToRectangle({ position: person, posture }, wall([0, 0, 0.6], 0, 1.2, 2.1)) +
      personToRectangle({ position: person, posture }, wall([1.2, 0, 0.6], 0, 2.8, 2.1));
    expect(Math.abs(whole - parts)).toBeLessThanOrEqual(1e-12);
  });

  it("foot outside sideways: a panel beside the foot is the larger rectangle minus the overhang", () => {
    // Panel x ∈ [2, 3.5], z ∈ [0.6, 1.8] on the wall y = 0; foot at x = 1.2, z = 0.6.
    const c = 1.5;
    const direct = relation(posture, "vertical", 2.3 / c, 1.2 / c) - relation(posture, "vertical", 0.8 / c, 1.2 / c);
    const panel = wall([2, 0, 0.6], 0, 1.5, 1.2);
    expect(direct).toBeGreaterThan(0);
    expect(Math.abs(personToRectangle({ position: person, posture }, panel) - direct)).toBeLessThanOrEqual(1e-12);
  });

  it("foot outside diagonally: a high panel off to the side is the signed sum of four corner rectangles", () => {
    // Panel x ∈ [2, 3.5], z ∈ [1.5, 2.5]; foot at x = 1.2, z = 0.6.
    const c = 1.5;
    const f = (x: number, y: number): number => relation(posture, "vertical", x / c, y / c);
    const direct = f(2.3, 1.9) - f(0.8, 1.9) - f(2.3, 0.9) + f(0.8, 0.9);
    const panel = wall([2, 0, 1.5], 0, 1.5, 1.0);
    expect(direct).toBeGreaterThan(0);
    expect(Math.abs(personToRectangle({ position: person, posture }, panel) - direct)).toBeLessThanOrEqual(1e-12);
  });

  it("foot outside a ceiling panel: signed sum of four corner rectangles (horizontal constants)", () => {
    // Ceiling panel x ∈ [2, 3], y ∈ [3, 5] at z = 2.7; person at (1.2, 1.5, 0.6): c = 2.1.
    const c = 2.1;
    // Mean of both labellings of the sides (see the horizontal case above).
    const f = (x: number, y: number): number => 0.5 * (relation(posture, "horizontal", x / c, y / c) + relation(posture, "horizontal", y / c, x / c));
    const direct = f(1.8, 3.5) - f(0.8, 3.5) - f(1.8, 1.5) + f(0.8, 1.5);
    const panel: Vec3[] = [[2, 3, 2.7], [3, 3, 2.7], [3, 5, 2.7], [2, 5, 2.7]];
    expect(Math.abs(personToRectangle({ position: person, posture }, panel) - direct)).toBeLessThanOrEqual(1e-12);
  });
});

describe("the six faces of a closed 5 × 4 × 2.7 m room sum to ≈ 1 (ISO 7726 Annex C: Σ F_p−i = 1; the fit closes within 0.06)", () => {
  const [L, W, H] = [5, 4, 2.7];
  const faces: Vec3[][] = [
    [[0, 0, 0], [L, 0, 0], [L, W, 0], [0, W, 0]],
    [[0, 0, H], [L, 0, H], [L, W, H], [0, W, H]],
    wall([0, 0, 0], 0, L, H),
    wall([0, W, 0], 0, L, H),
    wall([0, 0, 0], Math.PI / 2, W, H),
    wall([L, 0, 0], Math.PI / 2, W, H),
  ];
  const positions: ReadonlyArray<readonly [number, number]> = [
    [2.5, 2],
    [1, 1],
    [0.5, 3.5],
    [4.5, 0.4],
    [3.7, 2.9],
    [0.3, 0.3],
  ];
  it("has positions", () => {
    expect(positions.length).toBeGreaterThan(0);
  });
  for (const posture of POSTURES) {
    for (const [x, y] of positions) {
      it(`${posture} person at (${x}, ${y})`, () => {
        const position: Vec3 = [x, y, CENTRE_HEIGHT_M[posture]];
        const factors = faces.map((f) => personToRectangle({ position, posture }, f));
        for (const f of factors) expect(f).toBeGreaterThan(0);
        const sum = factors.reduce((s, f) => s + f, 0);
        expect(Math.abs(sum - 1)).toBeLessThanOrEqual(0.06);
        // Floor + ceiling: horizontal constants give a sensible share (neither face dominates absurdly).
        const horizontal = (factors[0] as number) + (factors[1] as number);
        expect(horizontal).toBeGreaterThan(0.15);
        expect(horizontal).toBeLessThan(0.75);
      });
    }
  }
});

describe("large-rectangle limit of the relation", () => {
  for (const posture of POSTURES) {
    for (const orientation of ["vertical", "horizontal"] as const) {
      it(`${posture}/${orientation}: a 200c × 200c corner rectangle approaches Fmax to within 0.005`, () => {
        const fMax = TABLE[posture][orientation][0];
        const c = 1;
        const rect: Vec3[] =
          orientation === "vertical"
            ? wall([0, 0, CENTRE_HEIGHT_M[posture]], 0, 200, 200)
            : [[0, 1, CENTRE_HEIGHT_M[posture] + c], [200, 1, CENTRE_HEIGHT_M[posture] + c], [200, 201, CENTRE_HEIGHT_M[posture] + c], [0, 201, CENTRE_HEIGHT_M[posture] + c]];
        const person: Vec3 = orientation === "vertical" ? [0, c, CENTRE_HEIGHT_M[posture]] : [0, 1, CENTRE_HEIGHT_M[posture]];
        expect(Math.abs(personToRectangle({ position: person, posture }, rect) - fMax)).toBeLessThanOrEqual(0.005);
      });
    }
  }
});
