/**
 * Louvered panel: effective radiant temperature and output curve checked against the
 * published exchange laws, with reference values computed independently in this file:
 *
 * - grey-surface radiosity (emitted + reflected): J = ε·σT_p⁴ + (1 − ε)·σT_surr⁴ for a grey
 *   surface facing black surroundings (Modest, "Radiative Heat Transfer", chapter on
 *   radiative exchange between grey diffuse surfaces; Siegel & Howell, "Thermal Radiation
 *   Heat Transfer" — from memory), so the net flux σ(T_eff⁴ − T_surr⁴) equals the panel
 *   radiant exchange q_r = ε·σ·(T_p⁴ − AUST⁴) of the ASHRAE Handbook panel heating and
 *   cooling chapter (form from memory);
 * - Stefan–Boltzmann constant σ = 5.670374419e-8 W/(m²K⁴) (CODATA 2018), 0 °C = 273.15 K
 *   (ISO 80000-5), written out here rather than imported.
 */
import { describe, expect, it } from "vitest";
import {
  buildLouverTable,
  louverApertureShare,
  louverEffectiveTemperatureC,
  louverEmissivityAt,
  louverOutputCurve,
} from "@/lib/panels";

const SIGMA = 5.670374419e-8; // CODATA 2018
const K = 273.15; // ISO 80000-5

describe("effective radiant temperature of a grey panel (grey-surface radiosity)", () => {
  const rows: ReadonlyArray<[number, number, number, number]> = [
    // surface °C, surroundings °C, ε, T_eff °C computed here by hand from (ε·T_p⁴ + (1 − ε)·T_s⁴)^¼
    [40, 20, 0.5, 30.493687006885125],
    [40, 20, 1, 40],
    [40, 20, 0, 20],
  ];

  it("matches (ε·T_p⁴ + (1 − ε)·T_surr⁴)^¼ for hand-computed cases", () => {
    expect(rows.length).toBeGreaterThan(0);
    for (const [surfaceC, surroundingsC, e, ref] of rows) {
      expect(louverEffectiveTemperatureC({ surfaceC, surroundingsC, directionalEmissivity: e })).toBeCloseTo(ref, 9);
    }
  });

  it("reproduces the panel's radiant exchange εσ(T_p⁴ − AUST⁴): 63.258 W/m² for ε = 0.5, 40 °C against 20 °C", () => {
    const teff = louverEffectiveTemperatureC({ surfaceC: 40, surroundingsC: 20, directionalEmissivity: 0.5 }) + K;
    const ts = 20 + K;
    expect(SIGMA * (teff ** 4 - ts ** 4)).toBeCloseTo(63.258190100216304, 6);
  });
});

describe("louver output curve: radiant part from the apparent emissivity (q_r = ε_face·σ·(T_p⁴ − AUST⁴))", () => {
  it("gives radiant W = s(α)·ε_a(α)·σ·(T_p⁴ − AUST⁴)·A at tabulated angles", () => {
    const table = buildLouverTable({ wallEmissivity: 0.3, finish: "diffuse", stepDeg: 30 });
    const panel = { orientation: "ceiling", mode: "heating", surfaceC: 38, airC: 21, austC: 19, areaM2: 1.8 } as const;
    const curve = louverOutputCurve({ panel, table });
    expect(curve.length).toBeGreaterThan(0);
    for (const p of curve) {
      const eFace = louverApertureShare(p.openingAngleDeg) * louverEmissivityAt(table, p.openingAngleDeg).hemispherical;
      const ref = eFace * SIGMA * ((38 + K) ** 4 - (19 + K) ** 4) * 1.8;
      expect(p.radiantW, `${p.openingAngleDeg}°`).toBeCloseTo(ref, 9);
    }
  });
});
