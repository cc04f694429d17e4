// The plain data the shell's client parts receive from the server (no functions, no icons).
export type AreaKey = "manage" | "judging" | "desk";

export const AREA_LABELS: Record<AreaKey, string> = {
  manage: "Manage show",
  judging: "Judging",
  desk: "Intake desk",
};

export type NavLink = { href: string; label: string; icon: NavIcon };

export type NavIcon = "entries" | "account" | "admin" | "manage" | "judging" | "desk" | "show" | "signIn" | "signUp";

export type ShowNav = {
  slug: string;
  name: string;
  /** Role names at this show, in words ("Judge", "Show chair"). */
  roleLabels: string[];
  /** The areas the viewer may enter, plus the public page when the show is public. */
  links: NavLink[];
};

export type ShellNav = {
  user: { name: string; email: string } | null;
  personal: NavLink[];
  myShows: ShowNav[];
  publicShows: { slug: string; name: string }[];
};
