/**
 * The editor's state and its reducer: the layout with its undo history, the selection, the
 * active tool, grid settings and the revision the edit started from. Konva never holds the
 * truth: the canvas dispatches completed gestures here and draws what comes back.
 */
import type { Layout, PlanPoint } from "@/lib/layout/schema";
import {
  PlacementError, addOpening, addPanel, addRoom, addSeat, addZone, deleteElements, duplicateElements, moveElements, replaceElements,
} from "@/lib/plan/commands";
import { elementsInRect, findElement, type AnyElement } from "@/lib/plan/geometry";
import { commit, createHistory, redo, undo, type History } from "@/lib/plan/history";
import type { RandomSource } from "@/lib/plan/ids";
import { DEFAULT_GRID, snapPoint, type GridSettings } from "@/lib/plan/snap";
import { SELECT_TOOL, toolStep, type Tool, type ToolEvent, type ToolOptions } from "@/lib/plan/tools";
import type { Underlay } from "@/lib/plan/underlay";

export interface EditorState {
  history: History<Layout>;
  /** The layout as last loaded or saved; the editor is dirty while the present differs. */
  savedLayout: Layout;
  /** The revision the edit is based on (sent as `baseRevision` when saving). */
  baseRevision: number;
  selection: readonly string[];
  tool: Tool;
  grid: GridSettings;
  /** Two underlay points waiting for their real distance. */
  calibration: { a: PlanPoint; b: PlanPoint } | null;
  /** A short message about the last gesture that could not be applied. */
  notice: string | null;
  readOnly: boolean;
}

export type SelectMode = "replace" | "toggle" | "add";

export type EditorAction =
  | { type: "load"; layout: Layout; revision: number }
  | { type: "saved"; layout: Layout; revision: number }
  | { type: "select"; ids: readonly string[]; mode?: SelectMode }
  | { type: "setTool"; tool: Tool }
  | { type: "tool"; event: ToolEvent; options: ToolOptions }
  | { type: "move"; ids: readonly string[]; dx: number; dy: number }
  | { type: "replace"; items: readonly AnyElement[] }
  | { type: "delete" }
  | { type: "duplicate" }
  | { type: "undo" }
  | { type: "redo" }
  | { type: "setGrid"; grid: Partial<GridSettings> }
  | { type: "setUnderlay"; underlay: Underlay | null }
  | { type: "cancelCalibration" }
  | { type: "notice"; message: string | null };

/** How far a duplicate lands from its original, m. */
export const DUPLICATE_OFFSET_M = 0.5;

export function initialEditorState(layout: Layout, revision: number, readOnly = false): EditorState {
  return {
    history: createHistory(layout),
    savedLayout: layout,
    baseRevision: revision,
    selection: [],
    tool: SELECT_TOOL,
    grid: DEFAULT_GRID,
    calibration: null,
    notice: null,
    readOnly,
  };
}

export function currentLayout(state: EditorState): Layout {
  return state.history.present;
}

export function isDirty(state: EditorState): boolean {
  return state.history.present !== state.savedLayout;
}

function existing(layout: Layout, ids: readonly string[]): string[] {
  return ids.filter((id) => findElement(layout, id) !== null);
}

/** Records a change as one undo entry and keeps the selection on elements that still exist. */
function change(state: EditorState, layout: Layout, selection: readonly string[] = state.selection): EditorState {
  if (state.readOnly) return state;
  const history = commit(state.history, layout);
  return { ...state, history, selection: existing(layout, selection), notice: null };
}

function select(selection: readonly string[], ids: readonly string[], mode: SelectMode): string[] {
  if (mode === "replace") return [...ids];
  if (mode === "add") return [...selection, ...ids.filter((id) => !selection.includes(id))];
  const toggled = new Set(selection);
  for (const id of ids) {
    if (toggled.has(id)) toggled.delete(id);
    else toggled.add(id);
  }
  return [...toggled];
}

function applyToolEffect(state: EditorState, tool: Tool, step: ReturnType<typeof toolStep>, random: RandomSource): EditorState {
  const layout = currentLayout(state);
  const effect = step.effect;
  const next = { ...state, tool: step.tool };
  if (!effect) return next;
  try {
    switch (effect.kind) {
      case "band": {
        const ids = elementsInRect(layout, effect.a, effect.b);
        return { ...next, selection: effect.additive ? select(state.selection, ids, "add") : ids };
      }
      case "clearSelection":
        return { ...next, selection: [] };
      case "cancel":
        return { ...next, notice: null };
      case "calibrationPoints":
        return { ...next, tool: SELECT_TOOL, calibration: { a: effect.a, b: effect.b } };
      case "polygon": {
        const made = effect.target === "room" ? addRoom(layout, effect.outline, random) : addZone(layout, effect.outline, random);
        return change({ ...next, tool: SELECT_TOOL }, made.layout, [made.id]);
      }
      case "place": {
        const made =
          effect.what === "seat"
            ? addSeat(layout, effect.point, random)
            : effect.what === "opening"
              ? addOpening(layout, effect.point, random)
              : addPanel(layout, effect.point, effect.what === "ceilingPanel" ? "ceiling" : "wall", random);
        return change(next, made.layout, [made.id]);
      }
    }
  } catch (error) {
    if (error instanceof PlacementError) return { ...next, tool, notice: error.message };
    throw error;
  }
}

/** The reducer; `random` feeds id generation (tests pass a seeded source). */
export function createEditorReducer(random: RandomSource = Math.random) {
  return function editorReducer(state: EditorState, action: EditorAction): EditorState {
    const layout = currentLayout(state);
    switch (action.type) {
      case "load":
        return { ...initialEditorState(action.layout, action.revision, state.readOnly), grid: state.grid };
      case "saved":
        return { ...state, savedLayout: action.layout, baseRevision: action.revision };
      case "select":
        return { ...state, selection: existing(layout, select(state.selection, action.ids, action.mode ?? "replace")) };
      case "setTool":
        if (state.readOnly && action.tool.kind !== "select") return state;
        return { ...state, tool: action.tool, notice: null };
      case "tool": {
        if (state.readOnly && state.tool.kind !== "select") return state;
        // Drawing and placing snap to the grid; selecting and picking underlay points do not.
        const snaps = state.tool.kind !== "select" && state.tool.kind !== "calibrate";
        const event = snaps && "point" in action.event ? { ...action.event, point: snapPoint(action.event.point, state.grid) } : action.event;
        return applyToolEffect(state, state.tool, toolStep(state.tool, event, action.options), random);
      }
      case "move":
        return change(state, moveElements(layout, action.ids, action.dx, action.dy));
      case "replace":
        return change(state, replaceElements(layout, action.items));
      case "delete":
        return state.selection.length === 0 ? state : change(state, deleteElements(layout, state.selection), []);
      case "duplicate": {
        if (state.selection.length === 0) return state;
        const copy = duplicateElements(layout, state.selection, { x: DUPLICATE_OFFSET_M, y: DUPLICATE_OFFSET_M }, random);
        return copy.ids.length === 0 ? state : change(state, copy.layout, copy.ids);
      }
      case "undo": {
        const history = undo(state.history);
        return { ...state, history, selection: existing(history.present, state.selection) };
      }
      case "redo": {
        const history = redo(state.history);
        return { ...state, history, selection: existing(history.present, state.selection) };
      }
      case "setGrid":
        return { ...state, grid: { ...state.grid, ...action.grid } };
      case "setUnderlay":
        return change(state, { ...layout, underlay: action.underlay });
      case "cancelCalibration":
        return { ...state, calibration: null };
      case "notice":
        return { ...state, notice: action.message };
    }
  };
}
