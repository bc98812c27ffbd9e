"use client";

import { useQuery } from "@tanstack/react-query";
import { useEffect, useState } from "react";
import type { OverlayMode } from "@/components/plan/overlay-shapes";
import { scenariosQuery } from "@/components/projects/queries";
import { apiErrorMessage } from "@/components/ui/api-errors";
import { Button } from "@/components/ui/button";
import type { ComputeResult, SeatResult } from "@/lib/compute/types";
import { PMV_LEGEND_TICKS, formatPmv, mrtScale, pmvColour } from "@/lib/plan/palette";
import { formatQuantity, unitSymbol, toDisplay, type UnitSystem } from "@/lib/units";

const STEPS = ["Checking the layout", "Finding the surfaces each seat sees", "Angle factors and radiant temperatures", "PMV, PPD and local discomfort", "Heatmap"];

/** A bar that fills while the request runs (the server gives no progress; most answers take < 0.3 s). */
function ComputeProgress() {
  const [elapsed, setElapsed] = useState(0);
  useEffect(() => {
    const started = Date.now();
    const timer = setInterval(() => setElapsed(Date.now() - started), 100);
    return () => clearInterval(timer);
  }, []);
  const fraction = 1 - Math.exp(-elapsed / 600);
  const step = STEPS[Math.min(STEPS.length - 1, Math.floor(fraction * STEPS.length))];
  return (
    <div className="space-y-1">
      <div role="progressbar" aria-label="Computing comfort" aria-valuemin={0} aria-valuemax={100} aria-valuenow={Math.round(fraction * 100)} className="h-2 overflow-hidden rounded bg-line/60">
        <div className="h-full bg-accent transition-[width]" style={{ width: `${Math.round(fraction * 95)}%` }} />
      </div>
      <p className="text-xs text-muted">{step}…</p>
    </div>
  );
}

export const CAUTION =
  "Results are design estimates. They do not replace licensed engineering judgement or local codes; mounting, electrical and hydraulic work follows local codes and licensed practice.";

interface Props {
  projectId: string;
  units: UnitSystem;
  dirty: boolean;
  canCompute: boolean;
  scenarioId: string;
  onScenario: (id: string) => void;
  onCompute: () => void;
  onSaveFirst: () => void;
  pending: boolean;
  error: unknown;
  result: ComputeResult | null;
  stale: boolean;
  overlay: { visible: boolean; mode: OverlayMode };
  onOverlay: (overlay: { visible: boolean; mode: OverlayMode }) => void;
  onSelect: (id: string) => void;
}

