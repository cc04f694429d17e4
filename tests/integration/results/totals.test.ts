// Panel totals computed in SQL against the same figures from the pure module and from
// simple-statistics (a reference library), on generated sheets; the published two-judge averages;
// and the proposed ranking with the sheets still missing.
import fc from "fast-check";
import { beforeAll, describe, expect, it } from "vitest";
import { mean, median, sampleStandardDeviation, standardDeviation } from "simple-statistics";
import { db } from "@/db/client";
import { judgeSheets, judgingPanels, panelCategories, panelMembers } from "@/db/schema";
import { resultsReview, totalsInJs, totalsInSql } from "@/db/queries/results";
import { emptySheet } from "@/scoring/sheet-sync";
import { grantRole, makeCategory, makeEntry, makeShow, makeUser } from "../../helpers/factories";
import { viewerOf } from "../entries/helpers";

async function sheet(showId: string, entryId: string, judgeUserId: string, total: number, status: "submitted" | "open" = "submitted") {
  await db.insert(judgeSheets).values({ showId, entryId, judgeUserId, status, state: { ...emptySheet(), status }, total: { total, complete: true, percent: total } });
}

describe("the published two-judge averages", () => {
  it("94/96 → 95, 88/93 → 90.5, 79/85 → 82 (a show's published results, quiltingtales.blogspot.com 2016)", async () => {
    const show = await makeShow({ status: "judging" });
    const [a, b, entrant] = await Promise.all([makeUser(), makeUser(), makeUser()]);
    const cat = await makeCategory(show.id);
    const pairs: [number, number, number][] = [[94, 96, 95], [88, 93, 90.5], [79, 85, 82]];
    const ids: string[] = [];
    for (const [x, y] of pairs) {
      const e = await makeEntry(show.id, entrant.id, { categoryId: cat.id, categoryState: "decided", paidAt: new Date() });
      ids.push(e.id);
      await sheet(show.id, e.id, a.id, x);
      await sheet(show.id, e.id, b.id, y);
    }
    const totals = await totalsInSql(show.id);
    expect(ids.map((id) => totals.find((t) => t.entryId === id)!.mean)).toEqual(pairs.map((p) => p[2]));
  });
});

describe("SQL, JavaScript and simple-statistics agree", () => {
  let show: Awaited<ReturnType<typeof makeShow>>;
  const data = new Map<string, { judge: string; total: number }[]>();

  beforeAll(async () => {
    show = await makeShow({ status: "judging" });
    const judges = await Promise.all([makeUser(), makeUser(), makeUser()]);
    const entrant = await makeUser();
    // Totals to hundredths, generated (fast-check's sample), two categories of 12 entries.
    const samples = fc.sample(fc.array(fc.integer({ min: 4_000, max: 10_000 }), { minLength: 3, maxLength: 3 }), { numRuns: 24, seed: 1224 });
    const cats = [await makeCategory(show.id, { code: "A" }), await makeCategory(show.id, { code: "B" })];
    for (let i = 0; i < samples.length; i++) {
      const e = await makeEntry(show.id, entrant.id, { categoryId: cats[i % 2]!.id, categoryState: "decided", paidAt: new Date() });
      const list = samples[i]!.map((h, j) => ({ judge: judges[j]!.id, total: h / 100 }));
      // One entry is missing its third sheet: statistics over the two there are.
      const used = i === 5 ? list.slice(0, 2) : list;
      data.set(e.id, used);
      for (const s of used) await sheet(show.id, e.id, s.judge, s.total);
      if (i === 5) await sheet(show.id, e.id, list[2]!.judge, list[2]!.total, "open");
    }
  });

  it("means, medians, spreads and sample standard deviations match simple-statistics", async () => {
    const totals = await totalsInSql(show.id);
    expect(totals).toHaveLength(data.size);
    for (const t of totals) {
      const xs = data.get(t.entryId)!.map((s) => s.total);
      expect(t.count).toBe(xs.length);
      expect(t.mean).toBeCloseTo(mean(xs), 9);
      expect(t.median).toBeCloseTo(median(xs), 9);
      expect(t.spread).toBeCloseTo(Math.max(...xs) - Math.min(...xs), 9);
      expect(t.sampleSd).toBeCloseTo(sampleStandardDeviation(xs), 9);
    }
  });

  it("z-scores: each judge standardised within the category (population SD, simple-statistics standardDeviation), then averaged", async () => {
    const totals = await totalsInSql(show.id);
    const byCat = new Map<string, string[]>();
    for (const t of totals) byCat.set(t.categoryId, [...(byCat.get(t.categoryId) ?? []), t.entryId]);
    for (const [, entryIds] of byCat) {
      const perJudge = new Map<string, number[]>();
      for (const id of entryIds) for (const s of data.get(id)!) perJudge.set(s.judge, [...(perJudge.get(s.judge) ?? []), s.total]);
      for (const id of entryIds) {
        const zs = data.get(id)!.map((s) => {
          const xs = perJudge.get(s.judge)!;
          const sd = standardDeviation(xs);
          return sd === 0 ? 0 : (s.total - mean(xs)) / sd;
        });
        expect(totals.find((t) => t.entryId === id)!.z).toBeCloseTo(mean(zs), 9);
      }
    }
  });

  it("the JavaScript path gives the same figures as SQL", async () => {
    const [inSql, inJs] = await Promise.all([totalsInSql(show.id), totalsInJs(show.id)]);
    const key = (t: { entryId: string }) => t.entryId;
    const js = new Map(inJs.map((t) => [key(t), t]));
    for (const t of inSql) {
      const j = js.get(t.entryId)!;
      for (const f of ["mean", "median", "spread", "sampleSd", "z"] as const) expect(t[f]).toBeCloseTo(j[f]!, 9);
    }
  });
});

describe("proposed results", () => {
  it("ranks by the panel mean, shares ties 1224, and lists the sheets still missing", async () => {
    const show = await makeShow({ status: "judging" });
    const [chair, a, b, entrant] = await Promise.all([makeUser(), makeUser({ name: "Judge Ash" }), makeUser({ name: "Judge Birch" }), makeUser()]);
    await grantRole(chair.id, show.id, "chair");
    const cat = await makeCategory(show.id, { code: "10", name: "Pieced" });
    const [panel] = await db.insert(judgingPanels).values({ showId: show.id, name: "P" }).returning();
    await db.insert(panelMembers).values([{ panelId: panel!.id, userId: a.id, role: "judge" }, { panelId: panel!.id, userId: b.id, role: "judge" }]);
    await db.insert(panelCategories).values({ panelId: panel!.id, categoryId: cat.id });
    const scores: [number, number | null][] = [[90, 92], [91, 91], [80, 84], [70, null]];
    for (const [x, y] of scores) {
      const e = await makeEntry(show.id, entrant.id, { categoryId: cat.id, categoryState: "decided", paidAt: new Date() });
      await sheet(show.id, e.id, a.id, x);
      if (y !== null) await sheet(show.id, e.id, b.id, y);
    }
    const review = await resultsReview(await viewerOf(chair), show.slug);
    const [result] = review.results.categories;
    // Each judge placed a different one of the 91s first, so the first-place votes leave them tied.
    expect(result!.entries.map((e) => [e.score, e.ranked.displayRank, e.placeLabel])).toEqual([[91, "=1", "1st"], [91, "=1", "1st"], [82, "3", "2nd"], [70, "4", null]]);
    expect(result!.missing).toEqual([{ entryNumber: expect.any(Number), judge: "Judge Birch" }]);
    expect(review.results.blockers.join(" ")).toMatch(/1 sheet not submitted/);
  });
});
