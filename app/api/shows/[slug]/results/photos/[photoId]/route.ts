// GET: the photo of an entry that won a place, a mention or an award, for the public results page
// (no sign-in). Only while the results are published; every other photo stays private.
import { publicResultPhoto } from "@/db/queries/published-results";
import { defineRoute } from "@/lib/api";
import { notFound } from "@/lib/errors";
import { photoResponse } from "@/lib/photo-response";
import { isUuid } from "@/lib/ids";
import { getObjectBytes } from "@/storage/s3";

export const GET = defineRoute<{ slug: string; photoId: string }>({ access: "public" }, async ({ params, req }) => {
  if (!isUuid(params.photoId)) throw notFound("There is no such photo.");
  const photo = await publicResultPhoto(params.slug, params.photoId);
  const size = new URL(req.url).searchParams.get("size");
  const key = size === "thumb" ? (photo.thumbKey ?? photo.webKey ?? photo.storageKey) : (photo.webKey ?? photo.storageKey);
  const bytes = await getObjectBytes(key);
  return photoResponse(bytes, photo.contentType);
});
