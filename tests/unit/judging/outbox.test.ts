// The tablet's outbox rules (components/judging/outbox.ts) against the server's merge rules
// (scoring/sheet-sync.ts): what the judge sees locally is what the server ends up with.
import { describe, expect, it } from "vitest";
import { batches, marksOf, newerSheet, replacedBy, rowFor, settle, submitBlocker, viewSheet, wireChange, type OutboxRow, type ServerSheet, type SyncResultRow } from "@/components/judging/outbox";
import { applyBatch, emptySheet, type SheetChange, type SheetState } from "@/scoring/sheet-sync";

const SLUG = "show";
const J = "judge-1";
const E = "entry-1";
let seq = 0;
const stamp = () => ({ key: `key-${++seq}-abcdefgh`, seq, clientAt: "2027-03-11T10:00:00.000Z", slug: SLUG, judgeId: J, entryId: E });

/** The server's answer shape from a SheetState (as db/queries/judging.ts sheetView sends it). */
const toServer = (s: SheetState): ServerSheet => ({
  entryId: E,
  judgeUserId: J,
  status: s.status,
  version: s.version,
  fields: Object.fromEntries(Object.entries(s.fields).map(([k, f]) => [k, { value: f.value, version: f.version }])),
  conflicts: s.conflicts.map((c) => ({ field: c.field, serverValue: c.serverValue, clientValue: c.clientValue })),
});

/** Sends rows to an in-memory server the way the sync route does. */
function send(state: SheetState, rows: OutboxRow[], device: string) {
  const changes = rows.map((r) => ({ ...wireChange(r), deviceId: device }) as SheetChange);
  const r = applyBatch(state, changes);
  return { state: r.state, outcomes: r.outcomes, results: r.outcomes.map((o) => ({ ...o, entryId: E, outcome: o.outcome as SyncResultRow["outcome"] })) };
}

describe("outbox rows", () => {
  it("names the field version last seen from the server as baseVersion (rule 2)", () => {
    const sheet: ServerSheet = { entryId: E, judgeUserId: J, status: "open", version: 3, fields: { "mark:impact": { value: { kind: "points", points: 12 }, version: 2 } }, conflicts: [] };
    expect(rowFor(sheet, { kind: "set", field: "mark:impact", value: { kind: "points", points: 15 } }, stamp()).baseVersion).toBe(2);
    expect(rowFor(sheet, { kind: "set", field: "mark:colour", value: { kind: "na" } }, stamp()).baseVersion).toBe(0);
    expect(rowFor(undefined, { kind: "submit" }, stamp()).seen).toEqual({});
    expect(rowFor(sheet, { kind: "submit" }, stamp()).seen).toEqual({ "mark:impact": 2 });
  });

  it("replaces older pending writes of the same field only", () => {
    const a = rowFor(undefined, { kind: "set", field: "comment:overall", value: "Lov" }, stamp());
    const b = rowFor(undefined, { kind: "set", field: "mark:impact", value: null }, stamp());
    const refused = { ...rowFor(undefined, { kind: "set", field: "comment:overall", value: "x" }, stamp()), state: "refused" as const };
    const c = rowFor(undefined, { kind: "set", field: "comment:overall", value: "Lovely" }, stamp());
    expect(replacedBy([a, b, refused], c)).toEqual([a.key]);
    expect(replacedBy([a], rowFor(undefined, { kind: "submit" }, stamp()))).toEqual([]);
  });

  it("lays pending rows over the server's values and says where they are", () => {
    const sheet: ServerSheet = { entryId: E, judgeUserId: J, status: "open", version: 1, fields: { discuss: { value: false, version: 1 } }, conflicts: [] };
    expect(viewSheet(sheet, [], E, J).sync).toBe("synced");
    const row = rowFor(sheet, { kind: "set", field: "discuss", value: true }, stamp());
    const v = viewSheet(sheet, [row], E, J);
    expect(v.values.discuss).toBe(true);
    expect(v.sync).toBe("saved");
    expect(v.pending).toBe(1);
    expect(viewSheet(sheet, [{ ...row, state: "refused", text: "no" }], E, J)).toMatchObject({ sync: "refused", values: { discuss: false } });
    expect(viewSheet(sheet, [rowFor(sheet, { kind: "submit" }, stamp())], E, J).locked).toBe(true);
    expect(viewSheet(sheet, [row], "other-entry", J).pending).toBe(0);
  });

  it("hides a conflict once a Keep choice is waiting to be sent", () => {
    const sheet: ServerSheet = { entryId: E, judgeUserId: J, status: "open", version: 4, fields: { rank: { value: 2, version: 2 } }, conflicts: [{ field: "rank", serverValue: 2, clientValue: 3 }] };
    expect(viewSheet(sheet, [], E, J).sync).toBe("conflict");
    const keep = rowFor(sheet, { kind: "resolve", field: "rank", value: 3 }, stamp());
    expect(keep.baseVersion).toBe(2);
    expect(viewSheet(sheet, [keep], E, J)).toMatchObject({ sync: "saved", conflicts: [], values: { rank: 3 } });
  });

  it("settles answers: applied, unchanged, stale, duplicate and field conflicts go; refusals stay with their words", () => {
    const out = settle([
      { key: "a", entryId: E, duplicate: false, outcome: { kind: "applied" } },
      { key: "b", entryId: E, duplicate: false, outcome: { kind: "stale", field: "x" } },
      { key: "c", entryId: E, duplicate: true, outcome: { kind: "refused", text: "old" } },
      { key: "d", entryId: E, duplicate: false, outcome: { kind: "conflict", field: "x", text: "choose" } },
      { key: "e", entryId: E, duplicate: false, outcome: { kind: "conflict", text: "Another device changed a field" } },
      { key: "f", entryId: E, duplicate: false, outcome: { kind: "refused", text: "This sheet has been submitted" } },
      { key: "g", entryId: E, duplicate: false, outcome: { kind: "unchanged", field: "x" } },
    ]);
    expect(out.remove).toEqual(["a", "b", "c", "d", "g"]);
    expect(out.refuse).toEqual([
      { key: "e", text: "Another device changed a field" },
      { key: "f", text: "This sheet has been submitted" },
    ]);
  });

  it("never rolls a sheet back to an older copy", () => {
    const older: ServerSheet = { entryId: E, judgeUserId: J, status: "open", version: 2, fields: {}, conflicts: [] };
    const newer = { ...older, version: 5 };
    expect(newerSheet(newer, older)).toBe(newer);
    expect(newerSheet(older, newer)).toBe(newer);
    expect(newerSheet(undefined, older)).toBe(older);
  });

  it("batches pending rows per judge in seq order", () => {
    const r1 = { ...rowFor(undefined, { kind: "set", field: "rank", value: 1 }, stamp()), judgeId: "b" };
    const r2 = rowFor(undefined, { kind: "set", field: "rank", value: 2 }, stamp());
    const r3 = { ...rowFor(undefined, { kind: "set", field: "discuss", value: true }, stamp()), judgeId: "b" };
    const refused = { ...rowFor(undefined, { kind: "set", field: "sort", value: "kept" }, stamp()), state: "refused" as const };
    expect(batches([r3, r2, refused, r1]).map((b) => [b.judgeId, b.rows.map((r) => r.seq)])).toEqual([
      ["b", [r1.seq, r3.seq]],
      [J, [r2.seq]],
    ]);
  });
});

