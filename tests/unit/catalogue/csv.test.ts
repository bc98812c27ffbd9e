import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { describe, expect, test } from "vitest";
import { MAX_REPORTED_ERRORS, parseCatalogueFile, parseCatalogueText, productNameKey, type CatalogueParseResult } from "@/lib/catalogue/csv";
import { CATALOGUE_COLUMNS, MAX_CATALOGUE_BYTES, MAX_CATALOGUE_ROWS, type CatalogueRowError } from "@/lib/catalogue/schema";

const HEADER = CATALOGUE_COLUMNS.join(",");
const PLAIN = "Plain 600,0.6,1.2,5.2,1.1,0.93,,,,";
const LOUVERED = "Louvered 600,0.6,1.8,4.8,1.12,0.93,30,180,diffuse,0.9";
const SAMPLE_PATH = fileURLToPath(new URL("../../../docs/samples/panel-products.csv", import.meta.url));

const encode = (text: string) => new TextEncoder().encode(text);

function errorsOf(result: CatalogueParseResult): CatalogueRowError[] {
  if (result.ok) throw new Error(`expected errors, got ${result.products.length} products`);
  return result.errors;
}

function productsOf(result: CatalogueParseResult) {
  if (!result.ok) throw new Error(`expected products, got ${JSON.stringify(result.errors)}`);
  return result.products;
}

/** [line, field] of each error, the shape most tests compare. */
const where = (result: CatalogueParseResult) => errorsOf(result).map((e) => [e.line, e.field]);

describe("parseCatalogueText: a good file", () => {
  test("reads a plain and a louvered product into the record the API stores", () => {
    const result = parseCatalogueText(`${HEADER}\n${PLAIN}\n${LOUVERED}\n`);
    expect(productsOf(result)).toEqual([
      { name: "Plain 600", widthM: 0.6, lengthM: 1.2, kWm2PerKn: 5.2, n: 1.1, emissivity: 0.93, louver: null },
      {
        name: "Louvered 600",
        widthM: 0.6,
        lengthM: 1.8,
        kWm2PerKn: 4.8,
        n: 1.12,
        emissivity: 0.93,
        louver: { minOpeningAngleDeg: 30, maxOpeningAngleDeg: 180, finish: "diffuse", wallEmissivity: 0.9 },
      },
    ]);
    expect(result.ok && result.lines).toEqual([2, 3]);
  });

  test("the sample file in docs/samples imports cleanly, with louvered and plain products", () => {
    const products = productsOf(parseCatalogueFile(readFileSync(SAMPLE_PATH)));
    expect(products.length).toBeGreaterThanOrEqual(4);
    expect(products.some((p) => p.louver === null)).toBe(true);
    expect(products.some((p) => p.louver?.finish === "diffuse")).toBe(true);
    expect(products.some((p) => p.louver?.finish === "specular")).toBe(true);
  });

  test("columns in any order, header case and spaces, cell spaces, quoted commas, exponents and an upper-case finish", () => {
    const header = " Finish ,NAME,width_m,length_m,k,n,emissivity,louver_min_deg,louver_max_deg,wall_emissivity";
    const result = parseCatalogueText(`${header}\nSPECULAR,"Panel, wide", 1.2e0 , 2.4 ,5,1.1,.9,45,170,0.1\n`);
    expect(productsOf(result)).toEqual([
      {
        name: "Panel, wide",
        widthM: 1.2,
        lengthM: 2.4,
        kWm2PerKn: 5,
        n: 1.1,
        emissivity: 0.9,
        louver: { minOpeningAngleDeg: 45, maxOpeningAngleDeg: 170, finish: "specular", wallEmissivity: 0.1 },
      },
    ]);
  });

  test("accepts values on the limits (the layout's panel limits)", () => {
    const row = "Edge,0.1,50,100,2,1,0,180,diffuse,0.02";
    expect(productsOf(parseCatalogueText(`${HEADER}\n${row}\n`))[0]).toMatchObject({ widthM: 0.1, lengthM: 50, kWm2PerKn: 100, n: 2, emissivity: 1 });
  });
});

