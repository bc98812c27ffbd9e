/**
 * The panel catalogue: the CSV columns, the zod schema every data row passes through (server
 * import and client form alike), and the product record the API returns.
 *
 * Units and conventions (the same as the layout's panels, lib/layout/schema.ts):
 * - `width_m`, `length_m`: panel face size, m. For a ceiling panel width is across and length
 *   along its length axis; for a wall panel width is the vertical and length the horizontal size.
 * - `k`, `n`: the rated characteristic q = K·ΔTⁿ per m² of panel face, K in W/(m²·Kⁿ), n
 *   dimensionless, ΔT = mean water temperature − room air temperature in K (its magnitude when
 *   cooling). A panel's output is Q = q·width·length W.
 * - `emissivity`: hemispherical emissivity of the flat face.
 * - `louver_min_deg`, `louver_max_deg`: the range of full opening angles of the V-groove cavities
 *   the louver mechanism allows, degrees (180 = flat, fully open); both empty for a plain panel.
 * - `finish` (`diffuse` | `specular`) and `wall_emissivity`: the cavity walls; only for a
 *   louvered panel, and then required.
 */
import { z } from "zod";

/** The columns of a catalogue CSV file, in the order of the sample file. */
export const CATALOGUE_COLUMNS = [
  "name",
  "width_m",
  "length_m",
  "k",
  "n",
  "emissivity",
  "louver_min_deg",
  "louver_max_deg",
  "finish",
  "wall_emissivity",
] as const;
export type CatalogueColumn = (typeof CATALOGUE_COLUMNS)[number];

/** Largest catalogue file accepted, bytes (1 MiB). */
export const MAX_CATALOGUE_BYTES = 1024 * 1024;
/** Most products one file may hold (data rows, the header not counted). */
export const MAX_CATALOGUE_ROWS = 2000;

/** Longest product name (the column's width). */
export const MAX_PRODUCT_NAME_LENGTH = 120;

/** Decimal numbers as a spreadsheet writes them: optional sign, point as decimal separator, optional exponent. */
const DECIMAL = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;

interface NumberSpec {
  min: number;
  max: number;
  unit: string;
  /** The value must exceed `min` (a positive coefficient). */
  exclusiveMin?: boolean;
}

function checkNumber(raw: string, spec: NumberSpec, ctx: z.RefinementCtx): number | typeof z.NEVER {
  const text = raw.trim();
  if (text === "") {
    ctx.addIssue({ code: "custom", message: "required" });
    return z.NEVER;
  }
  if (!DECIMAL.test(text)) {
    ctx.addIssue({ code: "custom", message: `"${text.slice(0, 20)}" is not a number (use a point as the decimal separator)` });
    return z.NEVER;
  }
  const value = Number(text);
  if (spec.exclusiveMin ? value <= spec.min : value < spec.min) {
    ctx.addIssue({ code: "custom", message: `must be ${spec.exclusiveMin ? "greater than" : "at least"} ${spec.min}${spec.unit}` });
    return z.NEVER;
  }
  if (value > spec.max) {
    ctx.addIssue({ code: "custom", message: `must be at most ${spec.max}${spec.unit}` });
    return z.NEVER;
  }
  return value;
}

/** A required numeric cell within the spec's range. */
const numberCell = (spec: NumberSpec) => z.string().transform((raw, ctx) => checkNumber(raw, spec, ctx));

/** An optional numeric cell: empty → null. */
const optionalNumberCell = (spec: NumberSpec) =>
  z.string().transform((raw, ctx): number | null => (raw.trim() === "" ? null : checkNumber(raw, spec, ctx)));

const FINISHES = ["diffuse", "specular"] as const;

/** Cavity wall finish: empty → null; case-insensitive. */
const finishCell = z.string().transform((raw, ctx): (typeof FINISHES)[number] | null => {
  const text = raw.trim().toLowerCase();
  if (text === "") return null;
  const finish = FINISHES.find((f) => f === text);
  if (!finish) {
    ctx.addIssue({ code: "custom", message: "must be diffuse or specular" });
    return z.NEVER;
  }
  return finish;
});

const LOUVER_COLUMNS: readonly string[] = ["louver_min_deg", "louver_max_deg", "finish", "wall_emissivity"] satisfies CatalogueColumn[];

