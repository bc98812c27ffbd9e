"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { formatLouver, formatNumber, formatSize } from "@/components/catalogue/format";
import { ImportForm } from "@/components/catalogue/import-form";
import { catalogueProductsQuery, deleteCatalogueProduct } from "@/components/catalogue/queries";
import { apiErrorMessage } from "@/components/ui/api-errors";
import { Button } from "@/components/ui/button";
import { FormAlert } from "@/components/ui/form-alert";
import type { PanelProduct } from "@/lib/catalogue/schema";

interface Props {
  /** Rendered by the server page, so the table shows without a loading state. */
  initialData: PanelProduct[];
  canWrite: boolean;
  /** Link to the sample CSV file. */
  sampleHref: string;
}

const TH = "px-3 py-2 font-medium";
const TD = "px-3 py-2";

export function CataloguePanel({ initialData, canWrite, sampleHref }: Props) {
  const queryClient = useQueryClient();
  const { data: products } = useQuery({ ...catalogueProductsQuery(), initialData });
  const [message, setMessage] = useState<{ tone: "error" | "success"; text: string } | null>(null);
  const invalidate = () => queryClient.invalidateQueries({ queryKey: catalogueProductsQuery().queryKey });

  const remove = useMutation({
    mutationFn: (product: PanelProduct) => deleteCatalogueProduct(product.id),
    onSuccess: (_data, product) => invalidate().then(() => setMessage({ tone: "success", text: `${product.name} was removed from the catalogue.` })),
    onError: (error) => invalidate().then(() => setMessage({ tone: "error", text: apiErrorMessage(error) })),
  });

  return (
    <div className="space-y-10">
      {canWrite ? <ImportForm sampleHref={sampleHref} onImported={invalidate} /> : null}

      <section aria-labelledby="products-heading" className="space-y-3">
        <h2 id="products-heading" className="text-lg font-semibold">
          Products <span className="font-normal text-muted">({products.length})</span>
        </h2>
        <FormAlert tone={message?.tone}>{message?.text}</FormAlert>
        {products.length === 0 ? (
          <p className="text-sm text-muted">
            The catalogue is empty.{" "}
            {canWrite ? (
              "Import a CSV file above to add products."
            ) : (
              <>
                A designer or admin can import products.{" "}
                <a href={sampleHref} download="panel-products.csv" className="text-accent-strong underline underline-offset-4">
                  Download the sample file
                </a>{" "}
                to see the format.
              </>
            )}
          </p>
        ) : (
          <div className="overflow-x-auto rounded-lg border border-line bg-white">
            <table className="w-full text-left text-sm" aria-label="Panel products">
              <thead className="border-b border-line text-xs uppercase tracking-wide text-muted">
                <tr>
                  <th scope="col" className={TH}>
                    Name
                  </th>
                  <th scope="col" className={TH}>
                    Size <span className="normal-case">(w × l)</span>
                  </th>
                  <th scope="col" className={`${TH} text-right`}>
                    K <span className="normal-case">W/(m²·Kⁿ)</span>
                  </th>
                  <th scope="col" className={`${TH} text-right normal-case`}>
                    n
                  </th>
                  <th scope="col" className={`${TH} text-right`}>
                    Emissivity
                  </th>
                  <th scope="col" className={TH}>
                    Louver
                  </th>
                  {canWrite ? (
                    <th scope="col" className={TH}>
                      <span className="sr-only">Actions</span>
                    </th>
                  ) : null}
                </tr>
              </thead>
              <tbody className="divide-y divide-line">
                {products.map((p) => (
                  <tr key={p.id}>
                    <th scope="row" className={`${TD} font-medium`}>
                      {p.name}
                    </th>
                    <td className={`${TD} whitespace-nowrap tabular-nums`}>{formatSize(p)}</td>
                    <td className={`${TD} text-right tabular-nums`}>{formatNumber(p.kWm2PerKn)}</td>
                    <td className={`${TD} text-right tabular-nums`}>{formatNumber(p.n)}</td>
                    <td className={`${TD} text-right tabular-nums`}>{formatNumber(p.emissivity, 2)}</td>
                    <td className={TD}>{formatLouver(p)}</td>
                    {canWrite ? (
                      <td className={`${TD} text-right`}>
                        <Button
                          variant="danger"
                          className="px-2.5 py-1"
                          disabled={remove.isPending}
                          aria-label={`Delete ${p.name}`}
                          onClick={() => {
                            setMessage(null);
                            if (window.confirm(`Delete "${p.name}" from the catalogue? Panels already taken from it keep their values.`)) remove.mutate(p);
                          }}
                        >
                          Delete
                        </Button>
                      </td>
                    ) : null}
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
      </section>
    </div>
  );
}
