// "My entries": the signed-in entrant's entries grouped by show, with what each still needs,
// the category it is in, what paying the unpaid ones would cost, and the refund a withdrawal would give.
import "server-only";
import { asc, desc, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { CRITIQUE_PAYABLE, critiqueLinesPaid, entryFeesPaidCents, memberAt, scheduleOf } from "@/db/queries/payments";
import { myResults } from "@/db/queries/published-results";
import { settingsForShowId } from "@/db/queries/settings";
import { entrantMayWithdraw, refundIfWithdrawn } from "@/db/queries/withdrawals";
import { categories, entries, shows } from "@/db/schema";
import type { Viewer } from "@/lib/session";
import { critiqueFeeDue, paidOnline } from "@/scoring/fees";

/** What the entrant sees: waiting list is its own state, and a decision shows only once released. */
export function displayStatusOf(e: { status: string; waitlisted: boolean; paidAt: Date | null; decisionReleasedAt: Date | null }): string {
  if (e.status === "submitted" && e.waitlisted) return "waitlisted";
  if ((e.status === "accepted" || e.status === "declined") && !e.decisionReleasedAt) return e.paidAt ? "paid" : "submitted";
  return e.status;
}

const WITHDRAWABLE = new Set(["submitted", "paid", "accepted"]);

type CategoryColumns = { categoryState: string; categoryCode: string | null; categoryName: string | null; categoryReasons: string[] };

/** The entry's stored category for its card: state, code and name, and the reasons in plain words. */
function categoryOf(e: CategoryColumns) {
  if (e.categoryState === "undecided") return null;
  return { state: e.categoryState, code: e.categoryCode, name: e.categoryName, reasons: e.categoryReasons };
}

export async function myEntriesByShow(viewer: Viewer, now = new Date()) {
  const rows = await db
    .select({
      id: entries.id,
      entryNumber: entries.entryNumber,
      title: entries.title,
      widthUm: entries.widthUm,
      lengthUm: entries.lengthUm,
      status: entries.status,
      waitlisted: entries.waitlisted,
      decisionReason: entries.decisionReason,
      decisionReleasedAt: entries.decisionReleasedAt,
      paidAt: entries.paidAt,
      paymentReference: entries.paymentReference,
      critiqueRequested: entries.critiqueRequested,
      categoryState: entries.categoryState,
      categoryCode: categories.code,
      categoryName: categories.name,
      categoryReasons: entries.categoryReasons,
      waitlistReason: entries.waitlistReason,
      showId: shows.id,
      showStatus: shows.status,
      showSlug: shows.slug,
      showName: shows.name,
      guildName: shows.guildName,
      timeZone: shows.timeZone,
      venueName: shows.venueName,
      venueAddress: shows.venueAddress,
      entryClosesAt: shows.entryClosesAt,
      dropOffStartsAt: shows.dropOffStartsAt,
      dropOffEndsAt: shows.dropOffEndsAt,
    })
    .from(entries)
    .innerJoin(shows, eq(shows.id, entries.showId))
    .leftJoin(categories, eq(categories.id, entries.categoryId))
    .where(eq(entries.entrantUserId, viewer.id))
    .orderBy(desc(shows.showOpensAt), asc(shows.name), asc(entries.entryNumber));

  // Results only for shows whose results are published now (nothing before, nothing after a take-down).
  const results = await myResults(viewer, rows.filter((r) => r.status !== "draft").map((r) => r.showId));
  const byShow = new Map<string, typeof rows>();
  for (const r of rows) byShow.set(r.showId, [...(byShow.get(r.showId) ?? []), r]);

  return Promise.all(
    [...byShow.values()].map(async (list) => {
      const s = list[0]!;
      const settings = await settingsForShowId(s.showId);
      const member = await memberAt(db, viewer.id, { guildName: s.guildName, memberEmails: settings.memberEmails });
      const withdrawOpen = entrantMayWithdraw({ status: s.showStatus, entryClosesAt: s.entryClosesAt }, now);
      const critiquePaid = await critiqueLinesPaid(db, list.map((e) => e.id));
      const shaped = await Promise.all(
        list.map(async (e) => {
          const paidByCard = e.paymentReference.startsWith("card ");
          const critiqueDue = CRITIQUE_PAYABLE.has(e.status) && critiqueFeeDue(e, settings.critiqueFeeCents, critiquePaid.has(e.id));
          const critiqueOpen = withdrawOpen && WITHDRAWABLE.has(e.status) && settings.critiqueFeeCents > 0;
          const refund = paidByCard ? await refundIfWithdrawn(db, e.id, settings.withdrawalRefundPercent) : null;
          return {
            id: e.id,
            entryNumber: e.entryNumber,
            title: e.title,
            widthUm: e.widthUm,
            lengthUm: e.lengthUm,
            status: displayStatusOf(e),
            decisionReason: e.status === "declined" && e.decisionReleasedAt ? e.decisionReason : "",
            critiqueRequested: e.critiqueRequested,
            /** The critique fee is owed on its own (asked for after the entry fee was paid). */
            critiqueDue,
            critiquePaid: critiquePaid.has(e.id),
            /** Whether the critique checkbox on the card may be changed now, and if not while open, why. */
            critiqueChangeable: critiqueOpen && !(e.critiqueRequested && critiquePaid.has(e.id)) && !(!e.critiqueRequested && e.paidAt !== null && !paidOnline(e.paymentReference)),
            // Drafts are not placed yet; withdrawn and declined entries are out of the show.
            category: e.status === "draft" || e.status === "withdrawn" || e.status === "declined" ? null : categoryOf(e),
            waitlistReason: e.waitlisted ? e.waitlistReason : "",
            paid: e.paidAt !== null,
            paidByCard,
            canPay: (e.status === "submitted" && !e.waitlisted && e.paidAt === null) || critiqueDue,
            canWithdraw: withdrawOpen && WITHDRAWABLE.has(e.status),
            refundIfWithdrawnCents: refund?.refundCents ?? 0,
            result: results.get(e.id) ?? null,
          };
        }),
      );
      return {
        show: {
          id: s.showId,
          slug: s.showSlug,
          name: s.showName,
          guildName: s.guildName,
          timeZone: s.timeZone,
          venueName: s.venueName,
          venueAddress: s.venueAddress,
          entryClosesAt: s.entryClosesAt,
          dropOffStartsAt: s.dropOffStartsAt,
          dropOffEndsAt: s.dropOffEndsAt,
        },
        currency: settings.currency,
        critiqueFeeCents: settings.critiqueFeeCents,
        memberList: settings.memberEmails.length > 0,
        juried: settings.juried,
        refundPercent: settings.withdrawalRefundPercent,
        schedule: scheduleOf(settings),
        member,
        entryFeesAlreadyPaidCents: await entryFeesPaidCents(db, viewer.id, s.showId, { schedule: scheduleOf(settings), member }),
        withdrawOpen,
        entries: shaped,
      };
    }),
  );
}

export type MyShow = Awaited<ReturnType<typeof myEntriesByShow>>[number];
export type MyEntry = MyShow["entries"][number];
