import "server-only";
import { and, asc, eq, inArray } from "drizzle-orm";
import { getDb } from "@/db/client";
import { panelProducts } from "@/db/schema";
import { recordAudit } from "@/lib/audit";
import type { Member } from "@/lib/auth/session";
import { parseCatalogueFile, productNameKey } from "@/lib/catalogue/csv";
import type { CatalogueRowError, PanelProduct } from "@/lib/catalogue/schema";
import { AppError, notFound, type FieldError } from "@/lib/http/errors";
import { warmInBackground } from "@/lib/louvers/cavity-table-cache";
import type { LouverTableParams } from "@/lib/panels";

/** Rows per INSERT statement (a file holds at most 2,000). */
const INSERT_CHUNK = 500;

function toProduct(row: typeof panelProducts.$inferSelect): PanelProduct {
  const louvered = row.louverMinDeg !== null && row.louverMaxDeg !== null && row.finish !== null && row.wallEmissivity !== null;
  return {
    id: row.id,
    name: row.name,
    widthM: row.widthM,
    lengthM: row.lengthM,
    kWm2PerKn: row.kWm2PerKn,
    n: row.n,
    emissivity: row.emissivity,
    louver: louvered
      ? { minOpeningAngleDeg: row.louverMinDeg!, maxOpeningAngleDeg: row.louverMaxDeg!, finish: row.finish!, wallEmissivity: row.wallEmissivity! }
      : null,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

function isDuplicateKey(error: unknown): boolean {
  const e = error as { code?: string; cause?: { code?: string } };
  return e?.code === "ER_DUP_ENTRY" || e?.cause?.code === "ER_DUP_ENTRY";
}

/**
 * The 400 (or 413) of a bad file: `fields` in the house format ("line 4 · k") so every client
 * that reads field errors shows them, and `rows` with line, field and message apart.
 */
function badFile(code: "invalid_input" | "payload_too_large", rows: CatalogueRowError[]): AppError {
  const fields: FieldError[] = rows.map((r) => ({ path: `line ${r.line} · ${r.field}`, message: r.message }));
  const problems = rows.length === 1 ? "1 problem" : `${rows.length} problems`;
  const message =
    code === "payload_too_large"
      ? "The file is too large; nothing was imported."
      : `The file has ${problems}; nothing was imported. Correct the lines named and import the whole file again.`;
  return new AppError(code, message, fields, { rows });
}

/** The organisation's catalogue, by name. */
export async function listProducts(organisationId: string): Promise<PanelProduct[]> {
  const rows = await getDb().select().from(panelProducts).where(eq(panelProducts.organisationId, organisationId)).orderBy(asc(panelProducts.name));
  return rows.map(toProduct);
}

/**
 * Imports every product of a CSV file, or none: the file is parsed and every row validated
 * first (400 listing each bad line and field; 413 over 1 MB), names are checked against the
 * catalogue inside the transaction that inserts them, and the audit entry lands with them.
 */
export async function importProducts(member: Member, bytes: Uint8Array): Promise<{ imported: number; products: PanelProduct[] }> {
  const parsed = parseCatalogueFile(bytes);
  if (!parsed.ok) throw badFile(parsed.reason === "too_large" ? "payload_too_large" : "invalid_input", parsed.errors);
  const ids = parsed.products.map(() => crypto.randomUUID());
  try {
    await getDb().transaction(async (tx) => {
      const existing = await tx.select({ name: panelProducts.name }).from(panelProducts).where(eq(panelProducts.organisationId, member.organisationId));
      const taken = new Map(existing.map((p) => [productNameKey(p.name), p.name]));
      const clashes: CatalogueRowError[] = [];
      parsed.products.forEach((product, i) => {
        const other = taken.get(productNameKey(product.name));
        if (other !== undefined) {
          clashes.push({ line: parsed.lines[i]!, field: "name", message: `the catalogue has a product named "${other}" already` });
        }
      });
      if (clashes.length > 0) throw badFile("invalid_input", clashes);
      const values = parsed.products.map((p, i) => ({
        id: ids[i]!,
        organisationId: member.organisationId,
        name: p.name,
        widthM: p.widthM,
        lengthM: p.lengthM,
        kWm2PerKn: p.kWm2PerKn,
        n: p.n,
        emissivity: p.emissivity,
        louverMinDeg: p.louver?.minOpeningAngleDeg ?? null,
        louverMaxDeg: p.louver?.maxOpeningAngleDeg ?? null,
        finish: p.louver?.finish ?? null,
        wallEmissivity: p.louver?.wallEmissivity ?? null,
        createdBy: member.userId,
      }));
      for (let i = 0; i < values.length; i += INSERT_CHUNK) {
        await tx.insert(panelProducts).values(values.slice(i, i + INSERT_CHUNK));
      }
      await recordAudit(tx, {
        organisationId: member.organisationId,
        actorId: member.userId,
        action: "catalogue.import",
        targetType: "catalogue",
        details: { imported: values.length, names: values.slice(0, 20).map((v) => v.name) },
      });
    });
  } catch (error) {
    // Another import took one of the names after our check: the unique index refused the lot.
    if (isDuplicateKey(error)) throw new AppError("conflict", "A product with one of these names was added meanwhile; nothing was imported. Import the file again to see which.");
    throw error;
  }
  const rows = await getDb()
    .select()
    .from(panelProducts)
    .where(and(eq(panelProducts.organisationId, member.organisationId), inArray(panelProducts.id, ids)))
    .orderBy(asc(panelProducts.name));
  // Tabulate the new products' louver cavities now, so no seat computation waits for them later.
  warmInBackground(uniqueLouverParams(rows));
  return { imported: ids.length, products: rows.map(toProduct) };
}

function uniqueLouverParams(rows: ReadonlyArray<{ finish: "diffuse" | "specular" | null; wallEmissivity: number | null }>): LouverTableParams[] {
  const byKey = new Map<string, LouverTableParams>();
  for (const r of rows) {
    if (r.finish === null || r.wallEmissivity === null) continue;
    byKey.set(`${r.finish}/${r.wallEmissivity}`, { finish: r.finish, wallEmissivity: r.wallEmissivity });
  }
  return [...byKey.values()];
}

/** The louver finishes of every catalogue product (all organisations): warmed when the server starts. */
export async function catalogueLouverTableParams(): Promise<LouverTableParams[]> {
  const rows = await getDb()
    .selectDistinct({ finish: panelProducts.finish, wallEmissivity: panelProducts.wallEmissivity })
    .from(panelProducts);
  return uniqueLouverParams(rows);
}

/** Deletes a product of the member's organisation; 404 for unknown and foreign ids alike. Panels that refer to it keep their values. */
export async function deleteProduct(member: Member, productId: string): Promise<void> {
  await getDb().transaction(async (tx) => {
    const [row] = await tx
      .select({ id: panelProducts.id, name: panelProducts.name })
      .from(panelProducts)
      .where(and(eq(panelProducts.id, productId), eq(panelProducts.organisationId, member.organisationId)))
      .limit(1);
    if (!row) throw notFound("No such product.");
    await tx.delete(panelProducts).where(and(eq(panelProducts.id, productId), eq(panelProducts.organisationId, member.organisationId)));
    await recordAudit(tx, {
      organisationId: member.organisationId,
      actorId: member.userId,
      action: "catalogue.delete",
      targetType: "panel_product",
      targetId: productId,
      details: { name: row.name },
    });
  });
}
