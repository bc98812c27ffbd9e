import { describe, expect, it } from "vitest";
import { PEOPLE_SENSIBLE_GAIN_W, roomSensibleCoolingLoad, solarGainW } from "@/lib/loads";

describe("PEOPLE_SENSIBLE_GAIN_W against ASHRAE Fundamentals ch. 18 Table 1 (SI, sensible column; from memory)", () => {
  const rows: ReadonlyArray<{ activity: keyof typeof PEOPLE_SENSIBLE_GAIN_W; w: number }> = [
    { activity: "seatedAtRest", w: 65 },
    { activity: "seatedVeryLightWork", w: 70 },
    { activity: "moderatelyActiveOfficeWork", w: 75 },
    { activity: "sedentaryRestaurant", w: 80 },
    { activity: "walkingLightMachineWork", w: 110 },
    { activity: "athletics", w: 210 },
  ];
  it.each(rows)("lists $w W sensible for $activity", ({ activity, w }) => {
    expect(rows.length).toBeGreaterThan(0);
    expect(PEOPLE_SENSIBLE_GAIN_W[activity]).toBe(w);
  });
});

describe("roomSensibleCoolingLoad — hand-worked steady-state balance", () => {
  // Hand-worked example (not a published one). θ_e = 32 °C, θ_int = 26 °C → 6 K.
  //   conduction: wall 10 m² × 0.30 + window 3 m² × 1.30 = 6.9 W/K → 6.9 × 6 = 41.4 W
  //               floor on ground: gain neglected (ASHRAE ch. 18 practice, from memory) → 0
  //   outdoor air: 0.34 Wh/(m³K) × 0.5 1/h × 50 m³ = 8.5 W/K → 8.5 × 6 = 51 W
  //   people: 2 × 70 W (seated, very light work; ASHRAE ch. 18 Table 1, from memory) = 140 W
  //   equipment 10 W/m² × 20 m² = 200 W; lighting 8 W/m² × 20 m² = 160 W → internal 500 W
  //   solar (EN ISO 13790 form F_sh·g·A·I): 1 × 0.5 × 3 m² × 400 W/m² = 600 W
  //   total 41.4 + 51 + 500 + 600 = 1192.4 W
  it("adds conduction 41.4 W, outdoor air 51 W, internal 500 W and solar 600 W to 1192.4 W", () => {
    const r = roomSensibleCoolingLoad({
      surfaces: [
        { kind: "wall", areaM2: 10, uValueWm2K: 0.3, adjacent: "outdoor" },
        { kind: "window", areaM2: 3, uValueWm2K: 1.3, adjacent: "outdoor" },
        { kind: "floor", areaM2: 20, uValueWm2K: 0.4, adjacent: "ground" },
      ],
      volumeM3: 50,
      airChangesPerHour: 0.5,
      indoorC: 26,
      outdoorC: 32,
      people: { count: 2, activity: "seatedVeryLightWork" },
      floorAreaM2: 20,
      equipmentWm2: 10,
      lightingWm2: 8,
      glazing: [{ areaM2: 3, gValue: 0.5, irradianceWm2: 400 }],
    });
    expect(r.transmissionW).toBeCloseTo(41.4, 9);
    expect(r.ventilationW).toBeCloseTo(51, 9);
    expect(r.internalW).toBeCloseTo(500, 9);
    expect(r.internal.peopleW).toBeCloseTo(140, 9);
    expect(r.solarW).toBeCloseTo(600, 9);
    expect(r.totalW).toBeCloseTo(1192.4, 9);
  });

  it("applies the shading reduction factor F_sh multiplicatively (EN ISO 13790 form; hand-computed 0.6 × 0.4 × 2 × 500 = 240 W)", () => {
    expect(solarGainW([{ areaM2: 2, gValue: 0.4, irradianceWm2: 500, shadingFactor: 0.6 }])).toBeCloseTo(240, 9);
  });
});
