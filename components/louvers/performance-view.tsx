"use client";

import { useMutation, useQuery } from "@tanstack/react-query";
import { useId, useMemo, useState } from "react";
import {
  CartesianGrid, Legend, Line, LineChart, ReferenceLine, ResponsiveContainer, Scatter, ScatterChart, Tooltip, XAxis, YAxis, ZAxis,
} from "recharts";
import { JobProgress } from "@/components/jobs/job-progress";
import { useJob } from "@/components/jobs/use-job";
import { polarEmission, polarLambert, polarRings, sweepRows, turndownText } from "@/components/louvers/chart-data";
import { cavityTableQuery, performanceQuery, sweepPanel, type LouverTable, type PerformanceResult } from "@/components/louvers/queries";
import { InlineSelect } from "@/components/results/inline-select";
import { pmvText } from "@/components/results/format";
import { apiErrorMessage } from "@/components/ui/api-errors";
import { Button } from "@/components/ui/button";
import { SkeletonRows } from "@/components/ui/skeleton";
import type { Layout } from "@/lib/layout/schema";
import { louverFaceEmissivityAt } from "@/lib/panels/louverLookup";

type PanelRow = PerformanceResult["panels"][number];

interface Props {
  projectId: string;
  scenarioId: string;
  revision: number;
  layout: Layout;
  /** compute:run — the PMV sweep runs computations. */
  canSweep: boolean;
}

