import "server-only";
import type { NextRequest } from "next/server";

/**
 * The public address that links in e-mails and invitations point to. `APP_URL` when set (the
 * start and test scripts set it); otherwise the address the request came in on. A configured
 * address is preferred because a Host header can be forged to poison reset links.
 */
export function publicOrigin(req: NextRequest): string {
  const configured = process.env.APP_URL;
  if (configured) return configured.replace(/\/+$/, "");
  return req.nextUrl.origin;
}
