// Runs before every request (pages, route handlers, static files): refuses an address with a
// broken %-escape or a NUL character with a 400 before Next.js tries to decode it, a server action
// call larger than the limit with a 413, and adds the
// Content-Security-Policy with a fresh nonce (Next.js reads it from the request header and puts
// it on its own scripts) and, over HTTPS, HSTS. No database work here.
import { NextResponse, type NextRequest } from "next/server";
import { env } from "@/lib/env";
import { ACTION_BODY_LIMIT_BYTES, TOO_LARGE_MESSAGE } from "@/lib/request-limits";
import { contentSecurityPolicy, HSTS } from "@/lib/security-headers";

const https = env.APP_URL.startsWith("https:");
const storageOrigin = new URL(env.S3_ENDPOINT).origin;
const dev = env.NODE_ENV === "development";

export function proxy(request: NextRequest) {
  const nonce = Buffer.from(crypto.randomUUID()).toString("base64");
  const csp = contentSecurityPolicy({ nonce, dev, storageOrigin, https });
  const bad = badAddress(request) ?? oversizedAction(request);
  const response = bad ?? NextResponse.next({ request: { headers: withCsp(request.headers, nonce, csp) } });
  response.headers.set("Content-Security-Policy", csp);
  if (https) response.headers.set("Strict-Transport-Security", HSTS);
  return response;
}

function withCsp(headers: Headers, nonce: string, csp: string): Headers {
  const next = new Headers(headers);
  next.set("x-nonce", nonce);
  next.set("Content-Security-Policy", csp);
  return next;
}

/** RFC 3986 §2.1: a "%" must start two hex digits, and the bytes must be UTF-8; NUL is never allowed. */
function badAddress(request: NextRequest): NextResponse | null {
  const raw = rawPathAndQuery(request.url);
  for (const part of raw.split(/[/?&=]/)) {
    let decoded: string;
    try {
      decoded = decodeURIComponent(part.replace(/\+/g, " "));
    } catch {
      return refuse(request);
    }
    if (decoded.includes("\0")) return refuse(request);
  }
  return null;
}

/**
 * A server action call whose declared size is over the limit: Next.js would refuse it inside the
 * action handler with its own 500; answer 413 with a plain message first (RFC 9110 §15.5.14).
 */
function oversizedAction(request: NextRequest): NextResponse | null {
  if (request.method !== "POST" || !request.headers.has("next-action")) return null;
  const length = Number(request.headers.get("content-length") ?? "0");
  if (!(length > ACTION_BODY_LIMIT_BYTES)) return null;
  return new NextResponse(TOO_LARGE_MESSAGE, { status: 413, headers: { "content-type": "text/plain; charset=utf-8" } });
}

function rawPathAndQuery(url: string): string {
  // request.url keeps the escapes as sent; strip the scheme and host.
  const start = url.indexOf("/", url.indexOf("//") + 2);
  return start === -1 ? "/" : url.slice(start).split("#")[0]!;
}

function refuse(request: NextRequest): NextResponse {
  const message = "The address is not valid: it has a broken %-escape or a character that is not allowed.";
  if (request.nextUrl.pathname.startsWith("/api/")) {
    return NextResponse.json({ error: "invalid_address", message }, { status: 400 });
  }
  return new NextResponse(message, { status: 400, headers: { "content-type": "text/plain; charset=utf-8" } });
}
