// The member rate: when the chair keeps a list of members' e-mails, only those entrants pay it;
// a guild name typed in a profile is no longer enough. Without a list the profile's guild decides.

import { beforeAll, describe, expect, it } from "vitest";
import { updateSettingsAction } from "@/app/(chair)/shows/[slug]/manage/settings/actions";
import { startCheckoutAction } from "@/app/(entrant)/my/actions";
import { db } from "@/db/client";
import { myEntriesByShow } from "@/db/queries/entrant-shows";
import { settingsForShowId } from "@/db/queries/settings";
import { entrantProfiles } from "@/db/schema";
import { memberRateWords } from "@/scoring/fees";
import { grantRole, makeEntry, makeShow, makeUser, type TestUser } from "../../helpers/factories";
import { actAs } from "../../helpers/request-context";

const FEES = { section: "fees", entryFeeCents: "25", memberEntryFeeCents: "15", lateFeeCents: "0", critiqueFeeCents: "0", feeCapCents: "", withdrawalRefundPercent: "100" };

let chair: TestUser;
let listed: TestUser;
let typedGuild: TestUser;
let show: { id: string; slug: string };

async function totalFor(u: TestUser) {
  const e = await makeEntry(show.id, u.id);
  actAs(u.cookie);
  const r = await startCheckoutAction(null, { showSlug: show.slug, entryIds: [e.id] });
  if (!r.ok) throw new Error(r.message);
  return r.data!.totalCents;
}

beforeAll(async () => {
  chair = await makeUser();
  listed = await makeUser();
  typedGuild = await makeUser();
  show = await makeShow();
  await grantRole(chair.id, show.id, "chair");
  // Both name the show's guild ("Test Guild") in their profile; only one is on the chair's list.
  await db.insert(entrantProfiles).values([
    { userId: listed.id, displayName: "Listed", guild: "Test Guild" },
    { userId: typedGuild.id, displayName: "Typed", guild: "test guild" },
  ]);
});

describe("the chair's member list", () => {
  it("is saved from the fees form, lower case and once each; a bad address is named", async () => {
    actAs(chair.cookie);
    const bad = await updateSettingsAction(null, { showSlug: show.slug, ...FEES, memberEmails: "not-an-address" });
    expect(bad).toMatchObject({ ok: false, status: 400 });
    const r = await updateSettingsAction(null, { showSlug: show.slug, ...FEES, memberEmails: `${listed.email.toUpperCase()}\n${listed.email}` });
    expect(r).toMatchObject({ ok: true });
    expect((await settingsForShowId(show.id)).memberEmails).toEqual([listed.email.toLowerCase()]);
    // Saving fees without the list leaves it alone.
    expect(await updateSettingsAction(null, { showSlug: show.slug, ...FEES })).toMatchObject({ ok: true });
    expect((await settingsForShowId(show.id)).memberEmails).toEqual([listed.email.toLowerCase()]);
  });

  it("only the listed entrant pays the member rate; the guild name typed in a profile is not enough", async () => {
    expect(await totalFor(listed)).toBe(1500);
    expect(await totalFor(typedGuild)).toBe(2500);
    const group = (await myEntriesByShow({ id: typedGuild.id, email: typedGuild.email } as never)).find((g) => g.show.id === show.id)!;
    expect(group).toMatchObject({ member: false, memberList: true });
  });

  it("says so in plain words", () => {
    const words = memberRateWords({ member: false, guildName: "Test Guild", memberList: true, memberFee: "$15.00" });
    expect(words).toContain("keeps a list of its members' e-mail addresses");
    expect(words).not.toMatch(/ignoring capitals|matches/);
  });

  it("with the list emptied, the profile's guild decides again", async () => {
    actAs(chair.cookie);
    expect(await updateSettingsAction(null, { showSlug: show.slug, ...FEES, memberEmails: "" })).toMatchObject({ ok: true });
    expect(await totalFor(typedGuild)).toBe(1500);
  });
});

