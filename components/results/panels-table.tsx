import { num, percent } from "@/components/results/format";
import type { PanelResult } from "@/lib/compute/types";
import { unitSymbol, type UnitSystem } from "@/lib/units";

/** Per-panel output and condensation margin. No hooks: used on the results page and in the report. */
export function PanelsTable({ panels, system, roomName }: { panels: readonly PanelResult[]; system: UnitSystem; roomName: (id: string) => string }) {
  const t = unitSymbol("temperature", system);
  const dt = unitSymbol("temperatureDifference", system);
  return (
    <div className="overflow-x-auto rounded-md border border-line bg-white">
      <table aria-label="Panels" className="results-table w-full text-sm">
        <thead className="bg-paper text-left">
          <tr>
            <th scope="col" className="px-2 py-2 font-medium">Panel</th>
            <th scope="col" className="px-2 py-2 font-medium">Room</th>
            <th scope="col" className="px-2 py-2 font-medium">Mode</th>
            <th scope="col" className="px-2 py-2 text-right font-medium">Surface ({t})</th>
            <th scope="col" className="px-2 py-2 text-right font-medium">Area ({unitSymbol("area", system)})</th>
            <th scope="col" className="px-2 py-2 text-right font-medium">Output ({unitSymbol("power", system)})</th>
            <th scope="col" className="px-2 py-2 text-right font-medium">Output ({unitSymbol("powerPerArea", system)})</th>
            <th scope="col" className="px-2 py-2 text-right font-medium">Radiant share</th>
            <th scope="col" className="px-2 py-2 text-right font-medium">Condensation margin ({dt})</th>
            <th scope="col" className="px-2 py-2 font-medium">Warnings</th>
          </tr>
        </thead>
        <tbody>
          {panels.map((p) => (
            <tr key={p.id} className="border-t border-line/70 align-top">
              <th scope="row" className="px-2 py-1.5 text-left font-medium whitespace-nowrap">{p.label}</th>
              <td className="px-2 py-1.5">{roomName(p.roomId)}</td>
              <td className={`px-2 py-1.5 ${p.mode === "heating" ? "text-warm" : "text-cool"}`}>
                {p.mode}
                {p.active ? "" : " (off)"}
              </td>
              <td className="px-2 py-1.5 text-right font-mono">{num("temperature", p.surfaceTemperatureC, system)}</td>
              <td className="px-2 py-1.5 text-right font-mono">{num("area", p.areaM2, system, 2)}</td>
              <td className="px-2 py-1.5 text-right font-mono">{num("power", p.outputW, system, 0)}</td>
              <td className="px-2 py-1.5 text-right font-mono">{num("powerPerArea", p.outputWm2, system, 0)}</td>
              <td className="px-2 py-1.5 text-right font-mono">{percent(p.radiantShare)}</td>
              <td className={`px-2 py-1.5 text-right font-mono ${p.condensation?.risk ? "font-semibold text-danger" : ""}`}>
                {p.condensation ? num("temperatureDifference", p.condensation.marginK, system) : "—"}
                {p.condensation?.risk ? " risk" : ""}
              </td>
              <td className="px-2 py-1.5 text-xs">
                {p.warnings.length > 0 ? (
                  <ul className="list-disc pl-4 text-danger">
                    {p.warnings.map((w) => (
                      <li key={w}>{w}</li>
                    ))}
                  </ul>
                ) : (
                  <span className="text-muted">none</span>
                )}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
