import "server-only";
import { and, eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { uploads } from "@/db/schema";
import type { Member } from "@/lib/auth/session";
import { AppError, notFound } from "@/lib/http/errors";
import { getProject } from "@/lib/projects/service";
import { readStoredFile, removeStoredFile, storeFile } from "@/lib/storage";
import { MAX_IMAGE_SIDE_PX, sniffImage, type ImageType } from "@/lib/uploads/image";

/** Largest underlay image accepted, bytes (5 MiB). */
export const MAX_UNDERLAY_BYTES = 5 * 1024 * 1024;

function imageTooLarge(): AppError {
  return new AppError("payload_too_large", `Images are limited to ${MAX_UNDERLAY_BYTES / (1024 * 1024)} MB.`);
}

/** How an underlay upload's multipart body is read (lib/uploads/multipart.ts). */
export const UNDERLAY_UPLOAD_RULES = {
  maxFileBytes: MAX_UNDERLAY_BYTES,
  tooLarge: imageTooLarge,
  missingFileMessage: "attach a PNG or JPEG image",
  notMultipartMessage: "send the image as multipart/form-data",
} as const;

export interface StoredUnderlay {
  imageId: string;
  widthPx: number;
  heightPx: number;
  contentType: ImageType;
}

const EXT: Record<ImageType, "png" | "jpg"> = { "image/png": "png", "image/jpeg": "jpg" };

/**
 * Stores a floor-plan image for a project: PNG or JPEG by content (415 otherwise), at most
 * MAX_UNDERLAY_BYTES (413), its pixel size read from its header. The file is written first
 * and removed again if the row cannot be inserted, so no row ever points at a missing file.
 */
export async function saveUnderlay(member: Member, projectId: string, bytes: Uint8Array): Promise<StoredUnderlay> {
  await getProject(member.organisationId, projectId);
  if (bytes.byteLength > MAX_UNDERLAY_BYTES) throw imageTooLarge();
  const image = sniffImage(bytes);
  if (!image) {
    throw new AppError("unsupported_media_type", `Only PNG or JPEG images (up to ${MAX_IMAGE_SIDE_PX} px a side) are accepted; the file's content is neither.`, [
      { path: "file", message: "not a PNG or JPEG image" },
    ]);
  }
  const id = crypto.randomUUID();
  await storeFile(member.organisationId, id, image.ext, bytes);
  try {
    await getDb().insert(uploads).values({
      id,
      organisationId: member.organisationId,
      projectId,
      contentType: image.contentType,
      byteSize: bytes.byteLength,
      widthPx: image.widthPx,
      heightPx: image.heightPx,
      createdBy: member.userId,
    });
  } catch (error) {
    await removeStoredFile(member.organisationId, id, image.ext);
    throw error;
  }
  return { imageId: id, widthPx: image.widthPx, heightPx: image.heightPx, contentType: image.contentType };
}

/** An underlay of a project of the member's organisation, with its bytes; 404 otherwise. */
export async function readUnderlay(organisationId: string, projectId: string, imageId: string): Promise<{ contentType: ImageType; bytes: Buffer }> {
  const [row] = await getDb()
    .select()
    .from(uploads)
    .where(and(eq(uploads.id, imageId), eq(uploads.projectId, projectId), eq(uploads.organisationId, organisationId)))
    .limit(1);
  if (!row) throw notFound("No such image.");
  const bytes = await readStoredFile(organisationId, row.id, EXT[row.contentType]);
  if (!bytes) throw notFound("The image file is missing.");
  return { contentType: row.contentType, bytes };
}
