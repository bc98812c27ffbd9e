import { describe, expect, it } from "vitest";
import { commit, createHistory, redo, undo, canUndo, canRedo } from "@/lib/plan/history";
import { newId } from "@/lib/plan/ids";
import { formatPmv, pmvColour } from "@/lib/plan/palette";
import { snapDelta, snapPoint, snapValue } from "@/lib/plan/snap";
import { calibrateUnderlay, newUnderlay } from "@/lib/plan/underlay";
import { seeded } from "./helpers";

describe("snapping", () => {
  it.each([
    [0.12, 0.25, 0],
    [0.13, 0.25, 0.25],
    [1.74, 0.5, 1.5],
    [-0.3, 0.25, -0.25],
    [0.3, 0.1, 0.3],
  ])("snapValue(%f, grid %f) = %f", (value, size, expected) => {
    expect(snapValue(value, { enabled: true, sizeM: size })).toBe(expected);
  });

  it("snapping off leaves values alone", () => {
    expect(snapPoint({ x: 0.123, y: 4.567 }, { enabled: false, sizeM: 0.5 })).toEqual({ x: 0.123, y: 4.567 });
  });

  it("snapDelta lands the anchor on the grid", () => {
    expect(snapDelta({ x: 1.1, y: 0 }, 0.5, 0.4, { enabled: true, sizeM: 0.5 })).toEqual({ x: 0.4, y: 0.5 });
  });
});

describe("history", () => {
  it("undo/redo walk the entries and stop at either end", () => {
    let h = createHistory("a");
    h = commit(h, "b");
    h = commit(h, "c");
    expect(canRedo(h)).toBe(false);
    h = undo(undo(undo(h)));
    expect(h.present).toBe("a");
    expect(canUndo(h)).toBe(false);
    h = redo(h);
    expect(h.present).toBe("b");
    expect(canRedo(h)).toBe(true);
  });

  it("keeps at most `limit` past entries", () => {
    let h = createHistory(0);
    for (let i = 1; i <= 10; i += 1) h = commit(h, i, 4);
    expect(h.past).toEqual([6, 7, 8, 9]);
  });
});

describe("ids, palette, underlay", () => {
  it("newId skips taken ids", () => {
    const first = newId("seat", new Set(), seeded(3));
    expect(newId("seat", new Set([first]), seeded(3))).not.toBe(first);
    expect(first).toMatch(/^seat-[a-z0-9]{6}$/);
  });

  it("pmvColour is blue below 0, neutral at 0, orange above", () => {
    const rgb = (s: string) => s.match(/\d+/g)!.map(Number);
    const [r1, , b1] = rgb(pmvColour(-2));
    const [r2, , b2] = rgb(pmvColour(2));
    expect(b1).toBeGreaterThan(r1!);
    expect(r2).toBeGreaterThan(b2!);
    expect(pmvColour(0)).toBe("rgb(236, 238, 228)");
    expect(pmvColour(9)).toBe(pmvColour(3));
  });

  it("formatPmv rounds to 0.1 with a sign", () => {
    expect(formatPmv(0.44)).toBe("+0.4");
    expect(formatPmv(-1.25)).toBe("−1.3");
    expect(formatPmv(0.02)).toBe("0.0");
  });

  it("calibrateUnderlay scales so two points lie the typed distance apart, the first fixed", () => {
    const u = { ...newUnderlay("img"), origin: { x: -2, y: -2 } };
    const c = calibrateUnderlay(u, { x: 0, y: 0 }, { x: 3, y: 4 }, 10);
    expect(c.metresPerPixel).toBeCloseTo(0.04, 12);
    expect(c.origin).toEqual({ x: -4, y: -4 });
    expect(() => calibrateUnderlay(u, { x: 1, y: 1 }, { x: 1, y: 1 }, 3)).toThrow(RangeError);
  });
});
