"use client";

/**
 * The plan canvas. Konva is the view only: element nodes are drawn from the layout, and the
 * canvas reports completed gestures (a click, a drag end, a transform end) to the editor
 * reducer. Zoom, pan, the rubber band and the drawing preview are local view state; they never
 * touch the layout and never re-render the element layers (those are memoised).
 */
import type Konva from "konva";
import { memo, useCallback, useEffect, useImperativeHandle, useMemo, useRef, useState, type Dispatch, type Ref } from "react";
import { Circle, Group, Image as KonvaImage, Layer, Line, Rect, Shape, Stage, Transformer } from "react-konva";
import type { ComputeResult } from "@/lib/compute/types";
import type { Layout, PlanPoint } from "@/lib/layout/schema";
import type { EditorAction } from "@/lib/plan/editor";
import { findElement, layoutBounds, type AnyElement, type Bounds } from "@/lib/plan/geometry";
import { snapDelta, type GridSettings } from "@/lib/plan/snap";
import type { Tool } from "@/lib/plan/tools";
import { Heatmap, SeatMarkers, type OverlayMode } from "@/components/plan/overlay-shapes";
import { OpeningShape, PanelShape, RoomShape, SeatShape, ZoneShape, PLAN_COLOURS, type ShapeHandlers } from "@/components/plan/shapes";

export interface ViewTransform {
  /** Screen pixels per plan metre. */
  scale: number;
  /** Screen position of the plan origin, px. */
  x: number;
  y: number;
}

export interface PlanCanvasHandle {
  fit(): void;
}

export interface PlanCanvasProps {
  layout: Layout;
  selection: readonly string[];
  tool: Tool;
  grid: GridSettings;
  readOnly: boolean;
  dispatch: Dispatch<EditorAction>;
  result: ComputeResult | null;
  overlay: { visible: boolean; mode: OverlayMode };
  underlayImage: HTMLImageElement | null;
  /** Panels to badge: id → warning text. */
  panelWarnings: ReadonlyMap<string, string>;
  handle?: Ref<PlanCanvasHandle>;
}

const MIN_SCALE = 5;
const MAX_SCALE = 400;
const ZOOM_STEP = 1.12;
/** Tool tolerances in screen pixels, turned into metres at the current zoom. */
const CLOSE_RADIUS_PX = 12;
const BAND_THRESHOLD_PX = 4;

function fitView(bounds: Bounds | null, width: number, height: number): ViewTransform {
  if (!bounds || width === 0 || height === 0) return { scale: 40, x: 40, y: 40 };
  const margin = 40;
  const w = Math.max(bounds.maxX - bounds.minX, 1);
  const h = Math.max(bounds.maxY - bounds.minY, 1);
  const scale = Math.max(MIN_SCALE, Math.min(MAX_SCALE, Math.min((width - 2 * margin) / w, (height - 2 * margin) / h)));
  return { scale, x: margin - bounds.minX * scale + (width - 2 * margin - w * scale) / 2, y: margin - bounds.minY * scale + (height - 2 * margin - h * scale) / 2 };
}

const round = (v: number, digits = 3) => Math.round(v * 10 ** digits) / 10 ** digits;
/** Konva reports rotations in (−∞, ∞); the layout keeps (−180, 180]. */
function normaliseDeg(deg: number): number {
  const d = ((((deg + 180) % 360) + 360) % 360) - 180;
  return round(d === -180 ? 180 : d, 4);
}

