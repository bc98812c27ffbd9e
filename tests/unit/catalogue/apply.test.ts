import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { applyProductToPanel, type ApplicableProduct } from "@/lib/catalogue/apply";
import { parseCatalogueText } from "@/lib/catalogue/csv";
import { CATALOGUE_COLUMNS } from "@/lib/catalogue/schema";
import { panel as panelSchema, type Panel } from "@/lib/layout/schema";

const PRODUCT_ID = "5b1f8c1e-2f6a-4d83-9a3c-3f6f3a8e2b10";

function waterPanel(overrides: Partial<Panel> = {}): Panel {
  return {
    id: "p1",
    label: "P1",
    roomId: "r1",
    mounting: "ceiling",
    center: { x: 3, y: 2 },
    rotationDeg: 30,
    widthM: 1,
    lengthM: 2,
    mountingHeightM: null,
    mode: "heating",
    supply: { kind: "water", meanWaterTemperatureC: 45, characteristic: { kWm2PerKn: 9, n: 1.3 } },
    emissivity: 0.8,
    louver: null,
    productId: null,
    ...overrides,
  };
}

const plain: ApplicableProduct = { id: PRODUCT_ID, name: "Plain", widthM: 0.6, lengthM: 1.2, kWm2PerKn: 5.2, n: 1.1, emissivity: 0.93, louver: null };
const louvered: ApplicableProduct = {
  id: PRODUCT_ID,
  name: "Louvered",
  widthM: 0.6,
  lengthM: 1.8,
  kWm2PerKn: 4.8,
  n: 1.12,
  emissivity: 0.9,
  louver: { minOpeningAngleDeg: 40, maxOpeningAngleDeg: 150, finish: "specular", wallEmissivity: 0.1 },
};

describe("applyProductToPanel(panel, product)", () => {
  test("sets size, characteristic, emissivity and productId; keeps position, rotation, mounting, mode and water temperature", () => {
    const before = waterPanel();
    const after = applyProductToPanel(before, plain);
    expect(after).toEqual({
      ...before,
      widthM: 0.6,
      lengthM: 1.2,
      supply: { kind: "water", meanWaterTemperatureC: 45, characteristic: { kWm2PerKn: 5.2, n: 1.1 } },
      emissivity: 0.93,
      louver: null,
      productId: PRODUCT_ID,
    });
    expect(before.widthM).toBe(1);
    expect(before.supply).toEqual({ kind: "water", meanWaterTemperatureC: 45, characteristic: { kWm2PerKn: 9, n: 1.3 } });
  });

  test("a louvered product on a panel without a louver: its range, finish, wall emissivity; fully open; grooves along the panel's rotation", () => {
    const after = applyProductToPanel(waterPanel(), louvered);
    expect(after.louver).toEqual({ minOpeningAngleDeg: 40, maxOpeningAngleDeg: 150, openingAngleDeg: 150, axisDeg: 30, finish: "specular", wallEmissivity: 0.1 });
  });

  test.each([
    { had: 20, gets: 40 },
    { had: 90, gets: 90 },
    { had: 180, gets: 150 },
  ])("a louvered panel opened $had° keeps its setting clamped into the product's range: $gets°", ({ had, gets }) => {
    const panel = waterPanel({ louver: { openingAngleDeg: had, minOpeningAngleDeg: 0, maxOpeningAngleDeg: 180, axisDeg: -45, finish: "diffuse", wallEmissivity: 0.9 } });
    const after = applyProductToPanel(panel, louvered);
    expect(after.louver).toMatchObject({ openingAngleDeg: gets, axisDeg: -45, finish: "specular", wallEmissivity: 0.1 });
  });

  test("a plain product removes the panel's louver", () => {
    const panel = waterPanel({ louver: { openingAngleDeg: 90, minOpeningAngleDeg: 30, maxOpeningAngleDeg: 180, axisDeg: 0, finish: "diffuse", wallEmissivity: 0.9 } });
    expect(applyProductToPanel(panel, plain).louver).toBeNull();
  });

  test("a panel with a set surface temperature keeps it (no characteristic is used for it)", () => {
    const panel = waterPanel({ supply: { kind: "surface", surfaceTemperatureC: 32 } });
    const after = applyProductToPanel(panel, plain);
    expect(after.supply).toEqual({ kind: "surface", surfaceTemperatureC: 32 });
    expect(after).toMatchObject({ widthM: 0.6, lengthM: 1.2, emissivity: 0.93, productId: PRODUCT_ID });
  });

  test("a product from the sample format applied to a panel gives a panel the layout schema accepts", () => {
    const parsed = parseCatalogueText(`${CATALOGUE_COLUMNS.join(",")}\nWall,0.9,1.5,6.1,1.08,0.95,60,150,diffuse,0.85\n`);
    if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
    const product = { ...parsed.products[0]!, id: PRODUCT_ID };
    const after = applyProductToPanel(waterPanel({ mounting: "wall", mountingHeightM: 0.4 }), product);
    expect(panelSchema.safeParse(after).success).toBe(true);
    expect(after).toMatchObject({ mounting: "wall", mountingHeightM: 0.4, widthM: 0.9, lengthM: 1.5 });
  });

  test("any product within the catalogue's limits, on any valid panel, gives a valid panel", () => {
    const angle = fc.double({ min: 0, max: 180, noNaN: true });
    const productArb = fc.record({
      widthM: fc.double({ min: 0.1, max: 50, noNaN: true }),
      lengthM: fc.double({ min: 0.1, max: 50, noNaN: true }),
      kWm2PerKn: fc.double({ min: 0.001, max: 100, noNaN: true }),
      n: fc.double({ min: 0.8, max: 2, noNaN: true }),
      emissivity: fc.double({ min: 0.05, max: 1, noNaN: true }),
      louver: fc.option(
        fc.record({ a: angle, b: angle, finish: fc.constantFrom("diffuse" as const, "specular" as const), wallEmissivity: fc.double({ min: 0.02, max: 1, noNaN: true }) }),
      ),
    });
    const panelArb = fc.record({
      opening: fc.option(angle),
      water: fc.boolean(),
      rotationDeg: fc.double({ min: -360, max: 360, noNaN: true }),
    });
    fc.assert(
      fc.property(productArb, panelArb, (p, q) => {
        const product: ApplicableProduct = {
          id: PRODUCT_ID,
          name: "Any",
          widthM: p.widthM,
          lengthM: p.lengthM,
          kWm2PerKn: p.kWm2PerKn,
          n: p.n,
          emissivity: p.emissivity,
          louver: p.louver
            ? { minOpeningAngleDeg: Math.min(p.louver.a, p.louver.b), maxOpeningAngleDeg: Math.max(p.louver.a, p.louver.b), finish: p.louver.finish, wallEmissivity: p.louver.wallEmissivity }
            : null,
        };
        const panel = waterPanel({
          rotationDeg: q.rotationDeg,
          supply: q.water ? { kind: "water", meanWaterTemperatureC: 40, characteristic: { kWm2PerKn: 7, n: 1.2 } } : { kind: "surface", surfaceTemperatureC: 30 },
          louver: q.opening === null ? null : { openingAngleDeg: q.opening, minOpeningAngleDeg: 0, maxOpeningAngleDeg: 180, axisDeg: 10, finish: "diffuse", wallEmissivity: 0.9 },
        });
        const result = panelSchema.safeParse(applyProductToPanel(panel, product));
        expect(result.success, JSON.stringify(result.error?.issues)).toBe(true);
      }),
      { numRuns: 300 },
    );
  });
});
