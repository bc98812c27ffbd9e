import { describe, expect, it } from "vitest";
import { pmvPpd } from "@/lib/comfort";

/**
 * ASHRAE 55-2017 validation table for PMV computer models (still-air cases, 0.1 m/s,
 * 1.1 met, tr = ta), published with PMV to one decimal and PPD to one decimal.
 * Source: ANSI/ASHRAE Standard 55-2017, as transcribed in a public open-source
 * comfort-model validation data set (MIT licence); the standard itself was not available.
 *
 * With one-decimal PMV values the check is: the computed PMV rounds to the published value
 * and |ΔPMV| ≤ 0.05 + 0.01 (half a published unit plus the 0.01 of the brief); |ΔPPD| ≤ 1 %.
 */
const SI_ROWS: ReadonlyArray<{ ta: number; rh: number; clo: number; pmv: number; ppd: number }> = [
  { ta: 19.6, rh: 86, clo: 1, pmv: -0.5, ppd: 9.7 },
  { ta: 23.9, rh: 66, clo: 1, pmv: 0.5, ppd: 9.8 },
  { ta: 25.7, rh: 15, clo: 1, pmv: 0.5, ppd: 10.8 },
  { ta: 21.2, rh: 20, clo: 1, pmv: -0.5, ppd: 9.7 },
  { ta: 23.6, rh: 67, clo: 0.5, pmv: -0.5, ppd: 9.7 },
  { ta: 26.8, rh: 56, clo: 0.5, pmv: 0.5, ppd: 10.6 },
  { ta: 27.9, rh: 13, clo: 0.5, pmv: 0.5, ppd: 10.2 },
  { ta: 24.7, rh: 16, clo: 0.5, pmv: -0.5, ppd: 9.9 },
];

/** The same table in I-P units: °F, 20 fpm (0.1016 m/s). Same source. */
const IP_ROWS: ReadonlyArray<{ taF: number; rh: number; clo: number; pmv: number; ppd: number }> = [
  { taF: 67.3, rh: 86, clo: 1, pmv: -0.5, ppd: 9.8 },
  { taF: 75.0, rh: 66, clo: 1, pmv: 0.5, ppd: 9.6 },
  { taF: 78.2, rh: 15, clo: 1, pmv: 0.5, ppd: 10.6 },
  { taF: 70.2, rh: 20, clo: 1, pmv: -0.5, ppd: 9.7 },
  { taF: 74.5, rh: 67, clo: 0.5, pmv: -0.5, ppd: 9.7 },
  { taF: 80.2, rh: 56, clo: 0.5, pmv: 0.5, ppd: 10.3 },
  { taF: 82.2, rh: 13, clo: 0.5, pmv: 0.5, ppd: 10.1 },
  { taF: 76.5, rh: 16, clo: 0.5, pmv: -0.5, ppd: 9.9 },
];

const FPM_TO_MS = 0.00508; // 1 ft/min = 0.3048 m / 60 s (exact definition of the foot)

function roundTo1(x: number): number {
  return Math.round(x * 10) / 10;
}

describe("pmvPpd against the ASHRAE 55-2017 PMV validation table", () => {
  it("has rows in both unit systems", () => {
    expect(SI_ROWS.length).toBeGreaterThan(0);
    expect(IP_ROWS.length).toBeGreaterThan(0);
  });

  it.each(SI_ROWS)("matches the SI row ta = tr = $ta °C, RH $rh %, $clo clo → PMV $pmv, PPD $ppd", (row) => {
    const r = pmvPpd({ ta: row.ta, tr: row.ta, vr: 0.1, rh: row.rh, met: 1.1, clo: row.clo });
    expect(roundTo1(r.pmv)).toBeCloseTo(row.pmv, 10);
    expect(Math.abs(r.pmv - row.pmv)).toBeLessThanOrEqual(0.06);
    expect(Math.abs(r.ppd - row.ppd)).toBeLessThanOrEqual(1);
  });

  it.each(IP_ROWS)("matches the I-P row ta = tr = $taF °F, RH $rh %, $clo clo → PMV $pmv, PPD $ppd", (row) => {
    const taC = ((row.taF - 32) * 5) / 9;
    const r = pmvPpd({ ta: taC, tr: taC, vr: 20 * FPM_TO_MS, rh: row.rh, met: 1.1, clo: row.clo });
    expect(roundTo1(r.pmv)).toBeCloseTo(row.pmv, 10);
    expect(Math.abs(r.pmv - row.pmv)).toBeLessThanOrEqual(0.06);
    expect(Math.abs(r.ppd - row.ppd)).toBeLessThanOrEqual(1);
  });
});
