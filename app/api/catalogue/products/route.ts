import { listProducts } from "@/lib/catalogue/service";
import { memberRoute } from "@/lib/http/handler";

/** The organisation's panel catalogue, by name. */
export const GET = memberRoute("projects:read", {}, async ({ member }) => ({ products: await listProducts(member.organisationId) }));
