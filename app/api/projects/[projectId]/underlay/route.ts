import { memberRoute } from "@/lib/http/handler";
import { projectIdParams } from "@/lib/projects/schemas";
import { readMultipartFile } from "@/lib/uploads/multipart";
import { saveUnderlay, UNDERLAY_UPLOAD_RULES } from "@/lib/uploads/service";

/** Uploads a floor-plan image (multipart field `file`): PNG or JPEG by content, ≤ 5 MB. */
export const POST = memberRoute("layouts:write", { params: projectIdParams, status: 201 }, async ({ req, member, params }) =>
  saveUnderlay(member, params.projectId, await readMultipartFile(req, "file", UNDERLAY_UPLOAD_RULES)),
);
