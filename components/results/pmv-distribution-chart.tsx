"use client";

import { useId, useMemo, useState } from "react";
import { Bar, BarChart, CartesianGrid, ReferenceArea, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { InlineSelect } from "@/components/results/inline-select";
import { MAX_BIN_WIDTH, MIN_BIN_WIDTH, zoneHistograms } from "@/components/results/histogram";
import { pmvText } from "@/components/results/format";
import type { SeatResult, ZoneResult } from "@/lib/compute/types";

const WIDTHS = [MIN_BIN_WIDTH, 0.2, MAX_BIN_WIDTH];

/** PMV histogram per zone (small multiples on one shared axis), the zone's target band shaded. */
export function PmvDistributionChart({ seats, zones }: { seats: readonly SeatResult[]; zones: readonly ZoneResult[] }) {
  const id = useId();
  const [width, setWidth] = useState(0.25);
  const series = useMemo(() => zoneHistograms(seats, zones, width), [seats, zones, width]);
  const maxCount = Math.max(1, ...series.flatMap((s) => s.bins.map((b) => b.count)));
  return (
    <section aria-labelledby={`${id}-title`} className="space-y-3">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <h2 id={`${id}-title`} className="text-lg font-semibold">
          PMV distribution per zone
        </h2>
        <div className="no-print">
          <InlineSelect label="Bin width" value={width} onChange={(e) => setWidth(Number(e.target.value))}>
            {WIDTHS.map((w) => (
              <option key={w} value={w}>
                {w.toFixed(2)} PMV
              </option>
            ))}
          </InlineSelect>
        </div>
      </div>
      <p className="text-sm text-muted">Seats per PMV bin; the shaded band is the zone&apos;s comfort target.</p>
      <div className="grid gap-4 md:grid-cols-2">
        {series.map((s) => (
          <figure key={s.zoneId || "none"} className="rounded-md border border-line bg-white p-3">
            <figcaption className="mb-1 text-sm font-medium">
              {s.name}
              {s.band ? (
                <span className="font-normal text-muted">
                  {" "}
                  — target {pmvText(s.band.min)} … {pmvText(s.band.max)}
                </span>
              ) : null}
            </figcaption>
            <div className="h-48">
              <ResponsiveContainer width="100%" height="100%">
                <BarChart data={s.bins} margin={{ top: 4, right: 8, bottom: 4, left: -16 }}>
                  <CartesianGrid strokeDasharray="3 3" stroke="var(--color-line)" vertical={false} />
                  {s.bandBins ? <ReferenceArea x1={s.bandBins.from} x2={s.bandBins.to} fill="var(--color-accent)" fillOpacity={0.12} ifOverflow="extendDomain" /> : null}
                  <XAxis dataKey="label" tick={{ fontSize: 10 }} tickFormatter={(l: string) => l.split("…")[0] ?? l} interval="preserveStartEnd" />
                  <YAxis allowDecimals={false} domain={[0, maxCount]} tick={{ fontSize: 10 }} />
                  <Tooltip formatter={(v) => [`${v} seats`, "Seats"]} labelFormatter={(l) => `PMV ${l}`} />
                  <Bar dataKey="count" name="Seats" fill="var(--color-accent)" isAnimationActive={false} />
                </BarChart>
              </ResponsiveContainer>
            </div>
          </figure>
        ))}
      </div>
    </section>
  );
}