describe("parseCatalogueText: BOM, line ends and blank lines", () => {
  test.each([
    { name: "LF", text: `${HEADER}\n${PLAIN}\n${LOUVERED}\n` },
    { name: "CRLF", text: `${HEADER}\r\n${PLAIN}\r\n${LOUVERED}\r\n` },
    { name: "CR", text: `${HEADER}\r${PLAIN}\r${LOUVERED}` },
    { name: "BOM + CRLF", text: `\uFEFF${HEADER}\r\n${PLAIN}\r\n${LOUVERED}\r\n` },
  ])("$name gives the same two products", ({ text }) => {
    const products = productsOf(parseCatalogueText(text));
    expect(products.map((p) => p.name)).toEqual(["Plain 600", "Louvered 600"]);
  });

  test("a UTF-8 BOM in the bytes is not part of the first column's name", () => {
    const bytes = new Uint8Array([0xef, 0xbb, 0xbf, ...encode(`${HEADER}\r\n${PLAIN}\r\n`)]);
    expect(productsOf(parseCatalogueFile(bytes))).toHaveLength(1);
  });

  test("blank lines are skipped but still counted in line numbers", () => {
    const result = parseCatalogueText(`${HEADER}\r\n\r\n${PLAIN}\r\n   \r\n,,,,,,,,,\r\nBad,0.6,1.2,5,1.1,2,,,,\r\n`);
    expect(errorsOf(result)).toEqual([{ line: 6, field: "emissivity", message: "must be at most 1" }]);
  });

  test("a quoted name spanning two lines moves the line numbers after it", () => {
    const result = parseCatalogueText(`${HEADER}\n"Two\nlines",0.6,1.2,5,1.1,0.9,,,,\nBad,0.6,1.2,5,9,0.9,,,,\n`);
    expect(where(result)).toEqual([[4, "n"]]);
  });
});

describe("parseCatalogueText: bad rows, each named by line and column", () => {
  const bad = (row: string) => parseCatalogueText(`${HEADER}\n${PLAIN}\n${row}\n`);

  test.each([
    { kind: "an empty name", row: ",0.6,1.2,5,1.1,0.9,,,,", field: "name", message: "required" },
    { kind: "a name over 120 characters", row: `${"n".repeat(121)},0.6,1.2,5,1.1,0.9,,,,`, field: "name", message: "use at most 120 characters" },
    { kind: "a missing width", row: "P,,1.2,5,1.1,0.9,,,,", field: "width_m", message: "required" },
    { kind: "a width that is not a number", row: "P,wide,1.2,5,1.1,0.9,,,,", field: "width_m", message: '"wide" is not a number (use a point as the decimal separator)' },
    { kind: "a decimal comma", row: 'P,"0,6",1.2,5,1.1,0.9,,,,', field: "width_m", message: '"0,6" is not a number (use a point as the decimal separator)' },
    { kind: "a width below 0.1 m", row: "P,0.05,1.2,5,1.1,0.9,,,,", field: "width_m", message: "must be at least 0.1 m" },
    { kind: "a length above 50 m", row: "P,0.6,51,5,1.1,0.9,,,,", field: "length_m", message: "must be at most 50 m" },
    { kind: "K of zero", row: "P,0.6,1.2,0,1.1,0.9,,,,", field: "k", message: "must be greater than 0 W/(m²·Kⁿ)" },
    { kind: "K above 100", row: "P,0.6,1.2,101,1.1,0.9,,,,", field: "k", message: "must be at most 100 W/(m²·Kⁿ)" },
    { kind: "n below 0.8", row: "P,0.6,1.2,5,0.5,0.9,,,,", field: "n", message: "must be at least 0.8" },
    { kind: "an emissivity above 1", row: "P,0.6,1.2,5,1.1,1.2,,,,", field: "emissivity", message: "must be at most 1" },
    { kind: "Infinity", row: "P,0.6,1.2,Infinity,1.1,0.9,,,,", field: "k", message: '"Infinity" is not a number (use a point as the decimal separator)' },
    { kind: "a louver angle above 180°", row: "P,0.6,1.2,5,1.1,0.9,30,190,diffuse,0.9", field: "louver_max_deg", message: "must be at most 180°" },
    { kind: "an unknown finish", row: "P,0.6,1.2,5,1.1,0.9,30,180,matte,0.9", field: "finish", message: "must be diffuse or specular" },
    { kind: "a wall emissivity below 0.02", row: "P,0.6,1.2,5,1.1,0.9,30,180,diffuse,0.01", field: "wall_emissivity", message: "must be at least 0.02" },
    { kind: "min opening above max", row: "P,0.6,1.2,5,1.1,0.9,120,90,diffuse,0.9", field: "louver_min_deg", message: "must not exceed louver_max_deg" },
    { kind: "only a min opening", row: "P,0.6,1.2,5,1.1,0.9,30,,diffuse,0.9", field: "louver_max_deg", message: "required when louver_min_deg is given" },
    { kind: "only a max opening", row: "P,0.6,1.2,5,1.1,0.9,,180,diffuse,0.9", field: "louver_min_deg", message: "required when louver_max_deg is given" },
    { kind: "a louver without a finish", row: "P,0.6,1.2,5,1.1,0.9,30,180,,0.9", field: "finish", message: "required for a louvered panel (diffuse or specular)" },
    { kind: "a louver without a wall emissivity", row: "P,0.6,1.2,5,1.1,0.9,30,180,diffuse,", field: "wall_emissivity", message: "required for a louvered panel" },
    { kind: "a finish on a plain panel", row: "P,0.6,1.2,5,1.1,0.9,,,specular,", field: "finish", message: "only for a louvered panel: leave empty, or give the louver range" },
    { kind: "too few values", row: "P,0.6,1.2", field: "(row)", message: "expected 10 values, found 3" },
    { kind: "too many values", row: "P,0.6,1.2,5,1.1,0.9,,,,,extra", field: "(row)", message: "expected 10 values, found 11" },
    { kind: "an unterminated quote", row: '"P,0.6,1.2,5,1.1,0.9,,,,', field: "(row)", message: "Quoted field unterminated" },
  ])("$kind → line 3 · $field", ({ row, field, message }) => {
    expect(errorsOf(bad(row))).toEqual([{ line: 3, field, message }]);
  });

  test("every problem of every row is listed, in line then column order", () => {
    const result = parseCatalogueText(`${HEADER}\nA,x,1.2,0,1.1,0.9,,,,\n${PLAIN}\nB,0.6,1.2,5,1.1,0.9,30,,,\n`);
    expect(where(result)).toEqual([
      [2, "width_m"],
      [2, "k"],
      [4, "louver_max_deg"],
      [4, "finish"],
      [4, "wall_emissivity"],
    ]);
  });

  test(`at most ${MAX_REPORTED_ERRORS} problems are listed, then how many more`, () => {
    const rows = Array.from({ length: MAX_REPORTED_ERRORS + 30 }, (_, i) => `P${i},0.6,1.2,0,1.1,0.9,,,,`);
    const errors = errorsOf(parseCatalogueText([HEADER, ...rows].join("\n")));
    expect(errors).toHaveLength(MAX_REPORTED_ERRORS + 1);
    expect(errors.at(-1)).toMatchObject({ field: "(file)", message: "and 30 more problems not listed" });
  });
});

