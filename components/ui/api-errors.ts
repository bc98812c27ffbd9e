import type { FieldValues, Path, UseFormSetError } from "react-hook-form";
import { ApiError } from "@/lib/client/query";

const OFFLINE = "Seatwise could not be reached. Check your connection and try again.";

/**
 * Puts an API error where the user will see it: each 400/409 field error whose path is one of
 * the form's `fields` goes onto that field; the return value is the message for the form's own
 * live region (the API's message, plus any field errors the form has no input for).
 */
export function applyApiError<T extends FieldValues>(error: unknown, setError: UseFormSetError<T>, fields: ReadonlyArray<Path<T>>): string {
  if (!(error instanceof ApiError)) return OFFLINE;
  const unplaced: string[] = [];
  for (const field of error.fields) {
    const name = fields.find((f) => f === field.path);
    if (name) setError(name, { type: "server", message: field.message });
    else unplaced.push(`${field.path}: ${field.message}`);
  }
  return unplaced.length > 0 ? `${error.message} (${unplaced.join("; ")})` : error.message;
}

/** The message of any error thrown by `api()`, for places without form fields. */
export function apiErrorMessage(error: unknown): string {
  return error instanceof ApiError ? error.message : OFFLINE;
}
