// Where to go after signing in: only a path on this site. "//evil.example", "/\evil" and full
// URLs are refused, so a crafted link cannot bounce someone to another site (open redirect).
// With no `next`, /start sends each person where their role at a current show calls for.
const BASE = "http://ribbonry.invalid";

export function safeNext(raw: unknown, fallback = "/start"): string {
  const value = Array.isArray(raw) ? raw[0] : raw;
  if (typeof value !== "string" || value.length > 500) return fallback;
  if (!value.startsWith("/") || value.startsWith("//") || value.startsWith("/\\")) return fallback;
  if (/[\u0000-\u001f\\]/.test(value)) return fallback;
  try {
    const url = new URL(value, BASE);
    if (url.origin !== BASE) return fallback;
    return `${url.pathname}${url.search}${url.hash}`;
  } catch {
    return fallback;
  }
}

/** The first value of a search parameter. */
export function param(value: string | string[] | undefined): string | undefined {
  return Array.isArray(value) ? value[0] : value;
}

/** `/sign-in?next=…&email=…`, leaving out what is empty. */
export function withQuery(path: string, query: Record<string, string | undefined | null>): string {
  const qs = new URLSearchParams();
  for (const [k, v] of Object.entries(query)) if (v) qs.set(k, v);
  const s = qs.toString();
  return s ? `${path}?${s}` : path;
}