describe("parseCatalogueText: duplicate names", () => {
  test("a name twice is an error at the second line, naming the first", () => {
    const result = parseCatalogueText(`${HEADER}\n${PLAIN}\n${LOUVERED}\n${PLAIN}\n`);
    expect(errorsOf(result)).toEqual([{ line: 4, field: "name", message: '"Plain 600" is already on line 2; names must be unique' }]);
  });

  test("names differing only in case, accents or surrounding spaces are the same name", () => {
    const result = parseCatalogueText(`${HEADER}\nPanneau léger,0.6,1.2,5,1.1,0.9,,,,\n  PANNEAU LEGER ,0.6,1.2,5,1.1,0.9,,,,\n`);
    expect(where(result)).toEqual([[3, "name"]]);
    expect(productNameKey("Panneau léger")).toBe(productNameKey(" PANNEAU LEGER"));
  });

  test("a row that is bad otherwise still claims its name", () => {
    const result = parseCatalogueText(`${HEADER}\nSame,0.6,1.2,0,1.1,0.9,,,,\nSame,0.6,1.2,5,1.1,0.9,,,,\n`);
    expect(where(result)).toEqual([
      [2, "k"],
      [3, "name"],
    ]);
  });
});

describe("parseCatalogueText: header problems", () => {
  test("an unknown column is named", () => {
    const result = parseCatalogueText(`${HEADER},colour\n${PLAIN},red\n`);
    expect(errorsOf(result)).toEqual([{ line: 1, field: "colour", message: expect.stringContaining("unknown column") }]);
  });

  test("each missing column is named", () => {
    const header = CATALOGUE_COLUMNS.filter((c) => c !== "k" && c !== "finish").join(",");
    expect(where(parseCatalogueText(`${header}\nP,0.6,1.2,1.1,0.9,,,\n`))).toEqual([
      [1, "k"],
      [1, "finish"],
    ]);
  });

  test("a misspelt column is both unknown and missing", () => {
    const result = parseCatalogueText(`${HEADER.replace("length_m", "lenght_m")}\n${PLAIN}\n`);
    expect(where(result)).toEqual([
      [1, "lenght_m"],
      [1, "length_m"],
    ]);
  });

  test("a column twice, and a column without a name, are errors", () => {
    expect(where(parseCatalogueText(`${HEADER},name\n${PLAIN},x\n`))).toEqual([[1, "name"]]);
    expect(where(parseCatalogueText(`${HEADER},\n${PLAIN},\n`))).toEqual([[1, "(header)"]]);
  });

  test("a file without a header (data on line 1) names the columns it lacks, not its data", () => {
    const errors = errorsOf(parseCatalogueText(`${PLAIN}\n`));
    expect(errors.every((e) => e.line === 1)).toBe(true);
    expect(errors.map((e) => e.field)).toContain("name");
  });

  test.each([
    { name: "an empty file", text: "" },
    { name: "only a BOM and blank lines", text: "\uFEFF\r\n\r\n" },
  ])("$name is one error at line 1", ({ text }) => {
    expect(where(parseCatalogueText(text))).toEqual([[1, "(file)"]]);
  });

  test("a header and no products is an error", () => {
    expect(errorsOf(parseCatalogueText(`${HEADER}\r\n\r\n`))).toEqual([{ line: 1, field: "(file)", message: "no products below the header" }]);
  });
});

