// The chair's entrants spreadsheet rows: everyone with a sent entry at the show, their contact
// details from the profile, and their account (exports/entrant-accounts.ts) from the entries and
// payments recorded at this show only.
import "server-only";
import { and, asc, eq, inArray, ne } from "drizzle-orm";
import { db } from "@/db/client";
import { scheduleOf } from "@/db/queries/payments";
import { settingsForShowId } from "@/db/queries/settings";
import { entrantProfiles, entries, paymentItems, payments, shows, user } from "@/db/schema";
import { entrantAccounts, type AccountEntry, type AccountPayment, type EntrantFacts } from "@/exports/entrant-accounts";
import { requireShowRole, type Viewer } from "@/lib/session";

const CHAIR = ["chair"] as const;

async function entriesOf(showId: string) {
  return db
    .select({
      id: entries.id,
      entrantUserId: entries.entrantUserId,
      entryNumber: entries.entryNumber,
      title: entries.title,
      status: entries.status,
      waitlisted: entries.waitlisted,
      critiqueRequested: entries.critiqueRequested,
      paidAt: entries.paidAt,
      paymentReference: entries.paymentReference,
    })
    .from(entries)
    .where(and(eq(entries.showId, showId), ne(entries.status, "draft")))
    .orderBy(asc(entries.entryNumber), asc(entries.id));
}

async function peopleOf(userIds: string[]) {
  if (!userIds.length) return [];
  return db
    .select({
      id: user.id,
      accountName: user.name,
      email: user.email,
      displayName: entrantProfiles.displayName,
      phone: entrantProfiles.phone,
      addressLine1: entrantProfiles.addressLine1,
      addressLine2: entrantProfiles.addressLine2,
      city: entrantProfiles.city,
      region: entrantProfiles.region,
      postalCode: entrantProfiles.postalCode,
      country: entrantProfiles.country,
      guild: entrantProfiles.guild,
      publishNameConsent: entrantProfiles.publishNameConsent,
    })
    .from(user)
    .leftJoin(entrantProfiles, eq(entrantProfiles.userId, user.id))
    .where(inArray(user.id, userIds));
}

/** Every payment at the show with its lines, grouped by entrant. */
async function paymentsOf(showId: string): Promise<Map<string, AccountPayment[]>> {
  const [rows, items] = await Promise.all([
    db
      .select({ id: payments.id, entrantUserId: payments.entrantUserId, status: payments.status, amountCents: payments.amountCents, refundedCents: payments.refundedCents, paidAt: payments.paidAt })
      .from(payments)
      .where(eq(payments.showId, showId)),
    db
      .select({ paymentId: paymentItems.paymentId, entryId: paymentItems.entryId, amountCents: paymentItems.amountCents, kind: paymentItems.kind, description: paymentItems.description })
      .from(paymentItems)
      .innerJoin(payments, eq(payments.id, paymentItems.paymentId))
      .where(eq(payments.showId, showId)),
  ]);
  const lines = new Map<string, AccountPayment["items"]>();
  for (const { paymentId, ...line } of items) lines.set(paymentId, [...(lines.get(paymentId) ?? []), line]);
  const byEntrant = new Map<string, AccountPayment[]>();
  for (const p of rows) {
    const list = byEntrant.get(p.entrantUserId) ?? [];
    list.push({ status: p.status, amountCents: p.amountCents, refundedCents: p.refundedCents, paidAt: p.paidAt, items: lines.get(p.id) ?? [] });
    byEntrant.set(p.entrantUserId, list);
  }
  return byEntrant;
}

/** The show's entrants (anyone with a non-draft entry) with their accounts, by name. */
export async function entrantsForExport(viewer: Viewer, showSlug: string, now: Date = new Date()) {
  const show = await requireShowRole(viewer, showSlug, CHAIR);
  const [[facts], settings, sent, paid] = await Promise.all([
    db.select({ guildName: shows.guildName, timeZone: shows.timeZone }).from(shows).where(eq(shows.id, show.showId)),
    settingsForShowId(show.showId),
    entriesOf(show.showId),
    paymentsOf(show.showId),
  ]);
  const byEntrant = new Map<string, AccountEntry[]>();
  for (const { entrantUserId, ...e } of sent) byEntrant.set(entrantUserId, [...(byEntrant.get(entrantUserId) ?? []), e]);
  const people = await peopleOf([...byEntrant.keys()]);
  const all: EntrantFacts[] = people.map((p) => ({
    name: p.displayName || p.accountName,
    email: p.email,
    phone: p.phone ?? "",
    addressLine1: p.addressLine1 ?? "",
    addressLine2: p.addressLine2 ?? "",
    city: p.city ?? "",
    region: p.region ?? "",
    postalCode: p.postalCode ?? "",
    country: p.country ?? "",
    guild: p.guild ?? "",
    publishNameConsent: p.publishNameConsent ?? false,
    entries: byEntrant.get(p.id) ?? [],
    payments: paid.get(p.id) ?? [],
  }));
  const rows = entrantAccounts(all, { schedule: scheduleOf(settings), showGuildName: facts!.guildName, now });
  return { show: { slug: show.slug, name: show.name, timeZone: facts!.timeZone, currency: settings.currency }, rows };
}
