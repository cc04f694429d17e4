// Refuses the commonest passwords wherever a password is chosen: sign-up, reset, change, and an
// administrator creating an account or setting a password (OWASP ASVS 4.0 §2.1.7, NIST SP 800-63B
// §5.1.1.2: check new passwords against a list of commonly used or breached ones).
//
// The list is the `passwords-common` dictionary of @zxcvbn-ts/language-common (about 49,000 of
// the passwords seen most often in public breach corpora, the list zxcvbn ranks guesses by),
// shipped inside the package, so the check works offline. It is compared without regard to
// case; the length rules stay better-auth's own (minPasswordLength in lib/auth.ts).
import "server-only";
import { dictionary } from "@zxcvbn-ts/language-common";
import type { BetterAuthPlugin } from "better-auth";
import { APIError, createAuthMiddleware } from "better-auth/api";

export const COMMON_PASSWORD_CODE = "PASSWORD_TOO_COMMON";
export const COMMON_PASSWORD_MESSAGE = "This password is one of the most common ones; pick a longer phrase of your own.";

let common: Set<string> | undefined;

export function isCommonPassword(password: string): boolean {
  common ??= new Set(dictionary["passwords-common"].map((p) => p.toLowerCase()));
  return common.has(password.toLowerCase());
}

// Endpoint → the body field that carries the password being chosen.
const PASSWORD_FIELDS: Record<string, "password" | "newPassword"> = {
  "/sign-up/email": "password",
  "/reset-password": "newPassword",
  "/change-password": "newPassword",
  "/set-password": "newPassword",
  "/admin/create-user": "password",
  "/admin/set-user-password": "newPassword",
};

/** `minLength`: shorter passwords are left to better-auth's own "too short" answer. */
export function passwordPolicy({ minLength }: { minLength: number }): BetterAuthPlugin {
  return {
    id: "ribbonry-password-policy",
    hooks: {
      before: [
        {
          matcher: (ctx) => Boolean(ctx.path && ctx.path in PASSWORD_FIELDS),
          handler: createAuthMiddleware(async (ctx) => {
            const field = PASSWORD_FIELDS[ctx.path ?? ""];
            const password = field ? (ctx.body as Record<string, unknown> | undefined)?.[field] : undefined;
            if (typeof password === "string" && password.length >= minLength && isCommonPassword(password)) {
              throw new APIError("BAD_REQUEST", { code: COMMON_PASSWORD_CODE, message: COMMON_PASSWORD_MESSAGE });
            }
          }),
        },
      ],
    },
  };
}