describe("parseCatalogueFile: limits", () => {
  const rows = (n: number) => Array.from({ length: n }, (_, i) => `Panel ${i},0.6,1.2,5,1.1,0.9,,,,`);

  test(`${MAX_CATALOGUE_ROWS} products are accepted`, () => {
    expect(productsOf(parseCatalogueFile(encode([HEADER, ...rows(MAX_CATALOGUE_ROWS)].join("\n"))))).toHaveLength(MAX_CATALOGUE_ROWS);
  });

  test(`${MAX_CATALOGUE_ROWS + 1} products are refused at the first line too many`, () => {
    const errors = errorsOf(parseCatalogueFile(encode([HEADER, ...rows(MAX_CATALOGUE_ROWS + 1)].join("\n"))));
    expect(errors).toEqual([{ line: MAX_CATALOGUE_ROWS + 2, field: "(file)", message: expect.stringContaining("at most 2000 products") }]);
  });

  test("far more rows stop at the limit too (blank lines between them still counted)", () => {
    const errors = errorsOf(parseCatalogueText([HEADER, "", ...rows(MAX_CATALOGUE_ROWS + 500)].join("\n")));
    expect(errors).toEqual([{ line: MAX_CATALOGUE_ROWS + 3, field: "(file)", message: expect.any(String) }]);
  });

  test("1 MB exactly is read; one byte more is too large", () => {
    const head = `${HEADER}\n`;
    const pad = (total: number) => {
      const name = "x".repeat(total - encode(`${head}${",0.6,1.2,5,1.1,0.9,,,,"}`).byteLength);
      return encode(`${head}${name},0.6,1.2,5,1.1,0.9,,,,`);
    };
    const atLimit = parseCatalogueFile(pad(MAX_CATALOGUE_BYTES));
    // Read and judged (the name is far too long), not refused for size.
    expect(atLimit.ok).toBe(false);
    expect(!atLimit.ok && atLimit.reason).toBe("invalid");
    expect(where(atLimit)).toEqual([[2, "name"]]);
    const over = parseCatalogueFile(pad(MAX_CATALOGUE_BYTES + 1));
    expect(!over.ok && over.reason).toBe("too_large");
    expect(where(over)).toEqual([[1, "(file)"]]);
  });

  test("bytes that are not UTF-8 are refused as such", () => {
    const bytes = new Uint8Array([...encode(`${HEADER}\nCaf`), 0xe9, ...encode(",0.6,1.2,5,1.1,0.9,,,,\n")]);
    expect(errorsOf(parseCatalogueFile(bytes))).toEqual([{ line: 1, field: "(file)", message: "the file is not UTF-8 text; save it as CSV UTF-8" }]);
  });
});
