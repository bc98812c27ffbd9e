"use client";

/**
 * The plan's elements as Konva nodes. Each one is memoised on its (immutable) element record, so
 * a change to one seat redraws that seat only; positions come from the model, and Konva only
 * reports finished gestures back (see plan-canvas.tsx).
 */
import type Konva from "konva";
import { memo } from "react";
import { Circle, Group, Line, Rect, Shape, Text } from "react-konva";
import type { Opening, Panel, Room, Seat, Zone } from "@/lib/layout/schema";
import { SEAT_RADIUS_M, WALL_PANEL_DEPTH_M, openingSegment, polygonCentroid } from "@/lib/plan/geometry";

export const PLAN_COLOURS = {
  ink: "#1f2a33",
  muted: "#5d6b76",
  accent: "#0f766e",
  // See-through, so a floor-plan underlay shows under the rooms.
  roomFill: "rgba(255, 253, 248, 0.55)",
  roomStroke: "#5d6b76",
  warmFill: "#f6c3a3",
  warmStroke: "#c2410c",
  coolFill: "#b9dcf0",
  coolStroke: "#0369a1",
  glazing: "#5fa8d3",
  danger: "#b91c1c",
} as const;

type DragHandler = (e: Konva.KonvaEventObject<DragEvent>) => void;

export interface ShapeHandlers {
  onDragStart: DragHandler;
  onDragEnd: DragHandler;
}

const flat = (points: readonly { x: number; y: number }[]) => points.flatMap((p) => [p.x, p.y]);

/**
 * Labels are sized in plan metres (`labelM`), which the canvas sets from the zoom so that text
 * stays about the same size on screen; 0 hides them (zoomed far out).
 */

export const RoomShape = memo(function RoomShape({ room, selected, draggable, handlers, labelM }: { room: Room; selected: boolean; draggable: boolean; handlers: ShapeHandlers; labelM: number }) {
  const c = polygonCentroid(room.outline);
  return (
    <Group id={room.id} name="element room" draggable={draggable} onDragStart={handlers.onDragStart} onDragEnd={handlers.onDragEnd}>
      <Line
        points={flat(room.outline)}
        closed
        fill={PLAN_COLOURS.roomFill}
        stroke={selected ? PLAN_COLOURS.accent : PLAN_COLOURS.roomStroke}
        strokeWidth={selected ? 3 : 2}
        strokeScaleEnabled={false}
        perfectDrawEnabled={false}
      />
      {labelM > 0 ? <Text text={room.name} x={c.x} y={c.y} fontSize={labelM * 1.2} fill={PLAN_COLOURS.muted} listening={false} offsetX={room.name.length * labelM * 0.3} /> : null}
    </Group>
  );
});

function zoneTint(zone: Zone): string {
  if (zone.target.kind === "pmvBand") return "rgba(15, 118, 110, 0.10)";
  return { A: "rgba(15, 118, 110, 0.16)", B: "rgba(15, 118, 110, 0.10)", C: "rgba(15, 118, 110, 0.05)" }[zone.target.category];
}

export const ZoneShape = memo(function ZoneShape({ zone, selected, draggable, handlers, labelM }: { zone: Zone; selected: boolean; draggable: boolean; handlers: ShapeHandlers; labelM: number }) {
  const c = polygonCentroid(zone.outline);
  const target = zone.target.kind === "pmvBand" ? `PMV ${zone.target.minPmv} … ${zone.target.maxPmv}` : `Category ${zone.target.category}`;
  return (
    <Group id={zone.id} name="element zone" draggable={draggable} onDragStart={handlers.onDragStart} onDragEnd={handlers.onDragEnd}>
      <Line
        points={flat(zone.outline)}
        closed
        fill={zoneTint(zone)}
        stroke={selected ? PLAN_COLOURS.accent : "#0f766e"}
        strokeWidth={selected ? 3 : 1.5}
        dash={[8, 5]}
        strokeScaleEnabled={false}
        perfectDrawEnabled={false}
      />
      {labelM > 0 ? <Text text={`${zone.name}\n${target}`} x={c.x} y={c.y + labelM * 1.5} fontSize={labelM * 0.9} fill={PLAN_COLOURS.accent} listening={false} /> : null}
    </Group>
  );
});

export const OpeningShape = memo(function OpeningShape({ opening, room, selected }: { opening: Opening; room: Room | undefined; selected: boolean }) {
  const segment = openingSegment(opening, room);
  if (!segment) return null;
  return (
    <Line
      id={opening.id}
      name="element opening"
      points={flat(segment)}
      stroke={selected ? PLAN_COLOURS.accent : opening.kind === "glazedDoor" ? "#2b7bb0" : PLAN_COLOURS.glazing}
      strokeWidth={selected ? 8 : 6}
      hitStrokeWidth={16}
      strokeScaleEnabled={false}
      lineCap="butt"
    />
  );
});

