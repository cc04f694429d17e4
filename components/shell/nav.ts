// Builds the shell's navigation from the viewer: per show, the areas their roles open
// (AREA_ROLES in lib/session), plus personal links. Hiding a link protects nothing; pages check.
import "server-only";
import type { ShowRole } from "@/db/schema";
import { ROLE_LABELS } from "@/lib/schemas/show";
import { AREA_ROLES, type Viewer } from "@/lib/session";
import { AREA_LABELS, type AreaKey, type NavLink, type ShellNav, type ShowNav } from "./nav-types";

const AREA_ORDER: AreaKey[] = ["manage", "judging", "desk"];

export function areasFor(roles: readonly ShowRole[]): AreaKey[] {
  return AREA_ORDER.filter((area) => (AREA_ROLES[area] as readonly ShowRole[]).some((r) => roles.includes(r)));
}

export function areaHref(slug: string, area: AreaKey): string {
  return `/shows/${slug}/${area}`;
}

type PublicShowLite = { slug: string; name: string; status: string };

export function buildNav(viewer: Viewer | null, publicShows: PublicShowLite[]): ShellNav {
  const publicSlugs = new Set(publicShows.map((s) => s.slug));
  const listed = publicShows.filter((s) => s.status !== "archived").map(({ slug, name }) => ({ slug, name }));
  if (!viewer) {
    return {
      user: null,
      personal: [
        { href: "/sign-in", label: "Sign in", icon: "signIn" },
        { href: "/sign-up", label: "Create an account", icon: "signUp" },
      ],
      myShows: [],
      publicShows: listed,
    };
  }

  const bySlug = new Map<string, { name: string; roles: ShowRole[] }>();
  for (const r of viewer.roles) {
    const entry = bySlug.get(r.showSlug) ?? { name: r.showName, roles: [] };
    entry.roles.push(r.role);
    bySlug.set(r.showSlug, entry);
  }
  const myShows: ShowNav[] = [...bySlug.entries()]
    .map(([slug, { name, roles }]) => {
      const links: NavLink[] = areasFor(roles).map((area) => ({
        href: areaHref(slug, area),
        label: AREA_LABELS[area],
        icon: area,
      }));
      if (publicSlugs.has(slug)) links.unshift({ href: `/shows/${slug}`, label: "Show page", icon: "show" });
      return { slug, name, roleLabels: [...new Set(roles)].map((r) => ROLE_LABELS[r]), links };
    })
    .sort((a, b) => a.name.localeCompare(b.name));

  const personal: NavLink[] = [
    { href: "/my", label: "My entries", icon: "entries" },
    { href: "/account", label: "Account", icon: "account" },
  ];
  if (viewer.isAdmin) personal.push({ href: "/admin", label: "Admin", icon: "admin" });

  return {
    user: { name: viewer.name, email: viewer.email },
    personal,
    myShows,
    publicShows: listed.filter((s) => !bySlug.has(s.slug)),
  };
}
