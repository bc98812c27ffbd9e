import "server-only";
import { NextResponse, type NextRequest } from "next/server";
import { z } from "zod";
import { SESSION_COOKIE } from "@/lib/auth/lucia";
import { sessionCookie, validateSessionToken, type Member } from "@/lib/auth/session";
import { can, type Action } from "@/lib/permissions";
import { AppError, forbidden, unauthenticated, type FieldError } from "@/lib/http/errors";

/** Largest JSON body a route accepts (a layout with thousands of elements fits well inside). */
const MAX_JSON_BYTES = 2 * 1024 * 1024;

/** One entry per bad field; an unknown key is named by its own path. */
export function zodFieldErrors(error: z.ZodError, prefix: string[] = []): FieldError[] {
  return error.issues.flatMap((issue) => {
    const base = [...prefix, ...issue.path.map(String)];
    if (issue.code === "unrecognized_keys") {
      return issue.keys.map((key) => ({ path: [...base, key].join("."), message: "unknown field" }));
    }
    return [{ path: base.join(".") || "(root)", message: issue.message }];
  });
}

export function invalidInput(fields: FieldError[], message = "Some fields are not valid."): AppError {
  return new AppError("invalid_input", message, fields);
}

export function parseWith<T>(schema: z.ZodType<T>, value: unknown, prefix: string[] = []): T {
  const result = schema.safeParse(value);
  if (!result.success) throw invalidInput(zodFieldErrors(result.error, prefix));
  return result.data;
}

/** One place that turns any thrown value into a JSON error response; unknown errors leak nothing. */
export function errorResponse(error: unknown): NextResponse {
  if (error instanceof AppError) {
    return NextResponse.json(
      { error: error.code, message: error.message, ...(error.fields ? { fields: error.fields } : {}), ...(error.details ?? {}) },
      { status: error.status },
    );
  }
  console.error("[seatwise] unhandled error", error);
  return NextResponse.json({ error: "internal", message: "Something went wrong on our side." }, { status: 500 });
}

async function readJson(req: Request): Promise<unknown> {
  const length = Number(req.headers.get("content-length") ?? 0);
  if (length > MAX_JSON_BYTES) throw new AppError("payload_too_large", `Bodies are limited to ${MAX_JSON_BYTES} bytes.`);
  const text = await req.text();
  if (text.length > MAX_JSON_BYTES) throw new AppError("payload_too_large", `Bodies are limited to ${MAX_JSON_BYTES} bytes.`);
  if (text.trim() === "") return undefined;
  try {
    return JSON.parse(text);
  } catch {
    throw invalidInput([{ path: "(body)", message: "The body is not valid JSON." }]);
  }
}

/** Cross-site request check for state-changing methods (cookies are SameSite=Lax as well). */
function assertSameOrigin(req: Request): void {
  if (req.method === "GET" || req.method === "HEAD") return;
  const origin = req.headers.get("origin");
  if (!origin) return;
  const host = req.headers.get("x-forwarded-host") ?? req.headers.get("host");
  let originHost: string;
  try {
    originHost = new URL(origin).host;
  } catch {
    throw new AppError("forbidden", "Bad Origin header.");
  }
  if (host && originHost !== host) throw new AppError("forbidden", "Cross-site requests are not accepted.");
}

type RouteContext = { params: Promise<Record<string, string | string[]>> };

interface Spec<P, Q, B> {
  params?: z.ZodType<P>;
  query?: z.ZodType<Q>;
  body?: z.ZodType<B>;
  /** HTTP status on success (default 200). */
  status?: number;
}

interface Input<P, Q, B> {
  req: NextRequest;
  params: P;
  query: Q;
  body: B;
}

async function parseInput<P, Q, B>(req: NextRequest, ctx: RouteContext, spec: Spec<P, Q, B>): Promise<Input<P, Q, B>> {
  const rawParams = await ctx.params;
  const params = spec.params ? parseWith(spec.params, rawParams, ["params"]) : (rawParams as P);
  const query = spec.query
    ? parseWith(spec.query, Object.fromEntries(req.nextUrl.searchParams.entries()), ["query"])
    : (undefined as Q);
  const body = spec.body ? parseWith(spec.body, await readJson(req)) : (undefined as B);
  return { req, params, query, body };
}

function respond(data: unknown, status: number): NextResponse {
  if (data instanceof NextResponse) return data;
  // A plain Response (e.g. a file body) is wrapped so cookies can still be refreshed on it.
  if (data instanceof Response) return new NextResponse(data.body, { status: data.status, headers: data.headers });
  if (status === 204) return new NextResponse(null, { status });
  return NextResponse.json(data ?? {}, { status });
}

/** A route open to anyone (sign-in, sign-up, health…): validate → call → respond. */
export function publicRoute<P = unknown, Q = unknown, B = unknown>(
  spec: Spec<P, Q, B>,
  fn: (input: Input<P, Q, B>) => Promise<unknown>,
) {
  return async (req: NextRequest, ctx: RouteContext): Promise<NextResponse> => {
    try {
      assertSameOrigin(req);
      const input = await parseInput(req, ctx, spec);
      return respond(await fn(input), spec.status ?? 200);
    } catch (error) {
      return errorResponse(error);
    }
  };
}

/**
 * A route for signed-in members: authenticate (401) → authorise against the permission table
 * (403) → validate (400) → call → respond. Ids of other organisations are the lib's business:
 * every read it makes is scoped to `member.organisationId`, so they come back 404.
 */
export function memberRoute<P = unknown, Q = unknown, B = unknown>(
  action: Action,
  spec: Spec<P, Q, B>,
  fn: (input: Input<P, Q, B> & { member: Member }) => Promise<unknown>,
) {
  return async (req: NextRequest, ctx: RouteContext): Promise<NextResponse> => {
    try {
      assertSameOrigin(req);
      const token = req.cookies.get(SESSION_COOKIE)?.value;
      const session = await validateSessionToken(token);
      if (!session.ok) throw unauthenticated();
      if (!can(session.member.role, action)) throw forbidden();
      const input = await parseInput(req, ctx, spec);
      const response = respond(await fn({ ...input, member: session.member }), spec.status ?? 200);
      if (session.refreshed && token) {
        const cookie = sessionCookie(token);
        response.cookies.set(cookie.name, cookie.value, cookie.attributes);
      }
      return response;
    } catch (error) {
      return errorResponse(error);
    }
  };
}
