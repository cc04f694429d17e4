// POST: checks an uploaded photo and makes it the entry's photo for that view.
import { attachEntryPhoto } from "@/db/queries/entry-photos";
import { defineRoute } from "@/lib/api";
import { notFound } from "@/lib/errors";
import { attachPhotoSchema, PHOTO_VIEWS, type PhotoView } from "@/lib/schemas/entry";

export const POST = defineRoute<{ id: string; view: string }, typeof attachPhotoSchema>(
  { access: "user", input: attachPhotoSchema },
  async ({ viewer, params, input }) => {
    if (!PHOTO_VIEWS.includes(params.view as PhotoView)) throw notFound("There is no such photo view.");
    return attachEntryPhoto(viewer!, params.id, params.view as PhotoView, input.uploadKey);
  },
);
