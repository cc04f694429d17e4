// Blind judging, checked from outside: signed in as a demo judge and a demo scribe, the judging
// session and queue routes of the demo show must not carry any entrant's name, e-mail, phone or
// guild, any maker's or quilter's name, or the guild of the show itself. (Blind judging: maker's
// name covered, judges see entry numbers only — common practice.)
import { expect, test, type APIRequestContext } from "@playwright/test";
import { demoScenario } from "../../db/seed/demo-data";
import { DEMO_PASSWORD, DEMO_SHOW } from "./helpers";

/** Every string that would tell a judge whose quilt it is. */
function secrets(): string[] {
  const { people, quilts, show } = demoScenario();
  const out = new Set<string>();
  const add = (s: string | null | undefined) => {
    const t = (s ?? "").trim();
    if (t) out.add(t);
  };
  for (const p of people.filter((x) => x.role === "entrant")) {
    add(p.name);
    add(p.email);
    add(p.profile?.displayName);
    add(p.profile?.phone);
    add(p.profile?.guild);
  }
  for (const q of quilts) {
    for (const m of q.madeBy) add(m);
    add(q.quiltedBy);
    // "Name, Studio": the quilter and the studio, each on its own.
    for (const part of q.quiltedBy.split(",")) add(part);
  }
  add(show.guildName);
  return [...out];
}

async function signInApi(request: APIRequestContext, baseURL: string, email: string) {
  const res = await request.post("/api/auth/sign-in/email", { data: { email, password: DEMO_PASSWORD }, headers: { origin: baseURL } });
  expect(res.status(), await res.text()).toBe(200);
}

for (const email of ["judge1@ribbonry.test", "scribe1@ribbonry.test"]) {
  test(`the judging session and queue carry no entrant, maker or guild names (${email})`, async ({ playwright, baseURL }) => {
    test.setTimeout(180_000); // a dev server compiles each route on its first call
    const request = await playwright.request.newContext({ baseURL });
    try {
      await signInApi(request, baseURL!, email);
      const list = secrets();
      expect(list.length).toBeGreaterThan(20);
      for (const path of ["session", "queue"]) {
        const res = await request.get(`/api/shows/${DEMO_SHOW}/judging/${path}`);
        const body = await res.text();
        expect(res.status(), `${path}: ${body.slice(0, 300)}`).toBe(200);
        // The scan means something only when the queue has quilts in it.
        if (path === "queue") expect((JSON.parse(body) as { entries: unknown[] }).entries.length).toBeGreaterThan(0);
        const lower = body.toLowerCase();
        // JSON escapes nothing in these strings but quotes and backslashes; compare both ways.
        const found = list.filter((s) => lower.includes(s.toLowerCase()) || lower.includes(JSON.stringify(s).slice(1, -1).toLowerCase()));
        expect(found, `${path} as ${email} must not name anyone`).toEqual([]);
      }
    } finally {
      await request.dispose();
    }
  });
}
