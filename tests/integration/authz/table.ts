// The vocabulary of the access table: the kinds of caller, the statuses they expect, and the
// shape of a row. Rows live in rows/*.ts, one file per feature.
import type { TestUser } from "../../helpers/factories";

export const ROLES = ["anonymous", "entrant", "judge", "scribe", "intake", "chair", "admin", "otherChair"] as const;
export type Role = (typeof ROLES)[number];
export type Expect = Record<Role, number>;

/** Same answer for everyone but the anonymous caller and the allowed roles. */
export function only(allowed: Partial<Record<Role, number>>, others = 403): Expect {
  const out = Object.fromEntries(ROLES.map((r) => [r, r === "anonymous" ? 401 : others])) as Expect;
  return { ...out, ...allowed };
}
export const everyone = (status: number) => Object.fromEntries(ROLES.map((r) => [r, status])) as Expect;
export const signedIn = (status: number) => ({ ...everyone(status), anonymous: 401 });

export type World = {
  show: { id: string; slug: string; name: string };
  users: Record<Exclude<Role, "anonymous">, TestUser>;
};

export type Case = {
  expect: Expect;
  /** Builds the call for one caller; may create the rows that call needs. */
  request?: (w: World, role: Role) => Promise<{ params?: Record<string, string>; body?: unknown; query?: string }>;
  input?: (w: World, role: Role) => Promise<Record<string, unknown>>;
};

