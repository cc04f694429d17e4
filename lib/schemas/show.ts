// Input schemas for shows and show teams, shared by forms (react-hook-form), actions and routes.
import { z } from "zod";
import { storableString } from "@/lib/validation";

const TIME_ZONES = new Set(Intl.supportedValuesOf("timeZone"));
export const STAFF_ROLES = ["judge", "scribe", "intake"] as const;
export const ALL_SHOW_ROLES = ["chair", "judge", "scribe", "intake"] as const;

export const ROLE_LABELS: Record<(typeof ALL_SHOW_ROLES)[number], string> = {
  chair: "Show chair",
  judge: "Judge",
  scribe: "Scribe",
  intake: "Intake volunteer",
};

const email = z
  .string()
  .trim()
  .toLowerCase()
  .min(1, "Enter an e-mail address.")
  .pipe(z.email("Enter an e-mail address like name@example.org."));

export const createShowSchema = z.object({
  name: storableString().trim().min(3, "Give the show a name of at least 3 characters.").max(120),
  slug: z
    .string()
    .trim()
    .toLowerCase()
    .min(3, "The web address needs at least 3 characters.")
    .max(60)
    .regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, "Use lower-case letters, digits and single hyphens, e.g. spring-show-2027."),
  guildName: storableString().trim().min(2, "Name the guild or committee running the show.").max(120),
  venueName: storableString().trim().min(2, "Name the venue.").max(120),
  venueAddress: storableString().trim().max(300).default(""),
  timeZone: storableString().refine((tz) => TIME_ZONES.has(tz), "Choose a time zone from the list, e.g. America/Chicago."),
  chairEmail: email,
});
export type CreateShowInput = z.infer<typeof createShowSchema>;

export const inviteSchema = z.object({
  email,
  role: z.enum(STAFF_ROLES, "Choose judge, scribe or intake volunteer."),
});
export type InviteInput = z.infer<typeof inviteSchema>;

export const appointChairSchema = z.object({ showSlug: storableString().min(1), email });

export const tokenSchema = z.object({ token: storableString().min(20, "This invitation link is incomplete.").max(200) });

export const removeRoleSchema = z.object({ roleId: z.uuid("That team member was not found.") });
