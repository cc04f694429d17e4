// Who sees an entry photo through /api/photos/[photoId]/[size]: the owner and the show's chair
// always; intake once the entry is sent; a judge or scribe only for an entry of their own
// sessions; nobody else, drafts included. A refusal is the same 404 as a missing photo, so an id
// confirms nothing (OWASP ASVS 4.0, 4.2.1: access to a resource by id is checked per user).
import { randomUUID } from "node:crypto";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { entryPhotos, judgingPanels, panelCategories, panelMembers } from "@/db/schema";
import { GET as photoRoute } from "@/app/api/photos/[photoId]/[size]/route";
import { ensureBucket, putObject } from "@/storage/s3";
import { grantRole, makeCategory, makeEntry, makeShow, makeUser, type TestUser } from "../../helpers/factories";
import { pngOf } from "../../helpers/photo-fixtures";

let owner: TestUser, chair: TestUser, intake: TestUser, judgeIn: TestUser, judgeOut: TestUser, scribeIn: TestUser, otherEntrant: TestUser, otherChair: TestUser;
const photo = { draft: "", submitted: "" };

async function photoOf(entryId: string) {
  const key = `tests/photo-access/${randomUUID()}/web.png`;
  await putObject(key, await pngOf(40, 30), "image/png");
  const [row] = await db.insert(entryPhotos).values({ entryId, view: "full", storageKey: key, webKey: key, thumbKey: key, widthPx: 40, heightPx: 30, bytes: 100, contentType: "image/png" }).returning({ id: entryPhotos.id });
  return row!.id;
}

async function fetchAs(u: TestUser, photoId: string) {
  const res = await photoRoute(new Request(`http://t/api/photos/${photoId}/web`, { headers: { cookie: u.cookie } }), { params: Promise.resolve({ photoId, size: "web" }) });
  return { status: res.status, body: res.status === 200 ? "<bytes>" : await res.text() };
}

beforeAll(async () => {
  await ensureBucket();
  const show = await makeShow({ status: "judging" });
  const other = await makeShow();
  const users = await Promise.all(["Owner", "Chair", "Intake", "Judge In", "Judge Out", "Scribe In", "Other Entrant", "Other Chair"].map((name) => makeUser({ name })));
  [owner, chair, intake, judgeIn, judgeOut, scribeIn, otherEntrant, otherChair] = users as [TestUser, TestUser, TestUser, TestUser, TestUser, TestUser, TestUser, TestUser];
  await grantRole(chair.id, show.id, "chair");
  await grantRole(intake.id, show.id, "intake");
  for (const u of [judgeIn, judgeOut]) await grantRole(u.id, show.id, "judge");
  await grantRole(scribeIn.id, show.id, "scribe");
  await grantRole(otherChair.id, other.id, "chair");
  const [mine, elsewhere] = [await makeCategory(show.id, { code: "A" }), await makeCategory(show.id, { code: "B" })];
  for (const [name, cat, members] of [["Panel In", mine, [[judgeIn, "judge"], [scribeIn, "scribe"]]], ["Panel Out", elsewhere, [[judgeOut, "judge"]]]] as const) {
    const [p] = await db.insert(judgingPanels).values({ showId: show.id, name }).returning();
    await db.insert(panelMembers).values(members.map(([u, role]) => ({ panelId: p!.id, userId: u.id, role })));
    await db.insert(panelCategories).values({ panelId: p!.id, categoryId: cat.id });
  }
  // A draft still says which category it would fall in; it is nobody's business but the owner's and the chair's.
  const draft = await makeEntry(show.id, owner.id, { status: "draft", entryNumber: null, categoryId: mine.id });
  const sent = await makeEntry(show.id, owner.id, { status: "received", categoryId: mine.id, categoryState: "decided", paidAt: new Date() });
  photo.draft = await photoOf(draft.id);
  photo.submitted = await photoOf(sent.id);
});

describe("entry photos by role", () => {
  const table: [string, () => TestUser, "draft" | "submitted", 200 | 404][] = [
    ["the owner, a draft", () => owner, "draft", 200],
    ["the owner, a sent entry", () => owner, "submitted", 200],
    ["the chair, a draft", () => chair, "draft", 200],
    ["the chair, a sent entry", () => chair, "submitted", 200],
    ["intake, a draft", () => intake, "draft", 404],
    ["intake, a sent entry", () => intake, "submitted", 200],
    ["a judge of the entry's session", () => judgeIn, "submitted", 200],
    ["a judge of the entry's session, a draft", () => judgeIn, "draft", 404],
    ["a scribe of the entry's session", () => scribeIn, "submitted", 200],
    ["a judge of another session", () => judgeOut, "submitted", 404],
    ["another entrant", () => otherEntrant, "submitted", 404],
    ["another show's chair", () => otherChair, "submitted", 404],
  ];
  for (const [who, user, which, status] of table) {
    it(`${who}: ${status}`, async () => {
      const got = await fetchAs(user(), photo[which]);
      expect(got.status).toBe(status);
      // A refusal reads exactly like a photo that does not exist.
      if (status === 404) expect(got).toEqual(await fetchAs(user(), randomUUID()));
    });
  }
});
