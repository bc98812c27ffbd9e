/**
 * Taking a catalogue product into a plan panel. Pure; the plan editor calls it when the
 * designer picks a product for a panel.
 */
import type { PanelProductInput } from "@/lib/catalogue/schema";
import type { Panel } from "@/lib/layout/schema";

/** What of a product a panel takes: its data and its id. */
export type ApplicableProduct = PanelProductInput & { id: string };

function clamp(value: number, min: number, max: number): number {
  return Math.min(max, Math.max(min, value));
}

/**
 * The panel with the product's size, characteristic, emissivity and louver, and `productId`
 * set. Everything about where and how the panel is used stays: position, rotation, mounting,
 * mode, label, room, and the supply temperature.
 *
 * - Size: the product's width and length (for a wall panel: vertical and horizontal size).
 * - Characteristic (K, n): replaces the water supply's; a panel whose surface temperature is
 *   set directly (`supply.kind === "surface"`) keeps it, since no characteristic is used then.
 * - Louver: a plain product removes the panel's louver. A louvered product sets the range,
 *   finish and wall emissivity; the opening angle the panel had is kept, clamped into the new
 *   range (a panel without a louver starts fully open at the range's maximum), and so is the
 *   groove axis (a panel without a louver gets its rotation, grooves along its length).
 *
 * @param panel   a valid layout panel.
 * @param product a validated catalogue product (its limits lie inside the layout's).
 * @returns a new panel; the inputs are not changed.
 */
export function applyProductToPanel(panel: Readonly<Panel>, product: Readonly<ApplicableProduct>): Panel {
  const supply: Panel["supply"] =
    panel.supply.kind === "water"
      ? { ...panel.supply, characteristic: { kWm2PerKn: product.kWm2PerKn, n: product.n } }
      : { ...panel.supply };
  const louver: Panel["louver"] = product.louver
    ? {
        minOpeningAngleDeg: product.louver.minOpeningAngleDeg,
        maxOpeningAngleDeg: product.louver.maxOpeningAngleDeg,
        openingAngleDeg: clamp(panel.louver?.openingAngleDeg ?? product.louver.maxOpeningAngleDeg, product.louver.minOpeningAngleDeg, product.louver.maxOpeningAngleDeg),
        axisDeg: panel.louver?.axisDeg ?? panel.rotationDeg,
        finish: product.louver.finish,
        wallEmissivity: product.louver.wallEmissivity,
      }
    : null;
  return {
    ...panel,
    center: { ...panel.center },
    widthM: product.widthM,
    lengthM: product.lengthM,
    supply,
    emissivity: product.emissivity,
    louver,
    productId: product.id,
  };
}
