// POST: a presigned upload URL for one photo of an entry (the file goes straight to storage).
import { presignEntryPhoto } from "@/db/queries/entry-photos";
import { defineRoute } from "@/lib/api";
import { presignPhotoSchema } from "@/lib/schemas/entry";

export const POST = defineRoute<{ id: string }, typeof presignPhotoSchema>(
  { access: "user", input: presignPhotoSchema },
  async ({ viewer, params, input }) => presignEntryPhoto(viewer!, params.id, input.view, input.contentType, input.bytes),
);
