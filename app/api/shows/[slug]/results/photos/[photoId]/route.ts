// GET: the photo of an entry that won a place, a mention or an award, for the public results page
// (no sign-in). Only while the results are published; every other photo stays private.
import { keyForSize } from "@/db/queries/entry-photos";
import { publicResultPhoto } from "@/db/queries/published-results";
import { defineRoute } from "@/lib/api";
import { notFound } from "@/lib/errors";
import { photoResponse } from "@/lib/photo-response";
import { isUuid } from "@/lib/ids";
import { getObjectBytes } from "@/storage/s3";

export const GET = defineRoute<{ slug: string; photoId: string }>({ access: "public" }, async ({ params }) => {
  if (!isUuid(params.photoId)) throw notFound("There is no such photo.");
  const photo = await publicResultPhoto(params.slug, params.photoId);
  // The web size only: the public never gets the original file.
  const bytes = await getObjectBytes(keyForSize(photo, "web"));
  return photoResponse(bytes, photo.contentType);
});
