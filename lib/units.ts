/**
 * Display units. Everything is stored and computed in SI; IP is a per-user display setting.
 * Conversions: 1 ft = 0.3048 m (exact, international foot); °F = °C·9/5 + 32; 1 W = 3.412142 Btu/h
 * (1 Btu_IT/h = 0.29307107 W); 1 W/m² = 0.3169983 Btu/(h·ft²); 1 W/(m²·K) = 0.17611 Btu/(h·ft²·°F)
 * (the W/m² factor divided by 1.8 °F per K).
 */
export type UnitSystem = "si" | "ip";

export const FT_PER_M = 1 / 0.3048;
export const BTUH_PER_W = 1 / 0.29307107;
export const BTUH_FT2_PER_W_M2 = BTUH_PER_W / (FT_PER_M * FT_PER_M);
export const BTUH_FT2_F_PER_W_M2_K = BTUH_FT2_PER_W_M2 / 1.8;

export type Quantity = "temperature" | "temperatureDifference" | "length" | "area" | "power" | "powerPerArea" | "speed" | "uValue";

const SYMBOLS: Record<UnitSystem, Record<Quantity, string>> = {
  si: { temperature: "°C", temperatureDifference: "K", length: "m", area: "m²", power: "W", powerPerArea: "W/m²", speed: "m/s", uValue: "W/(m²·K)" },
  ip: { temperature: "°F", temperatureDifference: "°F", length: "ft", area: "ft²", power: "Btu/h", powerPerArea: "Btu/h·ft²", speed: "fpm", uValue: "Btu/(h·ft²·°F)" },
};

/** Converts an SI value of `quantity` to the display system. */
export function toDisplay(quantity: Quantity, si: number, system: UnitSystem): number {
  if (system === "si") return si;
  switch (quantity) {
    case "temperature":
      return (si * 9) / 5 + 32;
    case "temperatureDifference":
      return (si * 9) / 5;
    case "length":
      return si * FT_PER_M;
    case "area":
      return si * FT_PER_M * FT_PER_M;
    case "power":
      return si * BTUH_PER_W;
    case "powerPerArea":
      return si * BTUH_FT2_PER_W_M2;
    case "speed":
      return si * FT_PER_M * 60;
    case "uValue":
      return si * BTUH_FT2_F_PER_W_M2_K;
  }
}

/** Converts a display value back to SI (for inputs typed in IP). */
export function fromDisplay(quantity: Quantity, shown: number, system: UnitSystem): number {
  if (system === "si") return shown;
  switch (quantity) {
    case "temperature":
      return ((shown - 32) * 5) / 9;
    case "temperatureDifference":
      return (shown * 5) / 9;
    case "length":
      return shown / FT_PER_M;
    case "area":
      return shown / (FT_PER_M * FT_PER_M);
    case "power":
      return shown / BTUH_PER_W;
    case "powerPerArea":
      return shown / BTUH_FT2_PER_W_M2;
    case "speed":
      return shown / (FT_PER_M * 60);
    case "uValue":
      return shown / BTUH_FT2_F_PER_W_M2_K;
  }
}

export function unitSymbol(quantity: Quantity, system: UnitSystem): string {
  return SYMBOLS[system][quantity];
}

/** "21.4 °C" / "70.5 °F". */
export function formatQuantity(quantity: Quantity, si: number, system: UnitSystem, digits = 1): string {
  if (!Number.isFinite(si)) return "—";
  return `${toDisplay(quantity, si, system).toFixed(digits)} ${unitSymbol(quantity, system)}`;
}
