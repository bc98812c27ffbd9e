/**
 * The panel catalogue API against the database: import (raw CSV and multipart), listing,
 * deletion, organisation scope, and the all-or-nothing rule — a file with any bad row writes
 * no product and no audit entry.
 */
import { readFileSync } from "node:fs";
import path from "node:path";
import { and, eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { POST as importCatalogue } from "@/app/api/catalogue/import/route";
import { DELETE as deleteProduct } from "@/app/api/catalogue/products/[productId]/route";
import { GET as listProducts } from "@/app/api/catalogue/products/route";
import { auditLog, panelProducts } from "@/db/schema";
import { CATALOGUE_COLUMNS, MAX_CATALOGUE_BYTES, MAX_CATALOGUE_ROWS, type CatalogueRowError, type PanelProduct } from "@/lib/catalogue/schema";
import { call, organisationWithEveryRole, signUpOrganisation, type Account } from "../support/api";
import { closeDatabase, countAll, countRows, getDb } from "../support/db";
import { ROOT } from "../support/routes";

const SAMPLE = readFileSync(path.join(ROOT, "docs/samples/panel-products.csv"), "utf8");
const HEADER = CATALOGUE_COLUMNS.join(",");

type Org = Awaited<ReturnType<typeof organisationWithEveryRole>>;
let org: Org;
let other: Account;

beforeAll(async () => {
  org = await organisationWithEveryRole("catalogue");
  other = await signUpOrganisation("catalogue-other");
}, 60_000);

afterAll(async () => {
  await closeDatabase();
});

const uniq = () => crypto.randomUUID().slice(0, 8);

function importCsv(account: Account, text: string) {
  return call<{ imported: number; products: PanelProduct[] } & ErrorBody>(importCatalogue, "POST", {
    token: account.token,
    rawBody: text,
    headers: { "content-type": "text/csv" },
  });
}

function importForm(account: Account, text: string) {
  const form = new FormData();
  form.set("file", new Blob([text], { type: "text/csv" }), "products.csv");
  return call<{ imported: number; products: PanelProduct[] } & ErrorBody>(importCatalogue, "POST", { token: account.token, formData: form });
}

interface ErrorBody {
  error?: string;
  fields?: { path: string; message: string }[];
  rows?: CatalogueRowError[];
}

async function list(account: Account): Promise<PanelProduct[]> {
  const reply = await call<{ products: PanelProduct[] }>(listProducts, "GET", { token: account.token });
  expect(reply.status).toBe(200);
  return reply.body.products;
}

const orgCounts = async (organisationId: string) => ({
  products: await countRows(panelProducts, eq(panelProducts.organisationId, organisationId)),
  audit: await countRows(auditLog, eq(auditLog.organisationId, organisationId)),
});

describe("importing", () => {
  test("a designer imports the sample file; every staff role lists the products with their values", async () => {
    const reply = await importCsv(org.designer, SAMPLE);
    expect(reply.status, JSON.stringify(reply.body)).toBe(201);
    expect(reply.body.imported).toBe(6);
    expect(reply.body.products).toHaveLength(6);

    for (const account of [org.admin, org.designer, org.facility_manager]) {
      const products = await list(account);
      expect(products.map((p) => p.name)).toContain("Plain ceiling panel 0.6 x 1.2");
      expect(products).toHaveLength(6);
    }
    const products = await list(org.facility_manager);
    expect(products.find((p) => p.name === "Plain ceiling panel 0.6 x 1.2")).toMatchObject({
      widthM: 0.6,
      lengthM: 1.2,
      kWm2PerKn: 5.2,
      n: 1.1,
      emissivity: 0.93,
      louver: null,
    });
    expect(products.find((p) => p.name === "Louvered wall panel 1.2 x 2.0, narrow range")).toMatchObject({
      widthM: 1.2,
      lengthM: 2,
      louver: { minOpeningAngleDeg: 60, maxOpeningAngleDeg: 150, finish: "diffuse", wallEmissivity: 0.85 },
    });
    // Listed by name.
    const names = products.map((p) => p.name);
    expect(names).toEqual([...names].sort((a, b) => a.localeCompare(b, "en", { sensitivity: "base" })));

    const audit = await getDb()
      .select()
      .from(auditLog)
      .where(and(eq(auditLog.organisationId, org.admin.organisationId), eq(auditLog.action, "catalogue.import")));
    expect(audit).toHaveLength(1);
    expect(audit[0]!.actorId).toBe(org.designer.userId);
    expect(audit[0]!.details).toMatchObject({ imported: 6 });
  });

  test("an admin imports through the multipart form field `file`", async () => {
    const name = `Form panel ${uniq()}`;
    const reply = await importForm(org.admin, `${HEADER}\r\n${name},0.6,1.2,5,1.1,0.9,,,,\r\n`);
    expect(reply.status, JSON.stringify(reply.body)).toBe(201);
    expect(reply.body.products.map((p) => p.name)).toEqual([name]);
    expect((await list(org.admin)).map((p) => p.name)).toContain(name);
  });

  test("a file with one bad row among good ones is 400 naming its line and field, and writes nothing", async () => {
    const before = await orgCounts(org.admin.organisationId);
    const text = [HEADER, `Good A ${uniq()},0.6,1.2,5,1.1,0.9,,,,`, `Good B ${uniq()},0.6,1.2,5,1.1,0.9,30,180,diffuse,0.9`, `Bad ${uniq()},0.6,1.2,-5,1.1,0.9,,,,`, `Good C ${uniq()},0.6,1.2,5,1.1,0.9,,,,`].join("\n");
    const reply = await importCsv(org.designer, text);
    expect(reply.status).toBe(400);
    expect(reply.body.error).toBe("invalid_input");
    expect(reply.body.rows).toEqual([{ line: 4, field: "k", message: expect.stringContaining("greater than 0") }]);
    expect(reply.body.fields).toEqual([{ path: "line 4 · k", message: expect.stringContaining("greater than 0") }]);
    expect(await orgCounts(org.admin.organisationId)).toEqual(before);
  });

  test("a name the catalogue has already (any case) is an error at its line; nothing of the file is written", async () => {
    const before = await orgCounts(org.admin.organisationId);
    const text = `${HEADER}\nFresh ${uniq()},0.6,1.2,5,1.1,0.9,,,,\nPLAIN CEILING PANEL 0.6 X 1.2,0.6,1.2,5,1.1,0.9,,,,\n`;
    const reply = await importCsv(org.designer, text);
    expect(reply.status).toBe(400);
    expect(reply.body.rows).toEqual([{ line: 3, field: "name", message: 'the catalogue has a product named "Plain ceiling panel 0.6 x 1.2" already' }]);
    expect(await orgCounts(org.admin.organisationId)).toEqual(before);
  });

  test("the same name twice in one file is an error at the second line", async () => {
    const before = await orgCounts(org.admin.organisationId);
    const name = `Twice ${uniq()}`;
    const reply = await importCsv(org.designer, `${HEADER}\n${name},0.6,1.2,5,1.1,0.9,,,,\n${name},0.6,2.4,5,1.1,0.9,,,,\n`);
    expect(reply.status).toBe(400);
    expect(reply.body.rows).toEqual([{ line: 3, field: "name", message: `"${name}" is already on line 2; names must be unique` }]);
    expect(await orgCounts(org.admin.organisationId)).toEqual(before);
  });

  test("a header with an unknown column and a missing one names both", async () => {
    const before = await orgCounts(org.admin.organisationId);
    const header = HEADER.replace("emissivity,", "emisivity,");
    const reply = await importCsv(org.designer, `${header}\nX ${uniq()},0.6,1.2,5,1.1,0.9,,,,\n`);
    expect(reply.status).toBe(400);
    expect(reply.body.rows?.map((r) => [r.line, r.field])).toEqual([
      [1, "emisivity"],
      [1, "emissivity"],
    ]);
    expect(await orgCounts(org.admin.organisationId)).toEqual(before);
  });

  test(`more than ${MAX_CATALOGUE_ROWS} rows is 400 at the first row too many; exactly ${MAX_CATALOGUE_ROWS} are imported`, async () => {
    const tag = uniq();
    const rows = (n: number) => Array.from({ length: n }, (_, i) => `Bulk ${tag} ${i},0.6,1.2,5,1.1,0.9,,,,`);
    const before = await orgCounts(other.organisationId);
    const tooMany = await importCsv(other, [HEADER, ...rows(MAX_CATALOGUE_ROWS + 1)].join("\n"));
    expect(tooMany.status).toBe(400);
    expect(tooMany.body.rows).toEqual([{ line: MAX_CATALOGUE_ROWS + 2, field: "(file)", message: expect.stringContaining(String(MAX_CATALOGUE_ROWS)) }]);
    expect(await orgCounts(other.organisationId)).toEqual(before);

    const exactly = await importCsv(other, [HEADER, ...rows(MAX_CATALOGUE_ROWS)].join("\n"));
    expect(exactly.status, JSON.stringify(exactly.body).slice(0, 500)).toBe(201);
    expect(exactly.body.imported).toBe(MAX_CATALOGUE_ROWS);
    expect(await countRows(panelProducts, eq(panelProducts.organisationId, other.organisationId))).toBe(before.products + MAX_CATALOGUE_ROWS);
  });

  test("a file over 1 MB is 413 and writes nothing", async () => {
    const before = await orgCounts(org.admin.organisationId);
    const big = `${HEADER}\n${"x".repeat(MAX_CATALOGUE_BYTES)},0.6,1.2,5,1.1,0.9,,,,\n`;
    for (const reply of [await importCsv(org.designer, big), await importForm(org.designer, big)]) {
      expect(reply.status).toBe(413);
      expect(reply.body.error).toBe("payload_too_large");
    }
    expect(await orgCounts(org.admin.organisationId)).toEqual(before);
  });
});

describe("who may do what", () => {
  test("an occupant or facility manager may not import (403), and nothing is written", async () => {
    const before = await orgCounts(org.admin.organisationId);
    for (const account of [org.occupant, org.facility_manager]) {
      const reply = await importCsv(account, `${HEADER}\nRefused ${uniq()},0.6,1.2,5,1.1,0.9,,,,\n`);
      expect(reply.status).toBe(403);
      expect(reply.body.error).toBe("forbidden");
    }
    expect(await orgCounts(org.admin.organisationId)).toEqual(before);
  });

  test("an occupant may not list the catalogue; a facility manager may not delete from it", async () => {
    expect((await call(listProducts, "GET", { token: org.occupant.token })).status).toBe(403);
    const [product] = await list(org.admin);
    const reply = await call(deleteProduct, "DELETE", { token: org.facility_manager.token, params: { productId: product!.id } });
    expect(reply.status).toBe(403);
    expect((await list(org.admin)).map((p) => p.id)).toContain(product!.id);
  });
});

describe("organisation scope and deletion", () => {
  test("another organisation sees none of the products and may use the same names", async () => {
    const names = (await list(other)).map((p) => p.name);
    expect(names).not.toContain("Plain ceiling panel 0.6 x 1.2");
    const reply = await importCsv(other, SAMPLE);
    expect(reply.status, JSON.stringify(reply.body)).toBe(201);
  });

  test("deleting another organisation's product is 404 and leaves it; deleting one's own is 204, then 404", async () => {
    const [theirs] = await list(other);
    const before = await orgCounts(other.organisationId);
    const foreign = await call(deleteProduct, "DELETE", { token: org.designer.token, params: { productId: theirs!.id } });
    expect(foreign.status).toBe(404);
    expect(foreign.body.error).toBe("not_found");
    expect(await orgCounts(other.organisationId)).toEqual(before);

    const mine = (await list(org.designer)).find((p) => p.name === "Wall panel 0.9 x 1.5")!;
    const removed = await call(deleteProduct, "DELETE", { token: org.designer.token, params: { productId: mine.id } });
    expect(removed.status).toBe(204);
    expect((await list(org.designer)).map((p) => p.id)).not.toContain(mine.id);
    const audit = await getDb().select().from(auditLog).where(and(eq(auditLog.action, "catalogue.delete"), eq(auditLog.targetId, mine.id)));
    expect(audit).toHaveLength(1);
    const again = await call(deleteProduct, "DELETE", { token: org.designer.token, params: { productId: mine.id } });
    expect(again.status).toBe(404);
  });

  test("a deleted name can be imported again", async () => {
    const reply = await importCsv(org.designer, `${HEADER}\nWall panel 0.9 x 1.5,0.9,1.5,6.1,1.08,0.95,,,,\n`);
    expect(reply.status, JSON.stringify(reply.body)).toBe(201);
  });

  test("a product id that is not a UUID is 400 at params.productId", async () => {
    const before = await countAll({ panelProducts, auditLog });
    const reply = await call<ErrorBody>(deleteProduct, "DELETE", { token: org.designer.token, params: { productId: "12" } });
    expect(reply.status).toBe(400);
    expect(reply.body.fields?.map((f) => f.path)).toEqual(["params.productId"]);
    expect(await countAll({ panelProducts, auditLog })).toEqual(before);
  });
});
