/**
 * Reading a panel catalogue CSV file (format: docs/api.md, "Panel catalogue"). Pure: bytes in,
 * validated products or every problem found out, each with the file's line number (header =
 * line 1) and the column. The whole file is judged before anything is written; one bad row
 * makes the whole file bad.
 */
import Papa from "papaparse";
import {
  CATALOGUE_COLUMNS,
  catalogueRow,
  MAX_CATALOGUE_BYTES,
  MAX_CATALOGUE_ROWS,
  type CatalogueColumn,
  type CatalogueRowError,
  type PanelProductInput,
} from "@/lib/catalogue/schema";

/** At most this many problems are listed; a last entry says how many more there were. */
export const MAX_REPORTED_ERRORS = 200;

export type CatalogueParseResult =
  | { ok: true; products: PanelProductInput[]; /** The line each product is on, in the same order. */ lines: number[] }
  | { ok: false; reason: "too_large" | "invalid"; errors: CatalogueRowError[] };

/**
 * The key two product names collide on: case and accents ignored, as the database's
 * utf8mb4_unicode_ci collation compares the unique (organisation, name) index.
 */
export function productNameKey(name: string): string {
  return name.trim().normalize("NFKD").replace(/\p{M}/gu, "").toLowerCase();
}

/** A file's bytes: at most MAX_CATALOGUE_BYTES, UTF-8 (a BOM is fine), then parsed. */
export function parseCatalogueFile(bytes: Uint8Array): CatalogueParseResult {
  if (bytes.byteLength > MAX_CATALOGUE_BYTES) {
    return {
      ok: false,
      reason: "too_large",
      errors: [{ line: 1, field: "(file)", message: `the file has ${bytes.byteLength} bytes; the limit is ${MAX_CATALOGUE_BYTES} (1 MB)` }],
    };
  }
  let text: string;
  try {
    text = new TextDecoder("utf-8", { fatal: true }).decode(bytes);
  } catch {
    return { ok: false, reason: "invalid", errors: [{ line: 1, field: "(file)", message: "the file is not UTF-8 text; save it as CSV UTF-8" }] };
  }
  return parseCatalogueText(text);
}

interface RawRow {
  cells: string[];
  line: number;
  problems: string[];
}

/** Splits the text into rows with the line each starts on; stops after `maxRows` non-empty rows. */
function readRows(text: string, maxRows: number): { rows: RawRow[]; truncated: boolean } {
  const rows: RawRow[] = [];
  let start = 0;
  let line = 1;
  let truncated = false;
  Papa.parse<string[]>(text, {
    delimiter: ",",
    newline: "\n",
    skipEmptyLines: false,
    step: (result, parser) => {
      const end = result.meta.cursor;
      const cells = result.data;
      const blank = cells.every((c) => c.trim() === "");
      if (!blank || rows.length === 0) {
        if (rows.length >= maxRows) {
          truncated = true;
          parser.abort();
          return;
        }
        rows.push({ cells, line, problems: result.errors.map((e) => e.message) });
      }
      for (let i = start; i < end; i += 1) if (text.charCodeAt(i) === 10) line += 1;
      start = end;
    },
  });
  return { rows, truncated };
}

function headerErrors(header: readonly string[]): CatalogueRowError[] {
  const errors: CatalogueRowError[] = [];
  const known = new Set<string>(CATALOGUE_COLUMNS);
  const seen = new Set<string>();
  header.forEach((name, index) => {
    if (name === "") errors.push({ line: 1, field: "(header)", message: `column ${index + 1} has no name` });
    else if (!known.has(name)) errors.push({ line: 1, field: name, message: `unknown column; the columns are ${CATALOGUE_COLUMNS.join(", ")}` });
    else if (seen.has(name)) errors.push({ line: 1, field: name, message: "this column appears more than once" });
    seen.add(name);
  });
  for (const column of CATALOGUE_COLUMNS) {
    if (!seen.has(column)) errors.push({ line: 1, field: column, message: "missing column" });
  }
  return errors;
}

