// Merging a judge's score-sheet changes that arrive from tablets, possibly late, twice, out of
// order or from two devices at once. Pure: the server applies it inside a transaction, and the
// tablet runs the same rules to show what it expects.
//
// The rules (a sheet is a set of fields: one per criterion mark, per section comment, the overall
// comment, the discuss flag, the sorting decision and the rank):
// 1. Every change carries an idempotency key. A key seen before returns the stored outcome and
//    changes nothing, so replaying a batch yields the same state.
// 2. Every field has a version, raised by one on each write. A change names the version it was
//    made on (`baseVersion`, 0 for a field never seen). Made on the current version: applied.
// 3. Made on an older version that THIS device wrote meanwhile: the device's own sequence number
//    decides. A later change (higher `seq`) is applied; an earlier one that arrives late is stale
//    and ignored, so out-of-order delivery ends with the device's last edit.
// 4. Made on an older version that ANOTHER device wrote meanwhile: if the values agree, nothing
//    to do; if they differ, a conflict. The stored value stays, the conflict is recorded, and
//    someone resolves it by sending a "resolve" change made on the current version. Never a
//    silent overwrite.
// 5. Submitting locks the sheet. It is refused while a conflict is open, and is itself a conflict
//    when another device wrote a field after this device last saw it. A locked sheet refuses
//    every change until the chair reopens it.

import type { Mark } from "./score-sheets";

export type FieldKey = string;
export type Json = null | boolean | number | string | Json[] | { [k: string]: Json };

export type FieldState = { value: Json; version: number; deviceId: string; seq: number; changeKey: string };

export type OpenConflict = { field: FieldKey; serverValue: Json; clientValue: Json; serverDeviceId: string; clientDeviceId: string; changeKey: string };

export type SheetState = {
  status: "open" | "submitted";
  /** Raised by one on every applied change, submit and reopen. */
  version: number;
  fields: Record<FieldKey, FieldState>;
  conflicts: OpenConflict[];
};

export type SheetChange =
  | { kind: "set" | "resolve"; key: string; deviceId: string; seq: number; field: FieldKey; value: Json; baseVersion: number }
  | { kind: "submit"; key: string; deviceId: string; seq: number; seen: Record<FieldKey, number> };

export type ChangeOutcome =
  | { kind: "applied"; field?: FieldKey; version: number }
  | { kind: "unchanged"; field: FieldKey; version: number }
  | { kind: "stale"; field: FieldKey; version: number; value: Json }
  | { kind: "conflict"; field?: FieldKey; version: number; serverValue?: Json; text: string }
  | { kind: "refused"; text: string };

export const emptySheet = (): SheetState => ({ status: "open", version: 0, fields: {}, conflicts: [] });

/** JSON values compared by content (key order of objects ignored). */
export function sameValue(a: Json, b: Json): boolean {
  if (a === b) return true;
  if (a === null || b === null || typeof a !== "object" || typeof b !== "object") return false;
  if (Array.isArray(a) !== Array.isArray(b)) return false;
  if (Array.isArray(a) && Array.isArray(b)) return a.length === b.length && a.every((x, i) => sameValue(x, b[i]!));
  const ka = Object.keys(a as object).sort();
  const kb = Object.keys(b as object).sort();
  return ka.length === kb.length && ka.every((k, i) => k === kb[i] && sameValue((a as Record<string, Json>)[k]!, (b as Record<string, Json>)[k]!));
}

function write(state: SheetState, c: Extract<SheetChange, { kind: "set" | "resolve" }>, resolving: boolean): { state: SheetState; outcome: ChangeOutcome } {
  const current = state.fields[c.field];
  const version = (current?.version ?? 0) + 1;
  const fields = { ...state.fields, [c.field]: { value: c.value, version, deviceId: c.deviceId, seq: c.seq, changeKey: c.key } };
  const conflicts = resolving ? state.conflicts.filter((x) => x.field !== c.field) : state.conflicts;
  return { state: { ...state, version: state.version + 1, fields, conflicts }, outcome: { kind: "applied", field: c.field, version } };
}