/** Folds a finished transform of `node` into its element's geometry and resets the node. */
function foldTransform(node: Konva.Node, item: AnyElement): AnyElement {
  const sx = node.scaleX();
  const sy = node.scaleY();
  let result: AnyElement = item;
  switch (item.kind) {
    case "room":
    case "zone": {
      const t = node.getTransform();
      const outline = item.element.outline.map((p) => {
        const q = t.point(p);
        return { x: round(q.x), y: round(q.y) };
      });
      result = item.kind === "room" ? { kind: "room", element: { ...item.element, outline } } : { kind: "zone", element: { ...item.element, outline } };
      node.position({ x: 0, y: 0 });
      break;
    }
    case "panel": {
      const p = item.element;
      const ceiling = p.mounting === "ceiling";
      result = {
        kind: "panel",
        element: {
          ...p,
          center: { x: round(node.x()), y: round(node.y()) },
          rotationDeg: normaliseDeg(node.rotation()),
          lengthM: round(Math.max(0.1, Math.min(50, p.lengthM * (ceiling ? sx : sy)))),
          widthM: ceiling ? round(Math.max(0.1, Math.min(50, p.widthM * sy))) : p.widthM,
        },
      };
      break;
    }
    case "seat":
      result = {
        kind: "seat",
        element: { ...item.element, position: { x: round(node.x()), y: round(node.y()) }, facingDeg: normaliseDeg(item.element.facingDeg + node.rotation()) },
      };
      node.rotation(0);
      break;
    case "opening":
      break;
  }
  node.scale({ x: 1, y: 1 });
  node.skew({ x: 0, y: 0 });
  if (item.kind === "room" || item.kind === "zone") node.rotation(0);
  return result;
}

/** The reference point that lands on the grid when an element is dragged. */
function anchorOf(item: AnyElement): PlanPoint {
  switch (item.kind) {
    case "room":
    case "zone":
      return item.element.outline[0] ?? { x: 0, y: 0 };
    case "panel":
      return item.element.center;
    case "seat":
      return item.element.position;
    case "opening":
      return { x: 0, y: 0 };
  }
}

const GridLines = memo(function GridLines({ view, width, height, grid }: { view: ViewTransform; width: number; height: number; grid: GridSettings }) {
  // Thin out the drawn grid when it would be denser than one line per 8 px.
  let step = grid.sizeM;
  while (step * view.scale < 8) step *= 2;
  return (
    <Shape
      listening={false}
      perfectDrawEnabled={false}
      sceneFunc={(ctx) => {
        const x0 = -view.x / view.scale;
        const y0 = -view.y / view.scale;
        const x1 = x0 + width / view.scale;
        const y1 = y0 + height / view.scale;
        ctx.beginPath();
        for (let x = Math.floor(x0 / step) * step; x <= x1; x += step) {
          ctx.moveTo(x, y0);
          ctx.lineTo(x, y1);
        }
        for (let y = Math.floor(y0 / step) * step; y <= y1; y += step) {
          ctx.moveTo(x0, y);
          ctx.lineTo(x1, y);
        }
        ctx.strokeStyle = grid.enabled ? "rgba(93, 107, 118, 0.16)" : "rgba(93, 107, 118, 0.07)";
        ctx.lineWidth = 1 / view.scale;
        ctx.stroke();
      }}
    />
  );
});

interface ElementsProps {
  layout: Layout;
  selected: ReadonlySet<string>;
  editable: boolean;
  handlers: ShapeHandlers;
  panelWarnings: ReadonlyMap<string, string>;
  result: ComputeResult | null;
  overlay: { visible: boolean; mode: OverlayMode };
  labelM: number;
}

