"use client";

import { useQuery } from "@tanstack/react-query";
import Link from "next/link";
import { Bar, BarChart, CartesianGrid, Legend, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { energyQuery, loadsQuery } from "@/components/louvers/queries";
import { SAFETY_CAUTIONS } from "@/components/results/cautions";
import { apiErrorMessage } from "@/components/ui/api-errors";
import { SkeletonRows } from "@/components/ui/skeleton";

interface ReadProps {
  projectId: string;
  scenarioId: string;
  revision: number;
}

const f0 = (v: number | null | undefined) => (v === null || v === undefined || !Number.isFinite(v) ? "—" : v.toFixed(0));
const f1 = (v: number | null | undefined) => (v === null || v === undefined || !Number.isFinite(v) ? "—" : v.toFixed(1));

function ReadError({ error }: { error: unknown }) {
  return (
    <p role="alert" className="text-sm text-danger">
      {apiErrorMessage(error)}
    </p>
  );
}

function Cautions({ extra = [] }: { extra?: readonly string[] }) {
  return (
    <aside aria-label="Cautions" className="space-y-1 rounded-md border border-warm/40 bg-warm/5 px-4 py-3 text-sm">
      <p className="font-medium text-warm">Cautions</p>
      <ul className="list-disc space-y-1 pl-5">
        {[...extra, ...SAFETY_CAUTIONS].map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
    </aside>
  );
}

/** Per room and mode: design load against the panels' output, coverage, and each hydronic panel's water side. */
export function LoadsView({ projectId, scenarioId, revision }: ReadProps) {
  const loads = useQuery(loadsQuery(projectId, scenarioId, revision));
  if (loads.isPending) return <SkeletonRows rows={4} label="Computing room loads…" />;
  if (loads.error) return <ReadError error={loads.error} />;
  const data = loads.data;
  const rows = data.rooms.flatMap((room) => room.loads.map((load) => ({ room, load })));
  const water = rows.flatMap(({ room, load }) => load.panels.filter((p) => p.waterSide).map((p) => ({ room, mode: load.mode, panel: p, w: p.waterSide! })));
  return (
    <div className="space-y-6">
      <Cautions extra={data.cautions} />
      {data.warnings.length > 0 ? (
        <section aria-label="Coverage warnings" className="space-y-1 rounded-md border border-danger/30 bg-danger/5 px-4 py-3 text-sm">
          <h3 className="font-medium text-danger">
            {data.warnings.length} room{data.warnings.length === 1 ? "" : "s"} below 100 % coverage
          </h3>
          <ul className="list-disc pl-5">
            {data.warnings.map((w) => (
              <li key={`${w.roomId}:${w.mode}`}>{w.message}</li>
            ))}
          </ul>
        </section>
      ) : (
        <p role="status" className="text-sm text-muted">
          Every room&apos;s panels cover its design load in this scenario.
        </p>
      )}
      <section aria-labelledby="loads-title" className="space-y-2">
        <h2 id="loads-title" className="text-lg font-semibold">
          Room load against panel output
        </h2>
        <div className="overflow-x-auto rounded-md border border-line bg-white">
          <table aria-label="Room loads" className="w-full text-sm">
            <thead className="bg-paper text-left text-xs uppercase tracking-wide text-muted">
              <tr>
                <th className="px-3 py-2">Room</th>
                <th className="px-3 py-2">Mode</th>
                <th className="px-3 py-2 text-right">Transmission (W)</th>
                <th className="px-3 py-2 text-right">Ventilation (W)</th>
                <th className="px-3 py-2 text-right">Internal (W)</th>
                <th className="px-3 py-2 text-right">Load (W)</th>
                <th className="px-3 py-2 text-right">Panels (W)</th>
                <th className="px-3 py-2 text-right">Coverage</th>
              </tr>
            </thead>
            <tbody>
              {rows.map(({ room, load }) => (
                <tr key={`${room.id}:${load.mode}`} className={`border-t border-line ${load.warning ? "bg-danger/5" : ""}`}>
                  <th scope="row" className="px-3 py-1.5 text-left font-medium">
                    {room.name}
                  </th>
                  <td className="px-3 py-1.5">{load.mode}</td>
                  <td className="px-3 py-1.5 text-right tabular-nums">{f0(load.transmissionW)}</td>
                  <td className="px-3 py-1.5 text-right tabular-nums">{f0(load.ventilationW)}</td>
                  <td className="px-3 py-1.5 text-right tabular-nums">{f0(load.internal.totalW)}</td>
                  <td className="px-3 py-1.5 text-right tabular-nums">{f0(load.loadW)}</td>
                  <td className="px-3 py-1.5 text-right tabular-nums">{f0(load.panelOutputW)}</td>
                  <td className={`px-3 py-1.5 text-right tabular-nums ${load.warning ? "font-medium text-danger" : ""}`}>
                    {load.coveragePercent === null ? "no load" : `${f0(load.coveragePercent)} %`}
                    {load.warning ? ` ⚠ ${f0(load.shortfallW)} W short` : ""}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
        <p className="text-xs text-muted">
          Methods: {[...new Set(rows.map((r) => r.load.method))].join("; ")}. Air changes {data.conditions.airChangesPerHour} /h. Surfaces without a U-value are
          left out of the transmission loss (see the API answer for each).
        </p>
      </section>

      <section aria-labelledby="water-title" className="space-y-2">
        <h2 id="water-title" className="text-lg font-semibold">
          Water side of hydronic panels
        </h2>
        {water.length === 0 ? (
          <p className="text-sm text-muted">No active water-supplied panel in this scenario.</p>
        ) : (
          <div className="overflow-x-auto rounded-md border border-line bg-white">
            <table aria-label="Water side" className="w-full text-sm">
              <thead className="bg-paper text-left text-xs uppercase tracking-wide text-muted">
                <tr>
                  <th className="px-3 py-2">Panel</th>
                  <th className="px-3 py-2">Room</th>
                  <th className="px-3 py-2 text-right">Mean water (°C)</th>
                  <th className="px-3 py-2 text-right">Flow / return (°C)</th>
                  <th className="px-3 py-2 text-right">Surface (°C)</th>
                  <th className="px-3 py-2 text-right">Output (W)</th>
                  <th className="px-3 py-2 text-right">Flow (l/h)</th>
                </tr>
              </thead>
              <tbody>
                {water.map(({ room, mode, panel, w }) => (
                  <tr key={`${panel.id}:${mode}`} className="border-t border-line">
                    <th scope="row" className="px-3 py-1.5 text-left font-medium">
                      {panel.label}
                    </th>
                    <td className="px-3 py-1.5">{room.name}</td>
                    <td className="px-3 py-1.5 text-right tabular-nums">{f1(w.meanWaterTemperatureC)}</td>
                    <td className="px-3 py-1.5 text-right tabular-nums">
                      {f1(w.flowTemperatureC)} / {f1(w.returnTemperatureC)}
                    </td>
                    <td className="px-3 py-1.5 text-right tabular-nums">{f1(w.surfaceTemperatureC)}</td>
                    <td className="px-3 py-1.5 text-right tabular-nums">{f0(w.outputW)}</td>
                    <td className="px-3 py-1.5 text-right tabular-nums">{f1(w.litresPerHour)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
        {water[0] ? <p className="text-xs text-muted">{water[0].w.method}; design drop ΔT = |flow − return|.</p> : null}
      </section>
    </div>
  );
}

const DAY_NAMES: Record<string, string> = { mon: "Mon", tue: "Tue", wed: "Wed", thu: "Thu", fri: "Fri", sat: "Sat", sun: "Sun" };

/** Per zone: weekday and annual energy with louvers against fully open, and the saving. */
export function EnergyView({ projectId, scenarioId, revision, canEdit }: ReadProps & { canEdit: boolean }) {
  const energy = useQuery(energyQuery(projectId, scenarioId, revision));
  if (energy.isPending) return <SkeletonRows rows={4} label="Computing schedule energy…" />;
  if (energy.error) return <ReadError error={energy.error} />;
  const data = energy.data;
  const scheduled = data.zones.filter((z) => z.periods.length > 0);
  const chart = scheduled.map((z) => ({ name: z.name, withLouvers: z.annual.withLouversKWh, fullyOpen: z.annual.fullyOpenKWh }));
  return (
    <div className="space-y-6">
      <Cautions extra={["Energy figures are panel thermal output over the occupied hours of each schedule: a design estimate for comparing settings, not a metered or billed consumption."]} />
      <p className="text-sm text-muted">
        Zone schedules (weekday periods, each with a fixed louver angle or automatic) are edited in the{" "}
        <Link className="text-accent-strong underline" href={`/projects/${projectId}/plan`}>
          plan editor
        </Link>{" "}
        {canEdit ? "(select a zone, then Occupancy schedule)." : "by designers."}
        {data.automatic
          ? data.automatic.source === "optimiser"
            ? ` Automatic periods run each louvered panel at the automatic setting for this scenario (${data.automatic.panels.length} panels${data.automatic.unreachable.length > 0 ? `; ${data.automatic.unreachable.length} seats cannot be brought inside their target` : ""}).`
            : " Automatic periods run each louvered panel at its current opening angle in the layout."
          : null}
      </p>
      {scheduled.length === 0 ? (
        <p className="text-sm">No zone of this revision has an occupancy schedule, so there is no energy to show.</p>
      ) : (
        <>
          <div className="overflow-x-auto rounded-md border border-line bg-white">
            <table aria-label="Zone energy" className="w-full text-sm">
              <thead className="bg-paper text-left text-xs uppercase tracking-wide text-muted">
                <tr>
                  <th className="px-3 py-2">Zone</th>
                  <th className="px-3 py-2">Periods</th>
                  <th className="px-3 py-2 text-right">Weekday with louvers (kWh)</th>
                  <th className="px-3 py-2 text-right">Weekday fully open (kWh)</th>
                  <th className="px-3 py-2 text-right">Year with louvers (kWh)</th>
                  <th className="px-3 py-2 text-right">Year fully open (kWh)</th>
                  <th className="px-3 py-2 text-right">Saving</th>
                </tr>
              </thead>
              <tbody>
                {scheduled.map((z) => {
                  const day = z.byDay.mon;
                  return (
                    <tr key={z.id} className="border-t border-line">
                      <th scope="row" className="px-3 py-1.5 text-left font-medium">
                        {z.name}
                      </th>
                      <td className="px-3 py-1.5 text-xs">
                        {z.periods.map((p) => (
                          <div key={p.periodIndex}>
                            {p.days.map((d) => DAY_NAMES[d] ?? d).join(" ")} {p.startHour}–{p.endHour} h ·{" "}
                            {p.louver.mode === "fixed" ? `${p.louver.openingAngleDeg}°` : "automatic"}
                          </div>
                        ))}
                      </td>
                      <td className="px-3 py-1.5 text-right tabular-nums">{f1(day.withLouversWh / 1000)}</td>
                      <td className="px-3 py-1.5 text-right tabular-nums">{f1(day.fullyOpenWh / 1000)}</td>
                      <td className="px-3 py-1.5 text-right tabular-nums">{f0(z.annual.withLouversKWh)}</td>
                      <td className="px-3 py-1.5 text-right tabular-nums">{f0(z.annual.fullyOpenKWh)}</td>
                      <td className="px-3 py-1.5 text-right tabular-nums">
                        {f0(z.annual.savingKWh)} kWh{z.annual.savingPercent === null ? "" : ` (${f1(z.annual.savingPercent)} %)`}
                      </td>
                    </tr>
                  );
                })}
              </tbody>
              <tfoot>
                <tr className="border-t-2 border-line font-medium">
                  <th scope="row" className="px-3 py-1.5 text-left">
                    All zones
                  </th>
                  <td />
                  <td className="px-3 py-1.5 text-right tabular-nums">{f1(data.total.byDay.mon.withLouversWh / 1000)}</td>
                  <td className="px-3 py-1.5 text-right tabular-nums">{f1(data.total.byDay.mon.fullyOpenWh / 1000)}</td>
                  <td className="px-3 py-1.5 text-right tabular-nums">{f0(data.total.annual.withLouversKWh)}</td>
                  <td className="px-3 py-1.5 text-right tabular-nums">{f0(data.total.annual.fullyOpenKWh)}</td>
                  <td className="px-3 py-1.5 text-right tabular-nums">
                    {f0(data.total.annual.savingKWh)} kWh{data.total.annual.savingPercent === null ? "" : ` (${f1(data.total.annual.savingPercent)} %)`}
                  </td>
                </tr>
              </tfoot>
            </table>
          </div>
          <p className="text-xs text-muted">Weekday figures are for a Monday. {data.method}</p>
          <figure className="rounded-md border border-line bg-white p-3">
            <figcaption className="mb-1 text-sm font-medium">Annual panel energy per zone, kWh</figcaption>
            <div className="h-60">
              <ResponsiveContainer width="100%" height="100%">
                <BarChart data={chart} margin={{ top: 4, right: 12, bottom: 4, left: 0 }}>
                  <CartesianGrid strokeDasharray="3 3" stroke="var(--color-line)" vertical={false} />
                  <XAxis dataKey="name" tick={{ fontSize: 11 }} />
                  <YAxis tick={{ fontSize: 10 }} />
                  <Tooltip formatter={(v) => `${Number(v).toFixed(0)} kWh`} />
                  <Legend wrapperStyle={{ fontSize: 12 }} />
                  <Bar dataKey="withLouvers" name="With louvers" fill="var(--color-accent)" isAnimationActive={false} />
                  <Bar dataKey="fullyOpen" name="Fully open" fill="var(--color-muted)" isAnimationActive={false} />
                </BarChart>
              </ResponsiveContainer>
            </div>
          </figure>
        </>
      )}
    </div>
  );
}
