// Comparing two category sets by content: PostgreSQL's jsonb reorders object keys, so the saved
// set and the draft are compared by a key-sorted rendering, in id order.
import type { ShowCategory } from "@/scoring/category-sets";

export function stableKey(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(stableKey).join(",")}]`;
  if (value && typeof value === "object") {
    const entries = Object.entries(value as Record<string, unknown>).filter(([, v]) => v !== undefined).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${stableKey(v)}`).join(",")}}`;
  }
  return JSON.stringify(value ?? null);
}

const normal = (c: ShowCategory) => ({ ...c, description: c.description || undefined, cap: c.cap ?? null, mergedIntoId: c.mergedIntoId ?? null });

export function sameSet(a: readonly ShowCategory[], b: readonly ShowCategory[]): boolean {
  const key = (s: readonly ShowCategory[]) => stableKey([...s].map(normal).sort((x, y) => (x.id < y.id ? -1 : 1)));
  return a.length === b.length && key(a) === key(b);
}
