"use client";

import { useId } from "react";
import { Bar, BarChart, CartesianGrid, Legend, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import type { PanelResult } from "@/lib/compute/types";
import { toDisplay, unitSymbol, type UnitSystem } from "@/lib/units";

/** Output per panel, stacked radiant and convective parts, in the display unit of power. */
export function PanelOutputChart({ panels, system }: { panels: readonly PanelResult[]; system: UnitSystem }) {
  const id = useId();
  const unit = unitSymbol("power", system);
  const data = panels.map((p) => ({
    label: p.label,
    radiant: Number(toDisplay("power", p.radiantWm2 * p.areaM2, system).toFixed(1)),
    convective: Number(toDisplay("power", p.convectiveWm2 * p.areaM2, system).toFixed(1)),
  }));
  return (
    <section aria-labelledby={`${id}-title`} className="space-y-3">
      <h2 id={`${id}-title`} className="text-lg font-semibold">
        Panel output ({unit})
      </h2>
      <div className="h-72 rounded-md border border-line bg-white p-3">
        <ResponsiveContainer width="100%" height="100%">
          <BarChart data={data} margin={{ top: 4, right: 8, bottom: 24, left: 8 }}>
            <CartesianGrid strokeDasharray="3 3" stroke="var(--color-line)" vertical={false} />
            <XAxis dataKey="label" tick={{ fontSize: 10 }} angle={-45} textAnchor="end" interval={0} height={40} />
            <YAxis tick={{ fontSize: 10 }} label={{ value: unit, angle: -90, position: "insideLeft", fontSize: 11 }} />
            <Tooltip formatter={(v, name) => [`${v} ${unit}`, name]} />
            <Legend verticalAlign="top" height={24} />
            <Bar dataKey="radiant" name="Radiant" stackId="out" fill="var(--color-warm)" isAnimationActive={false} />
            <Bar dataKey="convective" name="Convective" stackId="out" fill="var(--color-cool)" isAnimationActive={false} />
          </BarChart>
        </ResponsiveContainer>
      </div>
    </section>
  );
}
