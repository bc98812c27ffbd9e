import "server-only";
import { readFile } from "node:fs/promises";
import path from "node:path";

/** The documented sample file (docs/samples/panel-products.csv), the one copy the page links to. */
const SAMPLE_PATH = path.join(process.cwd(), "docs/samples/panel-products.csv");

/**
 * The sample catalogue file as a `data:` URL for a download link, so the page serves the very
 * file the docs show without a second copy under public/.
 */
export async function sampleCatalogueHref(): Promise<string> {
  const text = await readFile(SAMPLE_PATH, "utf8");
  return `data:text/csv;charset=utf-8,${encodeURIComponent(text)}`;
}
