// The chair's entrants spreadsheet rows: everyone with a sent entry at the show, their contact
// details from the profile, and their account (exports/entrant-accounts.ts) from the entries and
// payments recorded at this show only.
import "server-only";
import { eq, inArray } from "drizzle-orm";
import { db } from "@/db/client";
import { accountFactsOf, scheduleOf } from "@/db/queries/payments";
import { settingsForShowId } from "@/db/queries/settings";
import { entrantProfiles, shows, user } from "@/db/schema";
import { entrantAccounts, type EntrantFacts } from "@/exports/entrant-accounts";
import { requireShowRole, type Viewer } from "@/lib/session";

const CHAIR = ["chair"] as const;

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

/** The show's entrants (anyone with a non-draft entry) with their accounts, by name. */
export async function entrantsForExport(viewer: Viewer, showSlug: string, now: Date = new Date()) {
  const show = await requireShowRole(viewer, showSlug, CHAIR);
  const [[facts], settings, accounts] = await Promise.all([
    db.select({ guildName: shows.guildName, timeZone: shows.timeZone }).from(shows).where(eq(shows.id, show.showId)),
    settingsForShowId(show.showId),
    accountFactsOf(db, show.showId),
  ]);
  const people = await peopleOf([...accounts.entries.keys()]);
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
    entries: accounts.entries.get(p.id) ?? [],
    payments: accounts.payments.get(p.id) ?? [],
  }));
  const rows = entrantAccounts(all, { schedule: scheduleOf(settings), showGuildName: facts!.guildName, memberEmails: settings.memberEmails, now });
  return { show: { slug: show.slug, name: show.name, timeZone: facts!.timeZone, currency: settings.currency }, rows };
}
