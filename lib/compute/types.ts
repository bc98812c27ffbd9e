/**
 * The comfort computation's result: what POST /api/projects/{id}/compute returns and what the
 * screens show. All values SI: °C, K, m, W, W/m², %.
 */
import type { ZoneTarget } from "@/lib/layout/schema";

export type SurfaceKind = "wall" | "floor" | "ceiling" | "opening" | "panel";
export type Iso7730Category = "A" | "B" | "C";

export interface SeatSurfaceShare {
  /** Layout id of the element (room-derived surfaces get ids like "<roomId>:wall:2", "<roomId>:floor"). */
  surfaceId: string;
  kind: SurfaceKind;
  label: string;
  temperatureC: number;
  /** Angle factor between the occupant and the surface (the parts sum to about 1). */
  angleFactor: number;
  /** Share of the occupant's mean radiant temperature (fourth-power) contributed by the surface, 0–1. */
  mrtShare: number;
}

export interface ComfortLimitFailure {
  code: string;
  message: string;
}

export interface SeatResult {
  id: string;
  label: string;
  roomId: string;
  zoneIds: string[];
  posture: "seated" | "standing";
  clo: number;
  met: number;
  mrtC: number;
  operativeC: number;
  pmv: number;
  ppd: number;
  /** False when an input is outside ISO 7730's range of application (values still given). */
  withinRange: boolean;
  planeRadiantC: { up: number; down: number; front: number; back: number; left: number; right: number };
  /** Plane radiant temperature up minus down, K. */
  verticalAsymmetryC: number;
  /** Largest difference between opposite horizontal plane radiant temperatures, K. */
  horizontalAsymmetryC: number;
  /** Percentage dissatisfied from the governing radiant asymmetry (ISO 7730 clause 6.5). */
  asymmetryDissatisfiedPercent: number;
  asymmetryKind: "warmCeiling" | "coolCeiling" | "warmWall" | "coolWall" | null;
  category: Iso7730Category | null;
  /** The limit that keeps the seat out of the next better category (null when in A). */
  categoryLimit: ComfortLimitFailure | null;
  ashrae55: { compliant: boolean; failing: ComfortLimitFailure[] };
  surfaces: SeatSurfaceShare[];
}

export interface PanelResult {
  id: string;
  label: string;
  roomId: string;
  mode: "heating" | "cooling";
  active: boolean;
  surfaceTemperatureC: number;
  areaM2: number;
  /** Heat delivered to (heating) or removed from (cooling) the room, W; positive either way. */
  outputW: number;
  outputWm2: number;
  radiantWm2: number;
  convectiveWm2: number;
  radiantShare: number;
  /** Cooling panels: surface temperature minus the room's dew point. */
  condensation: { dewPointC: number; marginK: number; risk: boolean } | null;
  warnings: string[];
}

export interface ZoneResult {
  id: string;
  name: string;
  target: ZoneTarget;
  seatIds: string[];
  pmvMin: number | null;
  pmvMean: number | null;
  pmvMax: number | null;
  /** Share of the zone's seats inside its target, 0–1 (null without seats). */
  shareInTarget: number | null;
}

export interface HeatmapGrid {
  roomId: string;
  /** Plan position of the centre of cell (0, 0), m. */
  originX: number;
  originY: number;
  cols: number;
  rows: number;
  /** Row-major (row = y index), null outside the room. */
  pmv: (number | null)[];
  mrtC: (number | null)[];
}

export interface Heatmap {
  stepM: number;
  /** Height of the evaluation plane above the floor, m (seated head height). */
  heightM: number;
  grids: HeatmapGrid[];
}

export interface ComputeWarning {
  code: string;
  message: string;
  objectId: string | null;
}

export interface ComputeResult {
  projectId: string;
  revision: number;
  scenarioId: string;
  computedAt: string;
  /** Version of the computation's method (lib/compute/service.ts COMPUTE_MODEL_VERSION). */
  modelVersion: number;
  /** Server time spent computing, ms (0 when served from the cache). */
  computeMs: number;
  cached: boolean;
  seats: SeatResult[];
  panels: PanelResult[];
  zones: ZoneResult[];
  heatmap: Heatmap;
  warnings: ComputeWarning[];
}
