import { describe, expect, it } from "vitest";
import { dewPoint, iso7730VaporPressurePa, saturationVaporPressure } from "@/lib/comfort";

/**
 * Independent reference: IAPWS-IF97 saturation-pressure equation (IAPWS R7-97(2012),
 * region 4, eq. (30)), implemented here separately from the library. Coefficients n1…n10
 * from the release (cross-checked against several public implementations).
 */
const IF97_N = [
  0.11670521452767e4, -0.72421316703206e6, -0.17073846940092e2, 0.1202082470247e5, -0.32325550322333e7,
  0.1491510861353e2, -0.48232657361591e4, 0.40511340542057e6, -0.23855557567849, 0.65017534844798e3,
] as const;

/** IAPWS-IF97 saturation pressure, Pa, for 273.15 K ≤ T ≤ 647.096 K. */
function if97SaturationPressurePa(tK: number): number {
  const n = IF97_N;
  const th = tK + n[8] / (tK - n[9]);
  const a = th * th + n[0] * th + n[1];
  const b = n[2] * th * th + n[3] * th + n[4];
  const c = n[5] * th * th + n[6] * th + n[7];
  return 1e6 * ((2 * c) / (-b + Math.sqrt(b * b - 4 * a * c))) ** 4;
}

/** Dew point from IF97 by bisection, °C (reference computed independently). */
function if97DewPointC(taC: number, rhPercent: number): number {
  const pv = (rhPercent / 100) * if97SaturationPressurePa(taC + 273.15);
  let lo = 273.15;
  let hi = taC + 273.15;
  for (let i = 0; i < 200; i++) {
    const mid = 0.5 * (lo + hi);
    if (if97SaturationPressurePa(mid) > pv) hi = mid;
    else lo = mid;
  }
  return 0.5 * (lo + hi) - 273.15;
}

/** IAPWS-IF97 verification values of eq. (30) (Table 35 of the release; read from a public transcription). */
const IF97_CHECKS: ReadonlyArray<{ tK: number; pMPa: number }> = [
  { tK: 300, pMPa: 0.353658941e-2 },
  { tK: 500, pMPa: 0.263889776e1 },
  { tK: 600, pMPa: 0.123443146e2 },
];

describe("IAPWS-IF97 reference implementation used by these tests", () => {
  it("has verification rows", () => {
    expect(IF97_CHECKS.length).toBeGreaterThan(0);
  });

  it.each(IF97_CHECKS)("reproduces the IF97 verification value at $tK K ($pMPa MPa) to 9 digits", ({ tK, pMPa }) => {
    expect(Math.abs(if97SaturationPressurePa(tK) / 1e6 / pMPa - 1)).toBeLessThan(1e-8);
  });
});

describe("saturationVaporPressure (Alduchov & Eskridge 1996 Magnus form)", () => {
  const temps = Array.from({ length: 51 }, (_, i) => Math.max(0.01, i));

  it("stays within the fit's stated 0.384 % relative error of IAPWS-IF97 from 0.01 to 50 °C", () => {
    expect(temps.length).toBeGreaterThan(0);
    for (const t of temps) {
      const rel = (saturationVaporPressure(t) * 1000) / if97SaturationPressurePa(t + 273.15) - 1;
      expect(Math.abs(rel)).toBeLessThan(0.00384);
    }
  });

  it("gives 2.339 kPa at 20 °C (steam-table value 2.3392 kPa, from memory) within 0.3 %", () => {
    expect(Math.abs(saturationVaporPressure(20) / 2.3392 - 1)).toBeLessThan(0.003);
  });
});

describe("dewPoint (Alduchov & Eskridge 1996 Magnus form)", () => {
  const cases: Array<[number, number]> = [];
  for (let t = 5; t <= 50; t += 5) {
    for (let rh = 10; rh <= 100; rh += 10) {
      if (if97SaturationPressurePa(273.15) <= (rh / 100) * if97SaturationPressurePa(t + 273.15)) {
        cases.push([t, rh]);
      }
    }
  }

  it("agrees with the dew point from IAPWS-IF97 within 0.1 K for dew points above 0 °C", () => {
    expect(cases.length).toBeGreaterThan(0);
    for (const [t, rh] of cases) {
      expect(Math.abs(dewPoint(t, rh) - if97DewPointC(t, rh))).toBeLessThan(0.1);
    }
  });

  it("gives 14.8 °C at 26 °C / 50 % (psychrometric chart value, from memory) within 0.1 K", () => {
    expect(Math.abs(dewPoint(26, 50) - 14.8)).toBeLessThan(0.1);
  });
});

describe("iso7730VaporPressurePa (ISO 7730:2005 Annex D formula)", () => {
  it("is within 0.5 % of RH × IAPWS-IF97 saturation pressure from 10 to 30 °C", () => {
    for (let t = 10; t <= 30; t += 2) {
      const ref = 0.5 * if97SaturationPressurePa(t + 273.15);
      expect(Math.abs(iso7730VaporPressurePa(t, 50) / ref - 1)).toBeLessThan(0.005);
    }
  });
});
