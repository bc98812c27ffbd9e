/**
 * Numerical building blocks of the V-groove solvers: the seeded generator
 * (xoshiro128**, SplitMix64 seeding), Gauss–Legendre rules and the dense
 * linear solve.
 */
import { describe, expect, it } from "vitest";
import { createRng, splitMix64, Xoshiro128StarStar } from "@/lib/viewfactor/rng";
import { gaussLegendre } from "@/lib/viewfactor/gaussLegendre";
import { solveDenseInPlace } from "@/lib/viewfactor/groove-linsolve";

/**
 * xoshiro128** written out separately here with BigInt arithmetic from the
 * algorithm of Blackman & Vigna's reference C code (xoshiro128starstar.c,
 * version 1.1) — an independent implementation to compare against.
 */
function referenceXoshiro(state: [bigint, bigint, bigint, bigint], count: number): number[] {
  const M = 0xffffffffn;
  const rotl = (x: bigint, k: bigint): bigint => ((x << k) | (x >> (32n - k))) & M;
  const s = [...state];
  const out: number[] = [];
  for (let i = 0; i < count; i++) {
    const [s0, s1, s2, s3] = s as [bigint, bigint, bigint, bigint];
    out.push(Number((rotl((s1 * 5n) & M, 7n) * 9n) & M));
    const t = (s1 << 9n) & M;
    const n2 = s2 ^ s0;
    const n3 = s3 ^ s1;
    s[1] = s1 ^ n2;
    s[0] = s0 ^ n3;
    s[2] = n2 ^ t;
    s[3] = rotl(n3, 11n);
  }
  return out;
}

describe("xoshiro128** generator", () => {
  it("reproduces the reference outputs from state {1, 2, 3, 4} (test vector of the rand_xoshiro crate, rust-random/rngs, produced with the reference C code v1.1)", () => {
    const expected = [11520, 0, 5927040, 70819200, 2031721883, 1637235492, 1287239034, 3734860849, 3729100597, 4258142804];
    const r = Xoshiro128StarStar.fromState(1, 2, 3, 4);
    expect(expected.map(() => r.nextUint32())).toEqual(expected);
  });

  it("matches an independent BigInt implementation of the published algorithm for 2 000 outputs", () => {
    const words: [number, number, number, number] = [0x9e3779b9, 0x243f6a88, 0xb7e15162, 0xdeadbeef];
    const r = Xoshiro128StarStar.fromState(...words);
    const mine = Array.from({ length: 2000 }, () => r.nextUint32());
    expect(mine).toEqual(referenceXoshiro(words.map((w) => BigInt(w >>> 0)) as [bigint, bigint, bigint, bigint], 2000));
  });

  it("rejects the all-zero state", () => {
    expect(() => Xoshiro128StarStar.fromState(0, 0, 0, 0)).toThrow(RangeError);
  });

  it("draws uniform numbers in [0, 1) with mean 1/2 and variance 1/12 (4-sigma bounds, 100 000 draws)", () => {
    const rng = createRng(99);
    const n = 100_000;
    let sum = 0;
    let sum2 = 0;
    let min = Infinity;
    let max = -Infinity;
    for (let i = 0; i < n; i++) {
      const u = rng.next();
      min = Math.min(min, u);
      max = Math.max(max, u);
      sum += u;
      sum2 += u * u;
    }
    expect(min).toBeGreaterThanOrEqual(0);
    expect(max).toBeLessThan(1);
    const mean = sum / n;
    expect(Math.abs(mean - 0.5)).toBeLessThan(4 * Math.sqrt(1 / 12 / n));
    expect(Math.abs(sum2 / n - mean * mean - 1 / 12)).toBeLessThan(0.002);
  });

  it("is reproducible from a seed and differs between seeds", () => {
    const a = createRng(7);
    const b = createRng(7);
    const c = createRng(8);
    const sa = Array.from({ length: 50 }, () => a.nextUint32());
    expect(Array.from({ length: 50 }, () => b.nextUint32())).toEqual(sa);
    expect(Array.from({ length: 50 }, () => c.nextUint32())).not.toEqual(sa);
    expect(() => createRng(1.5)).toThrow(RangeError);
  });
});

describe("SplitMix64 seeding", () => {
  it("gives 0xE220A8397B1DCDAF as the first output for state 0 (published reference value, as quoted in public test suites)", () => {
    expect(splitMix64(0n)[1]).toBe(0xe220a8397b1dcdafn);
  });

  it("gives the five reference outputs for seed 1234567 (Rosetta Code task 'Pseudo-random numbers/Splitmix64', as quoted in public test suites)", () => {
    const expected = [6457827717110365317n, 3203168211198807973n, 9817491932198370423n, 4593380528125082431n, 16408922859458223821n];
    let state = 1234567n;
    const got: bigint[] = [];
    for (let i = 0; i < expected.length; i++) {
      const [next, out] = splitMix64(state);
      state = next;
      got.push(out);
    }
    expect(got).toEqual(expected);
  });
});

describe("Gauss–Legendre rules", () => {
  it("weights sum to 2 and integrate x^(2n−1) and x^(2n−2) on [−1, 1] exactly (to 1e-13)", () => {
    for (const n of [1, 2, 5, 8, 16, 32]) {
      const [x, w] = gaussLegendre(n);
      expect(Math.abs(w.reduce((a, b) => a + b, 0) - 2)).toBeLessThan(1e-13);
      const p = 2 * n - 2;
      let even = 0;
      let odd = 0;
      for (let i = 0; i < n; i++) {
        even += (w[i] as number) * Math.pow(x[i] as number, p);
        odd += (w[i] as number) * Math.pow(x[i] as number, p + 1);
      }
      expect(Math.abs(even - 2 / (p + 1))).toBeLessThan(1e-13);
      expect(Math.abs(odd)).toBeLessThan(1e-13);
    }
  });

  it("has the textbook 2-point nodes ±1/√3 with weights 1 (Abramowitz & Stegun 25.4.29, common practice)", () => {
    const [x, w] = gaussLegendre(2);
    expect(x[1]).toBeCloseTo(1 / Math.sqrt(3), 15);
    expect(w[0]).toBeCloseTo(1, 15);
  });
});

describe("dense linear solve", () => {
  it("solves a system that needs pivoting", () => {
    const a = Float64Array.from([0, 2, 1, 1, 1, 1, 2, 1, 3]);
    const b = Float64Array.from([7, 6, 13]); // = A·(1, 2, 3)
    const x = solveDenseInPlace(a, b, 3);
    [1, 2, 3].forEach((v, i) => expect(x[i]).toBeCloseTo(v, 12));
  });

  it("throws RangeError for a singular matrix or wrong lengths", () => {
    expect(() => solveDenseInPlace(Float64Array.from([1, 2, 2, 4]), Float64Array.from([1, 2]), 2)).toThrow(RangeError);
    expect(() => solveDenseInPlace(new Float64Array(3), new Float64Array(2), 2)).toThrow(RangeError);
  });
});
