import "server-only";
import { AppError } from "@/lib/http/errors";
import { invalidInput } from "@/lib/http/handler";

/** Room for the multipart boundaries and part headers around the file, bytes. */
const MULTIPART_OVERHEAD_BYTES = 64 * 1024;

function tooLarge(maxFileBytes: number): AppError {
  return new AppError("payload_too_large", `Images are limited to ${maxFileBytes / (1024 * 1024)} MB.`);
}

/**
 * Reads one file field of a multipart/form-data body without ever holding more than
 * `maxFileBytes` plus the multipart overhead: a declared Content-Length above it is refused
 * at once (413) and a streamed body is counted as it arrives.
 */
export async function readMultipartFile(req: Request, field: string, maxFileBytes: number): Promise<Uint8Array> {
  const type = req.headers.get("content-type") ?? "";
  if (!type.toLowerCase().startsWith("multipart/form-data")) {
    throw invalidInput([{ path: field, message: "send the image as multipart/form-data" }]);
  }
  const limit = maxFileBytes + MULTIPART_OVERHEAD_BYTES;
  if (Number(req.headers.get("content-length") ?? 0) > limit) throw tooLarge(maxFileBytes);
  const chunks: Uint8Array[] = [];
  let total = 0;
  const reader = req.body?.getReader();
  if (reader) {
    for (;;) {
      const { done, value } = await reader.read();
      if (done) break;
      total += value.byteLength;
      if (total > limit) {
        await reader.cancel();
        throw tooLarge(maxFileBytes);
      }
      chunks.push(value);
    }
  }
  let form: FormData;
  try {
    form = await new Response(new Blob(chunks as BlobPart[]), { headers: { "content-type": type } }).formData();
  } catch {
    throw invalidInput([{ path: field, message: "the form data could not be read" }]);
  }
  const file = form.get(field);
  if (!(file instanceof Blob)) throw invalidInput([{ path: field, message: "attach a PNG or JPEG image" }]);
  if (file.size > maxFileBytes) throw tooLarge(maxFileBytes);
  return new Uint8Array(await file.arrayBuffer());
}
