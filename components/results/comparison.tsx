"use client";

import { useQuery } from "@tanstack/react-query";
import { useId, useMemo, useState } from "react";
import { CartesianGrid, ReferenceLine, ResponsiveContainer, Scatter, ScatterChart, Tooltip, XAxis, YAxis } from "recharts";
import { Button } from "@/components/ui/button";
import { InlineSelect } from "@/components/results/inline-select";
import { apiErrorMessage } from "@/components/ui/api-errors";
import { compareSeats } from "@/components/results/compare";
import { num, pmvText } from "@/components/results/format";
import { computeQuery, type RevisionSummary as Revision, type Scenario } from "@/components/projects/queries";
import { unitSymbol, type UnitSystem } from "@/lib/units";

interface Side {
  scenarioId: string;
  revision: number;
}

const TOP = 12;

/** PMV per seat in A against B: two scenarios on one revision, or one scenario on two revisions. */
export function Comparison({
  projectId,
  scenarios,
  revisions,
  system,
}: {
  projectId: string;
  scenarios: readonly Scenario[];
  revisions: readonly Revision[];
  system: UnitSystem;
}) {
  const id = useId();
  const head = revisions[0]?.number ?? 1;
  const [mode, setMode] = useState<"scenarios" | "revisions">("scenarios");
  const [scenarioA, setScenarioA] = useState(scenarios[0]?.id ?? "");
  const [scenarioB, setScenarioB] = useState(scenarios[1]?.id ?? scenarios[0]?.id ?? "");
  const [revisionA, setRevisionA] = useState(revisions[1]?.number ?? head);
  const [revisionB, setRevisionB] = useState(head);
  const [pair, setPair] = useState<{ a: Side; b: Side } | null>(null);

  const a = useQuery({ ...computeQuery(projectId, pair?.a.scenarioId ?? "", pair?.a.revision ?? 0), enabled: pair !== null });
  const b = useQuery({ ...computeQuery(projectId, pair?.b.scenarioId ?? "", pair?.b.revision ?? 0), enabled: pair !== null });
  const comparison = useMemo(() => (a.data && b.data ? compareSeats(a.data.seats, b.data.seats) : null), [a.data, b.data]);

  const scenarioName = (sid: string) => scenarios.find((s) => s.id === sid)?.name ?? "?";
  const sideName = (s: Side) => `${scenarioName(s.scenarioId)}, revision ${s.revision}`;

  function compare() {
    setPair(
      mode === "scenarios"
        ? { a: { scenarioId: scenarioA, revision: revisionB }, b: { scenarioId: scenarioB, revision: revisionB } }
        : { a: { scenarioId: scenarioA, revision: revisionA }, b: { scenarioId: scenarioA, revision: revisionB } },
    );
  }

  const scenarioOptions = scenarios.map((s) => (
    <option key={s.id} value={s.id}>
      {s.name}
    </option>
  ));
  const revisionOptions = revisions.map((r) => (
    <option key={r.number} value={r.number}>
      {r.number} — {r.message}
    </option>
  ));
  const dt = unitSymbol("temperatureDifference", system);
  const loading = pair !== null && (a.isFetching || b.isFetching);
  const error = a.error ?? b.error;
  const points = comparison?.changes.map((c) => ({ x: Number(c.pmvA.toFixed(3)), y: Number(c.pmvB.toFixed(3)), label: c.label })) ?? [];
  const extent = Math.max(1, ...points.flatMap((p) => [Math.abs(p.x), Math.abs(p.y)]));
  const lim = Math.ceil(extent * 4) / 4;

  return (
    <section aria-labelledby={`${id}-title`} className="space-y-3">
      <h2 id={`${id}-title`} className="text-lg font-semibold">
        Compare
      </h2>
      <div className="no-print flex flex-wrap items-end gap-3 text-sm">
        <fieldset className="flex gap-3">
          <legend className="sr-only">Compare what</legend>
          <label className="flex items-center gap-1">
            <input type="radio" name={`${id}-mode`} checked={mode === "scenarios"} onChange={() => setMode("scenarios")} /> Two scenarios
          </label>
          <label className="flex items-center gap-1">
            <input type="radio" name={`${id}-mode`} checked={mode === "revisions"} onChange={() => setMode("revisions")} /> Two revisions
          </label>
        </fieldset>
        {mode === "scenarios" ? (
          <>
            <InlineSelect label="Scenario A" value={scenarioA} onChange={(e) => setScenarioA(e.target.value)}>
              {scenarioOptions}
            </InlineSelect>
            <InlineSelect label="Scenario B" value={scenarioB} onChange={(e) => setScenarioB(e.target.value)}>
              {scenarioOptions}
            </InlineSelect>
            <InlineSelect label="On revision" value={revisionB} onChange={(e) => setRevisionB(Number(e.target.value))}>
              {revisionOptions}
            </InlineSelect>
          </>
        ) : (
          <>
            <InlineSelect label="Scenario to compare" value={scenarioA} onChange={(e) => setScenarioA(e.target.value)}>
              {scenarioOptions}
            </InlineSelect>
            <InlineSelect label="Revision A" value={revisionA} onChange={(e) => setRevisionA(Number(e.target.value))}>
              {revisionOptions}
            </InlineSelect>
            <InlineSelect label="Revision B" value={revisionB} onChange={(e) => setRevisionB(Number(e.target.value))}>
              {revisionOptions}
            </InlineSelect>
          </>
        )}
        <Button variant="secondary" onClick={compare} pending={loading} disabled={scenarios.length === 0}>
          Compare
        </Button>
      </div>
      <div role="status" aria-live="polite" className="text-sm">
        {loading ? "Computing both sides…" : error ? <span className="text-danger">{apiErrorMessage(error)}</span> : null}
      </div>
      {pair && comparison && !loading ? (
        <div className="space-y-3">
          <p className="text-sm">
            <strong>A</strong>: {sideName(pair.a)} · <strong>B</strong>: {sideName(pair.b)} · {comparison.changes.length} seats in both
            {comparison.meanDeltaPmv !== null ? `, mean PMV change ${pmvText(comparison.meanDeltaPmv)}` : ""}
            {comparison.onlyA.length > 0 ? `; only in A: ${comparison.onlyA.map((s) => s.label).join(", ")}` : ""}
            {comparison.onlyB.length > 0 ? `; only in B: ${comparison.onlyB.map((s) => s.label).join(", ")}` : ""}.
          </p>
          <div className="grid gap-4 lg:grid-cols-2">
            <figure className="h-80 rounded-md border border-line bg-white p-3">
              <figcaption className="text-sm font-medium">PMV per seat, A against B (points above the line are warmer in B)</figcaption>
              <ResponsiveContainer width="100%" height="90%">
                <ScatterChart margin={{ top: 8, right: 8, bottom: 16, left: 0 }}>
                  <CartesianGrid strokeDasharray="3 3" stroke="var(--color-line)" />
                  <XAxis type="number" dataKey="x" name="PMV A" domain={[-lim, lim]} tick={{ fontSize: 10 }} label={{ value: "PMV A", position: "insideBottom", offset: -8, fontSize: 11 }} />
                  <YAxis type="number" dataKey="y" name="PMV B" domain={[-lim, lim]} tick={{ fontSize: 10 }} label={{ value: "PMV B", angle: -90, position: "insideLeft", fontSize: 11 }} />
                  <ReferenceLine segment={[{ x: -lim, y: -lim }, { x: lim, y: lim }]} stroke="var(--color-muted)" strokeDasharray="4 4" />
                  <Tooltip cursor={{ strokeDasharray: "3 3" }} formatter={(v) => pmvText(Number(v))} />
                  <Scatter data={points} fill="var(--color-accent)" isAnimationActive={false} />
                </ScatterChart>
              </ResponsiveContainer>
            </figure>
            <div className="overflow-x-auto rounded-md border border-line bg-white">
              <table aria-label="Biggest changes" className="results-table w-full text-sm">
                <caption className="px-2 py-2 text-left text-sm font-medium">Biggest PMV changes</caption>
                <thead className="bg-paper text-left">
                  <tr>
                    <th scope="col" className="px-2 py-1.5 font-medium">Seat</th>
                    <th scope="col" className="px-2 py-1.5 text-right font-medium">PMV A</th>
                    <th scope="col" className="px-2 py-1.5 text-right font-medium">PMV B</th>
                    <th scope="col" className="px-2 py-1.5 text-right font-medium">ΔPMV</th>
                    <th scope="col" className="px-2 py-1.5 text-right font-medium">Δ operative ({dt})</th>
                  </tr>
                </thead>
                <tbody>
                  {comparison.changes.slice(0, TOP).map((c) => (
                    <tr key={c.id} className="border-t border-line/70">
                      <th scope="row" className="px-2 py-1 text-left font-medium">{c.label}</th>
                      <td className="px-2 py-1 text-right font-mono">{pmvText(c.pmvA)}</td>
                      <td className="px-2 py-1 text-right font-mono">{pmvText(c.pmvB)}</td>
                      <td className={`px-2 py-1 text-right font-mono ${c.deltaPmv > 0 ? "text-warm" : c.deltaPmv < 0 ? "text-cool" : ""}`}>{pmvText(c.deltaPmv)}</td>
                      <td className="px-2 py-1 text-right font-mono">{num("temperatureDifference", c.operativeB - c.operativeA, system)}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          </div>
        </div>
      ) : null}
    </section>
  );
}
