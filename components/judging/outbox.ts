// The tablet's outbox rules, pure (no React, no IndexedDB) so they are unit-tested: how a local
// change becomes an outbox row, what a sheet looks like with pending rows laid over the server's
// values, and what a sync answer does to the outbox. The server's merge rules are in
// scoring/sheet-sync.ts; these follow them (baseVersion = the field version last seen from the
// server, seq increasing per device).
import type { Json } from "@/scoring/sheet-sync";
import type { Mark, Marks } from "@/scoring/score-sheets";

/** A sheet as the server last told this tablet (session payload or a sync answer). */
export type ServerSheet = {
  entryId: string;
  judgeUserId: string;
  status: "open" | "submitted";
  version: number;
  fields: Record<string, { value: Json; version: number }>;
  conflicts: { field: string; serverValue: Json; clientValue: Json }[];
};

/** A change waiting on this tablet. Refused rows stay (with the server's words) until dismissed. */
export type OutboxRow = {
  key: string;
  slug: string;
  judgeId: string;
  entryId: string;
  seq: number;
  clientAt: string;
  kind: "set" | "resolve" | "submit";
  /** null for a submit. */
  field: string | null;
  value: Json;
  baseVersion: number;
  /** For a submit: the field versions this tablet had seen. */
  seen: Record<string, number> | null;
  state: "pending" | "refused";
  text?: string;
};

export type LocalChange = { kind: "set" | "resolve"; field: string; value: Json } | { kind: "submit" };

type Stamp = { key: string; seq: number; clientAt: string; slug: string; judgeId: string; entryId: string };

/** The outbox row for a change made now on this sheet. */
export function rowFor(sheet: ServerSheet | undefined, change: LocalChange, stamp: Stamp): OutboxRow {
  if (change.kind === "submit") {
    const seen = Object.fromEntries(Object.entries(sheet?.fields ?? {}).map(([f, v]) => [f, v.version]));
    return { ...stamp, kind: "submit", field: null, value: null, baseVersion: 0, seen, state: "pending" };
  }
  return { ...stamp, kind: change.kind, field: change.field, value: change.value, baseVersion: sheet?.fields[change.field]?.version ?? 0, seen: null, state: "pending" };
}

/**
 * Keys of older pending rows a new row makes pointless: earlier writes of the same field of the
 * same sheet (typing a comment writes on every key). Safe even if one is in flight: the server's
 * rule 3 applies the later seq from the same device over it.
 */
export function replacedBy(rows: readonly OutboxRow[], row: OutboxRow): string[] {
  if (row.kind === "submit") return [];
  return rows
    .filter((r) => r.state === "pending" && r.kind !== "submit" && r.slug === row.slug && r.judgeId === row.judgeId && r.entryId === row.entryId && r.field === row.field && r.seq < row.seq)
    .map((r) => r.key);
}

const sameSheet = (r: OutboxRow, entryId: string, judgeId: string) => r.entryId === entryId && r.judgeId === judgeId;

export type SyncState = "synced" | "saved" | "conflict" | "refused";

export type SheetView = {
  values: Record<string, Json>;
  /** Submitted on the server, or a submit waiting here. */
  locked: boolean;
  submittedOnServer: boolean;
  pending: number;
  refused: OutboxRow[];
  /** Open conflicts with no "keep" choice waiting to be sent. */
  conflicts: ServerSheet["conflicts"];
  sync: SyncState;
};

/** One sheet as the judge sees it: server values with this tablet's pending rows on top. */
export function viewSheet(sheet: ServerSheet | undefined, rows: readonly OutboxRow[], entryId: string, judgeId: string): SheetView {
  const mine = rows.filter((r) => sameSheet(r, entryId, judgeId)).sort((a, b) => a.seq - b.seq);
  const pendingRows = mine.filter((r) => r.state === "pending");
  const values: Record<string, Json> = Object.fromEntries(Object.entries(sheet?.fields ?? {}).map(([f, v]) => [f, v.value]));
  for (const r of pendingRows) if (r.field) values[r.field] = r.value;
  const resolving = new Set(pendingRows.filter((r) => r.kind === "resolve").map((r) => r.field));
  const conflicts = (sheet?.conflicts ?? []).filter((c) => !resolving.has(c.field));
  const refused = mine.filter((r) => r.state === "refused");
  const submittedOnServer = sheet?.status === "submitted";
  const locked = submittedOnServer || pendingRows.some((r) => r.kind === "submit");
  const sync: SyncState = conflicts.length ? "conflict" : refused.length ? "refused" : pendingRows.length ? "saved" : "synced";
  return { values, locked, submittedOnServer, pending: pendingRows.length, refused, conflicts, sync };
}

