"use client";

import { useQuery } from "@tanstack/react-query";
import { useId } from "react";
import { formatLouver, formatSize } from "@/components/catalogue/format";
import { catalogueProductsQuery } from "@/components/catalogue/queries";
import { apiErrorMessage } from "@/components/ui/api-errors";
import type { PanelProduct } from "@/lib/catalogue/schema";

interface Props {
  /** The product the panel refers to now, if any. */
  value: string | null;
  /** Called with the chosen product's record (apply it with `applyProductToPanel`), or null for "no product". */
  onSelect: (product: PanelProduct | null) => void;
  label?: string;
  disabled?: boolean;
}

const NONE = "";

/**
 * Chooses a product of the organisation's catalogue. It only reports the choice: the caller
 * decides what to do with it (the plan editor applies it to the selected panel). A panel whose
 * product was deleted from the catalogue since shows that, and keeps its values.
 */
export function ProductPicker({ value, onSelect, label = "Catalogue product", disabled = false }: Props) {
  const id = useId();
  const { data: products, isPending, error } = useQuery(catalogueProductsQuery());
  const selected = products?.find((p) => p.id === value) ?? null;
  const missing = value !== null && products !== undefined && selected === null;

  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block text-sm font-medium text-ink">
        {label}
      </label>
      <select
        id={id}
        value={value ?? NONE}
        disabled={disabled || isPending || Boolean(error)}
        aria-describedby={`${id}-detail`}
        onChange={(e) => onSelect(products?.find((p) => p.id === e.target.value) ?? null)}
        className="block w-full rounded-md border border-line bg-white px-3 py-2 text-sm text-ink shadow-xs focus:border-accent focus:outline-2 focus:outline-accent/30"
      >
        <option value={NONE}>{isPending ? "Loading the catalogue…" : "No catalogue product"}</option>
        {missing ? <option value={value}>A product deleted from the catalogue</option> : null}
        {(products ?? []).map((p) => (
          <option key={p.id} value={p.id}>
            {p.name}
          </option>
        ))}
      </select>
      <p id={`${id}-detail`} aria-live="polite" className={`text-xs ${error ? "text-danger" : "text-muted"}`}>
        {error
          ? `The catalogue could not be loaded: ${apiErrorMessage(error)}`
          : selected
            ? `${formatSize(selected)} · K ${selected.kWm2PerKn}, n ${selected.n} · ε ${selected.emissivity} · louver ${formatLouver(selected)}`
            : products?.length === 0
              ? "The catalogue is empty; designers and admins import products on the Catalogue page."
              : null}
      </p>
    </div>
  );
}