/** The limits below are the layout schema's panel limits, so any product can be applied to a panel. */
export const catalogueRow = z
  .strictObject({
    name: z.string().trim().min(1, "required").max(MAX_PRODUCT_NAME_LENGTH, `use at most ${MAX_PRODUCT_NAME_LENGTH} characters`),
    width_m: numberCell({ min: 0.1, max: 50, unit: " m" }),
    length_m: numberCell({ min: 0.1, max: 50, unit: " m" }),
    k: numberCell({ min: 0, max: 100, unit: " W/(m²·Kⁿ)", exclusiveMin: true }),
    n: numberCell({ min: 0.8, max: 2, unit: "" }),
    emissivity: numberCell({ min: 0.05, max: 1, unit: "" }),
    louver_min_deg: optionalNumberCell({ min: 0, max: 180, unit: "°" }),
    louver_max_deg: optionalNumberCell({ min: 0, max: 180, unit: "°" }),
    finish: finishCell,
    wall_emissivity: optionalNumberCell({ min: 0.02, max: 1, unit: "" }),
  })
  .superRefine((row, ctx) => {
    const louvered = row.louver_min_deg !== null || row.louver_max_deg !== null;
    if (!louvered) {
      if (row.finish !== null) ctx.addIssue({ code: "custom", path: ["finish"], message: "only for a louvered panel: leave empty, or give the louver range" });
      if (row.wall_emissivity !== null)
        ctx.addIssue({ code: "custom", path: ["wall_emissivity"], message: "only for a louvered panel: leave empty, or give the louver range" });
      return;
    }
    if (row.louver_min_deg === null) ctx.addIssue({ code: "custom", path: ["louver_min_deg"], message: "required when louver_max_deg is given" });
    if (row.louver_max_deg === null) ctx.addIssue({ code: "custom", path: ["louver_max_deg"], message: "required when louver_min_deg is given" });
    if (row.louver_min_deg !== null && row.louver_max_deg !== null && row.louver_min_deg > row.louver_max_deg) {
      ctx.addIssue({ code: "custom", path: ["louver_min_deg"], message: "must not exceed louver_max_deg" });
    }
    if (row.finish === null) ctx.addIssue({ code: "custom", path: ["finish"], message: "required for a louvered panel (diffuse or specular)" });
    if (row.wall_emissivity === null) ctx.addIssue({ code: "custom", path: ["wall_emissivity"], message: "required for a louvered panel" });
  }, {
    // Judged whenever the four louver cells parsed, so a row's other mistakes do not hide these.
    when: (payload) => payload.issues.every((issue) => !LOUVER_COLUMNS.includes(String(issue.path?.[0]))),
  })
  .transform(
    (row): PanelProductInput => ({
      name: row.name,
      widthM: row.width_m,
      lengthM: row.length_m,
      kWm2PerKn: row.k,
      n: row.n,
      emissivity: row.emissivity,
      louver:
        row.louver_min_deg !== null && row.louver_max_deg !== null && row.finish !== null && row.wall_emissivity !== null
          ? { minOpeningAngleDeg: row.louver_min_deg, maxOpeningAngleDeg: row.louver_max_deg, finish: row.finish, wallEmissivity: row.wall_emissivity }
          : null,
    }),
  );

/** The louver of a product: the range its mechanism allows and its cavity walls. */
export interface ProductLouver {
  minOpeningAngleDeg: number;
  maxOpeningAngleDeg: number;
  finish: "diffuse" | "specular";
  wallEmissivity: number;
}

/** One validated data row. */
export interface PanelProductInput {
  name: string;
  widthM: number;
  lengthM: number;
  /** K of q = K·ΔTⁿ per m² of panel face, W/(m²·Kⁿ). */
  kWm2PerKn: number;
  n: number;
  emissivity: number;
  louver: ProductLouver | null;
}

/** A catalogue product as the API returns it. */
export interface PanelProduct extends PanelProductInput {
  id: string;
  createdAt: string;
  updatedAt: string;
}

/** A problem in a catalogue file: `line` is the file's line number (header = line 1), `field` a column name or "(row)"/"(file)". */
export interface CatalogueRowError {
  line: number;
  field: string;
  message: string;
}

export const productParams = z.strictObject({ productId: z.uuid("not a product id") });

/** The import form: one CSV file of at most MAX_CATALOGUE_BYTES (the server enforces the same limit). */
export const catalogueImportForm = z.object({
  file: z
    .custom<FileList>((v) => typeof FileList !== "undefined" && v instanceof FileList, "choose a CSV file")
    .refine((files) => files.length === 1, "choose a CSV file")
    .refine((files) => (files[0]?.size ?? 0) <= MAX_CATALOGUE_BYTES, `the file is larger than ${MAX_CATALOGUE_BYTES / (1024 * 1024)} MB`)
    .refine((files) => (files[0]?.size ?? 0) > 0, "the file is empty"),
});
