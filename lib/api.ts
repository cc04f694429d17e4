// The one wrapper every JSON route handler goes through: find the viewer, parse the input with
// the zod schema, run the handler, and answer JSON with the right status (400 with field errors,
// 401, 403, 404, 409). Handlers check roles themselves through lib/session and db/queries.
import "server-only";
import { NextResponse } from "next/server";
import type { z } from "zod";
import { AppError } from "@/lib/errors";
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

export function defineRoute<P = Record<string, string>, S extends z.ZodType | undefined = undefined, R = unknown>(
  opts: Options<S>,
  handler: (ctx: Ctx<P, S extends z.ZodType ? z.output<S> : undefined>) => Promise<R | Response>,
) {
  return async function route(req: Request, context: RouteContext<P>): Promise<Response> {
    try {
      const params = (await context?.params) ?? ({} as P);
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
      if (err instanceof AppError) {
        return NextResponse.json(
          { error: codeFor(err.status), message: err.message, fieldErrors: err.fieldErrors },
          { status: err.status },
        );
      }
      console.error(`[api] ${req.method} ${new URL(req.url).pathname} failed`, err);
      return NextResponse.json({ error: "server_error", message: "Something went wrong on our side." }, { status: 500 });
    }
  };
}

async function readInput(req: Request): Promise<unknown> {
  if (req.method === "GET" || req.method === "HEAD") {
    return Object.fromEntries(new URL(req.url).searchParams.entries());
  }
  const type = req.headers.get("content-type") ?? "";
  if (type.includes("application/json")) {
    try {
      return await req.json();
    } catch {
      throw new AppError(400, "The request body is not valid JSON.");
    }
  }
  if (type.includes("form")) return Object.fromEntries((await req.formData()).entries());
  const text = await req.text();
  if (!text) return {};
  try {
    return JSON.parse(text);
  } catch {
    throw new AppError(400, "The request body is not valid JSON.");
  }
}

function codeFor(status: number): string {
  return ({ 400: "invalid_input", 401: "unauthenticated", 403: "forbidden", 404: "not_found", 409: "conflict" } as Record<number, string>)[status] ?? "error";
}
