import "server-only";
import type { NextResponse } from "next/server";
import { blankSessionCookie, sessionCookie } from "@/lib/auth/session";

export function setSessionCookie(response: NextResponse, token: string): NextResponse {
  const cookie = sessionCookie(token);
  response.cookies.set(cookie.name, cookie.value, cookie.attributes);
  return response;
}

export function clearSessionCookie(response: NextResponse): NextResponse {
  const cookie = blankSessionCookie();
  response.cookies.set(cookie.name, cookie.value, cookie.attributes);
  return response;
}