/** The marks in a sheet's values, by criterion id, for runningTotal. */
export function marksOf(values: Record<string, Json>): Marks {
  const out: Record<string, Mark> = {};
  for (const [k, v] of Object.entries(values)) if (k.startsWith("mark:") && v && typeof v === "object" && !Array.isArray(v) && "kind" in v) out[k.slice(5)] = v as Mark;
  return out;
}

export type SyncResultRow = { key: string; entryId: string; duplicate: boolean; outcome: { kind: "applied" | "unchanged" | "stale" | "conflict" | "refused"; text?: string; field?: string } };

/**
 * What a sync answer does to the outbox: applied, unchanged, stale and duplicate rows go; a
 * field conflict goes too (the server keeps it open on the sheet, which the answer carries); a
 * refusal, or a submit that met another device's change, stays with the server's words.
 */
export function settle(results: readonly SyncResultRow[]): { remove: string[]; refuse: { key: string; text: string }[] } {
  const remove: string[] = [];
  const refuse: { key: string; text: string }[] = [];
  for (const r of results) {
    const o = r.outcome;
    if (r.duplicate || o.kind === "applied" || o.kind === "unchanged" || o.kind === "stale") remove.push(r.key);
    else if (o.kind === "conflict" && o.field) remove.push(r.key);
    else refuse.push({ key: r.key, text: o.text ?? "The server did not accept this change." });
  }
  return { remove, refuse };
}

/** Keep the newer of two copies of a sheet (a late or cached answer must not roll one back). */
export function newerSheet(current: ServerSheet | undefined, incoming: ServerSheet): ServerSheet {
  if (!current) return incoming;
  return incoming.version >= current.version ? incoming : current;
}

/** Pending rows grouped into one batch per judge, in seq order, at most `max` per batch. */
export function batches(rows: readonly OutboxRow[], max = 200): { judgeId: string; rows: OutboxRow[] }[] {
  const byJudge = new Map<string, OutboxRow[]>();
  for (const r of [...rows].filter((r) => r.state === "pending").sort((a, b) => a.seq - b.seq)) byJudge.set(r.judgeId, [...(byJudge.get(r.judgeId) ?? []), r]);
  return [...byJudge].map(([judgeId, list]) => ({ judgeId, rows: list.slice(0, max) }));
}

/** The request body's change for an outbox row (the shape of lib/schemas/judging.ts). */
export function wireChange(r: OutboxRow) {
  if (r.kind === "submit") return { kind: "submit" as const, key: r.key, entryId: r.entryId, seq: r.seq, clientAt: r.clientAt, seen: r.seen ?? {} };
  return { kind: r.kind, key: r.key, entryId: r.entryId, seq: r.seq, clientAt: r.clientAt, field: r.field!, value: r.value, baseVersion: r.baseVersion };
}

export type Method = "points" | "sort_then_points" | "sort_then_rank" | "rank";

/** Why this sheet can't be submitted yet, in plain words; null when it can. */
export function submitBlocker(method: Method, values: Record<string, Json>, complete: boolean, missing: number): string | null {
  const sort = values.sort;
  const rank = values.rank;
  if (method.startsWith("sort_") && sort !== "kept" && sort !== "set_aside") return "Choose Keep or Set aside first.";
  if (sort === "set_aside") return null;
  if (method === "rank" || method === "sort_then_rank") return typeof rank === "number" ? null : "Give a rank first.";
  return complete ? null : `Score ${missing === 1 ? "the last criterion" : `the ${missing} criteria still open`} first.`;
}
