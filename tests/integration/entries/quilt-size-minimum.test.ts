// The show's smallest quilt side: set by the chair on the limits form, shown back as inches, and a
// quilt step with a side under it is refused with the reason beside the size.
import { beforeAll, describe, expect, it } from "vitest";
import { saveQuiltAction } from "@/app/(entrant)/entries/[id]/actions";
import { updateSettingsAction } from "@/app/(chair)/shows/[slug]/manage/settings/actions";
import { settingsForShowId } from "@/db/queries/settings";
import { limitsFormValues } from "@/components/settings/form-values";
import { grantRole, makeEntry, makeShow, makeUser, type TestUser } from "../../helpers/factories";
import { actAs } from "../../helpers/request-context";

let chair: TestUser;
let entrant: TestUser;
let show: { id: string; slug: string };
let entryId: string;

beforeAll(async () => {
  chair = await makeUser();
  entrant = await makeUser();
  show = await makeShow();
  await grantRole(chair.id, show.id, "chair");
  entryId = (await makeEntry(show.id, entrant.id, { status: "draft" })).id;
});

const quilt = (width: string, length: string) => ({ entryId, title: "Postage Stamp", sizeUnit: "in" as const, width, length, techniques: ["pieced"] });

describe("the smallest quilt side", () => {
  it("the chair sets it in inches; it is kept in micrometers and shown back the same", async () => {
    actAs(chair.cookie);
    expect(await updateSettingsAction(null, { showSlug: show.slug, section: "limits", maxEntriesPerEntrant: "", maxEntriesPerCategory: "", capacity: "", minQuiltSideUm: "12" })).toMatchObject({ ok: true });
    const s = await settingsForShowId(show.id);
    expect(s.minQuiltSideUm).toBe(12 * 25_400);
    expect(limitsFormValues(s).minQuiltSideUm).toBe("12");
    expect(await updateSettingsAction(null, { showSlug: show.slug, section: "limits", maxEntriesPerEntrant: "", maxEntriesPerCategory: "", capacity: "", minQuiltSideUm: "lots" })).toMatchObject({ ok: false, status: 400 });
  });

  it("a 3 × 2 in quilt is refused, saying why beside the size; a 12 × 14 in one is saved", async () => {
    actAs(entrant.cookie);
    const r = await saveQuiltAction(null, quilt("3", "2"));
    expect(r).toMatchObject({ ok: false, status: 400, fieldErrors: { width: [expect.stringContaining("at least 12 in")] } });
    expect(await saveQuiltAction(null, quilt("12", "14"))).toMatchObject({ ok: true });
  });

  it("a show with no minimum still takes a small quilt (the form warns instead)", async () => {
    const other = await makeShow();
    const e = await makeEntry(other.id, entrant.id, { status: "draft" });
    actAs(entrant.cookie);
    expect(await saveQuiltAction(null, { ...quilt("3", "2"), entryId: e.id })).toMatchObject({ ok: true });
  });
});
