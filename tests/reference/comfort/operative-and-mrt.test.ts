import { describe, expect, it } from "vitest";
import {
  meanRadiantTemperature,
  meanRadiantTemperatureDetailed,
  meanRadiantTemperatureLinear,
  operativeTemperature,
} from "@/lib/comfort";

describe("operativeTemperature (ASHRAE 55-2017 Normative Appendix A / ISO 7730:2005 A-weighting)", () => {
  // t_o = A·t_a + (1 − A)·t_r with A = 0.5 (< 0.2 m/s), 0.6 (0.2–0.6 m/s), 0.7 (0.6–1.0 m/s)
  // — table from memory; expected values hand-computed for ta = 20 °C, tr = 30 °C.
  const rows: ReadonlyArray<{ v: number; to: number }> = [
    { v: 0, to: 25 },
    { v: 0.1, to: 25 },
    { v: 0.19, to: 25 },
    { v: 0.2, to: 24 },
    { v: 0.4, to: 24 },
    { v: 0.6, to: 24 },
    { v: 0.61, to: 23 },
    { v: 1.0, to: 23 },
  ];

  it.each(rows)("gives $to °C for ta 20 °C, tr 30 °C at $v m/s", ({ v, to }) => {
    expect(rows.length).toBeGreaterThan(0);
    expect(operativeTemperature(20, 30, v)).toBeCloseTo(to, 12);
  });
});

describe("meanRadiantTemperature (ISO 7726:1998, fourth-power form)", () => {
  it("gives 23.62 °C at the centre of a cube with five faces at 20 °C and one at 40 °C (F = 1/6 each, hand-computed)", () => {
    // Hand computation: ((5·293.15⁴ + 313.15⁴)/6)^(1/4) − 273.15 = 23.6225 °C.
    const parts = [20, 20, 20, 20, 20, 40].map((t) => ({ angleFactor: 1 / 6, temperatureC: t }));
    expect(meanRadiantTemperature(parts)).toBeCloseTo(23.6225, 3);
    // ISO 7726 linear approximation: Σ F·t = 23.333 °C, below the fourth-power value.
    expect(meanRadiantTemperatureLinear(parts)).toBeCloseTo(23.3333, 3);
  });

  it("gives 20.51 °C for two halves at 10 °C and 30 °C (hand-computed), where the linear form gives 20 °C", () => {
    const parts = [
      { angleFactor: 0.5, temperatureC: 10 },
      { angleFactor: 0.5, temperatureC: 30 },
    ];
    expect(meanRadiantTemperature(parts)).toBeCloseTo(20.5104, 3);
    expect(meanRadiantTemperatureLinear(parts)).toBeCloseTo(20, 12);
  });

  it("normalises angle factors that do not sum to 1 and reports their sum", () => {
    const r = meanRadiantTemperatureDetailed([
      { angleFactor: 0.25, temperatureC: 10 },
      { angleFactor: 0.25, temperatureC: 30 },
    ]);
    expect(r.angleFactorSum).toBeCloseTo(0.5, 12);
    expect(r.mrtC).toBeCloseTo(20.5104, 3);
  });
});
