/** The room-surface classes a scenario sets, and the inside temperature each one ends up at. */
import type { ScenarioConditions, SurfaceThermal } from "@/lib/scenarios/schema";
import { insideSurfaceTemperature, type ElementPosition } from "@/lib/scenarios/surface-temperature";

export type SurfaceKey = keyof ScenarioConditions["surfaces"];

export const SURFACE_CLASSES: ReadonlyArray<{ key: SurfaceKey; label: string; position: ElementPosition; nullable: boolean }> = [
  { key: "exteriorWalls", label: "Exterior walls", position: "wall", nullable: false },
  { key: "interiorWalls", label: "Interior walls", position: "wall", nullable: true },
  { key: "floor", label: "Floor", position: "floor", nullable: true },
  { key: "ceiling", label: "Ceiling", position: "ceiling", nullable: true },
  { key: "openings", label: "Openings (windows, glazed doors)", position: "opening", nullable: false },
];

/**
 * Inside surface temperature of a class under the scenario's air and outdoor temperatures, °C:
 * given directly, from the U-value (ISO 6946 inside surface resistance), or the air temperature
 * when the class is left at "air temperature" (null). NaN when an input is not a usable number.
 */
export function insideTemperatureC(thermal: SurfaceThermal | null, airC: number, outdoorC: number, position: ElementPosition): number {
  if (thermal === null) return airC;
  if (thermal.kind === "surfaceTemperature") return thermal.surfaceTemperatureC;
  if (!(thermal.uValueWm2K > 0) || !Number.isFinite(airC) || !Number.isFinite(outdoorC)) return Number.NaN;
  return insideSurfaceTemperature({ uValueWm2K: thermal.uValueWm2K, insideC: airC, outsideC: outdoorC, position });
}
