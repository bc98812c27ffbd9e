"use client";

import { memo, type Dispatch } from "react";
import type { EditorAction } from "@/lib/plan/editor";
import { GRID_SIZES_M, type GridSettings } from "@/lib/plan/snap";
import { SELECT_TOOL, startTool, type Tool } from "@/lib/plan/tools";
import { formatQuantity, type UnitSystem } from "@/lib/units";

interface ToolbarProps {
  tool: Tool;
  grid: GridSettings;
  readOnly: boolean;
  canUndo: boolean;
  canRedo: boolean;
  hasSelection: boolean;
  units: UnitSystem;
  dispatch: Dispatch<EditorAction>;
  onFit: () => void;
}

const TOOLS: ReadonlyArray<{ label: string; tool: Tool; key: string }> = [
  { label: "Select", tool: SELECT_TOOL, key: "select" },
  { label: "Draw room", tool: startTool("draw", "room"), key: "draw-room" },
  { label: "Draw zone", tool: startTool("draw", "zone"), key: "draw-zone" },
  { label: "Ceiling panel", tool: startTool("panel", "ceiling"), key: "panel-ceiling" },
  { label: "Wall panel", tool: startTool("panel", "wall"), key: "panel-wall" },
  { label: "Seat", tool: startTool("seat"), key: "seat" },
  { label: "Opening", tool: startTool("opening"), key: "opening" },
];

function isActive(current: Tool, candidate: Tool): boolean {
  if (current.kind !== candidate.kind) return false;
  if (current.kind === "draw" && candidate.kind === "draw") return current.target === candidate.target;
  if (current.kind === "panel" && candidate.kind === "panel") return current.mounting === candidate.mounting;
  return true;
}

const HINTS: Partial<Record<Tool["kind"], string>> = {
  draw: "Click the corners; click the first corner again or press Enter to close, Escape to cancel, Backspace to drop the last corner.",
  panel: "Click inside a room for a ceiling panel, or on a wall for a wall panel.",
  seat: "Click inside a room to place a seat.",
  opening: "Click on a room wall to add a window there.",
  calibrate: "Click two points on the underlay a known distance apart.",
  select: "Click to select, Shift-click or drag a band for more; drag to move; Space-drag or middle mouse to pan; wheel to zoom.",
};

export const EditorToolbar = memo(function EditorToolbar({ tool, grid, readOnly, canUndo, canRedo, hasSelection, units, dispatch, onFit }: ToolbarProps) {
  const btn = "rounded-md border px-2.5 py-1.5 text-sm font-medium disabled:cursor-not-allowed disabled:opacity-40";
  return (
    <div className="space-y-1">
      <div role="toolbar" aria-label="Plan tools" className="flex flex-wrap items-center gap-1.5">
        {TOOLS.filter((t) => !readOnly || t.tool.kind === "select").map((t) => {
          const active = isActive(tool, t.tool);
          return (
            <button
              key={t.key}
              type="button"
              aria-pressed={active}
              onClick={() => dispatch({ type: "setTool", tool: t.tool })}
              className={`${btn} ${active ? "border-accent bg-accent text-white" : "border-line bg-white hover:border-accent"}`}
            >
              {t.label}
            </button>
          );
        })}
        <span className="mx-1 h-6 border-l border-line" aria-hidden />
        {readOnly ? null : (
          <>
            <button type="button" className={`${btn} border-line bg-white`} disabled={!canUndo} onClick={() => dispatch({ type: "undo" })} title="Ctrl/Cmd+Z">
              Undo
            </button>
            <button type="button" className={`${btn} border-line bg-white`} disabled={!canRedo} onClick={() => dispatch({ type: "redo" })} title="Ctrl/Cmd+Shift+Z">
              Redo
            </button>
            <button type="button" className={`${btn} border-line bg-white`} disabled={!hasSelection} onClick={() => dispatch({ type: "duplicate" })} title="Ctrl/Cmd+D">
              Duplicate
            </button>
            <button type="button" className={`${btn} border-danger/40 bg-white text-danger`} disabled={!hasSelection} onClick={() => dispatch({ type: "delete" })} title="Delete">
              Delete
            </button>
            <span className="mx-1 h-6 border-l border-line" aria-hidden />
          </>
        )}
        <button type="button" className={`${btn} border-line bg-white`} onClick={onFit}>
          Fit
        </button>
        <label className="ml-2 flex items-center gap-1.5 text-sm">
          <input type="checkbox" checked={grid.enabled} onChange={(e) => dispatch({ type: "setGrid", grid: { enabled: e.target.checked } })} />
          Snap to grid
        </label>
        <label className="flex items-center gap-1.5 text-sm">
          Grid size
          <select
            className="rounded-md border border-line bg-white px-1.5 py-1 text-sm"
            value={grid.sizeM}
            onChange={(e) => dispatch({ type: "setGrid", grid: { sizeM: Number(e.target.value) } })}
          >
            {GRID_SIZES_M.map((s) => (
              <option key={s} value={s}>
                {formatQuantity("length", s, units, units === "si" ? 2 : 2)}
              </option>
            ))}
          </select>
        </label>
      </div>
      <p className="text-xs text-muted" aria-live="polite">
        {HINTS[tool.kind]}
      </p>
    </div>
  );
});
