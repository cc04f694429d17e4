// Each entrant's account at a show, for the entrants spreadsheet: entries, fees due, paid,
// outstanding and a payment status in words. Pure: the caller loads the entrant's entries and
// payments. Money is integer cents.
//
// Where the figures come from:
// - Card payments (payments in paid / partially_refunded / refunded): what was charged, less what
//   was refunded, is both due and paid. The provider took it, whatever the entry's status now.
// - Entries marked paid offline (cash, cheque): the app records no amount, so the fee is quoted
//   from the show's schedule at the moment it was marked paid and counted as due and paid.
//   "no fee due" (a free checkout) counts nothing.
// - Entries still in the show, not waiting and not paid: quoted as a checkout now would charge
//   (late fee by today's date), counted as due and outstanding.
// The per-entrant cap counts entry fees for entries still in the show, card and offline alike,
// in entry-number order.
import { isMember, quoteFees, type FeeEntry, type FeeKind, type FeeSchedule } from "../scoring/fees";

export type AccountEntry = {
  id: string;
  entryNumber: number | null;
  title: string;
  status: string;
  waitlisted: boolean;
  critiqueRequested: boolean;
  paidAt: Date | null;
  paymentReference: string;
};

export type AccountPayment = {
  status: "open" | "paid" | "expired" | "refunded" | "partially_refunded";
  amountCents: number;
  refundedCents: number;
  paidAt: Date | null;
  items: { entryId: string; amountCents: number; kind: FeeKind; description: string }[];
};

export type EntrantFacts = {
  name: string;
  email: string;
  phone: string;
  addressLine1: string;
  addressLine2: string;
  city: string;
  region: string;
  postalCode: string;
  country: string;
  guild: string;
  publishNameConsent: boolean;
  entries: AccountEntry[];
  payments: AccountPayment[];
};

export type PaymentStatusText = "paid" | "part paid" | "unpaid" | "refunded" | "part refunded" | "nothing due";

export type EntrantRow = Omit<EntrantFacts, "entries" | "payments"> & {
  member: boolean;
  entries: number;
  withdrawnOrDeclined: number;
  feesDueCents: number;
  paidCents: number;
  outstandingCents: number;
  paymentStatus: PaymentStatusText;
  /** The latest moment money was taken (card) or an entry was marked paid offline; null if never. */
  lastPaymentAt: Date | null;
  /** Declined entries that were paid with no refund on record: the treasurer decides what to give back. */
  refundToCheck: (number | string)[];
};

export type AccountContext = { schedule: FeeSchedule; showGuildName: string; now: Date; memberEmails?: readonly string[] };

const CHARGED = new Set<AccountPayment["status"]>(["paid", "partially_refunded", "refunded"]);
const OUT_OF_SHOW = new Set(["draft", "withdrawn", "declined"]);
const NO_FEE = "no fee due";

const byNumber = (a: AccountEntry, b: AccountEntry) => (a.entryNumber ?? Infinity) - (b.entryNumber ?? Infinity) || a.id.localeCompare(b.id);
const feeEntry = (e: AccountEntry): FeeEntry => ({ entryId: e.id, entryNumber: e.entryNumber, title: e.title, critiqueRequested: e.critiqueRequested });
const latest = (dates: (Date | null)[]) => dates.reduce<Date | null>((max, d) => (d && (!max || d > max) ? d : max), null);

const personOf = (f: EntrantFacts) => ({
  name: f.name, email: f.email, phone: f.phone, addressLine1: f.addressLine1, addressLine2: f.addressLine2, city: f.city,
  region: f.region, postalCode: f.postalCode, country: f.country, guild: f.guild, publishNameConsent: f.publishNameConsent,
});

export function paymentStatusOf(a: { feesDueCents: number; paidCents: number; outstandingCents: number; refundedCents: number }): PaymentStatusText {
  if (a.outstandingCents > 0) return a.paidCents > 0 ? "part paid" : "unpaid";
  if (a.refundedCents > 0) return a.paidCents > 0 ? "part refunded" : "refunded";
  return a.paidCents > 0 ? "paid" : "nothing due";
}

