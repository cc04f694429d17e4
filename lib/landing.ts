// Where a person lands after signing in: the place their role at a current show calls for —
// judging on judging day, the desk while quilts come in, the chair's pages while the show runs —
// and "My entries" for everyone else. Pure, so it is unit-tested without a database.
export type LandingStatus = "draft" | "entries_open" | "entries_closed" | "judging" | "results_published" | "archived";
export type LandingRole = "chair" | "judge" | "scribe" | "intake";
export type LandingSeat = { showSlug: string; showName: string; role: LandingRole; status: LandingStatus };

export const MY_ENTRIES = "/my";

// Each rule: the roles it fits, the show statuses in which that work is current (most pressing
// first, so this year's show beats last year's published one), the area. Earlier rules win:
// judging happens on one day and cannot wait; the chair's pages are current for the whole life
// of a show; the desk from the time quilts may be dropped off until they are judged.
const RULES: { roles: readonly LandingRole[]; statuses: readonly LandingStatus[]; area: "judging" | "desk" | "manage" }[] = [
  { roles: ["judge", "scribe"], statuses: ["judging"], area: "judging" },
  { roles: ["chair"], statuses: ["judging", "entries_closed", "entries_open", "draft", "results_published"], area: "manage" },
  { roles: ["intake"], statuses: ["judging", "entries_closed", "entries_open"], area: "desk" },
];

/** The path to land on after signing in, from the viewer's seats and each show's status. */
export function landingFor(seats: readonly LandingSeat[]): string {
  for (const rule of RULES) {
    const fits = seats
      .filter((s) => rule.roles.includes(s.role) && rule.statuses.includes(s.status))
      .sort(
        (a, b) =>
          rule.statuses.indexOf(a.status) - rule.statuses.indexOf(b.status) ||
          a.showName.localeCompare(b.showName) ||
          a.showSlug.localeCompare(b.showSlug),
      );
    if (fits[0]) return `/shows/${fits[0].showSlug}/${rule.area}`;
  }
  return MY_ENTRIES;
}
