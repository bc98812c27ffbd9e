"use client";

import { CartesianGrid, Legend, Line, LineChart, ReferenceArea, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { bandText, type BeforeAfterZone } from "@/components/louvers/chart-data";
import { pmvText } from "@/components/results/format";

/** Before/after PMV of each seat of one zone, the zone's target band shaded. */
export function BeforeAfterChart({ zone }: { zone: BeforeAfterZone }) {
  const values = zone.seats.flatMap((s) => [s.pmvBefore, s.pmvAfter]).concat([zone.band.min, zone.band.max]);
  const lo = Math.floor((Math.min(...values) - 0.1) * 10) / 10;
  const hi = Math.ceil((Math.max(...values) + 0.1) * 10) / 10;
  return (
    <figure className="rounded-md border border-line bg-white p-3">
      <figcaption className="mb-1 text-sm font-medium">
        {zone.name} <span className="font-normal text-muted">— target {bandText(zone.target)} (shaded)</span>
      </figcaption>
      <div className="h-56">
        <ResponsiveContainer width="100%" height="100%">
          <LineChart data={zone.seats} margin={{ top: 4, right: 12, bottom: 4, left: -8 }}>
            <CartesianGrid strokeDasharray="3 3" stroke="var(--color-line)" vertical={false} />
            <ReferenceArea y1={zone.band.min} y2={zone.band.max} fill="var(--color-accent)" fillOpacity={0.12} ifOverflow="extendDomain" />
            <XAxis dataKey="label" tick={{ fontSize: 10 }} interval="preserveStartEnd" />
            <YAxis domain={[lo, hi]} tick={{ fontSize: 10 }} tickFormatter={(v: number) => v.toFixed(1)} label={{ value: "PMV", angle: -90, position: "insideLeft", offset: 16, fontSize: 11 }} />
            <Tooltip formatter={(v) => pmvText(Number(v))} />
            <Legend wrapperStyle={{ fontSize: 12 }} />
            <Line dataKey="pmvBefore" name="Before" stroke="var(--color-muted)" strokeOpacity={0} dot={{ r: 3, fill: "var(--color-muted)" }} isAnimationActive={false} />
            <Line dataKey="pmvAfter" name="After" stroke="var(--color-accent)" strokeOpacity={0} dot={{ r: 4, fill: "var(--color-accent)" }} isAnimationActive={false} />
          </LineChart>
        </ResponsiveContainer>
      </div>
    </figure>
  );
}
