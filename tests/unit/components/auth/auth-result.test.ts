// The sign-up, reset and sign-in forms show the server's own words for a common password and for
// an account locked after failed sign-ins (lib/password-policy.ts, lib/sign-in-throttle.ts).
import { describe, expect, it } from "vitest";
import { authFailure, TOO_MANY } from "@/components/auth/auth-result";

describe("authFailure", () => {
  it("puts the common-password message beside the password field", () => {
    const message = "This password is one of the most common ones; pick a longer phrase of your own.";
    const result = authFailure({ status: 400, code: "PASSWORD_TOO_COMMON", message });
    expect(result.fieldErrors).toEqual({ password: [message] });
  });

  it("says when a locked account may try again, and keeps the general words for the address limit", () => {
    const message = "Too many failed sign-ins for this e-mail address. Try again in 15 minutes, or reset your password.";
    expect(authFailure({ status: 429, code: "TOO_MANY_FAILED_SIGN_INS", message }).message).toBe(message);
    expect(authFailure({ status: 429, message: "Too many requests. Please try again later." }).message).toBe(TOO_MANY);
  });
});
