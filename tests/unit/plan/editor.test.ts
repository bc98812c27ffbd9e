import { describe, expect, it } from "vitest";
import { layoutSchema } from "@/lib/layout/schema";
import { createEditorReducer, currentLayout, initialEditorState, isDirty, type EditorAction, type EditorState } from "@/lib/plan/editor";
import { startTool } from "@/lib/plan/tools";
import { sampleLayout, seeded } from "./helpers";

const options = { closeRadiusM: 0.3, bandThresholdM: 0.1 };

function run(state: EditorState, actions: EditorAction[], seed = 7): EditorState {
  const reducer = createEditorReducer(seeded(seed));
  return actions.reduce(reducer, state);
}

const click = (x: number, y: number): EditorAction => ({ type: "tool", event: { type: "click", point: { x, y } }, options });

describe("editor reducer", () => {
  it("a drag is one undo entry: move on drag end, undo restores, redo repeats", () => {
    const start = initialEditorState(sampleLayout(), 3);
    const moved = run(start, [{ type: "move", ids: ["seat-a"], dx: 1.5, dy: 0.5 }]);
    expect(currentLayout(moved).seats[0]!.position).toEqual({ x: 2.5, y: 1.5 });
    expect(moved.history.past).toHaveLength(1);
    expect(isDirty(moved)).toBe(true);
    const undone = run(moved, [{ type: "undo" }]);
    expect(currentLayout(undone).seats[0]!.position).toEqual({ x: 1, y: 1 });
    expect(isDirty(undone)).toBe(false);
    const redone = run(undone, [{ type: "redo" }]);
    expect(currentLayout(redone).seats[0]!.position).toEqual({ x: 2.5, y: 1.5 });
  });

  it("a new change after undo drops the redo branch", () => {
    const s = run(initialEditorState(sampleLayout(), 1), [
      { type: "move", ids: ["seat-a"], dx: 1, dy: 0 },
      { type: "undo" },
      { type: "move", ids: ["seat-a"], dx: 0, dy: 1 },
    ]);
    expect(s.history.future).toHaveLength(0);
    expect(run(s, [{ type: "redo" }]).history.present).toBe(s.history.present);
  });

  it("a zero move records nothing", () => {
    const s = run(initialEditorState(sampleLayout(), 1), [{ type: "move", ids: ["seat-a"], dx: 0, dy: 0 }]);
    expect(s.history.past).toHaveLength(0);
    expect(isDirty(s)).toBe(false);
  });

  it("draws a room by clicking four corners and closing near the first; grid-snapped", () => {
    const s = run(initialEditorState(sampleLayout(), 1), [
      { type: "setTool", tool: startTool("draw", "room") },
      click(10.04, 0.1),
      click(14.1, -0.05),
      click(14, 4.12),
      click(10, 4),
      click(10.1, 0.05),
    ]);
    const rooms = currentLayout(s).rooms;
    expect(rooms).toHaveLength(2);
    expect(rooms[1]!.outline).toEqual([{ x: 10, y: 0 }, { x: 14, y: 0 }, { x: 14, y: 4 }, { x: 10, y: 4 }]);
    expect(s.selection).toEqual([rooms[1]!.id]);
    expect(s.tool.kind).toBe("select");
    expect(s.history.past).toHaveLength(1);
    expect(layoutSchema.safeParse(currentLayout(s)).success).toBe(true);
  });

  it("Enter closes a polygon of three corners, Escape cancels without a change", () => {
    const closed = run(initialEditorState(sampleLayout(), 1), [
      { type: "setTool", tool: startTool("draw", "zone") },
      click(1, 1),
      click(3, 1),
      click(2, 3),
      { type: "tool", event: { type: "key", key: "Enter" }, options },
    ]);
    expect(currentLayout(closed).zones).toHaveLength(1);
    expect(currentLayout(closed).zones[0]!.target).toEqual({ kind: "pmvBand", minPmv: -0.5, maxPmv: 0.5 });

    const cancelled = run(initialEditorState(sampleLayout(), 1), [
      { type: "setTool", tool: startTool("draw", "room") },
      click(1, 1),
      click(3, 1),
      { type: "tool", event: { type: "key", key: "Escape" }, options },
      { type: "tool", event: { type: "key", key: "Enter" }, options },
    ]);
    expect(currentLayout(cancelled).rooms).toHaveLength(1);
    expect(cancelled.history.past).toHaveLength(0);
  });

  it("places a ceiling panel and a seat inside a room, refuses them outside with a notice", () => {
    const s = run(initialEditorState(sampleLayout(), 1), [
      { type: "setTool", tool: startTool("panel", "ceiling") },
      click(4, 4),
      { type: "setTool", tool: startTool("seat") },
      click(2, 5),
      click(20, 20),
    ]);
    const layout = currentLayout(s);
    expect(layout.panels).toHaveLength(2);
    expect(layout.panels[1]).toMatchObject({ roomId: "room-a", center: { x: 4, y: 4 }, mounting: "ceiling", mountingHeightM: null });
    expect(layout.seats).toHaveLength(2);
    expect(s.notice).toMatch(/inside a room/);
    expect(layoutSchema.safeParse(layout).success).toBe(true);
  });

  it("places a wall panel on the nearest wall facing into the room and an opening on an edge", () => {
    const s = run(initialEditorState(sampleLayout(), 1), [
      { type: "setTool", tool: startTool("panel", "wall") },
      click(5.9, 3),
      { type: "setTool", tool: startTool("opening") },
      click(3, 6.1),
    ]);
    const layout = currentLayout(s);
    const wall = layout.panels[1]!;
    expect(wall.center).toEqual({ x: 6, y: 3 });
    expect(Math.abs(wall.rotationDeg)).toBeCloseTo(180, 6);
    const opening = layout.openings[1]!;
    expect(opening.edgeIndex).toBe(2);
    expect(layoutSchema.safeParse(layout).success).toBe(true);
  });

  it("duplicate gives new ids, offsets the copies and selects them", () => {
    const s = run(initialEditorState(sampleLayout(), 1), [{ type: "select", ids: ["seat-a", "panel-a", "room-a"] }, { type: "duplicate" }]);
    const layout = currentLayout(s);
    expect(layout.seats).toHaveLength(2);
    expect(layout.rooms).toHaveLength(2);
    expect(layout.openings).toHaveLength(2);
    const ids = [...layout.rooms, ...layout.openings, ...layout.panels, ...layout.seats].map((e) => e.id);
    expect(new Set(ids).size).toBe(ids.length);
    expect(s.selection).toHaveLength(3);
    expect(s.selection).not.toContain("seat-a");
    expect(layout.seats[1]!.position).toEqual({ x: 1.5, y: 1.5 });
    expect(layoutSchema.safeParse(layout).success).toBe(true);
  });

  it("duplicated ids differ between runs with different random seeds but never collide", () => {
    const a = run(initialEditorState(sampleLayout(), 1), [{ type: "select", ids: ["seat-a"] }, { type: "duplicate" }, { type: "duplicate" }], 1);
    const seats = currentLayout(a).seats.map((x) => x.id);
    expect(new Set(seats).size).toBe(3);
    expect(seats[1]).toMatch(/^seat-[a-z0-9]{6}$/);
  });

  it("deleting a room removes its openings and panels; undo brings them back", () => {
    const s = run(initialEditorState(sampleLayout(), 1), [{ type: "select", ids: ["room-a"] }, { type: "delete" }]);
    expect(currentLayout(s)).toMatchObject({ rooms: [], openings: [], panels: [] });
    expect(currentLayout(s).seats).toHaveLength(1);
    expect(s.selection).toEqual([]);
    expect(currentLayout(run(s, [{ type: "undo" }])).panels).toHaveLength(1);
  });

  it("shift-click toggles, band selection adds with shift", () => {
    let s = run(initialEditorState(sampleLayout(), 1), [
      { type: "select", ids: ["seat-a"] },
      { type: "select", ids: ["panel-a"], mode: "toggle" },
    ]);
    expect(s.selection).toEqual(["seat-a", "panel-a"]);
    s = run(s, [{ type: "select", ids: ["seat-a"], mode: "toggle" }]);
    expect(s.selection).toEqual(["panel-a"]);
    s = run(s, [
      { type: "tool", event: { type: "down", point: { x: 0.5, y: 0.5 }, additive: true }, options },
      { type: "tool", event: { type: "move", point: { x: 1.5, y: 1.5 } }, options },
      { type: "tool", event: { type: "up", point: { x: 1.5, y: 1.5 } }, options },
    ]);
    expect([...s.selection].sort()).toEqual(["panel-a", "seat-a"]);
  });

  it("a click on empty plan clears the selection", () => {
    const s = run(initialEditorState(sampleLayout(), 1), [
      { type: "select", ids: ["seat-a"] },
      { type: "tool", event: { type: "down", point: { x: 9, y: 9 } }, options },
      { type: "tool", event: { type: "up", point: { x: 9, y: 9 } }, options },
    ]);
    expect(s.selection).toEqual([]);
  });

  it("moving a panel into another room re-assigns its room", () => {
    const layout = sampleLayout();
    layout.rooms.push({ id: "room-b", name: "B", outline: [{ x: 6, y: 0 }, { x: 12, y: 0 }, { x: 12, y: 6 }, { x: 6, y: 6 }], ceilingHeightM: 3 });
    const s = run(initialEditorState(layout, 1), [{ type: "move", ids: ["panel-a"], dx: 6, dy: 0 }]);
    expect(currentLayout(s).panels[0]!.roomId).toBe("room-b");
  });

  it("saved clears dirty and moves the base revision; read-only refuses edits", () => {
    const moved = run(initialEditorState(sampleLayout(), 1), [{ type: "move", ids: ["seat-a"], dx: 1, dy: 0 }]);
    const saved = run(moved, [{ type: "saved", layout: currentLayout(moved), revision: 2 }]);
    expect(isDirty(saved)).toBe(false);
    expect(saved.baseRevision).toBe(2);
    const ro = run(initialEditorState(sampleLayout(), 1, true), [{ type: "move", ids: ["seat-a"], dx: 1, dy: 0 }, { type: "select", ids: ["seat-a"] }, { type: "delete" }]);
    expect(isDirty(ro)).toBe(false);
    expect(currentLayout(ro).seats).toHaveLength(1);
  });
});