/** Everything on the plan layer; memoised so view-only updates (zoom, pointer) skip it. */
const PlanElements = memo(function PlanElements({ layout, selected, editable, handlers, panelWarnings, result, overlay, labelM }: ElementsProps) {
  const rooms = useMemo(() => new Map(layout.rooms.map((r) => [r.id, r])), [layout.rooms]);
  const showOverlay = overlay.visible && result !== null;
  return (
    <>
      <Group>
        {layout.rooms.map((room) => (
          <RoomShape key={room.id} room={room} selected={selected.has(room.id)} draggable={editable && selected.has(room.id)} handlers={handlers} labelM={labelM} />
        ))}
      </Group>
      {showOverlay ? <Heatmap heatmap={result.heatmap} mode={overlay.mode} /> : null}
      <Group>
        {layout.zones.map((zone) => (
          <ZoneShape key={zone.id} zone={zone} selected={selected.has(zone.id)} draggable={editable && selected.has(zone.id)} handlers={handlers} labelM={labelM} />
        ))}
      </Group>
      <Group>
        {layout.openings.map((o) => (
          <OpeningShape key={o.id} opening={o} room={rooms.get(o.roomId)} selected={selected.has(o.id)} />
        ))}
      </Group>
      <Group>
        {layout.panels.map((p) => (
          <PanelShape key={p.id} panel={p} selected={selected.has(p.id)} draggable={editable} warning={panelWarnings.get(p.id) ?? null} handlers={handlers} labelM={labelM} />
        ))}
      </Group>
      <Group>
        {layout.seats.map((s) => (
          <SeatShape key={s.id} seat={s} selected={selected.has(s.id)} draggable={editable} handlers={handlers} labelM={labelM} />
        ))}
      </Group>
      {showOverlay ? <SeatMarkers seats={layout.seats} result={result} /> : null}
    </>
  );
});

