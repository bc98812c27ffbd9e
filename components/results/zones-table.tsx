import { targetBand } from "@/components/results/histogram";
import { percent, pmvText } from "@/components/results/format";
import type { ZoneResult } from "@/lib/compute/types";
import type { ZoneTarget } from "@/lib/layout/schema";

export function targetText(target: ZoneTarget): string {
  if (target.kind === "category") {
    const band = targetBand(target);
    return `ISO 7730 category ${target.category} (PMV ${pmvText(band.min)} … ${pmvText(band.max)})`;
  }
  return `PMV ${pmvText(target.minPmv)} … ${pmvText(target.maxPmv)}`;
}

/** Per-zone PMV summary. No hooks: used on the results page and in the report. */
export function ZonesTable({ zones }: { zones: readonly ZoneResult[] }) {
  if (zones.length === 0) return <p className="text-sm text-muted">This layout has no comfort zones.</p>;
  return (
    <div className="overflow-x-auto rounded-md border border-line bg-white">
      <table aria-label="Zones" className="results-table w-full text-sm">
        <thead className="bg-paper text-left">
          <tr>
            <th scope="col" className="px-2 py-2 font-medium">Zone</th>
            <th scope="col" className="px-2 py-2 font-medium">Target</th>
            <th scope="col" className="px-2 py-2 text-right font-medium">Seats</th>
            <th scope="col" className="px-2 py-2 text-right font-medium">PMV min</th>
            <th scope="col" className="px-2 py-2 text-right font-medium">PMV mean</th>
            <th scope="col" className="px-2 py-2 text-right font-medium">PMV max</th>
            <th scope="col" className="px-2 py-2 text-right font-medium">Seats in target</th>
          </tr>
        </thead>
        <tbody>
          {zones.map((z) => (
            <tr key={z.id} className="border-t border-line/70">
              <th scope="row" className="px-2 py-1.5 text-left font-medium">{z.name}</th>
              <td className="px-2 py-1.5">{targetText(z.target)}</td>
              <td className="px-2 py-1.5 text-right font-mono">{z.seatIds.length}</td>
              <td className="px-2 py-1.5 text-right font-mono">{pmvText(z.pmvMin)}</td>
              <td className="px-2 py-1.5 text-right font-mono">{pmvText(z.pmvMean)}</td>
              <td className="px-2 py-1.5 text-right font-mono">{pmvText(z.pmvMax)}</td>
              <td className={`px-2 py-1.5 text-right font-mono ${z.shareInTarget !== null && z.shareInTarget < 1 ? "text-warm" : ""}`}>
                {percent(z.shareInTarget)}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
