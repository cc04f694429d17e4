// The show's effective settings (saved row or defaults, with the current rules version), for the chair.
import { settingsForChair } from "@/db/queries/settings";
import { defineRoute } from "@/lib/api";

export const GET = defineRoute<{ slug: string }>({ access: "user" }, async ({ viewer, params }) => {
  const { settings } = await settingsForChair(viewer!, params.slug);
  return settings;
});
