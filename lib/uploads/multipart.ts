import "server-only";
import { AppError, type FieldError } from "@/lib/http/errors";
import { invalidInput } from "@/lib/http/handler";

/** Room for the multipart boundaries and part headers around the file, bytes. */
const MULTIPART_OVERHEAD_BYTES = 64 * 1024;

export interface UploadRules {
  /** Largest file accepted, bytes. */
  maxFileBytes: number;
  /** What a file (or body) over the limit is answered with (a 413). */
  tooLarge: () => AppError;
  /** Field message when the form has no file in the field. */
  missingFileMessage: string;
  /** Field message when the body is not multipart/form-data. */
  notMultipartMessage?: string;
}

/**
 * The body's bytes, never holding more than `limitBytes`: a declared Content-Length above it is
 * refused at once and a streamed body is counted as it arrives.
 */
export async function readCappedBody(req: Request, limitBytes: number, tooLarge: () => AppError): Promise<Uint8Array> {
  if (Number(req.headers.get("content-length") ?? 0) > limitBytes) throw tooLarge();
  const chunks: Uint8Array[] = [];
  let total = 0;
  const reader = req.body?.getReader();
  if (reader) {
    for (;;) {
      const { done, value } = await reader.read();
      if (done) break;
      total += value.byteLength;
      if (total > limitBytes) {
        await reader.cancel();
        throw tooLarge();
      }
      chunks.push(value);
    }
  }
  const bytes = new Uint8Array(total);
  let offset = 0;
  for (const chunk of chunks) {
    bytes.set(chunk, offset);
    offset += chunk.byteLength;
  }
  return bytes;
}

/**
 * Reads one file field of a multipart/form-data body without ever holding more than the file
 * limit plus the multipart overhead.
 */
export async function readMultipartFile(req: Request, field: string, rules: UploadRules): Promise<Uint8Array> {
  // The multipart boundary is case-sensitive: only the media type is compared lower-cased.
  const type = req.headers.get("content-type") ?? "";
  if (!type.toLowerCase().startsWith("multipart/form-data")) {
    throw invalidInput([{ path: field, message: rules.notMultipartMessage ?? "send the file as multipart/form-data" }]);
  }
  const body = await readCappedBody(req, rules.maxFileBytes + MULTIPART_OVERHEAD_BYTES, rules.tooLarge);
  let form: FormData;
  try {
    form = await new Response(new Blob([body as BlobPart]), { headers: { "content-type": type } }).formData();
  } catch {
    throw invalidInput([{ path: field, message: "the form data could not be read" }]);
  }
  const file = form.get(field);
  if (!(file instanceof Blob)) throw invalidInput([{ path: field, message: rules.missingFileMessage } satisfies FieldError]);
  if (file.size > rules.maxFileBytes) throw rules.tooLarge();
  return new Uint8Array(await file.arrayBuffer());
}
