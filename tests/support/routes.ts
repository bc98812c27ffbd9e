/**
 * Every route handler under app/api, found on disk, and the table of what each method declares:
 * the permission-table action a member route checks, or "public". Tests assert the table and
 * the disk agree, so a new route (or method) without a row fails them.
 */
import { readdirSync } from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import type { Action } from "@/lib/permissions";

export const ROOT = fileURLToPath(new URL("../..", import.meta.url));
const API_DIR = path.join(ROOT, "app/api");

export const HTTP_METHODS = ["GET", "HEAD", "POST", "PUT", "PATCH", "DELETE", "OPTIONS"] as const;
export type HttpMethod = (typeof HTTP_METHODS)[number];

/** Route folders relative to app/api (e.g. "projects/[projectId]/layout") that hold a route file. */
export function routeFilesOnDisk(): string[] {
  return readdirSync(API_DIR, { recursive: true, encoding: "utf8" })
    .filter((file) => /(^|\/)route\.(ts|tsx|js|mjs)$/.test(file))
    .map((file) => path.dirname(file).split(path.sep).join("/"))
    .sort();
}

/** The HTTP methods a route file exports, by importing it. */
export async function exportedMethods(route: string): Promise<HttpMethod[]> {
  const mod = (await import(path.join(API_DIR, route, "route.ts"))) as Record<string, unknown>;
  return HTTP_METHODS.filter((method) => typeof mod[method] === "function");
}

/** route folder → method → the action its handler declares (or "public"). */
export const ROUTE_ACTIONS: Record<string, Partial<Record<HttpMethod, Action | "public">>> = {
  "auth/password-reset/confirm": { POST: "public" },
  "auth/password-reset/request": { POST: "public" },
  "auth/session": { GET: "own-seats:read" },
  "auth/sign-in": { POST: "public" },
  "auth/sign-out": { POST: "own-seats:read" },
  "auth/sign-up": { POST: "public" },
  "catalogue/import": { POST: "catalogue:write" },
  "catalogue/products/[productId]": { DELETE: "catalogue:write" },
  "catalogue/products": { GET: "projects:read" },
  health: { GET: "public" },
  "invitations/[token]": { GET: "public" },
  "invitations/accept": { POST: "public" },
  "jobs/[jobId]": { GET: "compute:run" },
  "louvers/cavity-table": { POST: "compute:run" },
  "me/seats": { GET: "own-seats:read" },
  "me/settings": { PATCH: "own-seats:read" },
  "members/[membershipId]": { PATCH: "members:manage", DELETE: "members:manage" },
  "members/invitations/[invitationId]": { DELETE: "members:manage" },
  "members/invitations": { POST: "members:manage" },
  members: { GET: "members:read" },
  "projects/[projectId]/compute": { POST: "compute:run" },
  "projects/[projectId]/energy": { GET: "projects:read" },
  "projects/[projectId]/loads": { GET: "projects:read" },
  "projects/[projectId]/louvers/sweep": { POST: "compute:run" },
  "projects/[projectId]/louvers/optimise": { POST: "compute:run" },
  "projects/[projectId]/louvers/optimise/jobs": { POST: "compute:run" },
  "projects/[projectId]/louvers/apply": { POST: "layouts:write" },
  "projects/[projectId]/panels/performance": { GET: "projects:read" },
  "projects/[projectId]/layout": { GET: "projects:read", PUT: "layouts:write" },
  "projects/[projectId]/revisions/[number]/restore": { POST: "layouts:write" },
  "projects/[projectId]/revisions": { GET: "projects:read" },
  "projects/[projectId]/scenarios/[scenarioId]": { PUT: "scenarios:write" },
  "projects/[projectId]/seats/[seatId]": { PUT: "seats:manage" },
  "projects/[projectId]/seats": { GET: "projects:read" },
  "projects/[projectId]/underlay/[imageId]": { GET: "projects:read" },
  "projects/[projectId]/underlay": { POST: "layouts:write" },
  "projects/[projectId]/scenarios": { GET: "projects:read", POST: "scenarios:write" },
  "projects/[projectId]": { GET: "projects:read", PATCH: "projects:write" },
  projects: { GET: "projects:read", POST: "projects:write" },
};

/** "members/[membershipId] PATCH"-style keys of every row in ROUTE_ACTIONS. */
export function routeKeys(): string[] {
  return Object.entries(ROUTE_ACTIONS)
    .flatMap(([route, methods]) => Object.keys(methods).map((method) => `${route} ${method}`))
    .sort();
}
