// The tablet's IndexedDB store (components/judging/local-db.ts) on fake-indexeddb: seq numbers
// only go up and survive a reopen, writes of one field collapse, answers settle the outbox.
import "fake-indexeddb/auto";
import { afterEach, describe, expect, it } from "vitest";
import { applyAnswer, deviceId, JudgingDb, pendingRows, recordChange, saveSession, type SessionPayload } from "@/components/judging/local-db";

let n = 0;
const dbs: JudgingDb[] = [];
const open = (name = `test-${++n}`) => {
  const db = new JudgingDb(name);
  dbs.push(db);
  return db;
};
afterEach(async () => {
  for (const db of dbs.splice(0)) db.close();
});

const session = (version: number): SessionPayload => ({
  show: { slug: "s", name: "S", status: "judging", judgingOpen: true },
  me: { id: "j", seats: [] },
  judges: [{ id: "j", name: "J", categoryIds: ["c"] }],
  commentPolicy: "all",
  quickPhrases: [],
  sheets: [],
  categories: [],
  entries: [],
  states: [{ sheetRowId: null, entryId: "e", judgeUserId: "j", status: "open", version, fields: { discuss: { value: version > 1, version } }, conflicts: [] }],
});

describe("the tablet's store", () => {
  it("keeps one device id and an increasing seq across reopening", async () => {
    const name = `reopen-${++n}`;
    const a = open(name);
    const id = await deviceId(a);
    const r1 = await recordChange(a, "s", "j", "e", { kind: "set", field: "rank", value: 1 });
    const r2 = await recordChange(a, "s", "j", "e", { kind: "set", field: "discuss", value: true });
    a.close();
    const b = open(name);
    expect(await deviceId(b)).toBe(id);
    const r3 = await recordChange(b, "s", "j", "e", { kind: "set", field: "sort", value: "kept" });
    expect([r1.seq, r2.seq, r3.seq]).toEqual([1, 2, 3]);
    expect((await pendingRows(b, "s")).length).toBe(3);
  });

  it("collapses typing into one pending row and uses the server's field version", async () => {
    const db = open();
    await saveSession(db, "s", session(4));
    for (const text of ["L", "Lo", "Lovely"]) await recordChange(db, "s", "j", "e", { kind: "set", field: "comment:overall", value: text });
    const d = await recordChange(db, "s", "j", "e", { kind: "set", field: "discuss", value: false });
    const rows = await pendingRows(db, "s");
    expect(rows.map((r) => r.value)).toEqual(["Lovely", false]);
    expect(d.baseVersion).toBe(4);
  });

  it("settles an answer and never lets an older session roll a sheet back", async () => {
    const db = open();
    const row = await recordChange(db, "s", "j", "e", { kind: "set", field: "rank", value: 2 });
    const bad = await recordChange(db, "s", "j", "e", { kind: "set", field: "sort", value: "kept" });
    await applyAnswer(db, "s", {
      results: [
        { key: row.key, entryId: "e", duplicate: false, outcome: { kind: "applied" } },
        { key: bad.key, entryId: "e", duplicate: false, outcome: { kind: "refused", text: "This category has no sorting pass." } },
      ],
      sheets: [{ entryId: "e", judgeUserId: "j", status: "open", version: 7, fields: { rank: { value: 2, version: 1 } }, conflicts: [] }],
    });
    expect(await pendingRows(db, "s")).toEqual([]);
    expect(await db.outbox.get(bad.key)).toMatchObject({ state: "refused", text: "This category has no sorting pass." });
    await saveSession(db, "s", session(3));
    expect((await db.sheets.get("s|e|j"))?.version).toBe(7);
  });
});
