import { toDisplay, type Quantity, type UnitSystem } from "@/lib/units";

/** A number for a table cell in the display system (the unit sits in the column header). */
export function num(quantity: Quantity | null, si: number | null | undefined, system: UnitSystem, digits = 1): string {
  if (si === null || si === undefined || !Number.isFinite(si)) return "—";
  const value = quantity ? toDisplay(quantity, si, system) : si;
  const text = value.toFixed(digits);
  return /^-0\.?0*$/.test(text) ? text.slice(1) : text;
}

/** PMV with its sign: "+0.32", "-0.10", "0.00". */
export function pmvText(pmv: number | null | undefined): string {
  if (pmv === null || pmv === undefined || !Number.isFinite(pmv)) return "—";
  const text = pmv.toFixed(2);
  if (/^-?0\.00$/.test(text)) return "0.00";
  return pmv > 0 ? `+${text}` : text;
}

export function percent(share: number | null | undefined, digits = 0): string {
  if (share === null || share === undefined || !Number.isFinite(share)) return "—";
  return `${(share * 100).toFixed(digits)} %`;
}
