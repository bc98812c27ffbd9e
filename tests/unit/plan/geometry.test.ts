import { describe, expect, it } from "vitest";
import {
  elementsInRect, hitTest, nearestEdge, panelCorners, pointInPolygon, polygonArea, polygonCentroid, rotatePoints, roomAt, scalePoints, layoutBounds,
} from "@/lib/plan/geometry";
import { sampleLayout, square } from "./helpers";

describe("polygon helpers", () => {
  it("polygonArea(square 4 m) is 16 m² in either winding", () => {
    expect(polygonArea(square(0, 0, 4))).toBeCloseTo(16, 12);
    expect(polygonArea([...square(0, 0, 4)].reverse())).toBeCloseTo(16, 12);
  });

  it("polygonArea of an L-shaped room sums its parts", () => {
    const l = [{ x: 0, y: 0 }, { x: 4, y: 0 }, { x: 4, y: 2 }, { x: 2, y: 2 }, { x: 2, y: 4 }, { x: 0, y: 4 }];
    expect(polygonArea(l)).toBeCloseTo(12, 12);
    // centroid of an L: (8·(2,1) + 4·(1,3)) / 12
    const c = polygonCentroid(l);
    expect(c.x).toBeCloseTo((8 * 2 + 4 * 1) / 12, 12);
    expect(c.y).toBeCloseTo((8 * 1 + 4 * 3) / 12, 12);
  });

  it("pointInPolygon tells inside, outside, the notch of an L and edges", () => {
    const l = [{ x: 0, y: 0 }, { x: 4, y: 0 }, { x: 4, y: 2 }, { x: 2, y: 2 }, { x: 2, y: 4 }, { x: 0, y: 4 }];
    expect(pointInPolygon({ x: 1, y: 1 }, l)).toBe(true);
    expect(pointInPolygon({ x: 3, y: 3 }, l)).toBe(false);
    expect(pointInPolygon({ x: 5, y: 1 }, l)).toBe(false);
    expect(pointInPolygon({ x: 4, y: 1 }, l)).toBe(true);
  });

  it("rotatePoints turns 90° from +x toward +y about a centre", () => {
    const [p] = rotatePoints([{ x: 2, y: 1 }], { x: 1, y: 1 }, 90);
    expect(p!.x).toBeCloseTo(1, 12);
    expect(p!.y).toBeCloseTo(2, 12);
  });

  it("scalePoints keeps the origin fixed", () => {
    expect(scalePoints(square(1, 1, 2), { x: 1, y: 1 }, 2, 0.5)).toEqual([{ x: 1, y: 1 }, { x: 5, y: 1 }, { x: 5, y: 2 }, { x: 1, y: 2 }]);
  });
});

describe("elements", () => {
  it("panelCorners of a ceiling panel rotated 90° swap its extents", () => {
    const corners = panelCorners({ center: { x: 0, y: 0 }, rotationDeg: 90, widthM: 1, lengthM: 3, mounting: "ceiling" });
    const xs = corners.map((c) => c.x);
    const ys = corners.map((c) => c.y);
    expect(Math.max(...xs) - Math.min(...xs)).toBeCloseTo(1, 9);
    expect(Math.max(...ys) - Math.min(...ys)).toBeCloseTo(3, 9);
  });

  it("hitTest returns the topmost element: seat over panel over room, and null outside", () => {
    const layout = sampleLayout();
    expect(hitTest(layout, { x: 1.1, y: 1 })?.element.id).toBe("seat-a");
    expect(hitTest(layout, { x: 3.5, y: 3.2 })?.element.id).toBe("panel-a");
    expect(hitTest(layout, { x: 5, y: 5 })?.element.id).toBe("room-a");
    expect(hitTest(layout, { x: 2, y: 0.02 })?.element.id).toBe("win-a");
    expect(hitTest(layout, { x: 9, y: 9 })).toBeNull();
  });

  it("elementsInRect selects only elements wholly inside the band", () => {
    const layout = sampleLayout();
    expect(elementsInRect(layout, { x: 0.5, y: 0.5 }, { x: 4.5, y: 4.5 }).sort()).toEqual(["panel-a", "seat-a"]);
    expect(elementsInRect(layout, { x: -1, y: -1 }, { x: 7, y: 7 }).sort()).toEqual(["panel-a", "room-a", "seat-a", "win-a"]);
  });

  it("roomAt picks the smallest containing room", () => {
    const layout = sampleLayout();
    layout.rooms.push({ id: "room-b", name: "Inner", outline: square(2, 2, 2), ceilingHeightM: 2.8 });
    expect(roomAt(layout, { x: 3, y: 3 })?.id).toBe("room-b");
    expect(roomAt(layout, { x: 1, y: 1 })?.id).toBe("room-a");
    expect(roomAt(layout, { x: 8, y: 1 })).toBeNull();
  });

  it("nearestEdge finds the wall, the distance along it and the inward normal", () => {
    const hit = nearestEdge(sampleLayout(), { x: 2.5, y: -0.2 }, 0.5);
    expect(hit?.edgeIndex).toBe(0);
    expect(hit?.alongM).toBeCloseTo(2.5, 9);
    expect(hit?.inward.y).toBeCloseTo(1, 9);
    expect(nearestEdge(sampleLayout(), { x: 3, y: 3 }, 0.5)).toBeNull();
  });

  it("layoutBounds spans every element", () => {
    expect(layoutBounds(sampleLayout())).toEqual({ minX: 0, minY: 0, maxX: 6, maxY: 6 });
  });
});
