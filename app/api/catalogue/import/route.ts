import { importProducts } from "@/lib/catalogue/service";
import { readCatalogueUpload } from "@/lib/catalogue/upload";
import { memberRoute } from "@/lib/http/handler";

/** Imports a catalogue CSV (raw text/csv, or multipart field `file`): every row, or none (400 with each bad line and field). */
export const POST = memberRoute("catalogue:write", { status: 201 }, async ({ req, member }) => importProducts(member, await readCatalogueUpload(req)));
