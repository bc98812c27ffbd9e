/**
 * How each number of the scenario form is shown and typed in the member's unit system. Stored
 * values are SI; lib/units converts them (U-values included).
 */
import { fromDisplay, toDisplay, unitSymbol, type Quantity, type UnitSystem } from "@/lib/units";

export interface DisplayUnit {
  symbol: string;
  toDisplay(si: number): number;
  fromDisplay(shown: number): number;
  /** Decimals worth showing. */
  digits: number;
}

export function quantityUnit(quantity: Quantity, system: UnitSystem, digits = 1): DisplayUnit {
  return {
    symbol: unitSymbol(quantity, system),
    toDisplay: (si) => toDisplay(quantity, si, system),
    fromDisplay: (shown) => fromDisplay(quantity, shown, system),
    digits,
  };
}

export function uValueUnit(system: UnitSystem): DisplayUnit {
  return quantityUnit("uValue", system, system === "si" ? 2 : 3);
}

/** A display value as the form shows it: rounded to the unit's digits, without trailing zeros. */
export function displayText(unit: DisplayUnit, si: number): string {
  if (!Number.isFinite(si)) return "";
  return String(Number(unit.toDisplay(si).toFixed(unit.digits)));
}

/** What the user typed, as SI; NaN for an empty or non-numeric entry (the schema rejects it). */
export function parseDisplay(unit: DisplayUnit, text: string): number {
  const trimmed = text.trim().replace(",", ".");
  if (trimmed === "") return Number.NaN;
  const shown = Number(trimmed);
  return Number.isFinite(shown) ? unit.fromDisplay(shown) : Number.NaN;
}

/** "5 – 40 °C" in the display system, for hints beside the fields. */
export function rangeText(unit: DisplayUnit, minSi: number, maxSi: number): string {
  return `${displayText(unit, minSi)} – ${displayText(unit, maxSi)} ${unit.symbol}`;
}
