import "server-only";
import { MAX_CATALOGUE_BYTES } from "@/lib/catalogue/schema";
import { AppError } from "@/lib/http/errors";
import { readCappedBody, readMultipartFile } from "@/lib/uploads/multipart";

const CSV_TYPES = ["text/csv", "application/csv", "text/plain"];

function tooLarge(): AppError {
  const limit = `${MAX_CATALOGUE_BYTES / (1024 * 1024)} MB`;
  return new AppError("payload_too_large", `Catalogue files are limited to ${limit}; nothing was imported.`, [{ path: "file", message: `larger than ${limit}` }]);
}

/**
 * The catalogue file of an import request: the raw body when it is sent as `text/csv`, or the
 * field `file` of a `multipart/form-data` body (what the import form sends). Never holds more
 * than the 1 MB limit (plus the multipart overhead); anything else is 415.
 */
export async function readCatalogueUpload(req: Request): Promise<Uint8Array> {
  const mediaType = (req.headers.get("content-type") ?? "").split(";")[0]!.trim().toLowerCase();
  if (CSV_TYPES.includes(mediaType)) return readCappedBody(req, MAX_CATALOGUE_BYTES, tooLarge);
  if (mediaType !== "multipart/form-data") {
    throw new AppError("unsupported_media_type", "Send the catalogue as text/csv, or as the field \"file\" of a multipart/form-data body.", [
      { path: "file", message: "send a CSV file (text/csv or multipart/form-data)" },
    ]);
  }
  return readMultipartFile(req, "file", { maxFileBytes: MAX_CATALOGUE_BYTES, tooLarge, missingFileMessage: "attach a CSV file" });
}
