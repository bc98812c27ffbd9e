import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { mkdtempSync, readdirSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { NextRequest } from "next/server";
import { count, eq } from "drizzle-orm";
import { getDb, pool } from "@/db/client";
import { sessions, uploads } from "@/db/schema";
import { POST } from "@/app/api/projects/[projectId]/underlay/route";
import { GET } from "@/app/api/projects/[projectId]/underlay/[imageId]/route";
import { SESSION_COOKIE } from "@/lib/auth/lucia";
import { hashToken } from "@/lib/auth/tokens";
import { createProject } from "@/lib/projects/service";
import { sniffImage } from "@/lib/uploads/image";
import { addMember, newOrganisation, type ErrorBody, type TestMember } from "./support/members";

/** A valid 1 × 1 PNG (one opaque red pixel), byte for byte. */
const PNG_1X1 = Uint8Array.from(
  Buffer.from("89504e470d0a1a0a0000000d4948445200000001000000010802000000907753de0000000c4944415408d763f8cfc000000301010018dd8db00000000049454e44ae426082", "hex"),
);
/** A minimal JPEG header: SOI, an APP0 segment and a baseline frame header of 640 × 480. */
const JPEG_HEADER = Uint8Array.from([
  0xff, 0xd8, 0xff, 0xe0, 0x00, 0x10, 0x4a, 0x46, 0x49, 0x46, 0x00, 0x01, 0x01, 0x00, 0x00, 0x01, 0x00, 0x01, 0x00, 0x00,
  0xff, 0xc0, 0x00, 0x11, 0x08, 0x01, 0xe0, 0x02, 0x80, 0x03, 0x01, 0x22, 0x00, 0x02, 0x11, 0x01, 0x03, 0x11, 0x01, 0xff, 0xd9,
]);

let designer: TestMember;
let manager: TestMember;
let stranger: TestMember;
let projectId = "";
let uploadDir = "";

function upload(token: string, bytes: Uint8Array, fileName: string, declaredType: string, id = projectId): Promise<Response> {
  const form = new FormData();
  form.append("file", new File([bytes as BlobPart], fileName, { type: declaredType }));
  const req = new NextRequest(`http://localhost/api/projects/${id}/underlay`, { method: "POST", headers: { cookie: `${SESSION_COOKIE}=${token}` }, body: form });
  return POST(req, { params: Promise.resolve({ projectId: id }) });
}

function fetchImage(token: string, imageId: string, id = projectId): Promise<Response> {
  const req = new NextRequest(`http://localhost/api/projects/${id}/underlay/${imageId}`, { headers: { cookie: `${SESSION_COOKIE}=${token}` } });
  return GET(req, { params: Promise.resolve({ projectId: id, imageId }) });
}

async function rows(): Promise<number> {
  const [row] = await getDb().select({ n: count() }).from(uploads).where(eq(uploads.projectId, projectId));
  return row!.n;
}

beforeAll(async () => {
  uploadDir = mkdtempSync(path.join(os.tmpdir(), "seatwise-uploads-"));
  process.env.UPLOAD_DIR = uploadDir;
  const admin = await newOrganisation("Uploads");
  designer = await addMember(admin.member.organisationId, "designer", "Upload Designer");
  manager = await addMember(admin.member.organisationId, "facility_manager", "Upload Manager");
  stranger = await newOrganisation("Peeking");
  projectId = (await createProject(admin.member, { name: "Underlay project", description: "" })).id;
});

afterAll(async () => {
  rmSync(uploadDir, { recursive: true, force: true });
  await pool().end();
});

describe("sniffImage", () => {
  it("reads type and size from PNG and JPEG headers and refuses other bytes", () => {
    expect(sniffImage(PNG_1X1)).toEqual({ contentType: "image/png", ext: "png", widthPx: 1, heightPx: 1 });
    expect(sniffImage(JPEG_HEADER)).toEqual({ contentType: "image/jpeg", ext: "jpg", widthPx: 640, heightPx: 480 });
    expect(sniffImage(new TextEncoder().encode("just some text, not an image at all"))).toBeNull();
    expect(sniffImage(PNG_1X1.slice(0, 12))).toBeNull();
  });
});

describe("POST/GET /api/projects/{id}/underlay", () => {
  let imageId = "";

  it("accepts a real PNG (201) with its pixel size, stores it under UPLOAD_DIR and serves it back", async () => {
    const res = await upload(designer.token, PNG_1X1, "plan.png", "image/png");
    expect(res.status).toBe(201);
    const body = (await res.json()) as { imageId: string; widthPx: number; heightPx: number; contentType: string };
    expect(body).toMatchObject({ widthPx: 1, heightPx: 1, contentType: "image/png" });
    imageId = body.imageId;
    expect(await rows()).toBe(1);
    const orgDirs = readdirSync(uploadDir);
    expect(orgDirs).toHaveLength(1);
    expect(readdirSync(path.join(uploadDir, orgDirs[0]!))).toEqual([`${imageId}.png`]);

    const served = await fetchImage(manager.token, imageId);
    expect(served.status).toBe(200);
    expect(served.headers.get("content-type")).toBe("image/png");
    expect(new Uint8Array(await served.arrayBuffer())).toEqual(PNG_1X1);
  });

  it("serves the image with a refreshed session cookie when the session slides", async () => {
    // Past half of its 30-day life, the session is extended on use and the cookie re-sent.
    await getDb().update(sessions).set({ expiresAt: new Date(Date.now() + 2 * 24 * 3600 * 1000) }).where(eq(sessions.id, hashToken(manager.token)));
    const served = await fetchImage(manager.token, imageId);
    expect(served.status).toBe(200);
    expect(served.headers.get("content-type")).toBe("image/png");
    expect(served.headers.get("set-cookie")).toContain(`${SESSION_COOKIE}=${manager.token}`);
  });

  it("judges by content: a JPEG named .png is stored as JPEG", async () => {
    const res = await upload(designer.token, JPEG_HEADER, "photo.png", "image/png");
    expect(res.status).toBe(201);
    expect(await res.json()).toMatchObject({ contentType: "image/jpeg", widthPx: 640, heightPx: 480 });
  });

  it("rejects a text file renamed .png with 415 and stores nothing", async () => {
    const before = await rows();
    const res = await upload(designer.token, new TextEncoder().encode("this is not a picture"), "plan.png", "image/png");
    expect(res.status).toBe(415);
    const body = (await res.json()) as ErrorBody;
    expect(body.error).toBe("unsupported_media_type");
    expect(body.fields).toEqual([{ path: "file", message: "not a PNG or JPEG image" }]);
    expect(await rows()).toBe(before);
  });

  it("rejects an image over 5 MB with 413 and stores nothing", async () => {
    const before = await rows();
    const big = new Uint8Array(5 * 1024 * 1024 + 1);
    big.set(PNG_1X1);
    const res = await upload(designer.token, big, "huge.png", "image/png");
    expect(res.status).toBe(413);
    expect(((await res.json()) as ErrorBody).error).toBe("payload_too_large");
    expect(await rows()).toBe(before);
  });

  it("answers 400 without a file field, 403 for a facility manager and 404 for another organisation", async () => {
    const form = new FormData();
    form.append("other", "x");
    const missing = await POST(
      new NextRequest(`http://localhost/api/projects/${projectId}/underlay`, { method: "POST", headers: { cookie: `${SESSION_COOKIE}=${designer.token}` }, body: form }),
      { params: Promise.resolve({ projectId }) },
    );
    expect(missing.status).toBe(400);
    expect(((await missing.json()) as ErrorBody).fields).toEqual([{ path: "file", message: "attach a PNG or JPEG image" }]);
    expect((await upload(manager.token, PNG_1X1, "plan.png", "image/png")).status).toBe(403);
    expect((await upload(stranger.token, PNG_1X1, "plan.png", "image/png")).status).toBe(404);
    expect((await fetchImage(stranger.token, imageId)).status).toBe(404);
    expect((await fetchImage(designer.token, crypto.randomUUID())).status).toBe(404);
  });
});