function capped(errors: CatalogueRowError[]): CatalogueRowError[] {
  if (errors.length <= MAX_REPORTED_ERRORS) return errors;
  const shown = errors.slice(0, MAX_REPORTED_ERRORS);
  const last = shown[shown.length - 1]!;
  return [...shown, { line: last.line, field: "(file)", message: `and ${errors.length - MAX_REPORTED_ERRORS} more problems not listed` }];
}

/**
 * Parses and validates catalogue text. Line 1 is the header: the column names of
 * CATALOGUE_COLUMNS in any order (case and surrounding spaces ignored). A leading BOM and
 * CRLF or CR line ends are accepted; blank lines are skipped (and still counted).
 */
export function parseCatalogueText(raw: string): CatalogueParseResult {
  const text = raw.replace(/^\uFEFF/, "").replace(/\r\n?/g, "\n");
  // One row more than allowed (plus the header) is enough to know the file is too long.
  const { rows, truncated } = readRows(text, MAX_CATALOGUE_ROWS + 2);
  const [headerRow, ...dataRows] = rows;
  const invalid = (errors: CatalogueRowError[]): CatalogueParseResult => ({ ok: false, reason: "invalid", errors: capped(errors) });

  if (!headerRow || headerRow.cells.every((c) => c.trim() === "")) {
    return invalid([{ line: 1, field: "(file)", message: `the file is empty; line 1 must be the header: ${CATALOGUE_COLUMNS.join(",")}` }]);
  }
  const header = headerRow.cells.map((c) => c.trim().toLowerCase());
  const problems = headerErrors(header);
  if (headerRow.problems.length > 0) problems.unshift({ line: 1, field: "(header)", message: headerRow.problems[0]! });
  if (problems.length > 0) return invalid(problems);

  if (dataRows.length > MAX_CATALOGUE_ROWS || truncated) {
    const first = dataRows[MAX_CATALOGUE_ROWS];
    return invalid([{ line: first?.line ?? 1, field: "(file)", message: `a file may hold at most ${MAX_CATALOGUE_ROWS} products; split it into several files` }]);
  }
  if (dataRows.length === 0) return invalid([{ line: 1, field: "(file)", message: "no products below the header" }]);

  const errors: CatalogueRowError[] = [];
  const products: PanelProductInput[] = [];
  const lines: number[] = [];
  const firstLineOfName = new Map<string, number>();
  const columnOrder = (field: string) => {
    const i = CATALOGUE_COLUMNS.indexOf(field as CatalogueColumn);
    return i < 0 ? -1 : i;
  };

  for (const row of dataRows) {
    if (row.problems.length > 0) {
      errors.push({ line: row.line, field: "(row)", message: row.problems[0]! });
      continue;
    }
    if (row.cells.length !== header.length) {
      errors.push({ line: row.line, field: "(row)", message: `expected ${header.length} values, found ${row.cells.length}` });
      continue;
    }
    const record = Object.fromEntries(header.map((column, i) => [column, row.cells[i] ?? ""]));
    const rowErrors: CatalogueRowError[] = [];
    // Duplicates are judged on the name cell itself, so a row that is bad otherwise still claims its name.
    const name = (record.name ?? "").trim();
    const key = productNameKey(name);
    const earlier = firstLineOfName.get(key);
    if (name !== "" && earlier !== undefined) {
      rowErrors.push({ line: row.line, field: "name", message: `"${name}" is already on line ${earlier}; names must be unique` });
    } else if (name !== "") {
      firstLineOfName.set(key, row.line);
    }
    const parsed = catalogueRow.safeParse(record);
    if (!parsed.success) {
      rowErrors.push(...parsed.error.issues.map((issue) => ({ line: row.line, field: String(issue.path[0] ?? "(row)"), message: issue.message })));
    }
    if (rowErrors.length > 0 || !parsed.success) {
      errors.push(...rowErrors.sort((a, b) => columnOrder(a.field) - columnOrder(b.field)));
      continue;
    }
    products.push(parsed.data);
    lines.push(row.line);
  }
  return errors.length > 0 ? invalid(errors) : { ok: true, products, lines };
}
