import { describe, expect, it } from "vitest";
import { landingFor, type LandingSeat } from "@/lib/landing";

const seat = (role: LandingSeat["role"], status: LandingSeat["status"], slug = "show-a"): LandingSeat => ({
  showSlug: slug,
  showName: slug.toUpperCase(),
  role,
  status,
});

describe("landingFor", () => {
  it("sends someone with no show role to My entries", () => {
    expect(landingFor([])).toBe("/my");
  });

  it("sends a judge or scribe to judging on judging day, and to My entries before it", () => {
    expect(landingFor([seat("judge", "judging")])).toBe("/shows/show-a/judging");
    expect(landingFor([seat("scribe", "judging")])).toBe("/shows/show-a/judging");
    expect(landingFor([seat("judge", "entries_open")])).toBe("/my");
    expect(landingFor([seat("judge", "results_published")])).toBe("/my");
  });

  it("sends intake to the desk while quilts come in and are judged", () => {
    expect(landingFor([seat("intake", "entries_closed")])).toBe("/shows/show-a/desk");
    expect(landingFor([seat("intake", "judging")])).toBe("/shows/show-a/desk");
    expect(landingFor([seat("intake", "entries_open")])).toBe("/shows/show-a/desk");
    expect(landingFor([seat("intake", "draft")])).toBe("/my");
    expect(landingFor([seat("intake", "results_published")])).toBe("/my");
  });

  it("sends a chair to the show's pages while it runs, not once it is archived", () => {
    expect(landingFor([seat("chair", "draft")])).toBe("/shows/show-a/manage");
    expect(landingFor([seat("chair", "results_published")])).toBe("/shows/show-a/manage");
    expect(landingFor([seat("chair", "archived")])).toBe("/my");
  });

  it("puts judging day first, then the chair's pages, then the desk", () => {
    expect(landingFor([seat("chair", "entries_open", "b"), seat("judge", "judging", "c")])).toBe("/shows/c/judging");
    expect(landingFor([seat("intake", "judging", "a"), seat("chair", "judging", "b")])).toBe("/shows/b/manage");
  });

  it("prefers this year's running show to last year's published one", () => {
    expect(landingFor([seat("chair", "results_published", "a-2026"), seat("chair", "entries_open", "b-2027")])).toBe("/shows/b-2027/manage");
  });

  it("chooses among shows by name, so the answer does not depend on row order", () => {
    const seats = [seat("chair", "draft", "zeta"), seat("chair", "draft", "alpha")];
    expect(landingFor(seats)).toBe("/shows/alpha/manage");
    expect(landingFor([...seats].reverse())).toBe("/shows/alpha/manage");
  });
});