/** Card money: net charged, refunds, the entries it paid for, and card entry fees the cap counts. */
function cardTotals(facts: Pick<EntrantFacts, "entries" | "payments">) {
  const charged = facts.payments.filter((p) => CHARGED.has(p.status));
  const inShow = new Set(facts.entries.filter((e) => !OUT_OF_SHOW.has(e.status)).map((e) => e.id));
  const items = charged.flatMap((p) => p.items);
  return {
    netCents: charged.reduce((s, p) => s + p.amountCents - p.refundedCents, 0),
    refundedCents: charged.reduce((s, p) => s + p.refundedCents, 0),
    entryIds: new Set(items.map((i) => i.entryId)),
    capCountedCents: items.filter((i) => inShow.has(i.entryId) && i.kind === "entry").reduce((s, i) => s + i.amountCents, 0),
    lastPaidAt: latest(charged.filter((p) => p.amountCents > 0).map((p) => p.paidAt)),
  };
}

/**
 * Money already taken at the show (card net of refunds, offline quoted as of when it was marked
 * paid) and the entry fees the per-entrant cap counts, for entries still in the show. Checkout
 * (db/queries/payments.ts) and the entrants spreadsheet both use this, so what checkout charges
 * and what the spreadsheet says is outstanding agree.
 */
export function takenSoFar(facts: Pick<EntrantFacts, "entries" | "payments">, ctx: { schedule: FeeSchedule; member: boolean }) {
  const card = cardTotals(facts);
  const sorted = [...facts.entries].filter((e) => e.status !== "draft").sort(byNumber);
  const offline = sorted.filter((e) => e.paidAt && !card.entryIds.has(e.id) && e.paymentReference !== NO_FEE);
  let capCountedCents = card.capCountedCents;
  let offlineCents = 0;
  for (const e of offline) {
    const q = quoteFees({ schedule: ctx.schedule, member: ctx.member, at: e.paidAt!, entries: [feeEntry(e)], entryFeesAlreadyPaidCents: capCountedCents });
    offlineCents += q.totalCents;
    if (!OUT_OF_SHOW.has(e.status)) capCountedCents += q.entryFeesCents;
  }
  return { card, sorted, offline, offlineCents, capCountedCents };
}

/** Declined entries paid (card or offline) whose money has not been refunded at all. */
function declinedUnrefunded(facts: Pick<EntrantFacts, "entries" | "payments">): AccountEntry[] {
  const refunded = new Set(facts.payments.filter((p) => p.refundedCents > 0).flatMap((p) => p.items.map((i) => i.entryId)));
  return facts.entries.filter((e) => e.status === "declined" && e.paidAt && e.paymentReference !== NO_FEE && !refunded.has(e.id)).sort(byNumber);
}

export function entrantAccount(facts: EntrantFacts, ctx: AccountContext): EntrantRow {
  const member = isMember({ email: facts.email, guild: facts.guild }, { guildName: ctx.showGuildName, memberEmails: ctx.memberEmails ?? [] });
  const { card, sorted, offline, offlineCents, capCountedCents: capCounted } = takenSoFar(facts, { schedule: ctx.schedule, member });
  const owing = sorted.filter((e) => !OUT_OF_SHOW.has(e.status) && !e.waitlisted && !e.paidAt);

  const outstandingCents = owing.length ? quoteFees({ schedule: ctx.schedule, member, at: ctx.now, entries: owing.map(feeEntry), entryFeesAlreadyPaidCents: capCounted }).totalCents : 0;
  const paidCents = card.netCents + offlineCents;
  const feesDueCents = paidCents + outstandingCents;

  const { entries } = facts;
  return {
    ...personOf(facts),
    member,
    entries: entries.filter((e) => !OUT_OF_SHOW.has(e.status)).length,
    withdrawnOrDeclined: entries.filter((e) => e.status === "withdrawn" || e.status === "declined").length,
    feesDueCents,
    paidCents,
    outstandingCents,
    paymentStatus: paymentStatusOf({ feesDueCents, paidCents, outstandingCents, refundedCents: card.refundedCents }),
    lastPaymentAt: latest([card.lastPaidAt, ...offline.map((e) => e.paidAt)]),
    refundToCheck: declinedUnrefunded(facts).map((e) => e.entryNumber ?? e.title),
  };
}

/** One row per entrant with a sent entry, by name (then e-mail). */
export function entrantAccounts(all: EntrantFacts[], ctx: AccountContext): EntrantRow[] {
  return all
    .filter((f) => f.entries.some((e) => e.status !== "draft"))
    .map((f) => entrantAccount(f, ctx))
    .sort((a, b) => a.name.localeCompare(b.name, "en", { sensitivity: "base" }) || a.email.localeCompare(b.email));
}
