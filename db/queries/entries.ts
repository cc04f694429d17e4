// An entrant's entry from first draft to submission: the draft, each saved step and the
// submission itself (who may change it: ./entry-access.ts; its photos: ./entry-photos.ts).
import "server-only";
import { and, desc, eq, notInArray, sql } from "drizzle-orm";
import { db, type Tx } from "@/db/client";
import { entries, entryPhotos, showEntryCounters, shows, type Entry } from "@/db/schema";
import { writeAudit } from "@/db/queries/audit";
import { assertEditable, editBlock, entryAccess, showFacts } from "@/db/queries/entry-access";
import { settingsForShowId, type EffectiveSettings } from "@/db/queries/settings";
import { categoriesLocked, decideEntryTx, placeOnSubmission } from "@/db/queries/categories";
import { noteConflicts } from "@/db/queries/judge-conflicts";
import { entryWindow } from "@/components/shows/entry-window";
import { badInput, conflict, notFound } from "@/lib/errors";
import { sendEntryReceivedMail } from "@/lib/entry-mails";
import { aboutStepSchemaFor, dollarsToCents, quiltSizeUm, type EntryPhotoView, type SubmitInput } from "@/lib/schemas/entry";
import type { z } from "zod";
import type { aboutStepSchema, makersStepSchema, quiltStepSchema } from "@/lib/schemas/entry";
import type { Viewer } from "@/lib/session";
import { entryGaps, UNSET_LENGTH_UM, type Gap } from "@/scoring/entry-completeness";
import { errorSummary } from "@/lib/error-log";
import { belowShowMinimum } from "@/scoring/quilt-size";

/** Entries that hold one of the entrant's places (the per-entrant limit). */
const NOT_COUNTED_FOR_ENTRANT = ["draft", "withdrawn"] as const;
/** Entries that hold one of the show's places (capacity). */
const NOT_COUNTED_FOR_CAPACITY = ["draft", "withdrawn", "declined"] as const;

// ---- Drafts ------------------------------------------------------------------------------------

/** Resumes the viewer's latest draft for the show, or starts one (always a new one with `fresh`). */
export async function createDraft(viewer: Viewer, showSlug: string, opts: { fresh?: boolean } = {}): Promise<{ entryId: string; resumed: boolean }> {
  const [show] = await db.select(showFacts).from(shows).where(eq(shows.slug, showSlug)).limit(1);
  if (!show || show.status === "draft") throw notFound("There is no show at this address.");
  const [draft] = await db
    .select({ id: entries.id })
    .from(entries)
    .where(and(eq(entries.showId, show.id), eq(entries.entrantUserId, viewer.id), eq(entries.status, "draft")))
    .orderBy(desc(entries.updatedAt))
    .limit(1);
  if (draft && !opts.fresh) return { entryId: draft.id, resumed: true };
  const window = entryWindow(show);
  if (window !== "open") throw conflict(window === "closed" ? `Entries for ${show.name} have closed.` : `${show.name} is not taking entries yet.`);
  const entryId = await db.transaction(async (tx) => {
    const [row] = await tx
      .insert(entries)
      .values({
        showId: show.id,
        entrantUserId: viewer.id,
        title: "",
        // The table insists on a positive size; the placeholder reads as "not given yet".
        widthUm: UNSET_LENGTH_UM,
        lengthUm: UNSET_LENGTH_UM,
        quiltingMethod: "home_machine",
        status: "draft",
      })
      .returning({ id: entries.id });
    await writeAudit(tx, { actorUserId: viewer.id, showId: show.id, action: "entry.draft_created", subjectType: "entry", subjectId: row!.id });
    return row!.id;
  });
  return { entryId, resumed: false };
}

// ---- Reading -----------------------------------------------------------------------------------

export type EntryForForm = Awaited<ReturnType<typeof entryForEntrant>>;

/** Everything the entry form and its review page show, for the owner or the show's chair. */
export async function entryForEntrant(viewer: Viewer, entryId: string) {
  const a = await entryAccess(viewer, entryId);
  const settings = await settingsForShowId(a.show.id);
  const photos = await photosOf(db, a.entry.id);
  const e = a.entry;
  const entry = {
    id: e.id,
    entryNumber: e.entryNumber,
    status: e.status,
    waitlisted: e.waitlisted,
    submittedAt: e.submittedAt,
    rulesAcceptedAt: e.rulesAcceptedAt,
    title: e.title,
    sizeUnit: (e.sizeUnit === "cm" ? "cm" : "in") as "in" | "cm",
    widthUm: e.widthUm > UNSET_LENGTH_UM ? e.widthUm : null,
    lengthUm: e.lengthUm > UNSET_LENGTH_UM ? e.lengthUm : null,
    techniques: e.techniques,
    madeBy: e.madeBy,
    // Until the makers step is saved, no quilting method has really been chosen.
    quiltingMethod: e.madeBy.length ? e.quiltingMethod : null,
    quiltedByKind: (e.quiltedForHire ? "hire" : e.quiltedBy ? "other" : "self") as "self" | "other" | "hire",
    quiltedBy: e.quiltedBy,
    patternSource: e.patternSource === "original" ? "original" : ("pattern" as "original" | "pattern"),
    patternName: e.patternName,
    patternDesigner: e.patternDesigner,
    statement: e.statement,
    declaredValueCents: e.declaredValueCents,
    forSale: e.forSale,
    priceCents: e.priceCents,
    judged: e.judged,
    division: e.division,
    youthAge: e.youthAge,
    critiqueRequested: e.critiqueRequested,
  };
  return {
    entry,
    show: a.show,
    photos,
    settings,
    viewerIsChair: a.isChair,
    viewerIsOwner: e.entrantUserId === viewer.id,
    editBlock: editBlock(a),
    gaps: missingForEntry({ ...e, photoViews: photos.map((p) => p.view) }, settings),
  };
}

