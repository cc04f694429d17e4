// Entry fees in integer cents: the lines an entrant pays for the entries in one checkout (entry fee
// at the member or non-member rate, late fee, critique fee), the per-entrant cap, and refunds.
// Pure: the caller loads the show's settings and what was already paid, and saves the result.

export type FeeSchedule = {
  entryFeeCents: number;
  memberEntryFeeCents: number;
  lateFeeCents: number;
  /** After this moment the late fee applies; null = never. */
  lateFeeFromAt: Date | null;
  critiqueFeeCents: number;
  /** Most one entrant pays in entry fees at a show; late and critique fees come on top. null = no cap. */
  feeCapCents: number | null;
};

export type FeeKind = "entry" | "late" | "critique";

/** The start of each payment line's description (the line's kind is stored in its own column). */
export const FEE_KIND_LABELS: Record<FeeKind, string> = {
  entry: "Entry fee",
  late: "Late fee",
  critique: "Critique fee",
};

export type FeeEntry = {
  entryId: string;
  entryNumber: number | null;
  title: string;
  critiqueRequested: boolean;
  /** Already paid, with a critique asked for afterwards: only the critique fee is charged. */
  critiqueOnly?: boolean;
};

export type FeeLine = { entryId: string; kind: FeeKind; amountCents: number; description: string };

export type FeeQuote = {
  member: boolean;
  late: boolean;
  lines: FeeLine[];
  /** Entry fees in this checkout after the cap. */
  entryFeesCents: number;
  /** What the cap took off the entry fees in this checkout. */
  capSavingCents: number;
  totalCents: number;
};

/**
 * Membership rule. When the chair keeps a member list (e-mail addresses), a member is an entrant
 * whose account e-mail is on it. With no list, the show goes by the guild named in the entrant's
 * profile: the same name as the show's guild, capitals and spaces around it aside. An empty guild
 * is never a member.
 */
export function isMember(
  entrant: { email: string; guild: string | null | undefined },
  show: { guildName: string; memberEmails: readonly string[] },
): boolean {
  if (show.memberEmails.length > 0) return show.memberEmails.includes(entrant.email.trim().toLowerCase());
  return isGuildMember(entrant.guild, show.guildName);
}

/** The guild-name rule alone (see isMember). */
export function isGuildMember(profileGuild: string | null | undefined, showGuildName: string): boolean {
  const mine = (profileGuild ?? "").trim().toLowerCase();
  return mine !== "" && mine === showGuildName.trim().toLowerCase();
}

/** What the Pay box says about the member rate, in plain words. */
export function memberRateWords(input: { member: boolean; guildName: string; memberList: boolean; memberFee: string }): string {
  const { member, guildName, memberList, memberFee } = input;
  if (member) {
    return memberList
      ? `Member rate: your e-mail address is on ${guildName}'s member list.`
      : `Member rate: your profile says you belong to ${guildName}.`;
  }
  return memberList
    ? `Members of ${guildName} pay ${memberFee} per entry. The show keeps a list of its members' e-mail addresses; if you are a member and yours isn't on it, ask the show chair.`
    : `Members of ${guildName} pay ${memberFee} per entry: put ${guildName} as your guild on your Account page.`;
}

/** The late fee applies strictly after `lateFeeFromAt`. */
export function isLate(schedule: Pick<FeeSchedule, "lateFeeFromAt">, at: Date): boolean {
  return schedule.lateFeeFromAt !== null && at.getTime() > schedule.lateFeeFromAt.getTime();
}

const lineName = (kind: FeeKind, e: FeeEntry) =>
  `${FEE_KIND_LABELS[kind]} — ${e.entryNumber === null ? "entry" : `entry ${e.entryNumber}`}: ${e.title}`;

/**
 * The lines for the entries being paid now. The cap counts entry fees the entrant already paid
 * at this show (`entryFeesAlreadyPaidCents`); entries are charged in the order given until the
 * cap is reached, and later ones pay no entry fee. Zero-amount lines are left out.
 */
