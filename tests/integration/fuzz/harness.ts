// What the fuzz suites share: the seed and run counts, the hostile values, a corrupter that keeps
// a valid input's shape and spoils one field, a JSON writer that can send what JSON.stringify
// can't (1e309, -0, huge integers), and the world of shows, users and valid inputs the access
// table uses (its rows/*.ts give every endpoint a valid call per role).
import fc from "fast-check";
import { discoverRoutes as discoverModules } from "../authz/discover";
import { ROLES, type Case, type Role, type World } from "../authz/table";

/** FUZZ_SEED=123 npm test … replays another run; the seed is printed either way. */
export const SEED = process.env.FUZZ_SEED ? Number(process.env.FUZZ_SEED) : 20_270_313;
/** Inputs per endpoint and kind of call; FUZZ_RUNS raises it for a longer hunt. */
export const RUNS = process.env.FUZZ_RUNS ? Number(process.env.FUZZ_RUNS) : 30;
export const fcParams = (runs = RUNS) => ({ seed: SEED, numRuns: runs, endOnFailure: true });

// ── Values ───────────────────────────────────────────────────────────────────────────────────────

/** A JSON token written as is: numbers JSON.stringify would turn into null or 0. */
export class Raw {
  constructor(readonly text: string) {}
}

export function jsonText(v: unknown): string {
  const raws: string[] = [];
  const token = (text: string) => `\u0001${raws.push(text) - 1}\u0001`;
  const out = JSON.stringify(v, (_, x: unknown) => {
    if (x instanceof Raw) return token(x.text);
    if (typeof x === "bigint") return token(x.toString());
    if (typeof x === "number" && !Number.isFinite(x)) return token(Number.isNaN(x) ? "NaN" : x > 0 ? "1e309" : "-1e309");
    return x;
  });
  return (out ?? "null").replace(/"\\u0001(\d+)\\u0001"/g, (_, i: string) => raws[Number(i)]!);
}

/** Every integer limit a column or a parser has, and one past it (PostgreSQL docs §8.1; ECMA-262 Number). */
const NUMBERS = [0, -0, 1, -1, 0.5, -0.5, 2 ** 15, 2 ** 31 - 1, 2 ** 31, -(2 ** 31), -(2 ** 31) - 1, 2 ** 32, 2 ** 53 - 1, 2 ** 53, 2 ** 53 + 2, -(2 ** 53), 2 ** 63, 1e21, Number.MAX_VALUE, Number.MIN_VALUE, Number.EPSILON];
const RAW_NUMBERS = ["1e309", "-1e309", "-0", "1e-400", "123456789012345678901234567890", "0.1e1", "9007199254740993"];
export const BAD_CHARS = ["\u0000", "a\u0000b", "\ud800", "\udfff", "quilt \ud83d", "\ude00 quilt", "\ud83d\ud83d"];
const STRINGS = [
  "", " ", "\t\n", ...BAD_CHARS,
  "NaN", "Infinity", "-Infinity", "-1", "1e309", "2147483648", "9007199254740993", "0x10", "1,000", "-0",
  "null", "undefined", "true", "[]", "{}", "__proto__", "constructor", "<script>alert(1)</script>", "' or 1=1 --",
  "%00", "%ED%A0%80", "%", "../../etc/passwd", "00000000-0000-0000-0000-000000000000", "2027-02-30T25:61", "rules", "🧵".repeat(50),
];

function nest(depth: number, leaf: unknown, asArray: boolean): unknown {
  let v = leaf;
  for (let i = 0; i < depth; i++) v = asArray ? [v] : { a: v };
  return v;
}

/** A value of any type that an endpoint should refuse (or, now and then, accept) but never fail on. */
export const hostile: fc.Arbitrary<unknown> = fc.oneof(
  { weight: 3, arbitrary: fc.constantFrom(...STRINGS) },
  { weight: 3, arbitrary: fc.constantFrom(...NUMBERS) },
  { weight: 2, arbitrary: fc.constantFrom(...RAW_NUMBERS.map((t) => new Raw(t))) },
  { weight: 1, arbitrary: fc.integer({ min: 1, max: 300_000 }).map((n) => "x".repeat(n)) },
  { weight: 1, arbitrary: fc.string({ unit: "binary", maxLength: 30 }) },
  { weight: 1, arbitrary: fc.tuple(fc.constantFrom(...BAD_CHARS), fc.string({ maxLength: 10 })).map(([b, s]) => `${s}${b}${s}`) },
  { weight: 1, arbitrary: fc.integer() },
  { weight: 1, arbitrary: fc.double() },
  { weight: 1, arbitrary: fc.bigInt({ min: -(2n ** 80n), max: 2n ** 80n }) },
  { weight: 2, arbitrary: fc.constantFrom<unknown>(null, true, false, [], {}, [{}], [[]], [null], { "": "" }, { ["k\u0000"]: 1 }, { ["\ud800"]: "x" }) },
  { weight: 1, arbitrary: fc.tuple(fc.integer({ min: 20, max: 3000 }), fc.boolean()).map(([d, a]) => nest(d, "leaf", a)) },
  { weight: 1, arbitrary: fc.array(fc.constantFrom<unknown>("a", 1, null, "\u0000"), { minLength: 100, maxLength: 2000 }) },
  { weight: 1, arbitrary: fc.anything({ maxDepth: 3 }) },
);

