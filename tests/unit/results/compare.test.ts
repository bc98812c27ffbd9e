import { describe, expect, it } from "vitest";
import { compareSeats } from "@/components/results/compare";
import { seatResult } from "./fixtures";

describe("compareSeats(a, b)", () => {
  const a = [
    seatResult({ id: "s1", label: "Desk 1", pmv: 0.1, operativeC: 21 }),
    seatResult({ id: "s2", label: "Desk 2", pmv: -0.5 }),
    seatResult({ id: "s3", label: "Desk 3", pmv: 0.2 }),
    seatResult({ id: "gone", label: "Old desk", pmv: 0 }),
  ];
  const b = [
    seatResult({ id: "s3", label: "Desk 3", pmv: 0.25 }),
    seatResult({ id: "s1", label: "Desk 1", pmv: 0.4, operativeC: 22.5 }),
    seatResult({ id: "s2", label: "Desk 2", pmv: -1.2 }),
    seatResult({ id: "new", label: "New desk", pmv: 0.3 }),
  ];
  const result = compareSeats(a, b);

  it("matches seats by id and orders them by the size of the PMV change", () => {
    expect(result.changes.map((c) => c.id)).toEqual(["s2", "s1", "s3"]);
    expect(result.changes[0]!.deltaPmv).toBeCloseTo(-0.7, 10);
    expect(result.changes[1]!.deltaPmv).toBeCloseTo(0.3, 10);
    expect(result.changes[1]!.operativeB - result.changes[1]!.operativeA).toBeCloseTo(1.5, 10);
  });

  it("lists seats only in A and only in B", () => {
    expect(result.onlyA).toEqual([{ id: "gone", label: "Old desk" }]);
    expect(result.onlyB).toEqual([{ id: "new", label: "New desk" }]);
  });

  it("gives the mean PMV change over the matched seats", () => {
    expect(result.meanDeltaPmv).toBeCloseTo((-0.7 + 0.3 + 0.05) / 3, 10);
  });

  it("gives no mean when nothing matches", () => {
    expect(compareSeats(a, []).meanDeltaPmv).toBeNull();
    expect(compareSeats(a, []).onlyA).toHaveLength(4);
  });
});
