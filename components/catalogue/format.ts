import type { PanelProduct } from "@/lib/catalogue/schema";

/** Catalogue figures as the file states them (SI); trailing zeros dropped. */
export function formatNumber(value: number, maxDecimals = 3): string {
  return value.toLocaleString("en", { maximumFractionDigits: maxDecimals, useGrouping: false });
}

export function formatSize(product: Pick<PanelProduct, "widthM" | "lengthM">): string {
  return `${formatNumber(product.widthM)} × ${formatNumber(product.lengthM)} m`;
}

export function formatLouver(product: Pick<PanelProduct, "louver">): string {
  const l = product.louver;
  if (!l) return "none";
  return `${formatNumber(l.minOpeningAngleDeg, 1)}–${formatNumber(l.maxOpeningAngleDeg, 1)}° · ${l.finish} · wall ε ${formatNumber(l.wallEmissivity, 2)}`;
}