/** What the entry still lacks (see scoring/entry-completeness.ts), with this show's settings. */
export function missingForEntry(entry: Entry & { photoViews: readonly string[] }, settings: Pick<EffectiveSettings, "statementWordLimit" | "requiredPhotoViews">): Gap[] {
  return entryGaps(entry, settings);
}

async function photosOf(reader: Pick<Tx, "select">, entryId: string): Promise<EntryPhotoView[]> {
  return reader
    .select({ id: entryPhotos.id, view: entryPhotos.view, widthPx: entryPhotos.widthPx, heightPx: entryPhotos.heightPx, bytes: entryPhotos.bytes })
    .from(entryPhotos)
    .where(eq(entryPhotos.entryId, entryId));
}

// ---- Saving a step -----------------------------------------------------------------------------

export type StepInput =
  | { step: "quilt"; input: z.output<typeof quiltStepSchema> }
  | { step: "makers"; input: z.output<typeof makersStepSchema> }
  | { step: "about"; input: z.output<typeof aboutStepSchema> };

export async function saveEntryStep(viewer: Viewer, entryId: string, { step, input }: StepInput): Promise<void> {
  const first = await entryAccess(viewer, entryId);
  const settings = await settingsForShowId(first.show.id);
  const changes = columnsFor({ step, input } as StepInput, settings);
  await db.transaction(async (tx) => {
    const a = await entryAccess(viewer, entryId, tx, true);
    assertEditable(a);
    // Once sent, the critique request changes on "My entries" (which reprices an open checkout), never here.
    if (a.entry.status !== "draft") delete changes.critiqueRequested;
    const [saved] = await tx.update(entries).set({ ...changes, updatedAt: new Date() }).where(eq(entries.id, entryId)).returning();
    await writeAudit(tx, { actorUserId: viewer.id, showId: a.show.id, action: `entry.${step}_saved`, subjectType: "entry", subjectId: entryId, after: changes });
    // A sent entry is placed again whenever what the rules read changes (size, techniques, makers…).
    if (saved && saved.status !== "draft" && !categoriesLocked(a.show.status)) await decideEntryTx(tx, saved, viewer.id, `${step} step saved`);
  });
}

function columnsFor({ step, input }: StepInput, settings: EffectiveSettings): Partial<typeof entries.$inferInsert> {
  if (step === "quilt") {
    const unknown = input.techniques.filter((t) => !settings.techniques.includes(t));
    if (unknown.length) throw badInput("Some fields need attention.", { techniques: [`This show doesn't list ${unknown.join(", ")}; choose from its techniques.`] });
    const size = quiltSizeUm(input);
    const below = belowShowMinimum(size, settings.minQuiltSideUm);
    if (below) throw badInput(below, { width: [below] });
    return { title: input.title, sizeUnit: input.sizeUnit, ...size, techniques: [...new Set(input.techniques)] };
  }
  if (step === "makers") {
    return {
      madeBy: input.madeBy.map((r) => r.name),
      quiltedBy: input.quiltedByKind === "self" ? "" : input.quiltedByName,
      quiltedForHire: input.quiltedByKind === "hire",
      quiltingMethod: input.quiltingMethod,
      patternSource: input.patternSource,
      patternName: input.patternSource === "pattern" ? input.patternName : "",
      patternDesigner: input.patternSource === "pattern" ? input.patternDesigner : "",
    };
  }
  // The word limit is the show's: checked here with the same schema the form used.
  const checked = aboutStepSchemaFor(settings.statementWordLimit).safeParse(input);
  if (!checked.success) {
    const fieldErrors: Record<string, string[]> = {};
    for (const issue of checked.error.issues) (fieldErrors[issue.path.join(".") || "_form"] ??= []).push(issue.message);
    throw badInput("Some fields need attention.", fieldErrors);
  }
  return {
    statement: input.statement,
    declaredValueCents: dollarsToCents(input.declaredValue) ?? 0,
    forSale: input.forSale,
    priceCents: input.forSale && input.price ? dollarsToCents(input.price) : null,
    judged: input.judged === "judged",
    division: input.division,
    youthAge: input.division === "youth" ? Number(input.youthAge) : null,
    ...(input.critiqueRequested === undefined ? {} : { critiqueRequested: input.critiqueRequested }),
  };
}

