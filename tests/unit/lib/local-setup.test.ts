// Telling the local set-up from a deployment, and the secret rules for each.
import { describe, expect, it } from "vitest";
import { isLoopbackHost, notLocalReasons, secretProblems } from "@/lib/local-setup";

const LOCAL = {
  NODE_ENV: "production",
  RIBBONRY_LOCAL: "1",
  DATABASE_URL: "postgres://postgres@127.0.0.1:54329/ribbonry",
  S3_ENDPOINT: "http://127.0.0.1:4569",
  STRIPE_API_HOST: "127.0.0.1",
};
const strong = "x".repeat(43);

describe("isLoopbackHost (RFC 6761 §6.3 localhost, RFC 1122 127/8, RFC 4291 ::1)", () => {
  it.each(["localhost", "127.0.0.1", "127.1.2.3", "::1", "[::1]", "LOCALHOST"])("%s is this machine", (h) => expect(isLoopbackHost(h)).toBe(true));
  it.each(["0.0.0.0", "10.0.0.5", "db.example.org", "127.example.org", "", "::"])("%s is not", (h) => expect(isLoopbackHost(h)).toBe(false));
});

describe("notLocalReasons", () => {
  it("the scripts' profile is local", () => expect(notLocalReasons(LOCAL)).toEqual([]));
  it("development on loopback is local without the marker", () => expect(notLocalReasons({ ...LOCAL, NODE_ENV: "development", RIBBONRY_LOCAL: undefined })).toEqual([]));
  it("a Unix socket database is local", () => expect(notLocalReasons({ ...LOCAL, DATABASE_URL: "postgres:///ribbonry?host=/var/run/postgresql" })).toEqual([]));
  it("names each thing that is not on this machine", () => {
    expect(notLocalReasons({ ...LOCAL, DATABASE_URL: "postgres://u:p@db.example.org/r" })).toEqual(["DATABASE_URL points at db.example.org, not this machine"]);
    expect(notLocalReasons({ ...LOCAL, S3_ENDPOINT: "https://s3.amazonaws.com" })).toHaveLength(1);
    expect(notLocalReasons({ ...LOCAL, STRIPE_API_HOST: "" })).toEqual(["STRIPE_API_HOST is empty, so payments go to the real API"]);
    expect(notLocalReasons({ ...LOCAL, STRIPE_API_HOST: "api.stripe.com" })).toHaveLength(1);
    expect(notLocalReasons({ ...LOCAL, RIBBONRY_LOCAL: undefined })).toEqual([
      "NODE_ENV is production without RIBBONRY_LOCAL=1 (which only the project's own scripts set)",
    ]);
  });
});

describe("secretProblems", () => {
  const good = { BETTER_AUTH_SECRET: strong, STRIPE_WEBHOOK_SECRET: `whsec_${strong}`, STRIPE_SECRET_KEY: `sk_live_${strong}`, S3_ACCESS_KEY_ID: "AKIAEXAMPLEKEY123456", S3_SECRET_ACCESS_KEY: strong };

  it("accepts strong secrets anywhere", () => {
    expect(secretProblems(good, false)).toEqual([]);
    expect(secretProblems(good, true)).toEqual([]);
  });

  it("outside the local set-up refuses the old webhook default", () => {
    expect(secretProblems({ ...good, STRIPE_WEBHOOK_SECRET: "whsec_ribbonry_local" }, false)).toEqual(["STRIPE_WEBHOOK_SECRET is a published default value"]);
  });

  it("the signing secrets must be strong even locally; the S3 keys may be s3rver's there", () => {
    expect(secretProblems({ ...good, BETTER_AUTH_SECRET: "dev-only-secret-change-me-0123456789abcdef", S3_ACCESS_KEY_ID: "S3RVER", S3_SECRET_ACCESS_KEY: "S3RVER" }, true)).toEqual([
      "BETTER_AUTH_SECRET is a published default value",
    ]);
  });

  it("outside the local set-up refuses s3rver's keys, the old payments key and short ones", () => {
    expect(secretProblems({ ...good, STRIPE_SECRET_KEY: "sk_test_ribbonry_local", S3_ACCESS_KEY_ID: "S3RVER", S3_SECRET_ACCESS_KEY: "short" }, false)).toEqual([
      "STRIPE_SECRET_KEY is a published default value",
      "S3_ACCESS_KEY_ID is a published default value",
      "S3_SECRET_ACCESS_KEY is shorter than 32 characters",
    ]);
  });
});
