import type { FieldErrors } from "react-hook-form";

const blank = (v: unknown) => v === "" || v === null || v === undefined;

/** `setValueAs` for a required number: blank → NaN, so the schema names the field instead of reading 0. */
export const asNumber = (v: unknown): number => (blank(v) ? Number.NaN : Number(v));

/** `setValueAs` for an optional number: blank → null. */
export const asNumberOrNull = (v: unknown): number | null => (blank(v) ? null : Number(v));

/** The message at a dotted path of react-hook-form's errors (the zod schema's paths, e.g. "periods.0.startHour"). */
export function errorAt(errors: FieldErrors, path: string): string | undefined {
  let node: unknown = errors;
  for (const key of path.split(".")) {
    if (node === null || typeof node !== "object") return undefined;
    node = (node as Record<string, unknown>)[key];
  }
  const message = (node as { message?: unknown } | undefined)?.message;
  return typeof message === "string" ? message : undefined;
}
