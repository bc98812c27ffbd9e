import { describe, expect, it } from "vitest";
import { pmvPpd } from "@/lib/comfort";

/**
 * ISO 7730:2005 Annex D, Table D.1 — example output of the standard's PMV program.
 * Columns: ta °C, tr °C, var m/s, RH %, met, clo → PMV, PPD %.
 *
 * Source of the values: ISO 7730:2005 Table D.1 as transcribed (two decimals for PMV,
 * integer PPD) in two independent public open-source test suites; the ISO document itself
 * was not available. The two transcriptions agree on every row; a third public data set
 * gives the same rows with PMV rounded to one decimal.
 */
const TABLE_D1: ReadonlyArray<{
  run: number;
  ta: number;
  tr: number;
  vr: number;
  rh: number;
  met: number;
  clo: number;
  pmv: number;
  ppd: number;
}> = [
  { run: 1, ta: 22.0, tr: 22.0, vr: 0.1, rh: 60, met: 1.2, clo: 0.5, pmv: -0.75, ppd: 17 },
  { run: 2, ta: 27.0, tr: 27.0, vr: 0.1, rh: 60, met: 1.2, clo: 0.5, pmv: 0.77, ppd: 17 },
  { run: 3, ta: 27.0, tr: 27.0, vr: 0.3, rh: 60, met: 1.2, clo: 0.5, pmv: 0.44, ppd: 9 },
  { run: 4, ta: 23.5, tr: 25.5, vr: 0.1, rh: 60, met: 1.2, clo: 0.5, pmv: -0.01, ppd: 5 },
  { run: 5, ta: 23.5, tr: 25.5, vr: 0.3, rh: 60, met: 1.2, clo: 0.5, pmv: -0.55, ppd: 11 },
  { run: 6, ta: 19.0, tr: 19.0, vr: 0.1, rh: 40, met: 1.2, clo: 1.0, pmv: -0.6, ppd: 13 },
  // Run 7 is checked separately below.
  { run: 8, ta: 23.5, tr: 23.5, vr: 0.3, rh: 40, met: 1.2, clo: 1.0, pmv: 0.12, ppd: 5 },
  { run: 9, ta: 23.0, tr: 21.0, vr: 0.1, rh: 40, met: 1.2, clo: 1.0, pmv: 0.05, ppd: 5 },
  { run: 10, ta: 23.0, tr: 21.0, vr: 0.3, rh: 40, met: 1.2, clo: 1.0, pmv: -0.16, ppd: 6 },
  { run: 11, ta: 22.0, tr: 22.0, vr: 0.1, rh: 60, met: 1.6, clo: 0.5, pmv: 0.05, ppd: 5 },
  { run: 12, ta: 27.0, tr: 27.0, vr: 0.1, rh: 60, met: 1.6, clo: 0.5, pmv: 1.17, ppd: 34 },
  { run: 13, ta: 27.0, tr: 27.0, vr: 0.3, rh: 60, met: 1.6, clo: 0.5, pmv: 0.95, ppd: 24 },
];

/** Tolerances of the task: |ΔPMV| ≤ 0.01 against the 2-decimal value, |ΔPPD| ≤ 1 %. */
const PMV_TOLERANCE = 0.01;
const PPD_TOLERANCE = 1;

describe("pmvPpd against ISO 7730:2005 Table D.1", () => {
  it("has the table's rows", () => {
    expect(TABLE_D1.length).toBeGreaterThan(0);
  });

  it.each(TABLE_D1)(
    "reproduces run $run (ta $ta, tr $tr, var $vr, RH $rh, $met met, $clo clo → PMV $pmv, PPD $ppd)",
    (row) => {
      const r = pmvPpd({ ta: row.ta, tr: row.tr, vr: row.vr, rh: row.rh, met: row.met, clo: row.clo });
      expect(Math.abs(r.pmv - row.pmv)).toBeLessThanOrEqual(PMV_TOLERANCE);
      expect(Math.abs(r.ppd - row.ppd)).toBeLessThanOrEqual(PPD_TOLERANCE);
      expect(r.withinRange).toBe(true);
    },
  );

  /**
   * Run 7 as transcribed (23.5 / 23.5 / 0.10 / 40 / 1.2 met / 1.0 clo) lists PMV 0.50, PPD 10.
   * Equations (1)–(4) — and the Annex D program itself — give PMV ≈ 0.36 for those inputs;
   * both public transcriptions flag the row as not reproducible. The printed output is
   * reproduced (0.50 / 10) with 1.3 met, which suggests an input-column misprint. The
   * discrepancy is reported rather than tuned away: the row is checked with 1.3 met and the
   * printed-input result is pinned to the equations' value.
   */
  it("reproduces run 7's printed output (PMV 0.50, PPD 10) with 1.3 met, the likely intended input", () => {
    const r = pmvPpd({ ta: 23.5, tr: 23.5, vr: 0.1, rh: 40, met: 1.3, clo: 1.0 });
    expect(Math.abs(r.pmv - 0.5)).toBeLessThanOrEqual(PMV_TOLERANCE);
    expect(Math.abs(r.ppd - 10)).toBeLessThanOrEqual(PPD_TOLERANCE);
  });

  it("gives PMV 0.36 for run 7's inputs as transcribed (1.2 met), not the printed 0.50", () => {
    // Reference 0.36: the Annex D program (bench/reference port) and an independent bisection
    // solution of eq. (2) both give 0.36 (computed independently, not read from a document).
    const r = pmvPpd({ ta: 23.5, tr: 23.5, vr: 0.1, rh: 40, met: 1.2, clo: 1.0 });
    expect(Math.abs(r.pmv - 0.36)).toBeLessThanOrEqual(PMV_TOLERANCE);
  });
});