export function ResultsPanel(props: Props) {
  const { projectId, units, dirty, canCompute, scenarioId, onScenario, result, overlay, onOverlay } = props;
  const scenarios = useQuery(scenariosQuery(projectId));
  useEffect(() => {
    const first = scenarios.data?.[0];
    if (!scenarioId && first) onScenario(first.id);
  }, [scenarios.data, scenarioId, onScenario]);

  const flagged = (result?.panels ?? []).filter((p) => p.warnings.length > 0 || p.condensation?.risk);
  const scale = result ? mrtScale(result.heatmap.grids.flatMap((g) => g.mrtC)) : null;

  return (
    <div className="space-y-3 text-sm">
      {scenarios.isError ? <p className="text-danger">{apiErrorMessage(scenarios.error)}</p> : null}
      <label className="block space-y-1">
        <span className="font-medium">Scenario</span>
        <select className="block w-full rounded-md border border-line bg-white px-2 py-1.5" value={scenarioId} onChange={(e) => onScenario(e.target.value)}>
          {(scenarios.data ?? []).length === 0 ? <option value="">No scenarios yet</option> : null}
          {(scenarios.data ?? []).map((s) => (
            <option key={s.id} value={s.id}>
              {s.name}
            </option>
          ))}
        </select>
      </label>
      {dirty ? (
        <div className="rounded-md border border-warm/40 bg-warm/5 p-2 text-xs">
          <p>Results are computed for a saved revision. Save your changes first.</p>
          <button type="button" className="mt-1 font-medium text-accent-strong underline" onClick={props.onSaveFirst}>
            Save…
          </button>
        </div>
      ) : null}
      <Button className="w-full" onClick={props.onCompute} pending={props.pending} disabled={!canCompute || !scenarioId || dirty}>
        Compute
      </Button>
      {props.pending ? <ComputeProgress /> : null}
      <div aria-live="polite" className="text-danger">
        {props.error ? apiErrorMessage(props.error) : null}
      </div>
      {result ? (
        <div className="space-y-3">
          <p className="text-xs text-muted" data-testid="result-summary">
            Revision {result.revision} · {result.seats.length} seats · {result.cached ? "from the cache" : `${Math.round(result.computeMs)} ms on the server`}
            {props.stale ? " · the plan has changed since" : ""}
          </p>
          <div className="flex items-center gap-3">
            <label className="flex items-center gap-1.5">
              <input type="checkbox" checked={overlay.visible} onChange={(e) => onOverlay({ ...overlay, visible: e.target.checked })} />
              Show results overlay
            </label>
            <label className="flex items-center gap-1.5">
              Colour by
              <select className="rounded border border-line bg-white px-1 py-0.5" value={overlay.mode} onChange={(e) => onOverlay({ ...overlay, mode: e.target.value as OverlayMode })}>
                <option value="pmv">PMV</option>
                <option value="mrt">MRT</option>
              </select>
            </label>
          </div>
          <figure aria-label={overlay.mode === "pmv" ? "PMV legend" : "MRT legend"}>
            <div className="h-3 rounded" style={{ background: `linear-gradient(to right, ${PMV_LEGEND_TICKS.map((t) => pmvColour(t)).join(", ")})` }} />
            <div className="mt-0.5 flex justify-between text-xs text-muted">
              {PMV_LEGEND_TICKS.map((t) => (
                <span key={t}>
                  {overlay.mode === "pmv" || !scale ? (t > 0 ? `+${t}` : t === 0 ? "0" : `−${-t}`) : toDisplay("temperature", scale.midC + (t / 3) * scale.spanK, units).toFixed(1)}
                </span>
              ))}
            </div>
            <figcaption className="text-xs text-muted">
              {overlay.mode === "pmv" ? "PMV at seated head height: cool below 0, warm above" : `MRT at seated head height, ${unitSymbol("temperature", units)}`} ·{" "}
              {result.heatmap.stepM} m cells
            </figcaption>
          </figure>
          {result.warnings.length > 0 ? (
            <ul className="list-disc space-y-0.5 pl-5 text-xs text-warm">
              {result.warnings.map((w, i) => (
                <li key={i}>{w.message}</li>
              ))}
            </ul>
          ) : null}
          {flagged.length > 0 ? (
            <section aria-label="Panel warnings" className="space-y-1 rounded-md border border-danger/30 bg-danger/5 p-2 text-xs">
              <h3 className="font-semibold text-danger">⚠ Panel warnings</h3>
              <ul className="space-y-1">
                {flagged.map((p) => (
                  <li key={p.id}>
                    <button type="button" className="font-medium underline" onClick={() => props.onSelect(p.id)}>
                      {p.label}
                    </button>
                    {" — "}
                    {p.warnings.length > 0
                      ? p.warnings.join(" ")
                      : `condensation risk: the surface is ${formatQuantity("temperatureDifference", p.condensation?.marginK ?? 0, units)} from the dew point.`}
                  </li>
                ))}
              </ul>
              <p className="text-muted">
                Chilled surfaces at or below the dew point can drip; hot surfaces within reach can burn. Check dew-point control and guarding with the manufacturer
                and local codes.
              </p>
            </section>
          ) : null}
        </div>
      ) : null}
      <p className="text-xs text-muted">{CAUTION}</p>
    </div>
  );
}

