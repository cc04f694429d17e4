// GET: one entry photo's bytes, to whoever photoForViewer allows (owner, chair, intake once sent,
// a judge or scribe for their own sessions); anyone else a 404. Photos live
// in a private bucket; no public URL ever leaves the server.
import { photoForViewer } from "@/db/queries/entry-photos";
import { defineRoute } from "@/lib/api";
import { notFound } from "@/lib/errors";
import { photoResponse } from "@/lib/photo-response";
import { PHOTO_SIZES, type PhotoSize } from "@/lib/schemas/entry";
import { getObjectBytes } from "@/storage/s3";

export const GET = defineRoute<{ photoId: string; size: string }>({ access: "user" }, async ({ viewer, params }) => {
  if (!PHOTO_SIZES.includes(params.size as PhotoSize)) throw notFound("There is no such photo size.");
  const photo = await photoForViewer(viewer!, params.photoId, params.size as PhotoSize);
  const bytes = await getObjectBytes(photo.key);
  return photoResponse(bytes, photo.contentType);
});
