import { describe, expect, it } from "vitest";
import { displayText, parseDisplay, quantityUnit, rangeText, uValueUnit } from "@/components/scenarios/display-units";
import { SURFACE_CLASSES, insideTemperatureC } from "@/components/scenarios/surfaces";

describe("scenario form units", () => {
  it("shows and reads temperatures in °F for IP and °C for SI", () => {
    const ip = quantityUnit("temperature", "ip");
    expect(displayText(ip, 20)).toBe("68");
    expect(parseDisplay(ip, "68")).toBeCloseTo(20, 10);
    expect(parseDisplay(ip, " 71,6 ")).toBeCloseTo(22, 10);
    expect(displayText(quantityUnit("temperature", "si"), 21.25)).toBe("21.3");
    expect(rangeText(ip, 5, 40)).toBe("41 – 104 °F");
  });

  it("converts U-values to Btu/(h·ft²·°F) with the factor 0.17611", () => {
    const ip = uValueUnit("ip");
    expect(ip.toDisplay(1)).toBeCloseTo(0.17611, 5);
    expect(parseDisplay(ip, displayText(ip, 1.4))).toBeCloseTo(1.4, 2);
    expect(uValueUnit("si").symbol).toBe("W/(m²·K)");
  });

  it("reads an empty or non-numeric entry as NaN so the schema refuses it", () => {
    expect(parseDisplay(quantityUnit("speed", "si", 2), "")).toBeNaN();
    expect(parseDisplay(quantityUnit("speed", "si", 2), "fast")).toBeNaN();
  });
});

describe("insideTemperatureC(thermal, airC, outdoorC, position)", () => {
  it("uses the given surface temperature, or the air temperature for a class left at air", () => {
    expect(insideTemperatureC({ kind: "surfaceTemperature", surfaceTemperatureC: 17 }, 20, -8, "wall")).toBe(17);
    expect(insideTemperatureC(null, 20, -8, "floor")).toBe(20);
  });

  it("applies t_si = t_i − U·R_si·(t_i − t_e) with R_si = 0.13 m²K/W for walls and openings", () => {
    expect(insideTemperatureC({ kind: "uValue", uValueWm2K: 1.4 }, 20, -8, "opening")).toBeCloseTo(20 - 1.4 * 0.13 * 28, 10);
    expect(insideTemperatureC({ kind: "uValue", uValueWm2K: 0.3 }, 26, 32, "wall")).toBeCloseTo(26 + 0.3 * 0.13 * 6, 10);
  });

  it("covers the five surface classes a scenario sets", () => {
    expect(SURFACE_CLASSES.map((s) => s.key)).toEqual(["exteriorWalls", "interiorWalls", "floor", "ceiling", "openings"]);
  });
});
