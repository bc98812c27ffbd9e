/**
 * Editing tools as small state machines: each takes the tool's state and one input event and
 * returns the next state plus, when a gesture completes, an effect for the editor to apply.
 * Pointer positions are plan metres (already snapped by the caller when snapping is on).
 */
import type { PlanPoint } from "@/lib/layout/schema";
import { distance } from "@/lib/plan/geometry";

export type PolygonTarget = "room" | "zone";

export type SelectGesture =
  | { phase: "idle" }
  /** Pressed on empty plan; not yet moved far enough to be a rubber band. */
  | { phase: "pointing"; start: PlanPoint; additive: boolean }
  | { phase: "banding"; start: PlanPoint; current: PlanPoint; additive: boolean };

export type Tool =
  | { kind: "select"; gesture: SelectGesture }
  | { kind: "draw"; target: PolygonTarget; points: PlanPoint[] }
  | { kind: "panel"; mounting: "ceiling" | "wall" }
  | { kind: "seat" }
  | { kind: "opening" }
  /** Underlay scale: two clicked points, then the real distance is typed. */
  | { kind: "calibrate"; points: PlanPoint[] };

export type ToolEvent =
  | { type: "down"; point: PlanPoint; additive?: boolean }
  | { type: "move"; point: PlanPoint }
  | { type: "up"; point: PlanPoint }
  | { type: "click"; point: PlanPoint }
  | { type: "key"; key: string };

export type ToolEffect =
  | { kind: "polygon"; target: PolygonTarget; outline: PlanPoint[] }
  | { kind: "place"; what: "ceilingPanel" | "wallPanel" | "seat" | "opening"; point: PlanPoint }
  | { kind: "band"; a: PlanPoint; b: PlanPoint; additive: boolean }
  | { kind: "clearSelection" }
  | { kind: "calibrationPoints"; a: PlanPoint; b: PlanPoint }
  | { kind: "cancel" };

export interface ToolOptions {
  /** A click within this distance of the first corner closes a polygon, m. */
  closeRadiusM: number;
  /** Pointer travel that turns a press on empty plan into a rubber band, m. */
  bandThresholdM: number;
}

export const SELECT_TOOL: Tool = { kind: "select", gesture: { phase: "idle" } };

export function startTool(kind: Exclude<Tool["kind"], "select">, option?: PolygonTarget | "ceiling" | "wall"): Tool {
  switch (kind) {
    case "draw":
      return { kind, target: option === "zone" ? "zone" : "room", points: [] };
    case "panel":
      return { kind, mounting: option === "wall" ? "wall" : "ceiling" };
    case "calibrate":
      return { kind, points: [] };
    default:
      return { kind };
  }
}

export interface ToolStep {
  tool: Tool;
  effect: ToolEffect | null;
}

function drawStep(tool: Extract<Tool, { kind: "draw" }>, event: ToolEvent, options: ToolOptions): ToolStep {
  const close = (): ToolStep =>
    tool.points.length >= 3
      ? { tool: { ...tool, points: [] }, effect: { kind: "polygon", target: tool.target, outline: tool.points } }
      : { tool, effect: null };
  if (event.type === "key") {
    if (event.key === "Enter") return close();
    if (event.key === "Escape") return { tool: { ...tool, points: [] }, effect: { kind: "cancel" } };
    if (event.key === "Backspace") return { tool: { ...tool, points: tool.points.slice(0, -1) }, effect: null };
    return { tool, effect: null };
  }
  if (event.type !== "click") return { tool, effect: null };
  const first = tool.points[0];
  if (first && tool.points.length >= 3 && distance(first, event.point) <= options.closeRadiusM) return close();
  const last = tool.points[tool.points.length - 1];
  // A double click lands twice on the same spot: one corner, not two.
  if (last && distance(last, event.point) < 1e-9) return { tool, effect: null };
  return { tool: { ...tool, points: [...tool.points, event.point] }, effect: null };
}

function selectStep(tool: Extract<Tool, { kind: "select" }>, event: ToolEvent, options: ToolOptions): ToolStep {
  const g = tool.gesture;
  switch (event.type) {
    case "down":
      return { tool: { kind: "select", gesture: { phase: "pointing", start: event.point, additive: event.additive ?? false } }, effect: null };
    case "move":
      if (g.phase === "pointing" && distance(g.start, event.point) >= options.bandThresholdM)
        return { tool: { kind: "select", gesture: { phase: "banding", start: g.start, current: event.point, additive: g.additive } }, effect: null };
      if (g.phase === "banding") return { tool: { kind: "select", gesture: { ...g, current: event.point } }, effect: null };
      return { tool, effect: null };
    case "up":
      if (g.phase === "banding") return { tool: SELECT_TOOL, effect: { kind: "band", a: g.start, b: event.point, additive: g.additive } };
      if (g.phase === "pointing") return { tool: SELECT_TOOL, effect: g.additive ? null : { kind: "clearSelection" } };
      return { tool, effect: null };
    case "key":
      if (event.key === "Escape") return { tool: SELECT_TOOL, effect: { kind: "clearSelection" } };
      return { tool, effect: null };
    default:
      return { tool, effect: null };
  }
}

export function toolStep(tool: Tool, event: ToolEvent, options: ToolOptions): ToolStep {
  switch (tool.kind) {
    case "select":
      return selectStep(tool, event, options);
    case "draw":
      return drawStep(tool, event, options);
    case "calibrate": {
      if (event.type === "key" && event.key === "Escape") return { tool: SELECT_TOOL, effect: { kind: "cancel" } };
      if (event.type !== "click") return { tool, effect: null };
      const points = [...tool.points, event.point];
      const [a, b] = points;
      if (a && b) return { tool: { kind: "calibrate", points: [] }, effect: { kind: "calibrationPoints", a, b } };
      return { tool: { kind: "calibrate", points }, effect: null };
    }
    case "panel":
    case "seat":
    case "opening": {
      if (event.type === "key" && event.key === "Escape") return { tool: SELECT_TOOL, effect: { kind: "cancel" } };
      if (event.type !== "click") return { tool, effect: null };
      const what = tool.kind === "panel" ? (tool.mounting === "ceiling" ? "ceilingPanel" : "wallPanel") : tool.kind;
      return { tool, effect: { kind: "place", what, point: event.point } };
    }
  }
}
