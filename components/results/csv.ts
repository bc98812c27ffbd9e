/**
 * CSV export of the seats table, built in the browser with papaparse's `unparse` (RFC 4180
 * quoting). Every numeric header states its unit; labels that would start a spreadsheet formula
 * are escaped.
 */
import Papa from "papaparse";
import { toDisplay, unitSymbol, type UnitSystem } from "@/lib/units";
import type { SeatRow } from "@/components/results/seat-rows";

function round(value: number, digits: number): number | string {
  if (!Number.isFinite(value)) return "";
  const factor = 10 ** digits;
  const rounded = Math.round(value * factor) / factor;
  return Object.is(rounded, -0) ? 0 : rounded;
}

/** Header row of the seats CSV in `system`. */
export function seatCsvHeader(system: UnitSystem): string[] {
  const t = unitSymbol("temperature", system);
  const dt = unitSymbol("temperatureDifference", system);
  return [
    "Seat",
    "Zones",
    "PMV (-)",
    "PPD (%)",
    `MRT (${t})`,
    `Operative temperature (${t})`,
    `Vertical radiant asymmetry (${dt})`,
    `Horizontal radiant asymmetry (${dt})`,
    "Dissatisfied by asymmetry (%)",
    "ISO 7730 category",
    "ASHRAE 55",
    "ASHRAE 55 failing limits",
  ];
}

/** One CSV document: a header and one line per row, in `system` units (rows hold SI values). */
export function seatsCsv(rows: readonly SeatRow[], system: UnitSystem): string {
  const data = rows.map((r) => [
    r.label,
    r.zoneIds.length > 0 ? r.zoneNames : "",
    round(r.pmv, 2),
    round(r.ppd, 1),
    round(toDisplay("temperature", r.mrtC, system), 2),
    round(toDisplay("temperature", r.operativeC, system), 2),
    round(toDisplay("temperatureDifference", r.verticalAsymmetryC, system), 2),
    round(toDisplay("temperatureDifference", r.horizontalAsymmetryC, system), 2),
    round(r.asymmetryDissatisfiedPercent, 1),
    r.category ?? "outside C",
    r.ashrae55 ? "pass" : "fail",
    r.ashraeFailing.join("; "),
  ]);
  return Papa.unparse({ fields: seatCsvHeader(system), data }, { newline: "\r\n", escapeFormulae: true });
}