export function quoteFees(input: {
  schedule: FeeSchedule;
  member: boolean;
  at: Date;
  entries: FeeEntry[];
  entryFeesAlreadyPaidCents: number;
}): FeeQuote {
  const { schedule, member, entries } = input;
  const rate = member ? schedule.memberEntryFeeCents : schedule.entryFeeCents;
  const late = isLate(schedule, input.at);
  let capLeft = schedule.feeCapCents === null ? Infinity : Math.max(0, schedule.feeCapCents - input.entryFeesAlreadyPaidCents);
  const lines: FeeLine[] = [];
  let entryFeesCents = 0;
  let capSavingCents = 0;
  for (const e of entries) {
    if (e.critiqueOnly) {
      if (schedule.critiqueFeeCents > 0) lines.push({ entryId: e.entryId, kind: "critique", amountCents: schedule.critiqueFeeCents, description: lineName("critique", e) });
      continue;
    }
    const entryFee = Math.min(rate, capLeft);
    capLeft -= entryFee;
    entryFeesCents += entryFee;
    capSavingCents += rate - entryFee;
    const push = (kind: FeeKind, amountCents: number) => {
      if (amountCents > 0) lines.push({ entryId: e.entryId, kind, amountCents, description: lineName(kind, e) });
    };
    push("entry", entryFee);
    if (late) push("late", schedule.lateFeeCents);
    if (e.critiqueRequested) push("critique", schedule.critiqueFeeCents);
  }
  const totalCents = lines.reduce((sum, l) => sum + l.amountCents, 0);
  return { member, late, lines, entryFeesCents, capSavingCents, totalCents };
}

/** How the entry fee was settled, read from `entries.payment_reference`. */
export function paidOnline(paymentReference: string): boolean {
  return paymentReference.startsWith("card ") || paymentReference === "no fee due";
}

/**
 * Whether an entry owes the critique fee on its own: it asked for a critique, the show charges
 * for one, the entry fee is already settled online (a checkout, or nothing was due), and no paid
 * checkout carried its critique line. Before the entry is paid the critique rides on its checkout.
 */
export function critiqueFeeDue(
  e: { critiqueRequested: boolean; paidAt: Date | null; paymentReference: string },
  critiqueFeeCents: number,
  critiqueLinePaid: boolean,
): boolean {
  return e.critiqueRequested && critiqueFeeCents > 0 && e.paidAt !== null && paidOnline(e.paymentReference) && !critiqueLinePaid;
}

/** Refund on withdrawal: the show's percent of the entry fee charged for that entry, rounded down to the cent. */
export function withdrawalRefundCents(entryFeePaidCents: number, refundPercent: number): number {
  const pct = Math.min(100, Math.max(0, refundPercent));
  return Math.floor((entryFeePaidCents * pct) / 100);
}

// The card networks' own spellings of the brands the payments API reports (Stripe API reference,
// Charge.payment_method_details.card.brand).
const CARD_BRANDS: Record<string, string> = {
  amex: "American Express",
  cartes_bancaires: "Cartes Bancaires",
  diners: "Diners Club",
  discover: "Discover",
  eftpos_au: "eftpos",
  jcb: "JCB",
  link: "Link",
  mastercard: "Mastercard",
  unionpay: "UnionPay",
  visa: "Visa",
};

/** "Visa card ending 4242"; "card" alone when the provider told us nothing. */
export function cardWords(brand: string, last4: string): string {
  const name = CARD_BRANDS[brand] ?? (brand && brand !== "unknown" ? brand[0]!.toUpperCase() + brand.slice(1) : "");
  if (!last4) return name ? `${name} card` : "card";
  return `${name ? `${name} card` : "card"} ending ${last4}`;
}

/** "$25.00" — amounts are integer cents. */
export function formatMoney(cents: number, currency = "usd"): string {
  return new Intl.NumberFormat("en-US", { style: "currency", currency: currency.toUpperCase() }).format(cents / 100);
}
