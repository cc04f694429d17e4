// Shared steps for the entry tests: a viewer from a test user's cookie, a draft filled in step by
// step through the real server actions, and photo rows standing in for uploads where the test is
// about something else.
import { randomUUID } from "node:crypto";
import { db } from "@/db/client";
import { entryPhotos, showSettings } from "@/db/schema";
import { createDraft } from "@/db/queries/entries";
import { saveAboutAction, saveMakersAction, saveQuiltAction } from "@/app/(entrant)/entries/[id]/actions";
import { getViewer, type Viewer } from "@/lib/session";
import { actAs } from "../../helpers/request-context";
import type { TestUser } from "../../helpers/factories";

export async function viewerOf(u: TestUser): Promise<Viewer> {
  const v = await getViewer(new Headers({ cookie: u.cookie }));
  if (!v) throw new Error(`no session for ${u.email}`);
  return v;
}

export const QUILT = { title: "Prairie Stars", sizeUnit: "in" as const, width: "60½", length: "72", techniques: ["pieced", "appliqué"] };
export const MAKERS = { madeBy: [{ name: "Ada Quilter" }], quiltedByKind: "hire" as const, quiltedByName: "Longarm Lou", quiltingMethod: "frame_machine" as const, patternSource: "original" as const, patternName: "", patternDesigner: "" };
export const ABOUT = { statement: "Scraps from my grandmother's sewing box.", declaredValue: "1,250", forSale: false, price: "", judged: "judged" as const, division: "open" as const, youthAge: "" };

/** A draft with every step saved through the actions and both required photos present. */
export async function completeDraft(u: TestUser, showSlug: string): Promise<string> {
  const { entryId } = await createDraft(await viewerOf(u), showSlug, { fresh: true });
  actAs(u.cookie);
  for (const [action, input] of [[saveQuiltAction, QUILT], [saveMakersAction, MAKERS], [saveAboutAction, ABOUT]] as const) {
    const r = await action(null, { ...input, entryId });
    if (!r.ok) throw new Error(`step failed: ${JSON.stringify(r)}`);
  }
  await addPhotoRows(entryId);
  return entryId;
}

export async function addPhotoRows(entryId: string, views: ("full" | "detail")[] = ["full", "detail"]) {
  for (const view of views) {
    const key = `tests/fake/${randomUUID()}`;
    await db.insert(entryPhotos).values({ entryId, view, storageKey: `${key}/original.jpg`, webKey: `${key}/web.jpg`, thumbKey: `${key}/thumb.jpg`, widthPx: 1600, heightPx: 1200, bytes: 1000, contentType: "image/jpeg" });
  }
}

export async function setSettings(showId: string, values: Partial<typeof showSettings.$inferInsert>) {
  await db.insert(showSettings).values({ showId, ...values }).onConflictDoUpdate({ target: showSettings.showId, set: values });
}
