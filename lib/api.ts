// The one wrapper every JSON route handler goes through: refuse a foreign Origin on a write (403),
// a malformed address (400) and a body that is not JSON (415), find the viewer, parse the input
// with the zod schema, run the handler, and answer JSON with the right status (400 with field
// errors, 401, 403, 404, 409). Handlers check roles themselves through lib/session and db/queries.
import "server-only";
import { NextResponse } from "next/server";
import type { z } from "zod";
import { AppError } from "@/lib/errors";
import { errorSummary } from "@/lib/error-log";
import { trustedOrigins } from "@/lib/origins";
import { getViewer, type Viewer } from "@/lib/session";
import { fieldErrorsOf } from "@/lib/validation";

type Ctx<P, I> = { req: Request; params: P; viewer: Viewer | null; input: I };
type RouteContext<P> = { params: Promise<P> };

type Options<S extends z.ZodType | undefined> = {
  /** Body schema (POST/PATCH/PUT) or query-string schema (GET). */
  input?: S;
  /** "user": 401 unless signed in. "public": anyone. */
  access: "user" | "public";
};

const STATE_CHANGING = new Set(["POST", "PUT", "PATCH", "DELETE"]);

/** An answer decided before the handler runs: 403, 400 or 415 with a plain message. */
class Refusal extends Error {
  constructor(
    readonly status: 400 | 403 | 415,
    readonly code: string,
    message: string,
  ) {
    super(message);
  }
}

export function defineRoute<P = Record<string, string>, S extends z.ZodType | undefined = undefined, R = unknown>(
  opts: Options<S>,
  handler: (ctx: Ctx<P, S extends z.ZodType ? z.output<S> : undefined>) => Promise<R | Response>,
) {
  return async function route(req: Request, context: RouteContext<P>): Promise<Response> {
    let params = {} as P;
    try {
      checkOrigin(req);
      params = await readParams(context);
      checkAddress(req, params as Record<string, unknown>);
      checkContentType(req, opts.input !== undefined);
      const viewer = await getViewer(req.headers);
      if (opts.access === "user" && !viewer) throw new AppError(401, "Please sign in first.");
      let input: unknown = undefined;
      if (opts.input) {
        const raw = await readInput(req);
        const parsed = opts.input.safeParse(raw);
        if (!parsed.success) {
          return NextResponse.json(
            { error: "invalid_input", message: "Some fields need attention.", fieldErrors: fieldErrorsOf(parsed.error) },
            { status: 400 },
          );
        }
        input = parsed.data;
      }
      const result = await handler({ req, params, viewer, input: input as never });
      if (result instanceof Response) return result;
      const status = req.method === "POST" ? 201 : 200;
      return NextResponse.json(result ?? { ok: true }, { status });
    } catch (err) {
      if (err instanceof Refusal) {
        return NextResponse.json({ error: err.code, message: err.message }, { status: err.status });
      }
      if (err instanceof AppError) {
        return NextResponse.json(
          { error: codeFor(err.status), message: err.message, fieldErrors: err.fieldErrors },
          { status: err.status },
        );
      }
      // The route's pattern, not its address: a token or a search term in the URL stays out of the log.
      console.error(`[api] ${req.method} ${routePattern(req, params as Record<string, unknown>)} failed`, errorSummary(err));
      return NextResponse.json({ error: "server_error", message: "Something went wrong on our side." }, { status: 500 });
    }
  };
}

/**
 * Cross-site request forgery: a write must come from one of the app's own pages. Browsers send
 * Origin on every cross-origin POST/PUT/PATCH/DELETE (Fetch standard), so a foreign or "null"
 * Origin is refused. A request without Origin is a non-browser client (a script, a tablet's
 * background sync from an old browser) unless Fetch Metadata says otherwise: Sec-Fetch-Site other
 * than same-origin is refused too (OWASP CSRF Prevention Cheat Sheet: verifying origin with
 * standard headers, Fetch Metadata headers).
 */
