// POST: a presigned form upload (URL and signed fields, size and type bound) for one photo of an
// entry; the browser posts the file straight to storage.
import { presignEntryPhoto } from "@/db/queries/entry-photos";
import { defineRoute } from "@/lib/api";
import { presignPhotoSchema } from "@/lib/schemas/entry";

export const POST = defineRoute<{ id: string }, typeof presignPhotoSchema>(
  { access: "user", input: presignPhotoSchema },
  async ({ viewer, params, input }) => presignEntryPhoto(viewer!, params.id, input.view, input.contentType, input.bytes),
);
