import { emptyLayout, type Layout, type PlanPoint } from "@/lib/layout/schema";
import type { RandomSource } from "@/lib/plan/ids";
import { createRng } from "@/lib/viewfactor/rng";

/** A deterministic pseudo-random source (the project's seeded generator, lib/viewfactor/rng). */
export function seeded(seed = 1): RandomSource {
  const rng = createRng(seed);
  return () => rng.next();
}

export const square = (x0: number, y0: number, size: number): PlanPoint[] => [
  { x: x0, y: y0 },
  { x: x0 + size, y: y0 },
  { x: x0 + size, y: y0 + size },
  { x: x0, y: y0 + size },
];

/** One 6 m × 6 m room at the origin with a ceiling panel, a seat and a window. */
export function sampleLayout(): Layout {
  return {
    ...emptyLayout(),
    rooms: [{ id: "room-a", name: "Room A", outline: square(0, 0, 6), ceilingHeightM: 2.8 }],
    panels: [
      {
        id: "panel-a", label: "P-1", roomId: "room-a", mounting: "ceiling", center: { x: 3, y: 3 }, rotationDeg: 0, widthM: 1, lengthM: 2, mountingHeightM: null,
        mode: "heating", supply: { kind: "surface", surfaceTemperatureC: 32 }, emissivity: 0.93, louver: null, productId: null,
      },
    ],
    seats: [{ id: "seat-a", label: "Desk 1", position: { x: 1, y: 1 }, posture: "seated", facingDeg: 0, clo: null, met: null }],
    openings: [
      { id: "win-a", roomId: "room-a", kind: "window", edgeIndex: 0, offsetM: 1, widthM: 2, sillHeightM: 0.9, heightM: 1.5, thermal: { kind: "uValue", uValueWm2K: 1.4 } },
    ],
  };
}