/** Parallel lines along the louver axis, clipped to the panel face (drawn in the panel's frame). */
function LouverHatch({ along, across, axisInPanelDeg }: { along: number; across: number; axisInPanelDeg: number }) {
  return (
    <Shape
      listening={false}
      sceneFunc={(ctx, shape) => {
        ctx.save();
        ctx.beginPath();
        ctx.rect(-along / 2, -across / 2, along, across);
        ctx.clip();
        ctx.rotate((axisInPanelDeg * Math.PI) / 180);
        const reach = Math.hypot(along, across);
        ctx.beginPath();
        for (let d = -reach; d <= reach; d += 0.15) {
          ctx.moveTo(-reach, d);
          ctx.lineTo(reach, d);
        }
        // Stroke while the clip is active; restore() would drop it.
        ctx.fillStrokeShape(shape);
        ctx.restore();
      }}
      stroke="rgba(31, 42, 51, 0.45)"
      strokeWidth={1}
      strokeScaleEnabled={false}
    />
  );
}

export const PanelShape = memo(function PanelShape({
  panel, selected, draggable, warning, handlers, labelM,
}: { panel: Panel; selected: boolean; draggable: boolean; warning: string | null; handlers: ShapeHandlers; labelM: number }) {
  const heating = panel.mode === "heating";
  const along = panel.mounting === "ceiling" ? panel.lengthM : WALL_PANEL_DEPTH_M;
  const across = panel.mounting === "ceiling" ? panel.widthM : panel.lengthM;
  return (
    <Group
      id={panel.id}
      name="element panel"
      x={panel.center.x}
      y={panel.center.y}
      rotation={panel.rotationDeg}
      draggable={draggable}
      onDragStart={handlers.onDragStart}
      onDragEnd={handlers.onDragEnd}
    >
      <Rect
        x={-along / 2}
        y={-across / 2}
        width={along}
        height={across}
        fill={heating ? PLAN_COLOURS.warmFill : PLAN_COLOURS.coolFill}
        stroke={selected ? PLAN_COLOURS.accent : heating ? PLAN_COLOURS.warmStroke : PLAN_COLOURS.coolStroke}
        strokeWidth={selected ? 3 : 1.5}
        strokeScaleEnabled={false}
        hitStrokeWidth={12}
        perfectDrawEnabled={false}
      />
      {panel.louver ? <LouverHatch along={along} across={across} axisInPanelDeg={panel.louver.axisDeg - panel.rotationDeg} /> : null}
      {panel.mounting === "ceiling" && labelM > 0 ? (
        <Text text={panel.label} x={-along / 2 + 0.08} y={-across / 2 + 0.06} fontSize={labelM * 0.8} fill={PLAN_COLOURS.ink} listening={false} />
      ) : null}
      {warning ? (
        <Group x={along / 2} y={-across / 2} listening={false}>
          <Line points={[0, -0.36, 0.3, 0.14, -0.3, 0.14]} closed fill="#fde68a" stroke={PLAN_COLOURS.danger} strokeWidth={1.5} strokeScaleEnabled={false} />
          <Text text="!" x={-0.05} y={-0.2} fontSize={0.3} fontStyle="bold" fill={PLAN_COLOURS.danger} />
        </Group>
      ) : null}
    </Group>
  );
});

export const SeatShape = memo(function SeatShape({ seat, selected, draggable, handlers, labelM }: { seat: Seat; selected: boolean; draggable: boolean; handlers: ShapeHandlers; labelM: number }) {
  return (
    <Group id={seat.id} name="element seat" x={seat.position.x} y={seat.position.y} draggable={draggable} onDragStart={handlers.onDragStart} onDragEnd={handlers.onDragEnd}>
      <Group rotation={seat.facingDeg}>
        <Circle
          radius={SEAT_RADIUS_M}
          fill="#ffffff"
          stroke={selected ? PLAN_COLOURS.accent : PLAN_COLOURS.ink}
          strokeWidth={selected ? 3 : 1.5}
          strokeScaleEnabled={false}
          perfectDrawEnabled={false}
        />
        <Line points={[SEAT_RADIUS_M * 0.2, 0, SEAT_RADIUS_M * 1.6, 0]} stroke={PLAN_COLOURS.ink} strokeWidth={2} strokeScaleEnabled={false} listening={false} />
      </Group>
      {labelM > 0 ? <Text text={seat.label} x={-SEAT_RADIUS_M} y={SEAT_RADIUS_M + 0.05} fontSize={labelM * 0.75} fill={PLAN_COLOURS.ink} listening={false} /> : null}
    </Group>
  );
});