// ---- Submission --------------------------------------------------------------------------------

export type SubmitResult = { entryNumber: number; waitlisted: boolean };

export async function submitEntry(viewer: Viewer, entryId: string, input: SubmitInput): Promise<SubmitResult> {
  const first = await entryAccess(viewer, entryId);
  const settings = await settingsForShowId(first.show.id);
  const result = await db.transaction(async (tx) => {
    // Every submission to this show takes the counter row first, so numbers, the per-entrant
    // limit and capacity are decided one submission at a time.
    await tx.insert(showEntryCounters).values({ showId: first.show.id, lastNumber: 100 }).onConflictDoNothing();
    const [counter] = await tx.select({ lastNumber: showEntryCounters.lastNumber }).from(showEntryCounters).where(eq(showEntryCounters.showId, first.show.id)).for("update");
    const a = await entryAccess(viewer, entryId, tx, true);
    if (a.entry.status !== "draft") throw conflict("This entry has already been sent to the show.");
    assertEditable(a);

    const rules = settings.currentRules;
    if (rules && input.rulesVersionId !== rules.id) {
      throw conflict("The show's rules have changed since you opened this page. Please read them again and accept the new version.");
    }
    const photos = await photosOf(tx, entryId);
    const gaps = missingForEntry({ ...a.entry, photoViews: photos.map((p) => p.view) }, settings);
    if (gaps.length) throw badInput("This entry isn't complete yet.", { _form: gaps.map((g) => `Still missing: ${g.message}.`) });

    if (settings.maxEntriesPerEntrant !== null) {
      const [mine] = await tx
        .select({ n: sql<number>`count(*)::int` })
        .from(entries)
        .where(and(eq(entries.showId, a.show.id), eq(entries.entrantUserId, a.entry.entrantUserId), notInArray(entries.status, [...NOT_COUNTED_FOR_ENTRANT])));
      if ((mine?.n ?? 0) >= settings.maxEntriesPerEntrant) {
        throw conflict(`${a.show.name} takes at most ${settings.maxEntriesPerEntrant} ${settings.maxEntriesPerEntrant === 1 ? "entry" : "entries"} per entrant, and you have sent that many. Your draft is kept.`);
      }
    }
    let waitlisted = false;
    if (settings.capacity !== null) {
      const [taken] = await tx
        .select({ n: sql<number>`count(*)::int` })
        .from(entries)
        .where(and(eq(entries.showId, a.show.id), eq(entries.waitlisted, false), notInArray(entries.status, [...NOT_COUNTED_FOR_CAPACITY])));
      waitlisted = (taken?.n ?? 0) >= settings.capacity;
    }

    // The category, the entrant's per-category limit and the category's cap.
    const placed = await placeOnSubmission(tx, a.entry, { maxEntriesPerCategory: settings.maxEntriesPerCategory, toleranceUm: settings.sizeToleranceUm });
    const waitlistReason = waitlisted ? `${a.show.name} is full (${settings.capacity} entries).` : placed.waitlistReason;
    waitlisted = waitlisted || placed.waitlistReason !== "";

    const entryNumber = (counter?.lastNumber ?? 100) + 1;
    const now = new Date();
    await tx.update(showEntryCounters).set({ lastNumber: entryNumber }).where(eq(showEntryCounters.showId, a.show.id));
    await tx
      .update(entries)
      .set({ ...placed.columns, entryNumber, status: "submitted", submittedAt: now, waitlisted, waitlistReason, rulesVersionId: rules?.id ?? null, rulesAcceptedAt: now, updatedAt: now })
      .where(eq(entries.id, entryId));
    await writeAudit(tx, {
      actorUserId: viewer.id,
      showId: a.show.id,
      action: "entry.submitted",
      subjectType: "entry",
      subjectId: entryId,
      before: { status: "draft" },
      after: { status: "submitted", entryNumber, waitlisted, waitlistReason, rulesVersionId: rules?.id ?? null, categoryState: placed.placement.outcome.state, categoryId: placed.columns.categoryId, categoryReasons: placed.placement.reasons },
    });
    // A judge of this category may be the entrant, a maker or a declared person: the entry goes in
    // all the same, and the conflict waits for the chair (never shown to the entrant or the judge).
    await noteConflicts(tx, a.show.id, { entryIds: [entryId] }, "submission", null);
    return { entryNumber, waitlisted };
  });
  try {
    await sendEntryReceivedMail([entryId]);
  } catch (err) {
    // The entry is in; a lost mail must not undo that.
    console.error("[entries] entry-received mail failed", { entryId, err: errorSummary(err) });
  }
  return result;
}