export function PlanCanvas({ layout, selection, tool, grid, readOnly, dispatch, result, overlay, underlayImage, panelWarnings, handle }: PlanCanvasProps) {
  const containerRef = useRef<HTMLDivElement>(null);
  const stageRef = useRef<Konva.Stage>(null);
  const transformerRef = useRef<Konva.Transformer>(null);
  const [size, setSize] = useState({ width: 0, height: 0 });
  const [view, setView] = useState<ViewTransform | null>(null);
  const [pointer, setPointer] = useState<PlanPoint | null>(null);
  const [spaceHeld, setSpaceHeld] = useState(false);

  // Latest values for the stable event handlers below.
  const latest = useRef({ layout, selection, tool, grid, view, readOnly });
  useEffect(() => {
    latest.current = { layout, selection, tool, grid, view, readOnly };
  });

  useEffect(() => {
    const el = containerRef.current;
    if (!el) return;
    const observer = new ResizeObserver(([entry]) => {
      if (entry) setSize({ width: Math.floor(entry.contentRect.width), height: Math.floor(entry.contentRect.height) });
    });
    observer.observe(el);
    return () => observer.disconnect();
  }, []);

  const fit = useCallback(() => {
    const el = containerRef.current;
    if (!el) return;
    setView(fitView(layoutBounds(latest.current.layout), el.clientWidth, el.clientHeight));
  }, []);
  useImperativeHandle(handle, () => ({ fit }), [fit]);

  // First view: fit the plan once the container has a size.
  useEffect(() => {
    if (view === null && size.width > 0) fit();
  }, [view, size.width, fit]);

  useEffect(() => {
    const down = (e: KeyboardEvent) => {
      if (e.code === "Space" && !(e.target instanceof HTMLInputElement || e.target instanceof HTMLTextAreaElement || e.target instanceof HTMLSelectElement || e.target instanceof HTMLButtonElement)) {
        e.preventDefault();
        setSpaceHeld(true);
      }
    };
    const up = (e: KeyboardEvent) => {
      if (e.code === "Space") setSpaceHeld(false);
    };
    window.addEventListener("keydown", down);
    window.addEventListener("keyup", up);
    return () => {
      window.removeEventListener("keydown", down);
      window.removeEventListener("keyup", up);
    };
  }, []);

  const toolOptions = useCallback(() => {
    const scale = latest.current.view?.scale ?? 40;
    return { closeRadiusM: CLOSE_RADIUS_PX / scale, bandThresholdM: BAND_THRESHOLD_PX / scale };
  }, []);

  // --- dragging elements: one `move` on drag end (a drag is one undo entry) ---
  const drag = useRef<{ primary: string; ids: string[]; starts: Map<string, { x: number; y: number }> } | null>(null);

  const handlers = useMemo<ShapeHandlers>(
    () => ({
      onDragStart: (e) => {
        if (drag.current) return; // the other selected nodes, started by the Transformer
        const stage = stageRef.current;
        const id = e.target.id();
        const { selection } = latest.current;
        let ids = selection.includes(id) ? [...selection] : [id];
        if (!selection.includes(id)) dispatch({ type: "select", ids: [id] });
        ids = ids.filter((x) => {
          const item = findElement(latest.current.layout, x);
          return item !== null && item.kind !== "opening";
        });
        const starts = new Map<string, { x: number; y: number }>();
        for (const x of ids) {
          const node = stage?.findOne(`#${x}`);
          if (node) starts.set(x, node.position());
        }
        drag.current = { primary: id, ids, starts };
      },
      onDragEnd: () => {
        const current = drag.current;
        const stage = stageRef.current;
        if (!current || !stage) return;
        drag.current = null;
        const node = stage.findOne(`#${current.primary}`);
        const start = current.starts.get(current.primary);
        const item = findElement(latest.current.layout, current.primary);
        if (!node || !start || !item) return;
        const raw = { x: node.x() - start.x, y: node.y() - start.y };
        const delta = snapDelta(anchorOf(item), raw.x, raw.y, latest.current.grid);
        // Put the nodes back where the model has them; the model's new positions arrive with the next render.
        for (const [x, pos] of current.starts) stage.findOne(`#${x}`)?.position(pos);
        if (delta.x !== 0 || delta.y !== 0) dispatch({ type: "move", ids: current.ids, dx: delta.x, dy: delta.y });
        else stage.batchDraw();
      },
    }),
    [dispatch],
  );

  // --- selection handles on their own layer ---
  const selectedSet = useMemo(() => new Set(selection), [selection]);
  const selectedKinds = useMemo(() => selection.map((id) => findElement(layout, id)?.kind), [selection, layout]);
  useEffect(() => {
    const tr = transformerRef.current;
    const stage = stageRef.current;
    if (!tr || !stage) return;
    const nodes = readOnly
      ? []
      : selection
          .filter((id) => {
            const kind = findElement(layout, id)?.kind;
            return kind !== undefined && kind !== "opening";
          })
          .map((id) => stage.findOne(`#${id}`))
          .filter((n): n is Konva.Node => n !== undefined);
    tr.nodes(nodes);
    tr.getLayer()?.batchDraw();
  }, [selection, layout, readOnly]);

  const onTransformEnd = useCallback(() => {
    const tr = transformerRef.current;
    if (!tr) return;
    const items = tr
      .nodes()
      .map((node) => {
        const item = findElement(latest.current.layout, node.id());
        return item ? foldTransform(node, item) : null;
      })
      .filter((x): x is AnyElement => x !== null);
    dispatch({ type: "replace", items });
  }, [dispatch]);

  // --- pointer: tools, rubber band, pan, zoom ---
  const pan = useRef<{ pointer: { x: number; y: number }; origin: { x: number; y: number } } | null>(null);
  const pendingHit = useRef<{ id: string; additive: boolean } | null>(null);

  const planPointer = (): PlanPoint | null => stageRef.current?.getRelativePointerPosition() ?? null;

  const elementIdOf = (target: Konva.Node): string | null => {
    const node = target.hasName("element") ? target : target.findAncestor(".element");
    return node ? node.id() : null;
  };

  const onMouseDown = (e: Konva.KonvaEventObject<MouseEvent>) => {
    const stage = stageRef.current;
    if (!stage) return;
    if (e.evt.button === 1 || (e.evt.button === 0 && spaceHeld)) {
      e.evt.preventDefault();
      pan.current = { pointer: { x: e.evt.clientX, y: e.evt.clientY }, origin: stage.position() };
      return;
    }
    if (e.evt.button !== 0 || tool.kind !== "select") return;
    if (e.target.getParent()?.className === "Transformer") return;
    const point = planPointer();
    if (!point) return;
    const id = elementIdOf(e.target);
    const additive = e.evt.shiftKey;
    const kind = id ? findElement(layout, id)?.kind : undefined;
    pendingHit.current = null;
    if (id && (kind === "seat" || kind === "panel" || kind === "opening" || selectedSet.has(id))) {
      if (additive) dispatch({ type: "select", ids: [id], mode: "toggle" });
      else if (!selectedSet.has(id)) dispatch({ type: "select", ids: [id] });
      return;
    }
    // Empty plan, or a room/zone not yet selected: a click selects it, a drag draws a band.
    if (id) pendingHit.current = { id, additive };
    dispatch({ type: "tool", event: { type: "down", point, additive }, options: toolOptions() });
  };

  const onMouseMove = (e: Konva.KonvaEventObject<MouseEvent>) => {
    const stage = stageRef.current;
    if (!stage) return;
    if (pan.current) {
      stage.position({ x: pan.current.origin.x + e.evt.clientX - pan.current.pointer.x, y: pan.current.origin.y + e.evt.clientY - pan.current.pointer.y });
      stage.batchDraw();
      return;
    }
    const point = planPointer();
    if (!point) return;
    if (tool.kind === "draw" || tool.kind === "calibrate") setPointer(point);
    if (tool.kind === "select" && tool.gesture.phase !== "idle") dispatch({ type: "tool", event: { type: "move", point }, options: toolOptions() });
  };

  const onMouseUp = () => {
    const stage = stageRef.current;
    if (!stage) return;
    if (pan.current) {
      pan.current = null;
      const p = stage.position();
      setView((v) => (v ? { ...v, x: p.x, y: p.y } : v));
      return;
    }
    if (tool.kind !== "select" || tool.gesture.phase === "idle") return;
    const point = planPointer() ?? tool.gesture.start;
    const wasClick = tool.gesture.phase === "pointing";
    dispatch({ type: "tool", event: { type: "up", point }, options: toolOptions() });
    const hit = pendingHit.current;
    pendingHit.current = null;
    if (wasClick && hit) dispatch({ type: "select", ids: [hit.id], mode: hit.additive ? "toggle" : "replace" });
  };

  const onClick = (e: Konva.KonvaEventObject<MouseEvent>) => {
    if (e.evt.button !== 0 || spaceHeld || tool.kind === "select") return;
    const point = planPointer();
    if (point) dispatch({ type: "tool", event: { type: "click", point }, options: toolOptions() });
  };

  const onWheel = (e: Konva.KonvaEventObject<WheelEvent>) => {
    e.evt.preventDefault();
    const stage = stageRef.current;
    const screen = stage?.getPointerPosition();
    if (!stage || !screen || !view) return;
    const scale = Math.max(MIN_SCALE, Math.min(MAX_SCALE, e.evt.deltaY > 0 ? view.scale / ZOOM_STEP : view.scale * ZOOM_STEP));
    // Keep the plan point under the pointer where it is.
    const plan = { x: (screen.x - stage.x()) / view.scale, y: (screen.y - stage.y()) / view.scale };
    setView({ scale, x: screen.x - plan.x * scale, y: screen.y - plan.y * scale });
  };

  // Space held means the pointer pans: no element drags meanwhile.
  const editable = !readOnly && tool.kind === "select" && !spaceHeld;
  const band = tool.kind === "select" && tool.gesture.phase === "banding" ? tool.gesture : null;
  const draft = tool.kind === "draw" ? tool.points : null;
  const onlySeats = selectedKinds.length > 0 && selectedKinds.every((k) => k === "seat");
  const v = view ?? { scale: 40, x: 40, y: 40 };
  // About 11 px text on screen, no larger than 0.4 m on the plan; hidden when zoomed far out.
  const labelM = v.scale < 12 ? 0 : Math.min(0.4, 11 / v.scale);
  const cursor = spaceHeld ? "grab" : tool.kind === "select" ? "default" : "crosshair";

  return (
    <div
      ref={containerRef}
      className="relative h-full w-full overflow-hidden bg-[#f4f1ea]"
      style={{ cursor }}
      data-testid="plan-canvas"
      data-scale={v.scale}
      data-offset-x={v.x}
      data-offset-y={v.y}
      onContextMenu={(e) => e.preventDefault()}
    >
      {size.width > 0 ? (
        <Stage
          ref={stageRef}
          width={size.width}
          height={size.height}
          scaleX={v.scale}
          scaleY={v.scale}
          x={v.x}
          y={v.y}
          onMouseDown={onMouseDown}
          onMouseMove={onMouseMove}
          onMouseUp={onMouseUp}
          onClick={onClick}
          onWheel={onWheel}
        >
          <Layer listening={false}>
            <GridLines view={v} width={size.width} height={size.height} grid={grid} />
            {underlayImage && layout.underlay && layout.underlay.visible ? (
              <KonvaImage
                image={underlayImage}
                x={layout.underlay.origin.x}
                y={layout.underlay.origin.y}
                scaleX={layout.underlay.metresPerPixel}
                scaleY={layout.underlay.metresPerPixel}
                opacity={layout.underlay.opacity}
              />
            ) : null}
          </Layer>
          <Layer>
            <PlanElements
              layout={layout}
              selected={selectedSet}
              editable={editable}
              handlers={handlers}
              panelWarnings={panelWarnings}
              result={result}
              overlay={overlay}
              labelM={labelM}
            />
          </Layer>
          <Layer>
            <Transformer
              ref={transformerRef}
              rotateEnabled
              resizeEnabled={!onlySeats}
              flipEnabled={false}
              ignoreStroke
              rotationSnaps={[0, 45, 90, 135, 180, 225, 270, 315]}
              anchorSize={9}
              borderStroke={PLAN_COLOURS.accent}
              anchorStroke={PLAN_COLOURS.accent}
              onTransformEnd={onTransformEnd}
              boundBoxFunc={(oldBox, newBox) => (Math.abs(newBox.width) < 4 || Math.abs(newBox.height) < 4 ? oldBox : newBox)}
            />
            {band ? (
              <Rect
                x={Math.min(band.start.x, band.current.x)}
                y={Math.min(band.start.y, band.current.y)}
                width={Math.abs(band.current.x - band.start.x)}
                height={Math.abs(band.current.y - band.start.y)}
                fill="rgba(15, 118, 110, 0.08)"
                stroke={PLAN_COLOURS.accent}
                strokeWidth={1}
                dash={[4, 3]}
                strokeScaleEnabled={false}
                listening={false}
              />
            ) : null}
            {draft && draft.length > 0 ? (
              <Group listening={false}>
                <Line
                  points={[...draft, ...(pointer ? [pointer] : [])].flatMap((p) => [p.x, p.y])}
                  stroke={PLAN_COLOURS.accent}
                  strokeWidth={2}
                  dash={[6, 4]}
                  strokeScaleEnabled={false}
                />
                {draft.map((p, i) => (
                  <Circle key={i} x={p.x} y={p.y} radius={(i === 0 ? 6 : 4) / v.scale} fill={i === 0 ? PLAN_COLOURS.accent : "#ffffff"} stroke={PLAN_COLOURS.accent} strokeWidth={1} strokeScaleEnabled={false} />
                ))}
              </Group>
            ) : null}
            {tool.kind === "calibrate"
              ? tool.points.map((p, i) => <Circle key={i} x={p.x} y={p.y} radius={5 / v.scale} fill={PLAN_COLOURS.danger} listening={false} />)
              : null}
          </Layer>
        </Stage>
      ) : null}
    </div>
  );
}
