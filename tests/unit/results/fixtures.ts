import type { SeatResult, ZoneResult } from "@/lib/compute/types";

/** A seat result with plausible values; override what a test is about. */
export function seatResult(over: Partial<SeatResult> & { id: string }): SeatResult {
  return {
    label: over.id,
    roomId: "room-1",
    zoneIds: [],
    posture: "seated",
    clo: 1,
    met: 1.2,
    mrtC: 21,
    operativeC: 21,
    pmv: 0,
    ppd: 5,
    withinRange: true,
    planeRadiantC: { up: 21, down: 21, front: 21, back: 21, left: 21, right: 21 },
    verticalAsymmetryC: 0,
    horizontalAsymmetryC: 0,
    asymmetryDissatisfiedPercent: 0,
    asymmetryKind: null,
    category: "A",
    categoryLimit: null,
    ashrae55: { compliant: true, failing: [] },
    surfaces: [],
    ...over,
  };
}

export function zoneResult(over: Partial<ZoneResult> & { id: string }): ZoneResult {
  return {
    name: over.id,
    target: { kind: "category", category: "B" },
    seatIds: [],
    pmvMin: null,
    pmvMean: null,
    pmvMax: null,
    shareInTarget: null,
    ...over,
  };
}