/** The selected seat's radiant field: what it sees, each surface's share of its MRT, and its comfort indices. */
export function SeatDetail({ seat, units }: { seat: SeatResult; units: UnitSystem }) {
  const surfaces = [...seat.surfaces].sort((a, b) => b.mrtShare - a.mrtShare);
  const T = (c: number) => formatQuantity("temperature", c, units);
  const dT = (k: number) => formatQuantity("temperatureDifference", k, units);
  return (
    <section aria-label="Seat comfort" className="space-y-2 text-sm" data-testid="seat-detail">
      <h3 className="font-semibold">{seat.label}</h3>
      <dl className="grid grid-cols-2 gap-x-3 gap-y-1">
        <dt className="text-muted">PMV</dt>
        <dd data-testid="seat-pmv" data-pmv={seat.pmv} className="font-mono font-semibold" style={{ color: seat.pmv > 0.5 ? "#c2410c" : seat.pmv < -0.5 ? "#0369a1" : undefined }}>
          {formatPmv(seat.pmv)}
        </dd>
        <dt className="text-muted">PPD</dt>
        <dd className="font-mono">{seat.ppd.toFixed(0)} %</dd>
        <dt className="text-muted">MRT</dt>
        <dd className="font-mono">{T(seat.mrtC)}</dd>
        <dt className="text-muted">Operative temperature</dt>
        <dd className="font-mono">{T(seat.operativeC)}</dd>
        <dt className="text-muted">Vertical asymmetry</dt>
        <dd className="font-mono">{dT(seat.verticalAsymmetryC)}</dd>
        <dt className="text-muted">Horizontal asymmetry</dt>
        <dd className="font-mono">{dT(seat.horizontalAsymmetryC)}</dd>
        <dt className="text-muted">Dissatisfied (asymmetry)</dt>
        <dd className="font-mono">{seat.asymmetryDissatisfiedPercent.toFixed(1)} %</dd>
        <dt className="text-muted">ISO 7730 category</dt>
        <dd>{seat.category ?? "outside C"}</dd>
        <dt className="text-muted">ASHRAE 55</dt>
        <dd>{seat.ashrae55.compliant ? "meets" : "does not meet"}</dd>
      </dl>
      {seat.categoryLimit ? <p className="text-xs text-muted">Next better category limited by: {seat.categoryLimit.message}</p> : null}
      {!seat.ashrae55.compliant ? (
        <ul className="list-disc pl-5 text-xs text-warm">
          {seat.ashrae55.failing.map((f) => (
            <li key={f.code}>{f.message}</li>
          ))}
        </ul>
      ) : null}
      {!seat.withinRange ? <p className="text-xs text-warm">An input lies outside ISO 7730&apos;s range of application; treat PMV as indicative.</p> : null}
      <h4 className="pt-1 text-xs font-semibold uppercase tracking-wide text-muted">What this seat sees</h4>
      <ol className="space-y-1" aria-label="Surfaces by share of MRT">
        {surfaces.map((s) => (
          <li key={s.surfaceId} className="text-xs">
            <div className="flex justify-between gap-2">
              <span className="truncate">
                {s.label} <span className="text-muted">({s.kind})</span>
              </span>
              <span className="shrink-0 font-mono">
                {T(s.temperatureC)} · F {s.angleFactor.toFixed(3)} · {(s.mrtShare * 100).toFixed(1)} %
              </span>
            </div>
            <div className="h-1.5 rounded bg-line/50">
              <div className="h-full rounded" style={{ width: `${Math.max(0, Math.min(100, s.mrtShare * 100))}%`, background: s.kind === "panel" ? (s.temperatureC >= seat.mrtC ? "#c2410c" : "#0369a1") : "#5d6b76" }} />
            </div>
          </li>
        ))}
      </ol>
    </section>
  );
}
