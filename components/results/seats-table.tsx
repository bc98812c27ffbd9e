"use client";

import { useId, useMemo, useState } from "react";
import { Button } from "@/components/ui/button";
import { InlineSelect } from "@/components/results/inline-select";
import { seatsCsv } from "@/components/results/csv";
import { num, pmvText } from "@/components/results/format";
import { NO_FILTER, NO_ZONE, filterSeatRows, sortSeatRows, toSeatRows, type SeatFilter, type SeatSort, type SeatSortKey } from "@/components/results/seat-rows";
import type { SeatResult, ZoneResult } from "@/lib/compute/types";
import { unitSymbol, type UnitSystem } from "@/lib/units";

interface Column {
  key: SeatSortKey;
  label: string;
  unit?: string;
  numeric: boolean;
}

function columns(system: UnitSystem): Column[] {
  const t = unitSymbol("temperature", system);
  const dt = unitSymbol("temperatureDifference", system);
  return [
    { key: "label", label: "Seat", numeric: false },
    { key: "zoneNames", label: "Zones", numeric: false },
    { key: "pmv", label: "PMV", numeric: true },
    { key: "ppd", label: "PPD", unit: "%", numeric: true },
    { key: "mrtC", label: "MRT", unit: t, numeric: true },
    { key: "operativeC", label: "Operative", unit: t, numeric: true },
    { key: "verticalAsymmetryC", label: "Vert. asym.", unit: dt, numeric: true },
    { key: "horizontalAsymmetryC", label: "Horiz. asym.", unit: dt, numeric: true },
    { key: "asymmetryDissatisfiedPercent", label: "Dissatisfied (asym.)", unit: "%", numeric: true },
    { key: "category", label: "ISO 7730", numeric: false },
    { key: "ashrae55", label: "ASHRAE 55", numeric: false },
  ];
}

function download(filename: string, text: string): void {
  // The byte-order mark lets spreadsheet programs read "°C" as UTF-8.
  const blob = new Blob(["\uFEFF", text], { type: "text/csv;charset=utf-8" });
  const url = URL.createObjectURL(blob);
  const a = document.createElement("a");
  a.href = url;
  a.download = filename;
  document.body.append(a);
  a.click();
  a.remove();
  window.setTimeout(() => URL.revokeObjectURL(url), 1000);
}

