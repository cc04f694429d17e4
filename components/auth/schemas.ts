// Schemas for the sign-in, sign-up and password forms. Plain zod, safe in the browser and on the
// server. The server (better-auth, lib/auth.ts) enforces the same password length.
import { z } from "zod";

export const PASSWORD_MIN = 10;
export const PASSWORD_MAX = 128;

const email = z
  .string()
  .trim()
  .toLowerCase()
  .min(1, "Enter your e-mail address.")
  .pipe(z.email("Enter an e-mail address like name@example.org."));

const newPassword = z
  .string()
  .min(PASSWORD_MIN, `Use at least ${PASSWORD_MIN} characters.`)
  .max(PASSWORD_MAX, `Keep it under ${PASSWORD_MAX} characters.`);

export const signInSchema = z.object({
  email,
  password: z.string().min(1, "Enter your password."),
});
export type SignInInput = z.input<typeof signInSchema>;

export const signUpSchema = z.object({
  name: z.string().trim().min(2, "Enter your name as you'd like the show to see it.").max(80, "Keep your name under 80 characters."),
  email,
  password: newPassword,
});
export type SignUpInput = z.input<typeof signUpSchema>;

export const emailOnlySchema = z.object({ email });
export type EmailOnlyInput = z.input<typeof emailOnlySchema>;

export const resetPasswordSchema = z
  .object({ password: newPassword, confirm: z.string().min(1, "Type the new password again.") })
  .refine((v) => v.password === v.confirm, { path: ["confirm"], message: "The two passwords don't match." });
export type ResetPasswordInput = z.input<typeof resetPasswordSchema>;
