// Turns better-auth client errors into the same result shape our server actions return, with
// the plain-words messages placed beside the field they concern.
import type { ActionResult } from "@/lib/action";

export type AuthClientError = { status?: number; code?: string; message?: string } | null | undefined;

type Failure = Extract<ActionResult, { ok: false }>;

export const TOO_MANY = "Too many attempts. Wait a minute and try again.";

export function authFailure(error: NonNullable<AuthClientError>, overrides: Partial<Record<string, Omit<Failure, "ok" | "status">>> = {}): Failure {
  const code = error.code ?? "";
  const custom = overrides[code];
  if (custom) return { ok: false, status: 400, ...custom };
  // The per-account lock (lib/sign-in-throttle.ts) says when to try again; the per-address limit does not.
  if (error.status === 429) return { ok: false, status: 400, message: code === "TOO_MANY_FAILED_SIGN_INS" && error.message ? error.message : TOO_MANY };
  switch (code) {
    case "PASSWORD_TOO_COMMON": // lib/password-policy.ts
      return {
        ok: false,
        status: 400,
        message: "Some fields need attention.",
        fieldErrors: { password: [error.message || "This password is one of the most common ones; pick a longer phrase of your own."] },
      };
    case "INVALID_EMAIL_OR_PASSWORD":
      return { ok: false, status: 401, message: "Sign-in didn't work.", fieldErrors: { password: ["That e-mail and password don't match."] } };
    case "PASSWORD_TOO_SHORT":
      return { ok: false, status: 400, message: "Some fields need attention.", fieldErrors: { password: ["Use at least 10 characters."] } };
    case "PASSWORD_TOO_LONG":
      return { ok: false, status: 400, message: "Some fields need attention.", fieldErrors: { password: ["Keep it under 128 characters."] } };
    case "INVALID_EMAIL":
      return { ok: false, status: 400, message: "Some fields need attention.", fieldErrors: { email: ["Enter an e-mail address like name@example.org."] } };
    case "INVALID_TOKEN":
    case "TOKEN_EXPIRED":
      return { ok: false, status: 400, message: "This link has expired or was used already. Ask for a new one below." };
    default:
      console.error("[auth] unexpected error", error);
      return { ok: false, status: 500, message: "Something went wrong on our side. Try again in a moment." };
  }
}
