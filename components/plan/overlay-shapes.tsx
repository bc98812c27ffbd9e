"use client";

/** The results overlay on the canvas: the heatmap and the seat PMV markers (not interactive). */
import { memo, useMemo } from "react";
import { Circle, Group, Shape, Text } from "react-konva";
import type { ComputeResult } from "@/lib/compute/types";
import type { Seat } from "@/lib/layout/schema";
import { SEAT_RADIUS_M } from "@/lib/plan/geometry";
import { formatPmv, mrtColour, mrtScale, pmvColour } from "@/lib/plan/palette";

export type OverlayMode = "pmv" | "mrt";

export const Heatmap = memo(function Heatmap({ heatmap, mode }: { heatmap: ComputeResult["heatmap"]; mode: OverlayMode }) {
  const scale = useMemo(() => mrtScale(heatmap.grids.flatMap((g) => g.mrtC)), [heatmap]);
  const step = heatmap.stepM;
  return (
    <Shape
      listening={false}
      opacity={0.7}
      perfectDrawEnabled={false}
      // One shape draws every cell: thousands of Rect nodes would be slow to build and to hit-test.
      sceneFunc={(ctx) => {
        for (const grid of heatmap.grids) {
          for (let row = 0; row < grid.rows; row += 1) {
            for (let col = 0; col < grid.cols; col += 1) {
              const i = row * grid.cols + col;
              const value = mode === "pmv" ? grid.pmv[i] : grid.mrtC[i];
              if (value === null || value === undefined) continue;
              ctx.fillStyle = mode === "pmv" ? pmvColour(value) : mrtColour(value, scale);
              ctx.fillRect(grid.originX + col * step - step / 2, grid.originY + row * step - step / 2, step, step);
            }
          }
        }
      }}
    />
  );
});

export const SeatMarkers = memo(function SeatMarkers({ seats, result }: { seats: readonly Seat[]; result: ComputeResult }) {
  const byId = useMemo(() => new Map(result.seats.map((s) => [s.id, s])), [result]);
  return (
    <Group listening={false}>
      {seats.map((seat) => {
        const r = byId.get(seat.id);
        if (!r) return null;
        return (
          <Group key={seat.id} x={seat.position.x} y={seat.position.y}>
            <Circle radius={SEAT_RADIUS_M * 0.62} fill={pmvColour(r.pmv)} stroke="#1f2a33" strokeWidth={1} strokeScaleEnabled={false} />
            <Text text={formatPmv(r.pmv)} x={-0.42} y={-SEAT_RADIUS_M - 0.34} width={0.84} align="center" fontSize={0.26} fontStyle="bold" fill="#1f2a33" />
          </Group>
        );
      })}
    </Group>
  );
});
