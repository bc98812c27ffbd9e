import { NextResponse } from "next/server";
import { z } from "zod";
import { memberRoute } from "@/lib/http/handler";
import { readUnderlay } from "@/lib/uploads/service";

const params = z.strictObject({ projectId: z.uuid("not a project id"), imageId: z.uuid("not an image id") });

/** The image's bytes with its content type; 404 for unknown ids and other organisations' images. */
export const GET = memberRoute("projects:read", { params }, async ({ member, params }) => {
  const image = await readUnderlay(member.organisationId, params.projectId, params.imageId);
  // A NextResponse (not a bare Response): the handler may attach a refreshed session cookie.
  return new NextResponse(new Uint8Array(image.bytes), {
    headers: {
      "content-type": image.contentType,
      "content-length": String(image.bytes.byteLength),
      "cache-control": "private, max-age=31536000, immutable",
      "x-content-type-options": "nosniff",
    },
  });
});
