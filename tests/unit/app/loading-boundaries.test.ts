// Pages that answer 404 to someone else's id must have no loading.tsx above them: a loading
// boundary starts streaming, and once streaming has started the HTTP status stays 200 (Next.js
// docs, loading.js "Status codes"; DEVELOPERS.md "A page"). Checked on the files themselves.
import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";

const APP = path.resolve(__dirname, "../../../app");

/** Every folder from app/ down to the page's own folder that holds a loading.tsx. */
function loadingAbove(pageDir: string): string[] {
  const parts = pageDir.split("/");
  const found: string[] = [];
  for (let i = 0; i <= parts.length; i++) {
    const dir = path.join(APP, ...parts.slice(0, i));
    if (fs.existsSync(path.join(dir, "loading.tsx"))) found.push(path.relative(APP, dir) || ".");
  }
  return found;
}

describe("loading boundaries in the entrant area", () => {
  // The entry form and its steps (?step=…) answer 404 for another entrant's entry; entering a
  // show answers 404 for a show that does not exist.
  for (const page of ["(entrant)/entries/[id]", "(entrant)/shows/[slug]/enter"]) {
    it(`none above ${page}`, () => {
      expect(fs.existsSync(path.join(APP, page, "page.tsx"))).toBe(true);
      expect(loadingAbove(page)).toEqual([]);
    });
  }
});
