/**
 * Plane radiant temperature and mean radiant temperature against independent
 * calculations: view factors from the catalogue closed forms (Howell B-3,
 * B-4, sphere to rectangle; ./catalogueFormulas.ts) combined by the
 * ISO 7726:1998 fourth-power relation T_pr⁴ = Σ F_i T_i⁴, and the ISO 7726
 * Annex C six-direction weighting with the projected area factors of its
 * table (values as reproduced in the Brüel & Kjær Type 1213 manual,
 * Table 4.4: seated 0.18/0.22/0.30, standing 0.08/0.23/0.35).
 */
import { describe, expect, it } from "vitest";
import { planeRadiantTemperature, radiantField, type RadiantSurface, type Vec3 } from "@/lib/viewfactor";
import { elementParallelCorner, elementPerpendicularCorner, sphereRectangleCorner } from "./catalogueFormulas";

const K = 273.15;
const [L, W, H] = [6, 5, 3];
const PANEL = { x0: 1, x1: 3.5, y0: 1.5, y1: 4, temperatureC: 40 };
const T = { ceiling: 21, floor: 19, south: 18, north: 23, west: 20, east: 17 }; // south: y = 0, north: y = W, west: x = 0, east: x = L

/** Room surfaces: ceiling split into the warm panel and four strips around it. */
function surfaces(): RadiantSurface[] {
  const { x0, x1, y0, y1 } = PANEL;
  const rect = (ax: number, bx: number, ay: number, by: number, z: number): Vec3[] => [
    [ax, ay, z],
    [bx, ay, z],
    [bx, by, z],
    [ax, by, z],
  ];
  return [
    { polygon: rect(x0, x1, y0, y1, H), temperatureC: PANEL.temperatureC },
    { polygon: rect(0, L, 0, y0, H), temperatureC: T.ceiling },
    { polygon: rect(0, L, y1, W, H), temperatureC: T.ceiling },
    { polygon: rect(0, x0, y0, y1, H), temperatureC: T.ceiling },
    { polygon: rect(x1, L, y0, y1, H), temperatureC: T.ceiling },
    { polygon: rect(0, L, 0, W, 0), temperatureC: T.floor },
    { polygon: [[0, 0, 0], [L, 0, 0], [L, 0, H], [0, 0, H]], temperatureC: T.south },
    { polygon: [[0, W, 0], [L, W, 0], [L, W, H], [0, W, H]], temperatureC: T.north },
    { polygon: [[0, 0, 0], [0, W, 0], [0, W, H], [0, 0, H]], temperatureC: T.west },
    { polygon: [[L, 0, 0], [L, W, 0], [L, W, H], [L, 0, H]], temperatureC: T.east },
  ];
}

/** Signed corner sum over a rectangle [x0,x1]×[y0,y1] in plane coordinates centred on the foot, for a corner formula f(|x|,|y|). */
function cornerSum(f: (a: number, b: number) => number, x0: number, x1: number, y0: number, y1: number): number {
  const g = (x: number, y: number): number => (x === 0 || y === 0 ? 0 : Math.sign(x) * Math.sign(y) * f(Math.abs(x), Math.abs(y)));
  return g(x1, y1) - g(x0, y1) - g(x1, y0) + g(x0, y0);
}

/** Up-facing plane element at p: ceiling parts by B-3, wall parts above the element's plane by B-4 (superposed at the foot). */
function expectedUpTprC(p: Vec3): { tprC: number; sum: number } {
  const [px, py, pz] = p;
  const c = H - pz;
  const b3 = (a: number, b: number): number => elementParallelCorner(a, b, c);
  const fPanel = cornerSum(b3, PANEL.x0 - px, PANEL.x1 - px, PANEL.y0 - py, PANEL.y1 - py);
  const fCeiling = cornerSum(b3, -px, L - px, -py, W - py) - fPanel;
  // B-4 pieces: wall height above the element plane a = H − z, widths on both sides of the foot, distance to the wall.
  const b4 = (dist: number, left: number, right: number): number =>
    elementPerpendicularCorner(H - pz, left, dist) + elementPerpendicularCorner(H - pz, right, dist);
  const fSouth = b4(py, px, L - px);
  const fNorth = b4(W - py, px, L - px);
  const fWest = b4(px, py, W - py);
  const fEast = b4(L - px, py, W - py);
  const parts: Array<[number, number]> = [
    [fPanel, PANEL.temperatureC],
    [fCeiling, T.ceiling],
    [fSouth, T.south],
    [fNorth, T.north],
    [fWest, T.west],
    [fEast, T.east],
  ];
  const sum = parts.reduce((s, [f]) => s + f, 0);
  const t4 = parts.reduce((s, [f, t]) => s + f * (t + K) ** 4, 0);
  return { tprC: (t4 / sum) ** 0.25 - K, sum };
}

