// A field the form hides never blocks a save: the price once "for sale" is unticked, the youth age
// outside the youth division. What the form shows is still checked.
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { saveAboutAction } from "@/app/(entrant)/entries/[id]/actions";
import { db } from "@/db/client";
import { entries } from "@/db/schema";
import { makeEntry, makeShow, makeUser, type TestUser } from "../../helpers/factories";
import { actAs } from "../../helpers/request-context";

const about = { statement: "Blocks from a swap.", declaredValue: "600", forSale: false, price: "", judged: "judged", division: "open", youthAge: "" } as const;

let entrant: TestUser;
let entryId: string;

beforeAll(async () => {
  entrant = await makeUser();
  const show = await makeShow();
  entryId = (await makeEntry(show.id, entrant.id, { status: "draft" })).id;
});

describe("the About step with hidden fields", () => {
  it("saves with a negative price left behind after unticking 'for sale', and stores no price", async () => {
    actAs(entrant.cookie);
    const r = await saveAboutAction(null, { ...about, entryId, forSale: false, price: "-40" });
    expect(r).toMatchObject({ ok: true });
    const [row] = await db.select({ forSale: entries.forSale, priceCents: entries.priceCents }).from(entries).where(eq(entries.id, entryId));
    expect(row).toEqual({ forSale: false, priceCents: null });
  });

  it("saves with a stale youth age outside the youth division", async () => {
    actAs(entrant.cookie);
    expect(await saveAboutAction(null, { ...about, entryId, youthAge: "abcd" })).toMatchObject({ ok: true });
  });

  it("still refuses a bad price while 'for sale' is ticked, and says why beside the field", async () => {
    actAs(entrant.cookie);
    const r = await saveAboutAction(null, { ...about, entryId, forSale: true, price: "-40" });
    expect(r).toMatchObject({ ok: false, status: 400, fieldErrors: { price: [expect.stringContaining("price")] } });
  });
});
