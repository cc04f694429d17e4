"use server";
// Saving the signed-in person's entrant profile.
import { revalidatePath } from "next/cache";
import { saveProfile } from "@/db/queries/profiles";
import { defineAction } from "@/lib/action";
import { profileSchema } from "@/lib/schemas/profile";

export const saveProfileAction = defineAction(profileSchema, async (input, viewer) => {
  await saveProfile(viewer, input);
  revalidatePath("/account");
  return { message: "Your details are saved." };
});
