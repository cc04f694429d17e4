// What leaves the chair's desk once results are published, and nothing before: the public results
// page (awarded entries only; a maker's name only with their consent and the show's), each
// entrant's own results, and the critique sheet of an entrant's entry. Everything here reads the
// current publication's snapshot; while no publication is current these return nothing.
import "server-only";
import { and, asc, eq, inArray, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { categories, entrantProfiles, entries, entryPhotos, judgeSheets, resultPublications, scoreSheets, shows, showSettings, user } from "@/db/schema";
import { settingsForShowId } from "@/db/queries/settings";
import { notFound } from "@/lib/errors";
import type { Viewer } from "@/lib/session";
import type { CritiqueData } from "@/exports/critique-pdf";
import type { RibbonStyle } from "@/scoring/awards";
import { isAwarded, resultWords, type PublishedEntry, type PublishedResults } from "@/scoring/results";
import { marksOfState, OVERALL_COMMENT_FIELD, sectionCommentField } from "@/scoring/sheet-sync";
import type { ScoreSheet } from "@/scoring/score-sheets";

type Reader = Pick<typeof db, "select">;

export type Publication = { id: string; showId: string; version: number; publishedAt: Date; reason: string; snapshot: PublishedResults };

/** The show's current publication, or null while results are not (or no longer) published. */
export async function currentPublication(reader: Reader, showId: string): Promise<Publication | null> {
  const [row] = await reader
    .select({ id: resultPublications.id, showId: resultPublications.showId, version: resultPublications.version, publishedAt: resultPublications.publishedAt, reason: resultPublications.reason, snapshot: resultPublications.snapshot, status: shows.status })
    .from(resultPublications)
    .innerJoin(shows, eq(shows.id, resultPublications.showId))
    .where(and(eq(resultPublications.showId, showId), isNull(resultPublications.unpublishedAt)));
  if (!row || row.status !== "results_published") return null;
  const { status: _s, ...publication } = row;
  return publication as Publication;
}

/** The publication a given version replaced (for "what changed" in a corrected-results mail). */
export async function previousSnapshot(reader: Reader, showId: string, version: number): Promise<PublishedResults | null> {
  if (version <= 1) return null;
  const [row] = await reader
    .select({ snapshot: resultPublications.snapshot })
    .from(resultPublications)
    .where(and(eq(resultPublications.showId, showId), eq(resultPublications.version, version - 1)));
  return (row?.snapshot as PublishedResults | undefined) ?? null;
}

export type PublicCard = {
  entryNumber: number;
  title: string;
  categoryCode: string;
  categoryName: string;
  placeLabel: string | null;
  honorableMention: boolean;
  ribbon: RibbonStyle | null;
  awards: { name: string; ribbon: RibbonStyle }[];
  words: string;
  /** The maker's name where both the show and the entrant allow it; otherwise null. */
  entrantName: string | null;
  photoId: string | null;
};

/** Names that may be printed: only entrants who consented, and only when the show publishes names. */
async function consentedNames(reader: Reader, showId: string, userIds: string[]): Promise<Map<string, string>> {
  const [settings] = await reader.select({ publishNames: showSettings.publishNames }).from(showSettings).where(eq(showSettings.showId, showId));
  if (!settings?.publishNames || userIds.length === 0) return new Map();
  const rows = await reader
    .select({ id: entrantProfiles.userId, name: entrantProfiles.displayName, consent: entrantProfiles.publishNameConsent })
    .from(entrantProfiles)
    .where(inArray(entrantProfiles.userId, userIds));
  return new Map(rows.filter((r) => r.consent && r.name.trim()).map((r) => [r.id, r.name.trim()]));
}

async function fullPhotos(reader: Reader, entryIds: string[]): Promise<Map<string, string>> {
  if (entryIds.length === 0) return new Map();
  const rows = await reader.select({ entryId: entryPhotos.entryId, id: entryPhotos.id }).from(entryPhotos).where(and(inArray(entryPhotos.entryId, entryIds), eq(entryPhotos.view, "full")));
  return new Map(rows.map((r) => [r.entryId, r.id]));
}

const cardOf = (e: PublishedEntry, c: { code: string; name: string }, names: Map<string, string>, photos: Map<string, string>): PublicCard => ({
  entryNumber: e.entryNumber, title: e.title, categoryCode: c.code, categoryName: c.name, placeLabel: e.placeLabel, honorableMention: e.honorableMention,
  ribbon: e.ribbon, awards: e.awards, words: resultWords(e), entrantName: names.get(e.entrantUserId) ?? null, photoId: photos.get(e.entryId) ?? null,
});

/**
 * The public results page of a show (no sign-in): null for an unknown or draft show; `published`
 * null while no results are out. Only entries with a place, a mention or an award appear.
 */
export async function publicResults(slug: string) {
  const [show] = await db.select({ id: shows.id, name: shows.name, slug: shows.slug, status: shows.status, guildName: shows.guildName, timeZone: shows.timeZone }).from(shows).where(eq(shows.slug, slug));
  if (!show || show.status === "draft") return null;
  const publication = await currentPublication(db, show.id);
  if (!publication) return { show, published: null };
  const { snapshot } = publication;
  const awarded = snapshot.categories.flatMap((c) => c.entries.filter(isAwarded));
  const [names, photos] = await Promise.all([consentedNames(db, show.id, [...new Set(awarded.map((e) => e.entrantUserId))]), fullPhotos(db, awarded.map((e) => e.entryId))]);
  const byEntry = new Map(snapshot.categories.flatMap((c) => c.entries.filter(isAwarded).map((e) => [e.entryId, cardOf(e, c, names, photos)] as const)));
  // Show-wide awards first (in the show's order), then each category's places and mentions.
  const awards = snapshot.awards
    .map((a) => ({ name: a.name, ribbon: a.ribbon, cards: a.entryIds.map((id) => byEntry.get(id)).filter((c): c is PublicCard => Boolean(c)) }))
    .filter((a) => a.cards.length > 0);
  const rank = (e: PublishedEntry) => (e.place ?? 1000) + (e.honorableMention ? 500 : 0);
  const sections = snapshot.categories
    .map((c) => ({ code: c.code, name: c.name, cards: c.entries.filter(isAwarded).sort((a, b) => rank(a) - rank(b) || a.entryNumber - b.entryNumber).map((e) => byEntry.get(e.entryId)!) }))
    .filter((c) => c.cards.length > 0);
  return { show, published: { version: publication.version, publishedAt: publication.publishedAt, awards, categories: sections } };
}
export type PublicResults = NonNullable<Awaited<ReturnType<typeof publicResults>>>;

/** May the public see this photo? Only the full view of an entry awarded in the current publication. */
export async function publicResultPhoto(slug: string, photoId: string) {
  const [row] = await db
    .select({ showId: entries.showId, entryId: entries.id, view: entryPhotos.view, storageKey: entryPhotos.storageKey, webKey: entryPhotos.webKey, thumbKey: entryPhotos.thumbKey, contentType: entryPhotos.contentType, slug: shows.slug })
    .from(entryPhotos)
    .innerJoin(entries, eq(entries.id, entryPhotos.entryId))
    .innerJoin(shows, eq(shows.id, entries.showId))
    .where(eq(entryPhotos.id, photoId));
  if (!row || row.slug !== slug || row.view !== "full") throw notFound("There is no such photo.");
  const publication = await currentPublication(db, row.showId);
  const entry = publication?.snapshot.categories.flatMap((c) => c.entries).find((e) => e.entryId === row.entryId);
  if (!entry || !isAwarded(entry)) throw notFound("There is no such photo.");
  return row;
}

// ── The entrant's side ──────────────────────────────────────────────────────────────────────────

type CritiquePolicy = { commentPolicy: string; critiqueFeeCents: number };

/** Whether an entry's critique goes to its entrant, and if not, why (in words for the entrant). */
export function critiqueAvailability(policy: CritiquePolicy, entry: { critiqueRequested: boolean }, result: PublishedEntry): { available: true } | { available: false; why: string } {
  if (policy.commentPolicy === "none") return { available: false, why: "This show does not return judges' comments." };
  if (policy.commentPolicy === "placed" && !isAwarded(result)) return { available: false, why: "At this show, judges' comments go to ribbon winners only." };
  if (policy.critiqueFeeCents > 0 && !entry.critiqueRequested) return { available: false, why: "A critique was an option when entering; this entry did not ask for one." };
  return { available: true };
}

export type MyResult = { words: string; ribbon: RibbonStyle | null; awarded: boolean; critique: { available: true; url: string } | { available: false; why: string } };

/** The viewer's results at every show whose results are out, by entry id. */
export async function myResults(viewer: Viewer, showIds: string[]): Promise<Map<string, MyResult>> {
  const out = new Map<string, MyResult>();
  for (const showId of [...new Set(showIds)]) {
    const publication = await currentPublication(db, showId);
    if (!publication) continue;
    const mine = publication.snapshot.categories.flatMap((c) => c.entries).filter((e) => e.entrantUserId === viewer.id);
    if (mine.length === 0) continue;
    const [policy, asked] = await Promise.all([
      settingsForShowId(showId),
      db.select({ id: entries.id, critiqueRequested: entries.critiqueRequested }).from(entries).where(inArray(entries.id, mine.map((e) => e.entryId))),
    ]);
    for (const e of mine) {
      const critique = critiqueAvailability(policy, asked.find((a) => a.id === e.entryId) ?? { critiqueRequested: false }, e);
      out.set(e.entryId, { words: resultWords(e), ribbon: e.ribbon, awarded: isAwarded(e), critique: critique.available ? { available: true, url: `/api/entries/${e.entryId}/critique` } : critique });
    }
  }
  return out;
}

/**
 * The critique of one of the viewer's entries for the PDF. Not found unless the entry is theirs,
 * results are published and the show's policy returns comments for it.
 */
export async function critiqueData(entryId: string, viewer: Viewer): Promise<CritiqueData> {
  const [entry] = await db
    .select({ id: entries.id, showId: entries.showId, entrantUserId: entries.entrantUserId, entryNumber: entries.entryNumber, title: entries.title, critiqueRequested: entries.critiqueRequested, categoryCode: categories.code, categoryName: categories.name, showName: shows.name })
    .from(entries)
    .innerJoin(shows, eq(shows.id, entries.showId))
    .leftJoin(categories, eq(categories.id, entries.categoryId))
    .where(eq(entries.id, entryId));
  // The same answer for "not yours" and "not published": nothing tells another entrant it exists.
  const none = notFound("There is no critique for this entry (yet). Critiques are released with the results.");
  if (!entry || entry.entrantUserId !== viewer.id) throw none;
  const publication = await currentPublication(db, entry.showId);
  const result = publication?.snapshot.categories.flatMap((c) => c.entries).find((e) => e.entryId === entry.id);
  if (!publication || !result) throw none;
  const allowed = critiqueAvailability(await settingsForShowId(entry.showId), entry, result);
  if (!allowed.available) throw notFound(allowed.why);
  const category = entry.categoryCode ? `${entry.categoryCode} ${entry.categoryName ?? ""}`.trim() : "";
  return critiqueOf({ entryId: entry.id, entryNumber: entry.entryNumber ?? 0, title: entry.title, category, showName: entry.showName });
}

/**
 * An entry's critique from its judges' submitted sheets only ("Judge 1", "Judge 2"…, never names):
 * marks and comments. The caller has checked that this critique may go out (critiqueData, the mailer).
 */
export async function critiqueOf(e: { entryId: string; entryNumber: number; title: string; category: string; showName: string }): Promise<CritiqueData> {
  const sheets = await db
    .select({ state: judgeSheets.state, sheet: scoreSheets.sheet })
    .from(judgeSheets)
    .leftJoin(scoreSheets, eq(scoreSheets.id, judgeSheets.scoreSheetId))
    .where(and(eq(judgeSheets.entryId, e.entryId), eq(judgeSheets.status, "submitted")))
    .orderBy(asc(judgeSheets.judgeUserId));
  const sheet: ScoreSheet = (sheets.find((s) => s.sheet)?.sheet as ScoreSheet | undefined) ?? { sections: [] };
  const text = (state: (typeof sheets)[number]["state"], key: string) => {
    const v = state.fields[key]?.value;
    return typeof v === "string" ? v : "";
  };
  return {
    showName: e.showName,
    entryNumber: e.entryNumber,
    title: e.title,
    category: e.category,
    sheet,
    judges: sheets.map((s, i) => ({
      label: `Judge ${i + 1}`,
      marks: marksOfState(s.state),
      sectionComments: Object.fromEntries(sheet.sections.map((sec) => [sec.id, text(s.state, sectionCommentField(sec.id))])),
      overallComment: text(s.state, OVERALL_COMMENT_FIELD),
    })),
  };
}

/** The e-mail addresses and names of a show's entrants, for the results mail. */
export async function entrantContacts(userIds: string[]) {
  if (userIds.length === 0) return [];
  return db.select({ id: user.id, email: user.email, name: user.name }).from(user).where(inArray(user.id, userIds));
}
