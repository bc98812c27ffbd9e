import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { seatCsvHeader, seatsCsv } from "@/components/results/csv";
import { toSeatRows } from "@/components/results/seat-rows";
import { seatResult, zoneResult } from "./fixtures";

const zones = [zoneResult({ id: "z1", name: "Window band, south" })];
const rows = toSeatRows(
  [
    seatResult({ id: "a", label: 'Desk "A1"', pmv: -0.456, ppd: 9.31, mrtC: 20, operativeC: 21.5, verticalAsymmetryC: 2.5, zoneIds: ["z1"], category: "B" }),
    seatResult({ id: "b", label: "=HYPERLINK(\"x\")", pmv: 0.004, mrtC: 25, zoneIds: [], category: null, ashrae55: { compliant: false, failing: [{ code: "a", message: "limit one" }, { code: "b", message: "limit, two" }] } }),
  ],
  zones,
);

function parse(csv: string): string[][] {
  const result = Papa.parse<string[]>(csv, { skipEmptyLines: true });
  expect(result.errors).toEqual([]);
  return result.data;
}

describe("seatsCsv(rows, system)", () => {
  it("writes a header and one line per seat", () => {
    const lines = parse(seatsCsv(rows, "si"));
    expect(lines).toHaveLength(3);
    expect(lines[0]).toEqual(seatCsvHeader("si"));
  });

  it("states the unit in every numeric header, in the chosen system", () => {
    expect(seatCsvHeader("si")).toContain("MRT (°C)");
    expect(seatCsvHeader("si")).toContain("Vertical radiant asymmetry (K)");
    expect(seatCsvHeader("ip")).toContain("MRT (°F)");
    expect(seatCsvHeader("ip")).toContain("Vertical radiant asymmetry (°F)");
    expect(seatCsvHeader("ip").filter((h) => h.includes("°C"))).toEqual([]);
  });

  it("quotes commas and quotes so a round trip gives back the text", () => {
    const lines = parse(seatsCsv(rows, "si"));
    expect(lines[1]![0]).toBe('Desk "A1"');
    expect(lines[1]![1]).toBe("Window band, south");
    expect(lines[2]![11]).toBe("limit one; limit, two");
    expect(seatsCsv(rows, "si")).toContain('"Desk ""A1"""');
  });

  it("escapes a label that would start a spreadsheet formula, but not negative numbers", () => {
    const lines = parse(seatsCsv(rows, "si"));
    expect(lines[2]![0]!.startsWith("'=")).toBe(true);
    expect(lines[1]![2]).toBe("-0.46");
  });

  it("converts temperatures to °F and differences to °F spans in IP; PMV and PPD stay", () => {
    const [, si] = parse(seatsCsv(rows, "si"));
    const [, ip] = parse(seatsCsv(rows, "ip"));
    expect(Number(si![4])).toBe(20);
    expect(Number(ip![4])).toBeCloseTo(68, 6);
    expect(Number(ip![5])).toBeCloseTo(70.7, 6);
    expect(Number(ip![6])).toBeCloseTo(4.5, 6);
    expect(ip![2]).toBe(si![2]);
    expect(ip![3]).toBe("9.3");
  });

  it("marks category and ASHRAE 55 outcome in words", () => {
    const lines = parse(seatsCsv(rows, "si"));
    expect(lines[1]![9]).toBe("B");
    expect(lines[1]![10]).toBe("pass");
    expect(lines[2]![9]).toBe("outside C");
    expect(lines[2]![10]).toBe("fail");
    expect(lines[2]![1]).toBe("");
  });
});
