// The tablet's own copy of a judging session in IndexedDB (dexie): the session payload, each
// sheet as the server last told us, the outbox of changes, this device's id and seq counter, and
// the entries' web photos as blobs. Everything the judging screen shows is read from here first,
// so a reload, a lost Wi-Fi or a flat battery loses nothing.
import { Dexie, type Table } from "dexie";
import { newerSheet, replacedBy, rowFor, settle, type LocalChange, type OutboxRow, type ServerSheet, type SyncResultRow } from "./outbox";

export type StoredSession = { slug: string; payload: SessionPayload; fetchedAt: string };
export type StoredSheet = ServerSheet & { id: string; slug: string };
export type StoredPhoto = { id: string; slug: string; blob: Blob };
export type Meta = { key: string; value: unknown };

/** The session as GET /api/shows/[slug]/judging/session sends it (db/queries/judging.ts). */
export type SessionPayload = {
  show: { slug: string; name: string; status: string; judgingOpen: boolean };
  me: { id: string; seats: { panelId: string; panelName: string; day: string; room: string; role: "judge" | "scribe" }[] };
  judges: { id: string; name: string; categoryIds: string[] }[];
  commentPolicy: "all" | "placed" | "none";
  quickPhrases: string[];
  sheets: { id: string; name: string; sheet: import("@/scoring/score-sheets").ScoreSheet }[];
  /** `precedence` and `sessionId` (the panel judging it) order the list; a copy saved before they existed lacks them. */
  categories: { id: string; code: string; name: string; method: "points" | "sort_then_points" | "sort_then_rank" | "rank"; sheetId: string | null; precedence?: number; sessionId?: string | null }[];
  entries: SessionEntry[];
  states: (ServerSheet & { sheetRowId: string | null })[];
};
export type SessionEntry = {
  id: string;
  entryNumber: number;
  categoryId: string;
  title?: string;
  size?: string;
  techniques?: string[];
  quiltingMethod?: string;
  pattern?: string;
  statement?: string;
  division?: string;
  photos: { id: string; view: string; widthPx: number; heightPx: number; webUrl: string; thumbUrl: string }[];
};

export class JudgingDb extends Dexie {
  sessions!: Table<StoredSession, string>;
  sheets!: Table<StoredSheet, string>;
  outbox!: Table<OutboxRow, string>;
  meta!: Table<Meta, string>;
  photos!: Table<StoredPhoto, string>;

  constructor(name = "ribbonry-judging", options?: ConstructorParameters<typeof Dexie>[1]) {
    super(name, options);
    this.version(1).stores({
      sessions: "slug",
      sheets: "id, slug",
      outbox: "key, slug, seq",
      meta: "key",
      photos: "id, slug",
    });
  }
}

let shared: JudgingDb | null = null;
/** The browser's database, opened on first use (never on the server). */
export function localDb(): JudgingDb {
  shared ??= new JudgingDb();
  return shared;
}

export const sheetId = (slug: string, entryId: string, judgeId: string) => `${slug}|${entryId}|${judgeId}`;

const randomId = () => (typeof crypto !== "undefined" && "randomUUID" in crypto ? crypto.randomUUID() : `${Date.now().toString(36)}-${Math.random().toString(36).slice(2)}`);

/** This tablet's id, made once and kept. */
export async function deviceId(db: JudgingDb): Promise<string> {
  return db.transaction("rw", db.meta, async () => {
    const row = await db.meta.get("deviceId");
    if (typeof row?.value === "string") return row.value;
    const id = `tablet-${randomId()}`;
    await db.meta.put({ key: "deviceId", value: id });
    return id;
  });
}

export async function getMeta<T>(db: JudgingDb, key: string): Promise<T | undefined> {
  return (await db.meta.get(key))?.value as T | undefined;
}
export async function setMeta(db: JudgingDb, key: string, value: unknown) {
  await db.meta.put({ key, value });
}

/** Stores a fresh session; a sheet already newer here (a later sync answer) is kept. */
export async function saveSession(db: JudgingDb, slug: string, payload: SessionPayload) {
  await db.transaction("rw", db.sessions, db.sheets, async () => {
    await db.sessions.put({ slug, payload, fetchedAt: new Date().toISOString() });
    await putSheets(db, slug, payload.states);
  });
}

async function putSheets(db: JudgingDb, slug: string, sheets: readonly ServerSheet[]) {
  const ids = sheets.map((s) => sheetId(slug, s.entryId, s.judgeUserId));
  const current = await db.sheets.bulkGet(ids);
  await db.sheets.bulkPut(
    sheets.map((s, i) => {
      const plain: ServerSheet = { entryId: s.entryId, judgeUserId: s.judgeUserId, status: s.status, version: s.version, fields: s.fields, conflicts: s.conflicts };
      return { ...newerSheet(current[i], plain), id: ids[i]!, slug };
    }),
  );
}

/**
 * Records a change the moment it is made: the next seq (kept in meta, in the same transaction),
 * the row with the field version last seen from the server, older pending writes of the same
 * field dropped. Returns the row.
 */
export async function recordChange(db: JudgingDb, slug: string, judgeId: string, entryId: string, change: LocalChange): Promise<OutboxRow> {
  return db.transaction("rw", db.meta, db.sheets, db.outbox, async () => {
    const seq = (((await db.meta.get("seq"))?.value as number | undefined) ?? 0) + 1;
    await db.meta.put({ key: "seq", value: seq });
    const sheet = await db.sheets.get(sheetId(slug, entryId, judgeId));
    const row = rowFor(sheet, change, { key: randomId(), seq, clientAt: new Date().toISOString(), slug, judgeId, entryId });
    const rows = await db.outbox.where("slug").equals(slug).toArray();
    await db.outbox.bulkDelete(replacedBy(rows, row));
    await db.outbox.add(row);
    return row;
  });
}

/** Applies a sync answer: settled rows go, refusals stay with their words, sheets are updated. */
export async function applyAnswer(db: JudgingDb, slug: string, answer: { results: SyncResultRow[]; sheets: ServerSheet[] }) {
  const { remove, refuse } = settle(answer.results);
  await db.transaction("rw", db.outbox, db.sheets, async () => {
    await db.outbox.bulkDelete(remove);
    for (const r of refuse) await db.outbox.update(r.key, { state: "refused", text: r.text });
    await putSheets(db, slug, answer.sheets);
  });
}

/** Marks rows refused with one reason (a batch the server turned away as a whole). */
export async function refuseRows(db: JudgingDb, keys: readonly string[], text: string) {
  await db.transaction("rw", db.outbox, async () => {
    for (const key of keys) await db.outbox.update(key, { state: "refused", text });
  });
}

export async function dismissRow(db: JudgingDb, key: string) {
  await db.outbox.delete(key);
}

export async function pendingRows(db: JudgingDb, slug: string): Promise<OutboxRow[]> {
  return (await db.outbox.where("slug").equals(slug).toArray()).filter((r) => r.state === "pending").sort((a, b) => a.seq - b.seq);
}
