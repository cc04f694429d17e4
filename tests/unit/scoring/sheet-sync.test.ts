// Merging score-sheet changes from tablets: idempotent replays, out-of-order delivery from one
// device, concurrent edits from two devices (a conflict, never an overwrite), and the lock on submit.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { applyBatch, applyChange, emptySheet, fieldValues, reopenSheet, sameValue, type Json, type SheetChange, type SheetState } from "@/scoring/sheet-sync";

let n = 0;
const set = (deviceId: string, seq: number, field: string, value: Json, baseVersion: number): SheetChange => ({
  kind: "set",
  key: `${deviceId}-${seq}-${n++}`,
  deviceId,
  seq,
  field,
  value,
  baseVersion,
});

function run(changes: SheetChange[], from: SheetState = emptySheet()) {
  return applyBatch(from, changes);
}

describe("applying changes", () => {
  it("a change made on the current version is applied and raises the field's version", () => {
    const r = run([set("A", 1, "mark:design", { kind: "points", points: 8 }, 0), set("A", 2, "mark:design", { kind: "points", points: 9 }, 1)]);
    expect(r.outcomes.map((o) => o.outcome.kind)).toEqual(["applied", "applied"]);
    expect(r.state.fields["mark:design"]).toMatchObject({ version: 2, value: { kind: "points", points: 9 } });
    expect(r.state.version).toBe(2);
  });

  it("the same batch posted twice gives the same state, and the second time every change is a duplicate", () => {
    const batch = [set("A", 1, "mark:a", 5, 0), set("A", 2, "mark:b", 7, 0), set("A", 3, "comment:overall", "Crisp points", 0)];
    const once = run(batch);
    const seen = new Map(once.outcomes.map((o) => [o.key, o.outcome]));
    const twice = applyBatch(once.state, batch, seen);
    expect(twice.state).toEqual(once.state);
    expect(twice.outcomes.every((o) => o.duplicate)).toBe(true);
    expect(twice.outcomes.map((o) => o.outcome)).toEqual(once.outcomes.map((o) => o.outcome));
  });

  it("one device's edits arriving out of order end with its last edit (its sequence number decides)", () => {
    // Offline, the device edited the field three times, each on the version it last saw (0).
    const edits = [set("A", 1, "mark:a", 6, 0), set("A", 2, "mark:a", 7, 0), set("A", 3, "mark:a", 8, 0)];
    const reversed = run([...edits].reverse());
    expect(fieldValues(reversed.state)["mark:a"]).toBe(8);
    expect(reversed.outcomes.map((o) => o.outcome.kind)).toEqual(["applied", "stale", "stale"]);
    const inOrder = run(edits);
    expect(fieldValues(inOrder.state)["mark:a"]).toBe(8);
  });

  it("any order of one device's changes ends with the highest sequence number per field (property, fast-check)", () => {
    fc.assert(
      fc.property(
        fc.array(fc.record({ field: fc.constantFrom("mark:a", "mark:b", "discuss"), value: fc.integer({ min: 0, max: 10 }) }), { minLength: 1, maxLength: 12 }),
        fc.func(fc.integer()),
        (edits, order) => {
          const changes = edits.map((e, i) => set("A", i + 1, e.field, e.value, 0));
          const shuffled = [...changes].sort((x, y) => order(x.key) - order(y.key) || x.key.localeCompare(y.key));
          const s = run(shuffled).state;
          for (const field of new Set(edits.map((e) => e.field))) {
            const last = changes.filter((c) => c.kind === "set" && c.field === field).at(-1)!;
            expect(s.fields[field]!.value).toBe((last as { value: number }).value);
          }
          expect(s.conflicts).toEqual([]);
        },
      ),
      { numRuns: 300 },
    );
  });

  it("two devices editing the same field from the same version: the first stands, the second is a conflict", () => {
    const r = run([set("A", 1, "mark:a", 6, 0), set("B", 1, "mark:a", 9, 0)]);
    expect(r.outcomes[1]!.outcome).toMatchObject({ kind: "conflict", field: "mark:a", serverValue: 6 });
    expect(fieldValues(r.state)["mark:a"]).toBe(6);
    expect(r.state.conflicts).toEqual([{ field: "mark:a", serverValue: 6, clientValue: 9, serverDeviceId: "A", clientDeviceId: "B", changeKey: r.outcomes[1]!.key }]);

    // Resolving: a change made on the current version with kind "resolve" writes and clears it.
    const resolved = applyChange(r.state, { kind: "resolve", key: "B-r", deviceId: "B", seq: 2, field: "mark:a", value: 9, baseVersion: 1 });
    expect(resolved.outcome).toMatchObject({ kind: "applied", version: 2 });
    expect(resolved.state.conflicts).toEqual([]);
    expect(fieldValues(resolved.state)["mark:a"]).toBe(9);
  });

  it("two devices that agree on the value are not in conflict", () => {
    const r = run([set("A", 1, "discuss", true, 0), set("B", 1, "discuss", true, 0)]);
    expect(r.outcomes[1]!.outcome.kind).toBe("unchanged");
    expect(r.state.conflicts).toEqual([]);
  });

  it("a change naming a version the server never had is refused", () => {
    expect(applyChange(emptySheet(), set("A", 1, "mark:a", 1, 3)).outcome.kind).toBe("refused");
  });
});

describe("submitting", () => {
  it("locks the sheet; later changes are refused until the chair reopens it", () => {
    const s = run([set("A", 1, "mark:a", 5, 0)]).state;
    const submitted = applyChange(s, { kind: "submit", key: "A-s", deviceId: "A", seq: 2, seen: {} });
    expect(submitted.outcome.kind).toBe("applied");
    expect(submitted.state.status).toBe("submitted");
    expect(applyChange(submitted.state, set("A", 3, "mark:a", 6, 1)).outcome).toEqual({ kind: "refused", text: "This sheet has been submitted; the chair can reopen it." });
    const reopened = reopenSheet(submitted.state);
    expect(reopened.status).toBe("open");
    expect(applyChange(reopened, set("A", 4, "mark:a", 6, 1)).outcome.kind).toBe("applied");
  });

  it("is refused while a conflict is open, and is a conflict when another device wrote after this one last looked", () => {
    const conflicted = run([set("A", 1, "mark:a", 6, 0), set("B", 1, "mark:a", 9, 0)]).state;
    expect(applyChange(conflicted, { kind: "submit", key: "k1", deviceId: "A", seq: 2, seen: { "mark:a": 1 } }).outcome.kind).toBe("refused");

    const other = run([set("A", 1, "mark:a", 6, 0), set("B", 1, "mark:b", 3, 0)]).state;
    expect(applyChange(other, { kind: "submit", key: "k2", deviceId: "A", seq: 2, seen: { "mark:a": 1 } }).outcome.kind).toBe("conflict");
    expect(applyChange(other, { kind: "submit", key: "k3", deviceId: "A", seq: 2, seen: { "mark:a": 1, "mark:b": 1 } }).outcome.kind).toBe("applied");
  });
});

describe("sameValue", () => {
  it("compares JSON by content", () => {
    expect(sameValue({ kind: "points", points: 8 }, { points: 8, kind: "points" })).toBe(true);
    expect(sameValue([1, 2], [1, 2])).toBe(true);
    expect(sameValue([1, 2], [2, 1])).toBe(false);
    expect(sameValue(null, {})).toBe(false);
  });
});
