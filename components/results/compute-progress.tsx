"use client";

import { useEffect, useState } from "react";

/**
 * The server answers a computation in one response, so the steps shown are the stages the
 * server works through, paced by the time elapsed (the bar approaches but never reaches the end
 * until the answer arrives).
 */
const STEPS: ReadonlyArray<{ afterMs: number; text: string }> = [
  { afterMs: 0, text: "Sending the layout revision and the scenario" },
  { afterMs: 150, text: "Surface temperatures of walls, floor, ceiling and openings" },
  { afterMs: 350, text: "Angle factors from each seat to every surface and panel" },
  { afterMs: 800, text: "Mean radiant and operative temperature, PMV and PPD per seat" },
  { afterMs: 1500, text: "Radiant asymmetry, panel output and condensation margins" },
  { afterMs: 2500, text: "Comfort heatmap over each room" },
  { afterMs: 5000, text: "Still working: large plans take longer" },
];

export function ComputeProgress({ startedAt }: { startedAt: number }) {
  const [now, setNow] = useState(startedAt);
  useEffect(() => {
    const timer = window.setInterval(() => setNow(Date.now()), 100);
    return () => window.clearInterval(timer);
  }, []);
  const elapsed = Math.max(0, now - startedAt);
  const step = [...STEPS].reverse().find((s) => elapsed >= s.afterMs) ?? STEPS[0]!;
  // 1 − e^(−t/τ): quick at first, then slower, below 95 % until the answer arrives.
  const fraction = Math.min(0.95, 1 - Math.exp(-elapsed / 1200));
  return (
    <div className="space-y-2 rounded-md border border-line bg-white px-4 py-3" role="status" aria-live="polite">
      <p className="text-sm">
        <span className="font-medium">Computing…</span> {step.text}
      </p>
      <div
        role="progressbar"
        aria-label="Computation progress"
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={Math.round(fraction * 100)}
        className="h-2 w-full overflow-hidden rounded bg-line/60"
      >
        <div className="h-full bg-accent transition-[width] duration-100" style={{ width: `${fraction * 100}%` }} />
      </div>
    </div>
  );
}
