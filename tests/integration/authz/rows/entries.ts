// Access rows for registering a quilt: the entry form's actions, photo uploads and the photo route.
// Entries belong to the world's entrant; the show's chair may act on them too; anyone else is told
// the entry does not exist (404), so an id confirms nothing.
import { randomUUID } from "node:crypto";
import { db } from "@/db/client";
import { entryPhotos } from "@/db/schema";
import { settingsForShowId } from "@/db/queries/settings";
import { ensureBucket, putObject } from "@/storage/s3";
import { makeEntry } from "../../../helpers/factories";
import { pngOf } from "../../../helpers/photo-fixtures";
import { only, type Case, type World } from "../table";

const owners = only({ entrant: 200, chair: 200 }, 404);
const ownersCreate = only({ entrant: 201, chair: 201 }, 404);

/** A fresh draft of the world's entrant, complete enough to submit, with both photos on record. */
async function draft(w: World, complete = false): Promise<string> {
  const entry = await makeEntry(w.show.id, w.users.entrant.id, {
    status: "draft",
    entryNumber: null,
    techniques: ["pieced"],
    statement: complete ? "Scraps from a sewing box." : "",
    declaredValueCents: complete ? 50_000 : 0,
  });
  if (complete) {
    for (const view of ["full", "detail"] as const) {
      const key = `tests/authz/${randomUUID()}`;
      await db.insert(entryPhotos).values({ entryId: entry.id, view, storageKey: `${key}/original.jpg`, webKey: `${key}/web.jpg`, thumbKey: `${key}/thumb.jpg`, widthPx: 1200, heightPx: 800, bytes: 1000, contentType: "image/jpeg" });
    }
  }
  return entry.id;
}

async function photo(w: World): Promise<string> {
  await ensureBucket();
  const entryId = await draft(w);
  const key = `tests/authz/${randomUUID()}/thumb.jpg`;
  await putObject(key, await pngOf(40, 30), "image/png");
  const [row] = await db.insert(entryPhotos).values({ entryId, view: "full", storageKey: key, webKey: key, thumbKey: key, widthPx: 40, heightPx: 30, bytes: 100, contentType: "image/png" }).returning({ id: entryPhotos.id });
  return row!.id;
}

export const routes: Record<string, Case> = {
  "POST /api/entries/[id]/photos": {
    expect: ownersCreate,
    request: async (w) => ({ params: { id: await draft(w) }, body: { view: "full", contentType: "image/jpeg", bytes: 200_000 } }),
  },
  "POST /api/entries/[id]/photos/[view]": {
    expect: ownersCreate,
    request: async (w) => {
      await ensureBucket();
      const id = await draft(w);
      const uploadKey = `uploads/entries/${id}/full/${randomUUID()}`;
      await putObject(uploadKey, await pngOf(1200, 800), "image/png");
      return { params: { id, view: "full" }, body: { uploadKey } };
    },
  },
  // A draft's photo is its owner's and the chair's alone; anyone else gets the 404 of a missing
  // photo (intake, judges and scribes by role are in tests/integration/judging/photo-access.test.ts).
  "GET /api/photos/[photoId]/[size]": {
    expect: only({ entrant: 200, chair: 200 }, 404),
    request: async (w) => ({ params: { photoId: await photo(w), size: "thumb" } }),
  },
};

const QUILT = { title: "Access Quilt", sizeUnit: "in", width: "60", length: "72", techniques: ["pieced"] };
const MAKERS = { madeBy: [{ name: "Ada" }], quiltedByKind: "self", quiltedByName: "", quiltingMethod: "hand", patternSource: "original", patternName: "", patternDesigner: "" };
const ABOUT = { statement: "A short statement.", declaredValue: "500", forSale: false, price: "", judged: "judged", division: "open", youthAge: "" };

export const actions: Record<string, Case> = {
  "(entrant)/entries/[id]#saveQuiltAction": { expect: owners, input: async (w) => ({ ...QUILT, entryId: await draft(w) }) },
  "(entrant)/entries/[id]#saveMakersAction": { expect: owners, input: async (w) => ({ ...MAKERS, entryId: await draft(w) }) },
  "(entrant)/entries/[id]#saveAboutAction": { expect: owners, input: async (w) => ({ ...ABOUT, entryId: await draft(w) }) },
  "(entrant)/entries/[id]#submitEntryAction": {
    expect: owners,
    input: async (w) => ({ entryId: await draft(w, true), acceptRules: true, rulesVersionId: (await settingsForShowId(w.show.id)).currentRules?.id ?? "" }),
  },
};
