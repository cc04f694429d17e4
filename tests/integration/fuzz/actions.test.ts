// Every server action, called with thousands of hostile inputs built from its access-table row
// (valid shape, one field spoiled; or anything at all), as a plain object and as FormData, by the
// role that may use it and now and then by an outsider: it answers { ok } or a 4xx, never status
// 500, and never throws (a redirect after success aside).
import fc from "fast-check";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { actAs } from "../../helpers/request-context";
import type { World } from "../authz/table";
import { allowedRole, cookieOf, discoverActions, fcParams, inputFrom, jsonText, loadRows, makeWorld, OUTSIDERS, Raw, RUNS, SEED, type ActionFn } from "./harness";

const { actions: ROWS } = await loadRows();
let world: World;
let actions: Map<string, ActionFn>;
const valid = new Map<string, Record<string, unknown>>();
let tried = 0;
const statuses = new Map<number, number>();

beforeAll(async () => {
  world = await makeWorld();
  actions = await discoverActions();
  for (const [key, c] of Object.entries(ROWS)) {
    if (!actions.has(key)) continue;
    valid.set(key, c.input ? await c.input(world, allowedRole(c)) : {});
  }
}, 180_000);

afterAll(() => {
  console.log(`[fuzz] actions: ${tried} calls, seed ${SEED} (FUZZ_SEED to replay, FUZZ_RUNS=${RUNS} per action and form); statuses ${JSON.stringify(Object.fromEntries(statuses))}`);
});

/** What a server action can receive: React's reply encoding carries numbers, bigints, dates and undefined as they are. */
function asActionValue(v: unknown): unknown {
  if (v instanceof Raw) return Number(v.text);
  if (Array.isArray(v)) return v.map(asActionValue);
  if (v && typeof v === "object" && !(v instanceof Date)) return Object.fromEntries(Object.entries(v).map(([k, x]) => [k, asActionValue(x)]));
  return v;
}

/** A <form action> post: every value a string (objects as JSON), arrays as repeated keys. */
function asFormData(v: unknown): FormData {
  const form = new FormData();
  if (!v || typeof v !== "object" || Array.isArray(v)) {
    form.append("value", typeof v === "string" ? v : jsonText(v));
    return form;
  }
  for (const [k, x] of Object.entries(v)) {
    const items = Array.isArray(x) ? x : [x];
    for (const item of items) form.append(k, typeof item === "string" ? item : item === undefined ? "" : jsonText(item));
  }
  return form;
}

async function statusOf(action: ActionFn, args: unknown[]): Promise<{ status: number; detail: string }> {
  tried++;
  try {
    const r = (await action(...args)) as { ok: boolean; status?: number; message?: string } | undefined;
    const status = r?.ok ? 200 : (r?.status ?? 500);
    statuses.set(status, (statuses.get(status) ?? 0) + 1);
    return { status, detail: r?.message ?? "" };
  } catch (err) {
    const digest = (err as { digest?: string }).digest ?? "";
    if (digest.startsWith("NEXT_REDIRECT")) return { status: 303, detail: "" };
    return { status: 500, detail: `threw ${String(err).slice(0, 300)}` };
  }
}

describe("server actions never answer 500", () => {
  const keys = Object.keys(ROWS);

  it.each(keys)("%s", async (key) => {
    const c = ROWS[key]!;
    const action = actions.get(key)!;
    const role = fc.oneof({ weight: 5, arbitrary: fc.constant(allowedRole(c)) }, { weight: 1, arbitrary: fc.constantFrom(...OUTSIDERS) });
    const form = fc.constantFrom("object", "formData", "single", "prevState");
    await fc.assert(
      fc.asyncProperty(role, form, inputFrom(valid.get(key)), async (who, how, input) => {
        actAs(cookieOf(world, who));
        const value = asActionValue(input);
        const args = how === "formData" ? [null, asFormData(input)] : how === "single" ? [value] : how === "prevState" ? [{ ok: false, status: 400 }, value] : [null, value];
        const { status, detail } = await statusOf(action, args);
        expect(status, `${detail} — as ${who}, ${how}: ${jsonText(input).slice(0, 600)}`).not.toBe(500);
      }),
      fcParams(),
    );
  });
});
