// What goes out once results are published, and nothing before: the public results (awarded
// entries only, names only with consent), public photos, each entrant's own results and critique,
// and the announcement mails with the critique sheets attached; unpublishing takes it all back,
// and a corrected publication mails only the entrants whose results changed.
import { describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { db } from "@/db/client";
import { entrantProfiles, entryPhotos, judgeSheets, judgingPanels, panelCategories, panelMembers, resultMails, scoreSheets, showSettings } from "@/db/schema";
import { myEntriesByShow } from "@/db/queries/entrant-shows";
import { critiqueData, myResults, publicResultPhoto, publicResults } from "@/db/queries/published-results";
import { overridePlacement } from "@/db/queries/result-changes";
import { publishResults, unpublishResults } from "@/db/queries/results";
import { DEMO_SHEET } from "@/db/seed/demo-judging";
import { critiqueBytes } from "@/exports/critique-pdf";
import { env } from "@/lib/env";
import { sendResultMails } from "@/lib/result-mails";
import { sheetTotal, type Mark } from "@/scoring/score-sheets";
import { emptySheet } from "@/scoring/sheet-sync";
import { grantRole, makeCategory, makeEntry, makeShow, makeUser } from "../../helpers/factories";
import { listMail, readMail } from "../../helpers/mailbox";
import { readPdf } from "../../unit/exports/read-back";
import { viewerOf } from "../entries/helpers";

// Every judge gives the same points per criterion, times a factor per entry, so totals differ.
const BASE: Record<string, number> = { impact: 18, colour: 9, composition: 13, fabric: 9, piecing: 13, applique: 9, quilting: 13 };
function marksFor(scale: number): Record<string, Mark> {
  const marks: Record<string, Mark> = Object.fromEntries(Object.entries(BASE).map(([id, p]) => [id, { kind: "points", points: Math.round(p * scale) } as Mark]));
  marks.edges = { kind: "word", level: "Good" };
  return marks;
}
function stateOf(marks: Record<string, Mark>, comments: Record<string, string>) {
  const field = (value: unknown) => ({ value, version: 1, deviceId: "test", seq: 1, changeKey: crypto.randomUUID() });
  const fields = { ...emptySheet().fields } as Record<string, unknown>;
  for (const [id, m] of Object.entries(marks)) fields[`mark:${id}`] = field(m);
  for (const [k, v] of Object.entries(comments)) fields[`comment:${k}`] = field(v);
  return { ...emptySheet(), status: "submitted" as const, fields } as never;
}

/** A judged show: two judges, one category, three entries (two by Wren who consents, one by Sol who does not). */
async function judgedShow() {
  const show = await makeShow({ status: "judging" });
  const [chairUser, a, b, wren, sol] = await Promise.all([makeUser({ name: "Chair Ida" }), makeUser({ name: "Judge Ash" }), makeUser({ name: "Judge Birch" }), makeUser({ name: "Wren Halloway" }), makeUser({ name: "Sol Marten" })]);
  await grantRole(chairUser.id, show.id, "chair");
  await db.insert(showSettings).values({ showId: show.id }).onConflictDoNothing();
  await db.insert(entrantProfiles).values([
    { userId: wren.id, displayName: "Wren Halloway", publishNameConsent: true },
    { userId: sol.id, displayName: "Sol Marten", publishNameConsent: false },
  ]);
  const [sheet] = await db.insert(scoreSheets).values({ showId: show.id, name: DEMO_SHEET.name, sheet: DEMO_SHEET.sheet, isDefault: true }).returning();
  const cat = await makeCategory(show.id, { code: "20", name: "Art quilts" });
  const [panel] = await db.insert(judgingPanels).values({ showId: show.id, name: "P" }).returning();
  await db.insert(panelMembers).values([{ panelId: panel!.id, userId: a.id, role: "judge" }, { panelId: panel!.id, userId: b.id, role: "judge" }]);
  await db.insert(panelCategories).values({ panelId: panel!.id, categoryId: cat.id });
  // Places with three entries and the defaults: 1st, 2nd, 3rd. Give entry 3 a low score so a size
  // rule (1st only) can leave it and entry 2 unplaced.
  const owners = [wren, sol, wren];
  const scales = [1, 0.9, 0.6];
  const entries = [];
  for (const [i, owner] of owners.entries()) {
    const e = await makeEntry(show.id, owner.id, { categoryId: cat.id, categoryState: "decided", paidAt: new Date(), title: `Tide pool ${i + 1}` });
    entries.push(e);
    for (const [j, judge] of [a, b].entries()) {
      const marks = marksFor(scales[i]!);
      const total = sheetTotal(DEMO_SHEET.sheet, marks);
      await db.insert(judgeSheets).values({
        showId: show.id, entryId: e.id, judgeUserId: judge.id, scoreSheetId: sheet!.id, status: "submitted",
        state: stateOf(marks, { overall: `${e.title}: the curves sit flat (note ${j + 1}).`, workmanship: `Workmanship note for ${e.title}.` }),
        total: { total: total.total, complete: true, percent: total.percent },
      });
    }
    await db.insert(entryPhotos).values({ entryId: e.id, view: "full", storageKey: `tests/results/${e.id}/full.jpg`, widthPx: 1200, heightPx: 900, bytes: 1000, contentType: "image/jpeg" });
    await db.insert(entryPhotos).values({ entryId: e.id, view: "detail", storageKey: `tests/results/${e.id}/detail.jpg`, widthPx: 1200, heightPx: 900, bytes: 1000, contentType: "image/jpeg" });
  }
  const photoOf = async (entryId: string, view: "full" | "detail") =>
    (await db.select({ id: entryPhotos.id, view: entryPhotos.view }).from(entryPhotos).where(eq(entryPhotos.entryId, entryId))).find((p) => p.view === view)!.id;
  return { show, chair: await viewerOf(chairUser), wren: await viewerOf(wren), sol: await viewerOf(sol), wrenUser: wren, solUser: sol, entries, photoOf };
}

const pdfText = async (bytes: Buffer) => (await readPdf(async (out) => void out.end(bytes))).map((p) => p.text);
const mailsTo = async (email: string) => (await listMail(env.MAIL_WEB_URL)).filter((m) => m.to.includes(email.toLowerCase()));

describe("nothing leaks before publishing", () => {
  it("the public page, the photos, My entries and the critique say nothing until the chair publishes", async () => {
    const w = await judgedShow();
    const page = await publicResults(w.show.slug);
    expect(page?.published).toBeNull();
    await expect(publicResultPhoto(w.show.slug, await w.photoOf(w.entries[0]!.id, "full"))).rejects.toMatchObject({ status: 404 });
    expect((await myResults(w.wren, [w.show.id])).size).toBe(0);
    const mine = (await myEntriesByShow(w.wren)).find((g) => g.show.id === w.show.id)!;
    expect(mine.entries.map((e) => e.result)).toEqual([null, null]);
    await expect(critiqueData(w.entries[0]!.id, w.wren)).rejects.toMatchObject({ status: 404 });
    // The mailer refuses to send for a show that has not published.
    expect(await sendResultMails(crypto.randomUUID())).toEqual({ sent: 0, failed: 0, alreadySent: 0, unchanged: 0 });
  });
});

describe("after publishing", () => {
  it("shows the awarded entries with names only where the entrant consented, and their full photos only", async () => {
    const w = await judgedShow();
    await publishResults(w.chair, w.show.slug, { reason: "" });
    const page = (await publicResults(w.show.slug))!;
    const cards = page.published!.categories[0]!.cards;
    expect(cards.map((c) => [c.entryNumber, c.placeLabel, c.ribbon?.name])).toEqual([
      [w.entries[0]!.entryNumber, "1st", "Blue"],
      [w.entries[1]!.entryNumber, "2nd", "Red"],
      [w.entries[2]!.entryNumber, "3rd", "Yellow"],
    ]);
    expect(cards.map((c) => c.entrantName)).toEqual(["Wren Halloway", null, "Wren Halloway"]);
    expect(JSON.stringify(page)).not.toContain("Sol Marten");
    // No scores, no judges and no comments on the public side.
    expect(JSON.stringify(page)).not.toMatch(/Judge Ash|curves sit flat|mean|total/i);
    await expect(publicResultPhoto(w.show.slug, await w.photoOf(w.entries[0]!.id, "full"))).resolves.toMatchObject({ view: "full" });
    await expect(publicResultPhoto(w.show.slug, await w.photoOf(w.entries[0]!.id, "detail"))).rejects.toMatchObject({ status: 404 });
    await expect(publicResultPhoto("another-show", await w.photoOf(w.entries[0]!.id, "full"))).rejects.toMatchObject({ status: 404 });

    // The show does not publish names: nobody is named, whatever they consented to.
    await db.update(showSettings).set({ publishNames: false }).where(eq(showSettings.showId, w.show.id));
    expect((await publicResults(w.show.slug))!.published!.categories[0]!.cards.map((c) => c.entrantName)).toEqual([null, null, null]);
  });

  it("leaves unplaced entries off the public page and their photos private", async () => {
    const w = await judgedShow();
    await overridePlacement(w.chair, w.show.slug, { entryId: w.entries[2]!.id, place: null, honorableMention: false, reason: "Binding came loose at intake; judges withheld the ribbon." });
    await publishResults(w.chair, w.show.slug, { reason: "" });
    const cards = (await publicResults(w.show.slug))!.published!.categories[0]!.cards;
    expect(cards.map((c) => c.entryNumber)).toEqual([w.entries[0]!.entryNumber, w.entries[1]!.entryNumber]);
    await expect(publicResultPhoto(w.show.slug, await w.photoOf(w.entries[2]!.id, "full"))).rejects.toMatchObject({ status: 404 });
    const mine = await myResults(w.wren, [w.show.id]);
    expect(mine.get(w.entries[2]!.id)?.words).toBe("No ribbon");
  });

  it("gives each entrant their own critique: one page per judge, this entry's marks and comments, no names", async () => {
    const w = await judgedShow();
    await publishResults(w.chair, w.show.slug, { reason: "" });
    const data = await critiqueData(w.entries[0]!.id, w.wren);
    expect(data.judges.map((j) => j.label)).toEqual(["Judge 1", "Judge 2"]);
    const pages = await pdfText(await critiqueBytes(data));
    expect(pages).toHaveLength(2);
    const all = pages.join(" ");
    expect(all).toContain(`Entry ${w.entries[0]!.entryNumber}: Tide pool 1`);
    expect(all).toContain("Tide pool 1: the curves sit flat (note 1).");
    expect(all).toContain("Tide pool 1: the curves sit flat (note 2).");
    expect(all).toContain("Workmanship note for Tide pool 1.");
    // Marks scaled 1.0: 18 of 20 for visual impact (the points given), the total of the demo sheet.
    expect(all).toContain(`Total: ${sheetTotal(DEMO_SHEET.sheet, marksFor(1)).total}`);
    expect(all).not.toMatch(/Tide pool 2|Tide pool 3|Judge Ash|Judge Birch|Sol Marten/);
    // Another entrant's entry is "not found", and so is one's own once the policy withholds it.
    await expect(critiqueData(w.entries[1]!.id, w.wren)).rejects.toMatchObject({ status: 404 });
    await expect(critiqueData(w.entries[0]!.id, w.sol)).rejects.toMatchObject({ status: 404 });
    const mine = await myResults(w.wren, [w.show.id]);
    expect(mine.get(w.entries[0]!.id)).toMatchObject({ words: "1st place (Blue)", critique: { available: true, url: `/api/entries/${w.entries[0]!.id}/critique` } });
  });

  it("follows the show's comment policy and critique fee", async () => {
    const w = await judgedShow();
    await overridePlacement(w.chair, w.show.slug, { entryId: w.entries[2]!.id, place: null, honorableMention: false, reason: "Withheld by the judges." });
    await publishResults(w.chair, w.show.slug, { reason: "" });
    await db.update(showSettings).set({ commentPolicy: "placed" }).where(eq(showSettings.showId, w.show.id));
    await expect(critiqueData(w.entries[0]!.id, w.wren)).resolves.toBeTruthy();
    await expect(critiqueData(w.entries[2]!.id, w.wren)).rejects.toMatchObject({ status: 404, message: expect.stringMatching(/ribbon winners only/) });
    await db.update(showSettings).set({ commentPolicy: "all", critiqueFeeCents: 500 }).where(eq(showSettings.showId, w.show.id));
    const mine = await myResults(w.wren, [w.show.id]);
    expect(mine.get(w.entries[0]!.id)?.critique).toEqual({ available: false, why: expect.stringMatching(/did not ask for one/) });
    await db.update(showSettings).set({ commentPolicy: "none", critiqueFeeCents: 0 }).where(eq(showSettings.showId, w.show.id));
    await expect(critiqueData(w.entries[0]!.id, w.wren)).rejects.toMatchObject({ status: 404, message: expect.stringMatching(/does not return/) });
  });
});

describe("the results mails", () => {
  it("mails every entrant once with their results and critiques; unpublishing takes it all back; a correction mails only those it changed", async () => {
    const w = await judgedShow();
    const first = await publishResults(w.chair, w.show.slug, { reason: "" });
    expect(await sendResultMails(first.id)).toEqual({ sent: 2, failed: 0, alreadySent: 0, unchanged: 0 });
    // Pressing "Send again" sends nothing twice.
    expect(await sendResultMails(first.id)).toEqual({ sent: 0, failed: 0, alreadySent: 2, unchanged: 0 });
    expect(await db.select().from(resultMails).where(eq(resultMails.publicationId, first.id))).toHaveLength(2);

    const [wrenSummary] = await mailsTo(w.wrenUser.email);
    expect(wrenSummary!.subject).toBe(`Results: ${w.show.name}`);
    const wrenMail = await readMail(env.MAIL_WEB_URL, wrenSummary!.id);
    expect(wrenMail.text).toContain(`Entry ${w.entries[0]!.entryNumber} — Tide pool 1 (20 Art quilts): 1st place (Blue)`);
    expect(wrenMail.text).toContain(`Entry ${w.entries[2]!.entryNumber} — Tide pool 3 (20 Art quilts): 3rd place (Yellow)`);
    expect(wrenMail.text).not.toContain("Tide pool 2");
    expect(wrenMail.attachments.map((a) => a.filename).sort()).toEqual([`critique-${w.entries[0]!.entryNumber}.pdf`, `critique-${w.entries[2]!.entryNumber}.pdf`].sort());
    const attached = await pdfText(wrenMail.attachments.find((a) => a.filename === `critique-${w.entries[0]!.entryNumber}.pdf`)!.content);
    expect(attached.join(" ")).toContain("Tide pool 1: the curves sit flat (note 1).");
    expect(attached.join(" ")).not.toContain("Tide pool 2");
    const solMail = await readMail(env.MAIL_WEB_URL, (await mailsTo(w.solUser.email))[0]!.id);
    expect(solMail.attachments.map((a) => a.filename)).toEqual([`critique-${w.entries[1]!.entryNumber}.pdf`]);
    expect(solMail.text).not.toContain("Tide pool 1");

    await unpublishResults(w.chair, w.show.slug, { reason: "A ribbon went to the wrong entry." });
    expect((await publicResults(w.show.slug))!.published).toBeNull();
    await expect(critiqueData(w.entries[0]!.id, w.wren)).rejects.toMatchObject({ status: 404 });
    expect((await myResults(w.wren, [w.show.id])).size).toBe(0);
    expect(await sendResultMails(first.id)).toEqual({ sent: 0, failed: 0, alreadySent: 0, unchanged: 0 });

    // Sol's 2nd becomes an honorable mention; Wren's results stay as they were.
    await overridePlacement(w.chair, w.show.slug, { entryId: w.entries[1]!.id, place: null, honorableMention: true, reason: "The judges moved it to a mention." });
    const second = await publishResults(w.chair, w.show.slug, { reason: "A ribbon went to the wrong entry." });
    expect(second.version).toBe(2);
    // A chair's change moves only that entry (the others keep their places): only Sol is mailed.
    expect(await sendResultMails(second.id)).toEqual({ sent: 1, failed: 0, alreadySent: 0, unchanged: 1 });
    expect(await mailsTo(w.wrenUser.email)).toHaveLength(1);
    const solMails = await mailsTo(w.solUser.email);
    expect(solMails).toHaveLength(2);
    // Both may carry the same time stamp, so pick the correction by its subject, not by order.
    expect(solMails.map((m) => m.subject).sort()).toEqual([`Corrected results: ${w.show.name}`, `Results: ${w.show.name}`]);
    const corrected = await readMail(env.MAIL_WEB_URL, solMails.find((m) => m.subject.startsWith("Corrected"))!.id);
    expect(corrected.text).toContain("A ribbon went to the wrong entry.");
    expect(corrected.text).toMatch(/Honorable mention \(Green\)/);
  });
});