/** Output against opening angle per panel with turndown, a louver setting's directional emission, and PMV per seat against angle. */
export function PerformanceView({ projectId, scenarioId, revision, layout, canSweep }: Props) {
  const performance = useQuery(performanceQuery(projectId, scenarioId, revision));
  const louvered = useMemo(() => performance.data?.panels.filter((p) => p.louvered) ?? [], [performance.data]);
  const [panelChoice, setPanelChoice] = useState("");
  if (performance.isPending) return <SkeletonRows rows={5} label="Computing panel output at each louver setting…" />;
  if (performance.error) {
    return (
      <p role="alert" className="text-sm text-danger">
        {apiErrorMessage(performance.error)}
      </p>
    );
  }
  const data = performance.data;
  const selected = louvered.find((p) => p.id === panelChoice) ?? louvered[0];
  const layoutPanel = selected ? layout.panels.find((p) => p.id === selected.id) : undefined;

  return (
    <div className="space-y-8">
      <section aria-labelledby="turndown-title" className="space-y-3">
        <h2 id="turndown-title" className="text-lg font-semibold">
          Output and turndown per panel
        </h2>
        <p className="text-sm text-muted">{data.method}</p>
        <div className="overflow-x-auto rounded-md border border-line bg-white">
          <table aria-label="Panel output and turndown" className="w-full text-sm">
            <thead className="bg-paper text-left text-xs uppercase tracking-wide text-muted">
              <tr>
                <th className="px-3 py-2">Panel</th>
                <th className="px-3 py-2">Mode</th>
                <th className="px-3 py-2">Louver range (°)</th>
                <th className="px-3 py-2 text-right">Current (°)</th>
                <th className="px-3 py-2 text-right">Output now (W)</th>
                <th className="px-3 py-2 text-right">Fully open (W)</th>
                <th className="px-3 py-2 text-right">Turndown</th>
              </tr>
            </thead>
            <tbody>
              {data.panels.map((p) => (
                <tr key={p.id} className="border-t border-line">
                  <th scope="row" className="px-3 py-1.5 text-left font-medium">
                    {p.label}
                  </th>
                  <td className="px-3 py-1.5">
                    {p.mode}
                    {p.active ? "" : " (off in this scenario)"}
                  </td>
                  <td className="px-3 py-1.5">{p.louverRange ? `${p.louverRange.minOpeningAngleDeg}–${p.louverRange.maxOpeningAngleDeg}` : "no louver"}</td>
                  <td className="px-3 py-1.5 text-right tabular-nums">{p.louverRange?.currentOpeningAngleDeg ?? "—"}</td>
                  <td className="px-3 py-1.5 text-right tabular-nums">{p.current.totalW.toFixed(0)}</td>
                  <td className="px-3 py-1.5 text-right tabular-nums">{(p.curve[p.curve.length - 1]?.totalW ?? 0).toFixed(0)}</td>
                  <td className="px-3 py-1.5 text-right tabular-nums">{turndownText(p.turndownRatio)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
        <ul className="flex flex-wrap gap-x-6 gap-y-1 text-sm" aria-label="Turndown per zone">
          {data.zones.map((z) => (
            <li key={z.id}>
              <span className="font-medium">{z.name}</span>: turndown {turndownText(z.turndownRatio)}
            </li>
          ))}
        </ul>
      </section>

      {selected && layoutPanel?.louver ? (
        <>
          <div className="flex flex-wrap items-end gap-3">
            <InlineSelect label="Louvered panel" value={selected.id} onChange={(e) => setPanelChoice(e.target.value)}>
              {louvered.map((p) => (
                <option key={p.id} value={p.id}>
                  {p.label}
                </option>
              ))}
            </InlineSelect>
          </div>
          <OutputCurveChart panel={selected} />
          <PolarEmission
            key={selected.id}
            finish={layoutPanel.louver.finish}
            wallEmissivity={layoutPanel.louver.wallEmissivity}
            flatEmissivity={layoutPanel.emissivity}
            range={[layoutPanel.louver.minOpeningAngleDeg, layoutPanel.louver.maxOpeningAngleDeg]}
            initialAngleDeg={layoutPanel.louver.openingAngleDeg}
          />
          <PmvSweep key={`${selected.id}:${scenarioId}:${revision}`} projectId={projectId} scenarioId={scenarioId} revision={revision} panel={selected} canSweep={canSweep} />
        </>
      ) : (
        <p className="text-sm text-muted">This revision has no louvered panel.</p>
      )}
    </div>
  );
}

function OutputCurveChart({ panel }: { panel: PanelRow }) {
  const id = useId();
  const points = panel.curve.filter((p) => p.openingAngleDeg !== null);
  return (
    <figure aria-labelledby={`${id}-title`} className="rounded-md border border-line bg-white p-3">
      <figcaption id={`${id}-title`} className="mb-1 text-sm font-medium">
        Output of {panel.label} against opening angle <span className="font-normal text-muted">— turndown {turndownText(panel.turndownRatio)}</span>
      </figcaption>
      <div className="h-64">
        <ResponsiveContainer width="100%" height="100%">
          <LineChart data={points} margin={{ top: 4, right: 16, bottom: 16, left: 0 }}>
            <CartesianGrid strokeDasharray="3 3" stroke="var(--color-line)" />
            <XAxis dataKey="openingAngleDeg" type="number" domain={["dataMin", "dataMax"]} tick={{ fontSize: 10 }} label={{ value: "Opening angle (°)", position: "insideBottom", offset: -8, fontSize: 11 }} />
            <YAxis tick={{ fontSize: 10 }} label={{ value: "W", angle: -90, position: "insideLeft", offset: 12, fontSize: 11 }} />
            <Tooltip formatter={(v) => `${Number(v).toFixed(0)} W`} labelFormatter={(l) => `${l}°`} />
            <Legend verticalAlign="top" wrapperStyle={{ fontSize: 12 }} />
            {panel.louverRange ? <ReferenceLine x={panel.louverRange.currentOpeningAngleDeg} stroke="var(--color-muted)" strokeDasharray="4 4" label={{ value: "now", fontSize: 10 }} /> : null}
            <Line dataKey="totalW" name="Total" stroke="var(--color-warm)" dot={false} isAnimationActive={false} />
            <Line dataKey="radiantW" name="Radiant" stroke="var(--color-accent)" dot={false} isAnimationActive={false} />
            <Line dataKey="convectiveW" name="Convective" stroke="var(--color-cool)" dot={false} isAnimationActive={false} />
          </LineChart>
        </ResponsiveContainer>
      </div>
    </figure>
  );
}

const noDot = () => <g />;

function PolarEmission({
  finish,
  wallEmissivity,
  flatEmissivity,
  range,
  initialAngleDeg,
}: {
  finish: "diffuse" | "specular";
  wallEmissivity: number;
  flatEmissivity: number;
  range: [number, number];
  initialAngleDeg: number;
}) {
  const id = useId();
  const [angleDeg, setAngleDeg] = useState(initialAngleDeg);
  const answer = useQuery(cavityTableQuery(finish, wallEmissivity));
  const jobId = answer.data && "jobId" in answer.data ? answer.data.jobId : null;
  const job = useJob<LouverTable>(jobId);
  const table = answer.data && "table" in answer.data ? answer.data.table : job.result;
  const series = useMemo(() => {
    if (!table) return null;
    const face = louverFaceEmissivityAt(table, Math.min(180, Math.max(0, angleDeg)));
    return { louver: polarEmission(face.directional), flat: polarLambert(flatEmissivity), hemispherical: face.hemispherical };
  }, [table, angleDeg, flatEmissivity]);
  const radius = series ? Math.max(0.05, ...series.louver.map((p) => p.intensity), ...series.flat.map((p) => p.intensity)) : 1;
  const rings = polarRings(radius);

  return (
    <figure aria-labelledby={`${id}-title`} className="space-y-2 rounded-md border border-line bg-white p-3">
      <figcaption id={`${id}-title`} className="text-sm font-medium">
        Directional emission of the louvered face{" "}
        <span className="font-normal text-muted">
          — {finish} cavity walls, ε<sub>wall</sub> {wallEmissivity}; radiant intensity ε(θ)·cos θ across the grooves (θ from the face normal, 10° bins mirrored), against a flat
          face of ε {flatEmissivity}
        </span>
      </figcaption>
      <label className="flex flex-wrap items-center gap-3 text-sm">
        <span className="font-medium">Opening angle for the plot (°)</span>
        <input type="range" min={range[0]} max={range[1]} step={1} value={angleDeg} onChange={(e) => setAngleDeg(Number(e.target.value))} className="w-64" />
        <span className="tabular-nums">{angleDeg}°</span>
      </label>
      {answer.error ? <p className="text-sm text-danger">{apiErrorMessage(answer.error)}</p> : null}
      {jobId && !table ? <JobProgress label="Cavity table" status={job.status} progress={job.progress} error={job.error} /> : null}
      {series ? (
        <>
          <p className="text-xs text-muted">Hemispherical emissivity of the face at {angleDeg}°: {series.hemispherical.toFixed(3)}.</p>
          <div className="mx-auto h-72 max-w-xl">
            <ResponsiveContainer width="100%" height="100%">
              <ScatterChart margin={{ top: 8, right: 16, bottom: 8, left: 16 }}>
                <XAxis type="number" dataKey="x" domain={[-radius, radius]} hide />
                <YAxis type="number" dataKey="y" domain={[0, radius]} hide />
                <ZAxis range={[10, 10]} />
                {rings.map((r) => (
                  <Scatter key={r.level} data={r.points} line={{ stroke: "var(--color-line)", strokeDasharray: "3 3" }} shape={noDot} legendType="none" isAnimationActive={false} />
                ))}
                <Scatter name={`Flat face (ε ${flatEmissivity})`} data={series.flat} line={{ stroke: "var(--color-muted)", strokeWidth: 1.5 }} shape={noDot} isAnimationActive={false} fill="var(--color-muted)" />
                <Scatter name={`Louvers at ${angleDeg}°`} data={series.louver} line={{ stroke: "var(--color-warm)", strokeWidth: 2 }} fill="var(--color-warm)" isAnimationActive={false} />
                <Legend wrapperStyle={{ fontSize: 12 }} />
              </ScatterChart>
            </ResponsiveContainer>
          </div>
          <p className="text-xs text-muted">Rings at a quarter, half, three quarters and all of {radius.toFixed(2)}; straight up is the face normal, left and right run across the grooves to grazing.</p>
        </>
      ) : null}
    </figure>
  );
}

function PmvSweep({ projectId, scenarioId, revision, panel, canSweep }: { projectId: string; scenarioId: string; revision: number; panel: PanelRow; canSweep: boolean }) {
  const id = useId();
  const sweep = useMutation({ mutationFn: () => sweepPanel(projectId, { scenarioId, panelId: panel.id, revision }) });
  const rows = useMemo(() => (sweep.data ? sweepRows(sweep.data) : []), [sweep.data]);
  const palette = ["var(--color-accent)", "var(--color-warm)", "var(--color-cool)", "var(--color-ink)", "var(--color-muted)", "var(--color-danger)"];
  return (
    <section aria-labelledby={`${id}-title`} className="space-y-3 rounded-md border border-line bg-white p-3">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <h3 id={`${id}-title`} className="text-sm font-medium">
          PMV per seat against the opening angle of {panel.label}
          <span className="font-normal text-muted"> — seats of its room; every other panel stays at its setting</span>
        </h3>
        <Button variant="secondary" onClick={() => sweep.mutate()} pending={sweep.isPending} disabled={!canSweep}>
          Sweep PMV against angle
        </Button>
      </div>
      {!canSweep ? <p className="text-sm text-muted">Your role does not run computations.</p> : null}
      {sweep.error ? (
        <p role="alert" className="text-sm text-danger">
          {apiErrorMessage(sweep.error)}
        </p>
      ) : null}
      {sweep.data ? (
        <div className="h-72">
          <ResponsiveContainer width="100%" height="100%">
            <LineChart data={rows} margin={{ top: 4, right: 16, bottom: 16, left: 0 }}>
              <CartesianGrid strokeDasharray="3 3" stroke="var(--color-line)" />
              <XAxis dataKey="angle" type="number" domain={["dataMin", "dataMax"]} tick={{ fontSize: 10 }} label={{ value: "Opening angle (°)", position: "insideBottom", offset: -8, fontSize: 11 }} />
              <YAxis tick={{ fontSize: 10 }} tickFormatter={(v: number) => v.toFixed(2)} label={{ value: "PMV", angle: -90, position: "insideLeft", offset: 12, fontSize: 11 }} />
              <Tooltip formatter={(v) => pmvText(Number(v))} labelFormatter={(l) => `${l}°`} />
              {sweep.data.seats.map((s, i) => (
                <Line key={s.id} dataKey={s.id} name={s.label} stroke={palette[i % palette.length]} dot={false} strokeWidth={1} isAnimationActive={false} />
              ))}
            </LineChart>
          </ResponsiveContainer>
        </div>
      ) : null}
      {sweep.data ? (
        <p role="status" className="text-xs text-muted">
          {sweep.data.seats.length} seats at {sweep.data.anglesDeg.length} settings from {sweep.data.anglesDeg[0]}° to {sweep.data.anglesDeg[sweep.data.anglesDeg.length - 1]}°.
        </p>
      ) : null}
    </section>
  );
}
