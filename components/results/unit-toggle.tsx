"use client";

import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { apiErrorMessage } from "@/components/ui/api-errors";
import { updateUnitSystem } from "@/components/settings/queries";
import type { UnitSystem } from "@/lib/units";

const OPTIONS: ReadonlyArray<{ value: UnitSystem; label: string; hint: string }> = [
  { value: "si", label: "SI", hint: "°C, m, W" },
  { value: "ip", label: "IP", hint: "°F, ft, Btu/h" },
];

/**
 * The member's display units. Saved on the account (PATCH /api/me/settings); the server pages
 * render with it, so a refresh shows every value converted. Stored values stay SI.
 */
export function UnitToggle({ value }: { value: UnitSystem }) {
  const router = useRouter();
  const [refreshing, startRefresh] = useTransition();
  const [error, setError] = useState<string | null>(null);
  const mutation = useMutation({
    mutationFn: updateUnitSystem,
    onSuccess: () => {
      setError(null);
      startRefresh(() => router.refresh());
    },
    onError: (e) => setError(apiErrorMessage(e)),
  });
  const busy = mutation.isPending || refreshing;
  return (
    <div className="flex items-center gap-2 text-sm">
      <span id="unit-toggle-label" className="text-muted">
        Units
      </span>
      <div role="group" aria-labelledby="unit-toggle-label" className="inline-flex overflow-hidden rounded-md border border-line bg-white">
        {OPTIONS.map((o) => (
          <button
            key={o.value}
            type="button"
            aria-pressed={value === o.value}
            title={o.hint}
            disabled={busy}
            onClick={() => value !== o.value && mutation.mutate(o.value)}
            className={`px-3 py-1.5 font-medium ${value === o.value ? "bg-accent text-white" : "text-ink hover:bg-paper"} disabled:opacity-70`}
          >
            {o.label} <span className="sr-only">({o.hint})</span>
          </button>
        ))}
      </div>
      <span role="status" aria-live="polite" className="text-danger">
        {error}
      </span>
    </div>
  );
}
