import type { Metadata } from "next";
import { CataloguePanel } from "@/components/catalogue/catalogue-panel";
import { SAFETY_CAUTIONS } from "@/components/results/cautions";
import { PageHeader } from "@/components/ui/page-header";
import { requireMember } from "@/lib/auth/guard";
import { sampleCatalogueHref } from "@/lib/catalogue/sample";
import { listProducts } from "@/lib/catalogue/service";
import { can } from "@/lib/permissions";

export const metadata: Metadata = { title: "Panel catalogue" };

export default async function CataloguePage() {
  const member = await requireMember("projects:read");
  const [products, sampleHref] = await Promise.all([listProducts(member.organisationId), sampleCatalogueHref()]);
  return (
    <>
      <PageHeader title="Panel catalogue">
        The radiant panel products of {member.organisationName}: size, rated characteristic q = K·ΔTⁿ per m² of panel face, emissivity and, for
        louvered panels, the opening range and cavity walls. A panel in a plan can take its values from a product.
      </PageHeader>
      <CataloguePanel initialData={products} canWrite={can(member.role, "catalogue:write")} sampleHref={sampleHref} />
      <aside aria-label="Product cautions" className="mt-10 space-y-2 rounded-md border border-warm/40 bg-warm/5 px-4 py-3 text-sm">
        <p className="font-medium text-warm">Before specifying a product</p>
        <p>
          Catalogue figures are the manufacturer&apos;s ratings as imported; check them against the current data sheet and its limits for supply
          temperature, pressure and surface temperature.
        </p>
        <ul className="list-disc space-y-1 pl-5">
          {SAFETY_CAUTIONS.map((caution) => (
            <li key={caution}>{caution}</li>
          ))}
        </ul>
      </aside>
    </>
  );
}