function checkOrigin(req: Request) {
  if (!STATE_CHANGING.has(req.method)) return;
  const origin = req.headers.get("origin");
  const refuse = () => {
    throw new Refusal(403, "foreign_origin", "This request did not come from a Ribbonry page, so it was refused.");
  };
  if (origin !== null) {
    if (!trustedOrigins().includes(origin)) refuse();
    return;
  }
  const site = req.headers.get("sec-fetch-site");
  if (site !== null && site !== "same-origin") refuse();
  const referer = req.headers.get("referer");
  if (referer !== null) {
    let from: string | null = null;
    try {
      from = new URL(referer).origin;
    } catch {
      // An unreadable Referer is no evidence of our own page.
    }
    if (!from || !trustedOrigins().includes(from)) refuse();
  }
}

async function readParams<P>(context: RouteContext<P> | undefined): Promise<P> {
  try {
    return ((await context?.params) ?? {}) as P;
  } catch {
    throw badAddress();
  }
}

const badAddress = () =>
  new Refusal(400, "invalid_address", "The address is not valid: it has a broken %-escape or a character that is not allowed.");

/** A malformed %-escape or a NUL character in the path or the query string is a bad request (RFC 3986 §2.1). */
function checkAddress(req: Request, params: Record<string, unknown>) {
  const url = new URL(req.url);
  for (const segment of url.pathname.split("/")) decodeOrRefuse(segment);
  for (const part of url.search.slice(1).split("&")) {
    for (const piece of part.split("=")) decodeOrRefuse(piece.replace(/\+/g, " "));
  }
  for (const value of Object.values(params)) {
    const values = Array.isArray(value) ? value : [value];
    for (const v of values) if (typeof v === "string" && (v.includes("\0") || hasBrokenEscape(v))) throw badAddress();
  }
}

function decodeOrRefuse(s: string) {
  let decoded: string;
  try {
    decoded = decodeURIComponent(s);
  } catch {
    throw badAddress();
  }
  if (decoded.includes("\0")) throw badAddress();
}

// A parameter Next could not decode reaches the handler as its raw text, escapes and all.
function hasBrokenEscape(v: string): boolean {
  if (!v.includes("%")) return false;
  try {
    decodeURIComponent(v);
    return false;
  } catch {
    return true;
  }
}

/**
 * Bodies are JSON only: a form or text body is what a foreign page can send without a CORS
 * preflight, and multipart is never expected here (OWASP ASVS 4.0 V13.1.5: requests with
 * unexpected or missing content types are rejected). A body-less write may omit the header.
 */
function checkContentType(req: Request, hasInput: boolean) {
  if (req.method === "GET" || req.method === "HEAD") return;
  const header = req.headers.get("content-type");
  const media = header?.split(";")[0]!.trim().toLowerCase();
  if (media === "application/json") return;
  if (header === null && !hasInput) return;
  throw new Refusal(415, "unsupported_media_type", "Send the request body as JSON (Content-Type: application/json).");
}

async function readInput(req: Request): Promise<unknown> {
  if (req.method === "GET" || req.method === "HEAD") {
    return Object.fromEntries(new URL(req.url).searchParams.entries());
  }
  try {
    return await req.json();
  } catch {
    throw new AppError(400, "The request body is not valid JSON.");
  }
}

/** `/api/shows/[slug]/team` for `/api/shows/spring-show/team`: each parameter's value named by its key. */
function routePattern(req: Request, params: Record<string, unknown>): string {
  let segments: string[];
  try {
    segments = new URL(req.url).pathname.split("/");
  } catch {
    return "(unreadable address)";
  }
  const byValue = new Map<string, string>();
  for (const [k, v] of Object.entries(params)) if (typeof v === "string") byValue.set(v, `[${k}]`);
  return segments
    .map((s) => {
      let decoded = s;
      try {
        decoded = decodeURIComponent(s);
      } catch {
        // keep the raw segment's place, not its text
        return "[?]";
      }
      return byValue.get(decoded) ?? byValue.get(s) ?? s;
    })
    .join("/");
}

function codeFor(status: number): string {
  return ({ 400: "invalid_input", 401: "unauthenticated", 403: "forbidden", 404: "not_found", 409: "conflict" } as Record<number, string>)[status] ?? "error";
}
