/**
 * The seats table as plain rows: what the table shows, how it sorts and filters, and the CSV
 * built from it. Pure (no React) so it is unit-tested on its own. Values stay SI here; the table
 * and the CSV convert to the display system.
 */
import type { Iso7730Category, SeatResult, ZoneResult } from "@/lib/compute/types";

export interface SeatRow {
  id: string;
  label: string;
  zoneIds: string[];
  /** Zone names joined with ", "; "—" when the seat lies in no zone. */
  zoneNames: string;
  pmv: number;
  ppd: number;
  mrtC: number;
  operativeC: number;
  verticalAsymmetryC: number;
  horizontalAsymmetryC: number;
  asymmetryDissatisfiedPercent: number;
  category: Iso7730Category | null;
  categoryLimit: string | null;
  ashrae55: boolean;
  /** Messages of the failing ASHRAE 55 limits, empty when compliant. */
  ashraeFailing: string[];
  withinRange: boolean;
}

export const NO_ZONE = "—";

export function toSeatRows(seats: readonly SeatResult[], zones: readonly ZoneResult[]): SeatRow[] {
  const zoneName = new Map(zones.map((z) => [z.id, z.name]));
  return seats.map((s) => ({
    id: s.id,
    label: s.label,
    zoneIds: s.zoneIds,
    zoneNames: s.zoneIds.length > 0 ? s.zoneIds.map((id) => zoneName.get(id) ?? id).join(", ") : NO_ZONE,
    pmv: s.pmv,
    ppd: s.ppd,
    mrtC: s.mrtC,
    operativeC: s.operativeC,
    verticalAsymmetryC: s.verticalAsymmetryC,
    horizontalAsymmetryC: s.horizontalAsymmetryC,
    asymmetryDissatisfiedPercent: s.asymmetryDissatisfiedPercent,
    category: s.category,
    categoryLimit: s.categoryLimit?.message ?? null,
    ashrae55: s.ashrae55.compliant,
    ashraeFailing: s.ashrae55.failing.map((f) => f.message),
    withinRange: s.withinRange,
  }));
}

export type SeatSortKey =
  | "label"
  | "zoneNames"
  | "pmv"
  | "ppd"
  | "mrtC"
  | "operativeC"
  | "verticalAsymmetryC"
  | "horizontalAsymmetryC"
  | "asymmetryDissatisfiedPercent"
  | "category"
  | "ashrae55";

export interface SeatSort {
  key: SeatSortKey;
  direction: "asc" | "desc";
}

const collator = new Intl.Collator("en", { numeric: true, sensitivity: "base" });

function compareValues(a: SeatRow, b: SeatRow, key: SeatSortKey): number {
  switch (key) {
    case "label":
    case "zoneNames":
      return collator.compare(a[key], b[key]);
    case "category":
      // A before B before C; seats outside every category last.
      return collator.compare(a.category ?? "Z", b.category ?? "Z");
    case "ashrae55":
      return Number(b.ashrae55) - Number(a.ashrae55);
    default:
      return a[key] - b[key];
  }
}

/** A sorted copy; ties keep label order so the result does not depend on the input order. */
export function sortSeatRows(rows: readonly SeatRow[], sort: SeatSort): SeatRow[] {
  const sign = sort.direction === "asc" ? 1 : -1;
  return [...rows].sort((a, b) => sign * compareValues(a, b, sort.key) || collator.compare(a.label, b.label));
}

export interface SeatFilter {
  /** A zone id, NO_ZONE for seats outside every zone, or "" for all. */
  zoneId: string;
  /** "A" | "B" | "C", "none" for seats outside every category, or "" for all. */
  category: string;
  /** Case-insensitive text matched against the label and the zone names. */
  text: string;
}

export const NO_FILTER: SeatFilter = { zoneId: "", category: "", text: "" };

export function filterSeatRows(rows: readonly SeatRow[], filter: SeatFilter): SeatRow[] {
  const text = filter.text.trim().toLowerCase();
  return rows.filter((row) => {
    if (filter.zoneId === NO_ZONE && row.zoneIds.length > 0) return false;
    if (filter.zoneId && filter.zoneId !== NO_ZONE && !row.zoneIds.includes(filter.zoneId)) return false;
    if (filter.category === "none" && row.category !== null) return false;
    if (filter.category && filter.category !== "none" && row.category !== filter.category) return false;
    if (text && !row.label.toLowerCase().includes(text) && !row.zoneNames.toLowerCase().includes(text)) return false;
    return true;
  });
}