/** Every path into a value (objects and arrays), the value itself first. */
function pathsOf(v: unknown, prefix: (string | number)[] = [], out: (string | number)[][] = []): (string | number)[][] {
  out.push(prefix);
  if (Array.isArray(v)) v.forEach((x, i) => pathsOf(x, [...prefix, i], out));
  else if (v && typeof v === "object") for (const [k, x] of Object.entries(v)) pathsOf(x, [...prefix, k], out);
  return out;
}

type Spoil = "replace" | "delete" | "wrap" | "add";

/** The valid value with the thing at one path replaced by a hostile value, removed, wrapped in an array, or given a stray key. */
export function corrupt(valid: unknown, pick: number, how: Spoil, bad: unknown): unknown {
  const paths = pathsOf(valid);
  const at = paths[pick % paths.length]!;
  if (at.length === 0) return how === "wrap" ? [valid] : how === "add" && valid && typeof valid === "object" ? { ...valid, ["x\u0000"]: bad } : bad;
  const copy = structuredClone(valid) as Record<string | number, unknown>;
  let parent: Record<string | number, unknown> = copy;
  for (const k of at.slice(0, -1)) parent = parent[k] as Record<string | number, unknown>;
  const last = at[at.length - 1]!;
  if (how === "delete") {
    if (Array.isArray(parent)) parent.splice(Number(last), 1);
    else delete parent[last];
  } else if (how === "wrap") parent[last] = [parent[last]];
  else if (how === "add" && parent[last] && typeof parent[last] === "object") (parent[last] as Record<string, unknown>)["__proto__x"] = bad;
  else parent[last] = bad;
  return copy;
}

/** The valid value with one string leaf carrying a character PostgreSQL can't store: valid in every other way. */
export function taint(valid: unknown, pick: number, bad: string): unknown {
  const leaves = pathsOf(valid).filter((p) => typeof getAt(valid, p) === "string");
  if (!leaves.length) return valid;
  const at = leaves[pick % leaves.length]!;
  const s = getAt(valid, at) as string;
  const cut = pick % (s.length + 1);
  return setAt(valid, at, `${s.slice(0, cut)}${bad}${s.slice(cut)}`);
}

/** The valid value with one number leaf (or one leaf of any kind) at or past an integer limit. */
export function atLimit(valid: unknown, pick: number, limit: unknown): unknown {
  const paths = pathsOf(valid).filter((p) => p.length > 0);
  const numeric = paths.filter((p) => typeof getAt(valid, p) === "number");
  const pool = numeric.length ? numeric : paths;
  if (!pool.length) return valid;
  return setAt(valid, pool[pick % pool.length]!, limit);
}

function getAt(v: unknown, at: (string | number)[]): unknown {
  return at.reduce<unknown>((x, k) => (x as Record<string | number, unknown>)?.[k], v);
}

function setAt(v: unknown, at: (string | number)[], value: unknown): unknown {
  if (!at.length) return value;
  const copy = structuredClone(v) as Record<string | number, unknown>;
  let parent = copy;
  for (const k of at.slice(0, -1)) parent = parent[k] as Record<string | number, unknown>;
  parent[at[at.length - 1]!] = value;
  return copy;
}

const LIMITS: unknown[] = [...NUMBERS, ...RAW_NUMBERS.map((t) => new Raw(t)), "2147483648", "-1", "NaN", "1e309"];

/**
 * Mostly the valid input with one field spoiled (so the fuzz reaches past the first parse): a bad
 * character inside a string that is otherwise right, a number at an integer limit, a field of the
 * wrong type, removed, or wrapped in an array; sometimes anything at all.
 */
export const inputFrom = (valid: unknown): fc.Arbitrary<unknown> =>
  fc.oneof(
    { weight: 3, arbitrary: fc.tuple(fc.nat(), fc.constantFrom(...BAD_CHARS)).map(([p, bad]) => taint(valid, p, bad)) },
    { weight: 2, arbitrary: fc.tuple(fc.nat(), fc.constantFrom(...LIMITS)).map(([p, n]) => atLimit(valid, p, n)) },
    { weight: 4, arbitrary: fc.tuple(fc.nat(), fc.constantFrom<Spoil>("replace", "replace", "replace", "delete", "wrap", "add"), hostile).map(([p, how, bad]) => corrupt(valid, p, how, bad)) },
    { weight: 1, arbitrary: fc.tuple(fc.nat(), hostile, fc.nat(), hostile).map(([p1, b1, p2, b2]) => corrupt(corrupt(valid, p1, "replace", b1), p2, "replace", b2)) },
    { weight: 1, arbitrary: hostile },
  );

// ── The world ────────────────────────────────────────────────────────────────────────────────────

export type RouteFn = (req: Request, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>;
export type ActionFn = (...args: unknown[]) => Promise<unknown>;

// The same discovery, rows and cast of users as the access table.
export { discoverActions, loadRows, makeWorld } from "../authz/discover";

/** "METHOD /api/path" → its handler, for every route.ts under app/api. */
export async function discoverRoutes(): Promise<Map<string, RouteFn>> {
  const found = new Map<string, RouteFn>();
  for (const [key, mod] of await discoverModules()) found.set(key, mod[key.split(" ")[0]!] as RouteFn);
  return found;
}

/** The first role the row lets through (2xx or a redirect); the fuzz runs as that role, and now and then as an outsider. */
export function allowedRole(c: Case): Role {
  return ROLES.find((r) => r !== "anonymous" && c.expect[r] < 400) ?? "chair";
}
export const OUTSIDERS: Role[] = ["anonymous", "entrant", "otherChair"];

export function cookieOf(w: World, role: Role): string | null {
  return role === "anonymous" ? null : w.users[role].cookie;
}