/** One change against the sheet: the new state and what happened, in words where it matters. */
export function applyChange(state: SheetState, c: SheetChange): { state: SheetState; outcome: ChangeOutcome } {
  if (state.status === "submitted") return { state, outcome: { kind: "refused", text: "This sheet has been submitted; the chair can reopen it." } };

  if (c.kind === "submit") {
    if (state.conflicts.length) {
      return { state, outcome: { kind: "refused", text: `Resolve the ${state.conflicts.length === 1 ? "conflict" : `${state.conflicts.length} conflicts`} on this sheet before submitting it.` } };
    }
    const changedElsewhere = Object.entries(state.fields).filter(([field, f]) => f.deviceId !== c.deviceId && f.version > (c.seen[field] ?? 0));
    if (changedElsewhere.length) {
      return {
        state,
        outcome: { kind: "conflict", version: state.version, text: `Another device changed ${changedElsewhere.length === 1 ? "a field" : `${changedElsewhere.length} fields`} of this sheet since you last saw it; check the sheet and submit again.` },
      };
    }
    return { state: { ...state, status: "submitted", version: state.version + 1 }, outcome: { kind: "applied", version: state.version + 1 } };
  }

  const current = state.fields[c.field];
  const at = current?.version ?? 0;
  if (c.baseVersion > at) return { state, outcome: { kind: "refused", text: "That change names a version the server never had; reload the sheet." } };
  if (c.baseVersion === at) return write(state, c, c.kind === "resolve");

  // Made on an older version: current is defined here.
  const cur = current!;
  if (cur.deviceId === c.deviceId) {
    if (c.seq > cur.seq) return write(state, c, c.kind === "resolve");
    return { state, outcome: { kind: "stale", field: c.field, version: at, value: cur.value } };
  }
  if (sameValue(cur.value, c.value)) return { state, outcome: { kind: "unchanged", field: c.field, version: at } };
  const conflict: OpenConflict = { field: c.field, serverValue: cur.value, clientValue: c.value, serverDeviceId: cur.deviceId, clientDeviceId: c.deviceId, changeKey: c.key };
  const conflicts = [...state.conflicts.filter((x) => x.field !== c.field), conflict];
  return {
    state: { ...state, conflicts },
    outcome: { kind: "conflict", field: c.field, version: at, serverValue: cur.value, text: "This field was changed on another device meanwhile; choose which value to keep." },
  };
}

/** Reopening by the chair: the sheet takes changes again (conflicts and values are kept). */
export function reopenSheet(state: SheetState): SheetState {
  return state.status === "submitted" ? { ...state, status: "open", version: state.version + 1 } : state;
}

/** Applies changes in the order given; duplicates (keys in `seen`) return their stored outcome. */
export function applyBatch(
  state: SheetState,
  changes: readonly SheetChange[],
  seen: ReadonlyMap<string, ChangeOutcome> = new Map(),
): { state: SheetState; outcomes: { key: string; outcome: ChangeOutcome; duplicate: boolean }[] } {
  const known = new Map(seen);
  const outcomes: { key: string; outcome: ChangeOutcome; duplicate: boolean }[] = [];
  let s = state;
  for (const c of changes) {
    const before = known.get(c.key);
    if (before) {
      outcomes.push({ key: c.key, outcome: before, duplicate: true });
      continue;
    }
    const r = applyChange(s, c);
    s = r.state;
    known.set(c.key, r.outcome);
    outcomes.push({ key: c.key, outcome: r.outcome, duplicate: false });
  }
  return { state: s, outcomes };
}

/** The plain values of a sheet's fields, for scoring and display. */
export function fieldValues(state: SheetState): Record<FieldKey, Json> {
  return Object.fromEntries(Object.entries(state.fields).map(([k, f]) => [k, f.value]));
}

// Field names used by the judging screen.
export const markField = (criterionId: string) => `mark:${criterionId}`;
export const sectionCommentField = (sectionId: string) => `comment:${sectionId}`;
export const OVERALL_COMMENT_FIELD = "comment:overall";
export const DISCUSS_FIELD = "discuss";
export const SORT_FIELD = "sort";
export const RANK_FIELD = "rank";

/** The marks of a sheet's state, by criterion id (cleared marks left out). */
export function marksOfState(state: SheetState): Record<string, Mark | undefined> {
  return Object.fromEntries(Object.entries(state.fields).filter(([k, f]) => k.startsWith("mark:") && f.value !== null).map(([k, f]) => [k.slice(5), f.value as Mark]));
}
