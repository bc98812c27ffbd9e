import { api } from "@/lib/client/query";

/** Saves the member's display units (everything stays stored in SI). */
export function updateUnitSystem(unitSystem: "si" | "ip"): Promise<{ unitSystem: "si" | "ip" }> {
  return api("/api/me/settings", { method: "PATCH", body: { unitSystem } });
}