export function SeatsTable({
  seats,
  zones,
  system,
  fileStem,
}: {
  seats: readonly SeatResult[];
  zones: readonly ZoneResult[];
  system: UnitSystem;
  /** Start of the CSV file name, e.g. "level-3-winter-design-r2". */
  fileStem: string;
}) {
  const ids = useId();
  const [sort, setSort] = useState<SeatSort>({ key: "label", direction: "asc" });
  const [filter, setFilter] = useState<SeatFilter>(NO_FILTER);
  const [csvSystem, setCsvSystem] = useState<UnitSystem>(system);
  const rows = useMemo(() => toSeatRows(seats, zones), [seats, zones]);
  const shown = useMemo(() => sortSeatRows(filterSeatRows(rows, filter), sort), [rows, filter, sort]);
  const cols = columns(system);

  function toggleSort(key: SeatSortKey) {
    setSort((s) => (s.key === key ? { key, direction: s.direction === "asc" ? "desc" : "asc" } : { key, direction: "asc" }));
  }

  return (
    <section aria-labelledby={`${ids}-title`} className="space-y-3">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <h2 id={`${ids}-title`} className="text-lg font-semibold">
          Seats
        </h2>
        <div className="no-print flex flex-wrap items-end gap-3 text-sm">
          <InlineSelect label="Zone" value={filter.zoneId} onChange={(e) => setFilter({ ...filter, zoneId: e.target.value })}>
            <option value="">All zones</option>
            {zones.map((z) => (
              <option key={z.id} value={z.id}>
                {z.name}
              </option>
            ))}
            <option value={NO_ZONE}>In no zone</option>
          </InlineSelect>
          <InlineSelect label="Category" value={filter.category} onChange={(e) => setFilter({ ...filter, category: e.target.value })}>
            <option value="">All categories</option>
            <option value="A">A</option>
            <option value="B">B</option>
            <option value="C">C</option>
            <option value="none">Outside C</option>
          </InlineSelect>
          <label className="space-y-1">
            <span className="block font-medium">Search seats</span>
            <input
              type="search"
              className="rounded-md border border-line bg-white px-2 py-1.5"
              value={filter.text}
              placeholder="Label or zone"
              onChange={(e) => setFilter({ ...filter, text: e.target.value })}
            />
          </label>
          <InlineSelect label="CSV units" value={csvSystem} onChange={(e) => setCsvSystem(e.target.value as UnitSystem)}>
            <option value="si">SI (°C, K)</option>
            <option value="ip">IP (°F)</option>
          </InlineSelect>
          <Button variant="secondary" onClick={() => download(`${fileStem}-seats-${csvSystem}.csv`, seatsCsv(shown, csvSystem))}>
            Download CSV
          </Button>
        </div>
      </div>
      <p className="text-sm text-muted" role="status" aria-live="polite">
        Showing {shown.length} of {rows.length} seats{shown.length !== rows.length ? " (the CSV holds the rows shown)" : ""}.
      </p>
      <div className="overflow-x-auto rounded-md border border-line bg-white">
        <table aria-label="Seats" className="results-table w-full text-sm">
          <thead className="bg-paper text-left">
            <tr>
              {cols.map((c) => {
                const active = sort.key === c.key;
                return (
                  <th
                    key={c.key}
                    scope="col"
                    aria-sort={active ? (sort.direction === "asc" ? "ascending" : "descending") : "none"}
                    className={`px-2 py-2 font-medium whitespace-nowrap ${c.numeric ? "text-right" : ""}`}
                  >
                    <button type="button" className="inline-flex items-center gap-1 hover:text-accent-strong" onClick={() => toggleSort(c.key)}>
                      {c.label}
                      {c.unit ? <span className="font-normal text-muted">({c.unit})</span> : null}
                      <span aria-hidden="true" className="text-muted">
                        {active ? (sort.direction === "asc" ? "▲" : "▼") : "↕"}
                      </span>
                    </button>
                  </th>
                );
              })}
            </tr>
          </thead>
          <tbody>
            {shown.map((r) => (
              <tr key={r.id} className="border-t border-line/70 align-top">
                <th scope="row" className="px-2 py-1.5 text-left font-medium whitespace-nowrap">
                  {r.label}
                  {!r.withinRange ? (
                    <span className="ml-1 text-xs text-warm" title="An input is outside the ISO 7730 range of application; the values are indicative.">
                      (outside model range)
                    </span>
                  ) : null}
                </th>
                <td className="px-2 py-1.5">{r.zoneNames}</td>
                <td data-col="pmv" className={`px-2 py-1.5 text-right font-mono ${r.pmv > 0.5 ? "text-warm" : r.pmv < -0.5 ? "text-cool" : ""}`}>
                  {pmvText(r.pmv)}
                </td>
                <td className="px-2 py-1.5 text-right font-mono">{num(null, r.ppd, system, 1)}</td>
                <td className="px-2 py-1.5 text-right font-mono">{num("temperature", r.mrtC, system)}</td>
                <td className="px-2 py-1.5 text-right font-mono">{num("temperature", r.operativeC, system)}</td>
                <td className="px-2 py-1.5 text-right font-mono">{num("temperatureDifference", r.verticalAsymmetryC, system)}</td>
                <td className="px-2 py-1.5 text-right font-mono">{num("temperatureDifference", r.horizontalAsymmetryC, system)}</td>
                <td className="px-2 py-1.5 text-right font-mono">{num(null, r.asymmetryDissatisfiedPercent, system, 1)}</td>
                <td className="px-2 py-1.5" title={r.categoryLimit ?? undefined}>
                  {r.category ?? "outside C"}
                  {r.categoryLimit ? <span className="sr-only"> ({r.categoryLimit})</span> : null}
                </td>
                <td className="px-2 py-1.5">
                  {r.ashrae55 ? (
                    <span className="text-accent-strong">
                      ✓<span className="sr-only"> complies</span>
                    </span>
                  ) : (
                    <details>
                      <summary className="cursor-pointer text-danger" title={r.ashraeFailing.join("\n")}>
                        ✗<span className="sr-only"> fails</span>
                      </summary>
                      <ul className="mt-1 list-disc pl-4 text-xs text-ink">
                        {r.ashraeFailing.map((m) => (
                          <li key={m}>{m}</li>
                        ))}
                      </ul>
                    </details>
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </section>
  );
}
