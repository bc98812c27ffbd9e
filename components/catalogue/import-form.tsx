"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation } from "@tanstack/react-query";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { importCatalogueFile, rowErrorsOf, type ImportResult } from "@/components/catalogue/queries";
import { RowErrorsTable } from "@/components/catalogue/row-errors-table";
import { applyApiError } from "@/components/ui/api-errors";
import { Button } from "@/components/ui/button";
import { FormField } from "@/components/ui/form-field";
import { catalogueImportForm, MAX_CATALOGUE_ROWS, type CatalogueRowError } from "@/lib/catalogue/schema";
import { ApiError } from "@/lib/client/query";

type Values = z.input<typeof catalogueImportForm>;

interface Outcome {
  tone: "error" | "success";
  text: string;
  rows: CatalogueRowError[];
}

/**
 * Uploads a catalogue CSV. The server takes every row or none; when it refuses the file, each
 * problem is listed with its line and column in the live region under the form.
 */
export function ImportForm({ sampleHref, onImported }: { sampleHref: string; onImported: (result: ImportResult) => Promise<unknown> }) {
  const [outcome, setOutcome] = useState<Outcome | null>(null);
  const form = useForm<Values, unknown, z.output<typeof catalogueImportForm>>({ resolver: zodResolver(catalogueImportForm) });
  const upload = useMutation({
    mutationFn: (file: File) => importCatalogueFile(file),
    onSuccess: async (result) => {
      form.reset();
      // The message appears together with the refreshed table, never ahead of it.
      await onImported(result);
      const names = result.imported === 1 ? "1 product" : `${result.imported} products`;
      setOutcome({ tone: "success", text: `Imported ${names}.`, rows: [] });
    },
    onError: (error) => {
      const rows = rowErrorsOf(error);
      if (rows.length > 0 && error instanceof ApiError) setOutcome({ tone: "error", text: error.message, rows });
      else setOutcome({ tone: "error", text: applyApiError(error, form.setError, ["file"]), rows: [] });
    },
  });
  const { errors } = form.formState;

  return (
    <section aria-labelledby="import-heading" className="space-y-4 rounded-lg border border-line bg-white p-4">
      <div className="space-y-1">
        <h2 id="import-heading" className="text-lg font-semibold">
          Import products
        </h2>
        <p className="max-w-prose text-sm text-muted">
          A CSV file (UTF-8, comma-separated, up to 1 MB and {MAX_CATALOGUE_ROWS.toLocaleString("en")} products) whose first line names the columns{" "}
          <code className="font-mono text-xs">name, width_m, length_m, k, n, emissivity, louver_min_deg, louver_max_deg, finish, wall_emissivity</code>.
          Leave the four louver columns empty for a plain panel. If any row is wrong, nothing is imported.{" "}
          <a href={sampleHref} download="panel-products.csv" className="font-medium text-accent-strong underline underline-offset-4">
            Download the sample file
          </a>
        </p>
      </div>
      <form
        noValidate
        className="grid gap-4 sm:grid-cols-[1fr_auto] sm:items-start"
        onSubmit={form.handleSubmit((values) => {
          setOutcome(null);
          const file = values.file[0];
          if (file) upload.mutate(file);
        })}
      >
        <FormField
          label="CSV file"
          type="file"
          accept=".csv,text/csv"
          error={errors.file?.message}
          hint="Sizes in m, K in W/(m²·Kⁿ) per m² of panel face, angles in degrees."
          {...form.register("file")}
        />
        <Button type="submit" className="sm:mt-6" pending={upload.isPending}>
          Import
        </Button>
      </form>
      <div aria-live="polite" className="space-y-3" data-testid="import-outcome">
        {outcome ? (
          <p
            className={`rounded-md border px-3 py-2 text-sm ${
              outcome.tone === "error" ? "border-danger/30 bg-danger/5 text-danger" : "border-accent/30 bg-accent/5 text-accent-strong"
            }`}
          >
            {outcome.text}
          </p>
        ) : null}
        {outcome && outcome.rows.length > 0 ? <RowErrorsTable rows={outcome.rows} /> : null}
      </div>
    </section>
  );
}
