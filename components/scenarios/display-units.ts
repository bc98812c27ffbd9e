/**
 * How each number of the scenario form is shown and typed in the member's unit system. Stored
 * values are SI; lib/units converts temperatures and speeds. U-values are converted here
 * (lib/units has no such quantity): 1 W/(m²·K) = 0.17611 Btu/(h·ft²·°F), i.e. the W/m² to
 * Btu/(h·ft²) factor divided by 1.8 °F per K.
 */
import { BTUH_FT2_PER_W_M2, fromDisplay, toDisplay, unitSymbol, type Quantity, type UnitSystem } from "@/lib/units";

export const BTUH_FT2_F_PER_W_M2_K = BTUH_FT2_PER_W_M2 / 1.8;

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
  return system === "si"
    ? { symbol: "W/(m²·K)", toDisplay: (si) => si, fromDisplay: (shown) => shown, digits: 2 }
    : {
        symbol: "Btu/(h·ft²·°F)",
        toDisplay: (si) => si * BTUH_FT2_F_PER_W_M2_K,
        fromDisplay: (shown) => shown / BTUH_FT2_F_PER_W_M2_K,
        digits: 3,
      };
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
