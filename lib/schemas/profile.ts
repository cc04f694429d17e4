// The entrant profile form's schema, shared by the form and the action.
import { z } from "zod";
import { storableString } from "@/lib/validation";

const text = (max: number) => storableString().trim().max(max, `Keep this under ${max} characters.`).default("");

export const profileSchema = z.object({
  displayName: storableString().trim().min(2, "Enter the name you want on your entries.").max(80),
  phone: z
    .string()
    .trim()
    .max(30)
    .regex(/^[0-9+().\-\s]*$/, "Use digits, spaces and + ( ) - only.")
    .default(""),
  addressLine1: text(120),
  addressLine2: text(120),
  city: text(80),
  region: text(80),
  postalCode: text(20),
  country: text(80),
  guild: text(120),
  publishNameConsent: z
    .union([z.boolean(), z.enum(["on", "true", "false", ""])])
    .default(false)
    .transform((v) => v === true || v === "on" || v === "true"),
});
export type ProfileInput = z.input<typeof profileSchema>;