describe("tablet and server agree", () => {
  it("two offline edits of one field, sent later in one batch, end with the last edit (rules 2 and 3)", () => {
    let server = emptySheet();
    let local = toServer(server);
    const a = rowFor(local, { kind: "set", field: "mark:impact", value: { kind: "points", points: 12 } }, stamp());
    const b = rowFor(local, { kind: "set", field: "mark:impact", value: { kind: "points", points: 18 } }, stamp());
    const r = send(server, [a, b], "tablet-a");
    server = r.state;
    expect(settle(r.results).remove).toEqual([a.key, b.key]);
    local = toServer(server);
    expect(viewSheet(local, [], E, J).values["mark:impact"]).toEqual({ kind: "points", points: 18 });
  });

  it("a lost answer and a resend change nothing (rule 1)", () => {
    const row = rowFor(toServer(emptySheet()), { kind: "set", field: "discuss", value: true }, stamp());
    const first = send(emptySheet(), [row], "tablet-a");
    const again = applyBatch(first.state, [{ ...wireChange(row), deviceId: "tablet-a" } as SheetChange], new Map([[row.key, first.outcomes[0]!.outcome]]));
    expect(again.state).toEqual(first.state);
    expect(again.outcomes[0]!.duplicate).toBe(true);
  });

  it("another device's value meets ours: a conflict, then Keep mine resolves it and submit works (rules 4 and 5)", () => {
    const start = toServer(emptySheet());
    const theirs = rowFor(start, { kind: "set", field: "mark:colour", value: { kind: "points", points: 6 } }, stamp());
    let server = send(emptySheet(), [theirs], "tablet-b").state;
    const mine = rowFor(start, { kind: "set", field: "mark:colour", value: { kind: "points", points: 9 } }, stamp());
    const r = send(server, [mine], "tablet-a");
    server = r.state;
    expect(r.results[0]!.outcome).toMatchObject({ kind: "conflict", field: "mark:colour" });
    expect(settle(r.results).remove).toEqual([mine.key]);
    let local = toServer(server);
    const view = viewSheet(local, [], E, J);
    expect(view.sync).toBe("conflict");
    expect(view.values["mark:colour"]).toEqual({ kind: "points", points: 6 });
    const keep = rowFor(local, { kind: "resolve", field: "mark:colour", value: view.conflicts[0]!.clientValue }, stamp());
    server = send(server, [keep], "tablet-a").state;
    local = toServer(server);
    const submit = rowFor(local, { kind: "submit" }, stamp());
    const done = send(server, [submit], "tablet-a");
    expect(done.results[0]!.outcome.kind).toBe("applied");
    expect(toServer(done.state)).toMatchObject({ status: "submitted", conflicts: [], fields: { "mark:colour": { value: { kind: "points", points: 9 } } } });
  });
});

describe("marks and submitting", () => {
  it("reads marks from values and says what is missing before a submit", () => {
    expect(marksOf({ "mark:impact": { kind: "points", points: 3 }, "mark:colour": null, discuss: true })).toEqual({ impact: { kind: "points", points: 3 } });
    expect(submitBlocker("points", {}, false, 2)).toBe("Score the 2 criteria still open first.");
    expect(submitBlocker("points", {}, true, 0)).toBeNull();
    expect(submitBlocker("sort_then_points", {}, true, 0)).toBe("Choose Keep or Set aside first.");
    expect(submitBlocker("sort_then_points", { sort: "set_aside" }, false, 8)).toBeNull();
    expect(submitBlocker("rank", {}, false, 8)).toBe("Give a rank first.");
    expect(submitBlocker("sort_then_rank", { sort: "kept", rank: 2 }, false, 8)).toBeNull();
  });
});
