import "server-only";
import { mkdir, readFile, rm, writeFile } from "node:fs/promises";
import path from "node:path";

/**
 * The one place uploaded bytes are kept. Files live under `UPLOAD_DIR` (default
 * `.data/uploads` in the project directory) as `<organisationId>/<id>.<ext>`; the database
 * (`uploads` table) holds what is known about each file and is the only way to find one, so a
 * path is never built from user input: both parts are ids the server generated.
 * Back up UPLOAD_DIR together with the database.
 */
export function uploadDir(): string {
  // The comment keeps the bundler from tracing the whole project for this run-time folder.
  return path.resolve(/* turbopackIgnore: true */ process.env.UPLOAD_DIR ?? path.join(/* turbopackIgnore: true */ process.cwd(), ".data", "uploads"));
}

const SAFE_PART = /^[A-Za-z0-9-]{1,64}$/;
const EXTENSIONS = new Set(["png", "jpg"]);

function filePath(organisationId: string, id: string, ext: string): string {
  if (!SAFE_PART.test(organisationId) || !SAFE_PART.test(id) || !EXTENSIONS.has(ext)) {
    throw new RangeError("storage: organisation id, file id or extension is not a safe path part");
  }
  return path.join(/* turbopackIgnore: true */ uploadDir(), organisationId, `${id}.${ext}`);
}

/** Writes a new file; never overwrites one (ids are fresh UUIDs). */
export async function storeFile(organisationId: string, id: string, ext: string, bytes: Uint8Array): Promise<void> {
  const target = filePath(organisationId, id, ext);
  await mkdir(path.dirname(target), { recursive: true });
  await writeFile(target, bytes, { flag: "wx" });
}

/** The bytes of a stored file, or null when it is missing. */
export async function readStoredFile(organisationId: string, id: string, ext: string): Promise<Buffer | null> {
  try {
    return await readFile(filePath(organisationId, id, ext));
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === "ENOENT") return null;
    throw error;
  }
}

export async function removeStoredFile(organisationId: string, id: string, ext: string): Promise<void> {
  await rm(filePath(organisationId, id, ext), { force: true });
}
