import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { pmvPpd, ppdFromPmv, validatePmvInput, type PmvInput, type PmvResult } from "@/lib/comfort";

const BASE: PmvInput = { ta: 22, tr: 22, vr: 0.1, rh: 60, met: 1.2, clo: 0.5 };

/** Inputs inside the ISO 7730:2005 clause 4.1 ranges. */
const inRange = fc.record({
  ta: fc.double({ min: 10, max: 30, noNaN: true }),
  tr: fc.double({ min: 10, max: 40, noNaN: true }),
  vr: fc.double({ min: 0, max: 1, noNaN: true }),
  rh: fc.double({ min: 0, max: 100, noNaN: true }),
  met: fc.double({ min: 0.8, max: 4, noNaN: true }),
  clo: fc.double({ min: 0, max: 2, noNaN: true }),
});

describe("pmvPpd input policy", () => {
  const bad: ReadonlyArray<[string, Partial<PmvInput>]> = [
    ["NaN air temperature", { ta: Number.NaN }],
    ["infinite radiant temperature", { tr: Number.POSITIVE_INFINITY }],
    ["negative air speed", { vr: -0.1 }],
    ["relative humidity above 100 %", { rh: 100.5 }],
    ["negative relative humidity", { rh: -1 }],
    ["negative metabolic rate", { met: -0.1 }],
    ["negative clothing", { clo: -0.1 }],
    ["negative external work", { wme: -0.1 }],
    ["NaN external work", { wme: Number.NaN }],
  ];

  it.each(bad)("throws RangeError for a %s", (_label, patch) => {
    expect(bad.length).toBeGreaterThan(0);
    expect(() => pmvPpd({ ...BASE, ...patch })).toThrow(RangeError);
    expect(() => validatePmvInput({ ...BASE, ...patch })).toThrow(RangeError);
  });

  it("names the offending field in the message", () => {
    expect(() => pmvPpd({ ...BASE, clo: -1 })).toThrow(/clo/);
  });

  it("accepts the edges 0 % and 100 % RH, zero air speed and zero clothing", () => {
    expect(Number.isFinite(pmvPpd({ ...BASE, rh: 0, vr: 0, clo: 0 }).pmv)).toBe(true);
    expect(Number.isFinite(pmvPpd({ ...BASE, rh: 100 }).pmv)).toBe(true);
  });
});

describe("pmvPpd applicability flag (ISO 7730:2005 clause 4.1)", () => {
  it("is true for a typical office condition", () => {
    expect(pmvPpd(BASE).withinRange).toBe(true);
  });

  const outside: ReadonlyArray<[string, Partial<PmvInput>]> = [
    ["air temperature above 30 °C", { ta: 31 }],
    ["air temperature below 10 °C", { ta: 9 }],
    ["radiant temperature above 40 °C", { tr: 41 }],
    ["air speed above 1 m/s", { vr: 1.1 }],
    ["metabolic rate below 0.8 met", { met: 0.7 }],
    ["metabolic rate above 4 met", { met: 4.1 }],
    ["clothing above 2 clo", { clo: 2.1 }],
    ["vapour pressure above 2700 Pa (30 °C, 90 % RH)", { ta: 30, tr: 30, rh: 90 }],
    ["PMV above +2", { ta: 30, tr: 40, met: 2, clo: 1.5 }],
  ];

  it.each(outside)("is false for %s but still returns finite values", (_label, patch) => {
    expect(outside.length).toBeGreaterThan(0);
    const r = pmvPpd({ ...BASE, ...patch });
    expect(r.withinRange).toBe(false);
    expect(Number.isFinite(r.pmv)).toBe(true);
    expect(Number.isFinite(r.ppd)).toBe(true);
  });
});

describe("pmvPpd behaviour", () => {
  it("writes into and returns the given out object", () => {
    const out: PmvResult = { pmv: 0, ppd: 0, withinRange: false };
    const r = pmvPpd(BASE, out);
    expect(r).toBe(out);
    expect(out.pmv).toBeCloseTo(pmvPpd(BASE).pmv, 14);
  });

  it("treats a missing external work as 0 met", () => {
    expect(pmvPpd(BASE).pmv).toBe(pmvPpd({ ...BASE, wme: 0 }).pmv);
  });

  it("lowers the PMV when part of the metabolic rate is external work", () => {
    expect(pmvPpd({ ...BASE, met: 2, wme: 0.3 }).pmv).toBeLessThan(pmvPpd({ ...BASE, met: 2 }).pmv);
  });

  it("reports the PPD of eq. (5) for its own PMV", () => {
    fc.assert(
      fc.property(inRange, (input) => {
        const r = pmvPpd(input);
        return Math.abs(r.ppd - ppdFromPmv(r.pmv)) < 1e-12;
      }),
    );
  });

  it("rises with air temperature at fixed other inputs", () => {
    fc.assert(
      fc.property(inRange, fc.double({ min: 0.05, max: 3, noNaN: true }), (input, d) => {
        return pmvPpd({ ...input, ta: input.ta + d }).pmv > pmvPpd(input).pmv;
      }),
    );
  });

  it("rises with mean radiant temperature at fixed other inputs", () => {
    fc.assert(
      fc.property(inRange, fc.double({ min: 0.05, max: 3, noNaN: true }), (input, d) => {
        return pmvPpd({ ...input, tr: input.tr + d }).pmv > pmvPpd(input).pmv;
      }),
    );
  });

  it("rises with metabolic rate while |PMV| ≤ 1.5", () => {
    // The model's sensitivity coefficient 0.303·e^(−0.036M) + 0.028 falls with M, so for a
    // strongly warm heat load (PMV near +2 and above) the PMV can dip as met rises; the
    // property is a statement about the comfort region.
    fc.assert(
      fc.property(inRange, fc.double({ min: 0.05, max: 0.5, noNaN: true }), (input, d) => {
        const a = pmvPpd(input).pmv;
        const b = pmvPpd({ ...input, met: input.met + d }).pmv;
        fc.pre(Math.abs(a) <= 1.5 && Math.abs(b) <= 1.5);
        return b > a;
      }),
    );
  });

  it("never reports a PPD below 5 % or above 100 %", () => {
    fc.assert(
      fc.property(inRange, (input) => {
        const r = pmvPpd(input);
        return r.ppd >= 5 - 1e-12 && r.ppd <= 100;
      }),
    );
  });
});

describe("ppdFromPmv", () => {
  it("is symmetric in PMV", () => {
    fc.assert(
      fc.property(fc.double({ min: -3, max: 3, noNaN: true }), (p) => ppdFromPmv(p) === ppdFromPmv(-p)),
    );
  });

  it("is at least 5 % and grows with |PMV|", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 3, noNaN: true }), fc.double({ min: 0, max: 3, noNaN: true }), (a, b) => {
        const lo = Math.min(a, b);
        const hi = Math.max(a, b);
        return ppdFromPmv(lo) >= 5 - 1e-12 && ppdFromPmv(hi) >= ppdFromPmv(lo);
      }),
    );
  });
});
