// Turning zod failures into per-field messages the forms show beside each field, and the input
// types every schema builds on: text PostgreSQL can store and whole numbers its columns can hold.
import { z } from "zod";
import type { FieldErrors } from "./errors";

export function fieldErrorsOf(error: z.ZodError): FieldErrors {
  const out: FieldErrors = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.join(".") : "_form";
    (out[key] ??= []).push(issue.message);
  }
  return out;
}

/** FormData → plain object; repeated keys become arrays. Files are left out. */
export function formDataToObject(form: FormData): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const [key, value] of form.entries()) {
    if (typeof value !== "string") continue;
    if (key.startsWith("$ACTION")) continue; // React's own bookkeeping fields
    const prev = out[key];
    if (prev === undefined) out[key] = value;
    else out[key] = Array.isArray(prev) ? [...prev, value] : [prev, value];
  }
  return out;
}

// ── Text ─────────────────────────────────────────────────────────────────────────────────────────

export const UNSTORABLE_MESSAGE = "This contains a character we can't store.";

/**
 * True when the string holds a NUL (PostgreSQL text and jsonb refuse U+0000, PostgreSQL docs §8.3
 * and §8.14) or half of a UTF-16 surrogate pair (not a Unicode scalar value, so it has no UTF-8
 * form: RFC 3629 §3; jsonb refuses the `\ud800` escape JSON.stringify writes for it).
 */
export function hasUnstorableChar(s: string): boolean {
  for (let i = 0; i < s.length; i++) {
    const c = s.charCodeAt(i);
    if (c === 0) return true;
    if (c >= 0xd800 && c <= 0xdbff) {
      const next = s.charCodeAt(i + 1);
      if (next >= 0xdc00 && next <= 0xdfff) i++;
      else return true;
    } else if (c >= 0xdc00 && c <= 0xdfff) return true;
  }
  return false;
}

/**
 * The string type of every input schema: z.string() that refuses what PostgreSQL can't store.
 * Chain .trim(), .min(), .max(), .regex() on it as on z.string().
 */
export function storableString(params?: Parameters<typeof z.string>[0]) {
  return z.string(params).refine((s) => !hasUnstorableChar(s), UNSTORABLE_MESSAGE);
}

/** How deep raw input may nest before it is refused (forms and our JSON never go past ~6). */
export const MAX_INPUT_DEPTH = 32;

/**
 * The path of the first string (or object key) in raw input that can't be stored, or of the first
 * value nested deeper than MAX_INPUT_DEPTH; null when there is none. Walks without recursion, so
 * a hostile nesting can't exhaust the stack.
 */
export function findUnstorable(value: unknown): { path: string; message: string } | null {
  const stack: { v: unknown; path: string[] }[] = [{ v: value, path: [] }];
  while (stack.length) {
    const { v, path } = stack.pop()!;
    if (typeof v === "string") {
      if (hasUnstorableChar(v)) return { path: path.join(".") || "_form", message: UNSTORABLE_MESSAGE };
      continue;
    }
    if (v === null || typeof v !== "object") continue;
    if (path.length >= MAX_INPUT_DEPTH) return { path: path.slice(0, 3).join(".") || "_form", message: "This is nested too deeply." };
    const items: [string, unknown][] = Array.isArray(v) ? v.map((x, i) => [String(i), x]) : Object.entries(v);
    for (const [k, x] of items) {
      if (hasUnstorableChar(k)) return { path: [...path, "?"].join("."), message: UNSTORABLE_MESSAGE };
      stack.push({ v: x, path: [...path, k] });
    }
  }
  return null;
}

// ── Whole numbers ────────────────────────────────────────────────────────────────────────────────

/** PostgreSQL `integer` (int4) limits (PostgreSQL docs §8.1.1). */
export const INT4_MIN = -2_147_483_648;
export const INT4_MAX = 2_147_483_647;

/** A whole number from min to max; both must lie within int4 unless the column is bigint. */
export function boundedInt(min: number, max: number, label = "This number") {
  return z
    .number({ error: `${label} must be a number.` })
    .int(`${label} must be a whole number.`)
    .min(min, `${label} must be at least ${min.toLocaleString("en-US")}.`)
    .max(max, `${label} must be at most ${max.toLocaleString("en-US")}.`);
}

/** Any whole number an `integer` column holds; prefer boundedInt with real-world limits. */
export const int4 = (label?: string) => boundedInt(INT4_MIN, INT4_MAX, label);