/** Small-sphere MRT at p: every face split at the foot of the perpendicular, each quadrant by the sphere-corner formula. */
function expectedSphereMrtC(p: Vec3): { mrtC: number; sum: number } {
  const [px, py, pz] = p;
  const s = (c: number) => (a: number, b: number): number => sphereRectangleCorner(a, b, c);
  const fPanel = cornerSum(s(H - pz), PANEL.x0 - px, PANEL.x1 - px, PANEL.y0 - py, PANEL.y1 - py);
  const parts: Array<[number, number]> = [
    [fPanel, PANEL.temperatureC],
    [cornerSum(s(H - pz), -px, L - px, -py, W - py) - fPanel, T.ceiling],
    [cornerSum(s(pz), -px, L - px, -py, W - py), T.floor],
    [cornerSum(s(py), -px, L - px, -pz, H - pz), T.south],
    [cornerSum(s(W - py), -px, L - px, -pz, H - pz), T.north],
    [cornerSum(s(px), -py, W - py, -pz, H - pz), T.west],
    [cornerSum(s(L - px), -py, W - py, -pz, H - pz), T.east],
  ];
  const sum = parts.reduce((acc, [f]) => acc + f, 0);
  const t4 = parts.reduce((acc, [f, t]) => acc + f * (t + K) ** 4, 0);
  return { mrtC: (t4 / sum) ** 0.25 - K, sum };
}

const POINTS: ReadonlyArray<Vec3> = [
  [2, 2.5, 0.6],
  [0.7, 0.9, 1.1],
  [5.2, 4.1, 0.6],
  [3.0, 2.0, 1.7],
];

describe("plane radiant temperature (up) vs catalogue view factors B-3/B-4 and the ISO 7726 fourth-power relation", () => {
  it("has points", () => {
    expect(POINTS.length).toBeGreaterThan(0);
  });
  for (const p of POINTS) {
    it(`agrees to 1e-9 °C at (${p.join(", ")}), and the up-hemisphere closes (Σ F = 1)`, () => {
      const expected = expectedUpTprC(p);
      expect(Math.abs(expected.sum - 1)).toBeLessThanOrEqual(1e-12);
      const got = planeRadiantTemperature(p, [0, 0, 1], surfaces());
      expect(Math.abs(got.viewFactorSum - 1)).toBeLessThanOrEqual(1e-12);
      expect(Math.abs(got.temperatureC - expected.tprC)).toBeLessThanOrEqual(1e-9);
    });
  }
});

describe("small-sphere MRT vs the catalogue's sphere-to-rectangle formula and the fourth-power relation", () => {
  for (const p of POINTS) {
    it(`agrees to 1e-9 °C at (${p.join(", ")}), Σ F = 1`, () => {
      const expected = expectedSphereMrtC(p);
      expect(Math.abs(expected.sum - 1)).toBeLessThanOrEqual(1e-12);
      const field = radiantField({ position: p, facingRad: 0.3, posture: "seated", surfaces: surfaces() });
      expect(Math.abs(field.sphereViewFactorSum - 1)).toBeLessThanOrEqual(1e-12);
      expect(Math.abs(field.sphereMrtC - expected.mrtC)).toBeLessThanOrEqual(1e-9);
    });
  }
});

describe("ISO 7726 Annex C six-direction MRT uses the projected area factors of the standard's table", () => {
  /** Projected area factors (up/down, left/right, front/back) — ISO 7726 table as reproduced in the B&K Type 1213 manual, Table 4.4. */
  const WEIGHTS = { seated: [0.18, 0.22, 0.3], standing: [0.08, 0.23, 0.35] } as const;
  for (const posture of ["seated", "standing"] as const) {
    it(`${posture}: mrtC = Σ w·(t_pr + t_pr,opposite) / 2Σw over the returned plane radiant temperatures`, () => {
      const field = radiantField({ position: [2, 2.5, posture === "seated" ? 0.6 : 1.0], facingRad: 1.0, posture, surfaces: surfaces() });
      const t = field.planeRadiantTemperatures;
      const [ud, lr, fb] = WEIGHTS[posture];
      const expected = (ud * (t.upC + t.downC) + lr * (t.leftC + t.rightC) + fb * (t.frontC + t.backC)) / (2 * (ud + lr + fb));
      expect(Math.abs(field.mrtC - expected)).toBeLessThanOrEqual(1e-12);
      // The warm panel overhead makes the field warmer above than below (positive vertical asymmetry).
      expect(field.verticalAsymmetryC).toBeGreaterThan(0);
      expect(Math.abs(field.verticalAsymmetryC - (expectedUpTprC([2, 2.5, posture === "seated" ? 0.6 : 1.0]).tprC - t.downC))).toBeLessThanOrEqual(1e-9);
    });
  }
});
