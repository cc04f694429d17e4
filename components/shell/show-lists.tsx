"use client";
// The body of the show menu and the drawer: "Your shows" with their areas, then public shows.
import { useId } from "react";
import Link from "next/link";
import { usePathname } from "next/navigation";
import { cx } from "@/components/ui/cx";
import { isActive, NavIcon } from "./nav-icon";
import type { ShellNav } from "./nav-types";

const itemClass =
  "flex min-h-tap items-center gap-3 rounded-control px-3 font-medium text-ink no-underline hover:bg-plum-50 aria-[current=page]:bg-plum-100 aria-[current=page]:text-plum-800";

export function ShowLists({ nav }: { nav: ShellNav }) {
  const pathname = usePathname();
  const id = useId();
  return (
    <div className="space-y-4">
      {nav.myShows.length > 0 ? (
        <section aria-labelledby={`${id}-mine`}>
          <h2 id={`${id}-mine`} className="px-3 pb-1 font-sans text-xs font-semibold tracking-wide text-ink-muted uppercase">
            Your shows
          </h2>
          <ul className="space-y-3">
            {nav.myShows.map((show) => (
              <li key={show.slug}>
                <p className="px-3 font-display text-lg font-semibold">{show.name}</p>
                <p className="px-3 text-sm text-ink-muted">{show.roleLabels.join(", ")}</p>
                <ul className="mt-1">
                  {show.links.map((link) => {
                    const active = isActive(pathname, link.href, link.icon === "show");
                    return (
                      <li key={link.href}>
                        <Link href={link.href} aria-current={active ? "page" : undefined} className={cx(itemClass, "pl-5")}>
                          <NavIcon name={link.icon} className="size-5 shrink-0 text-plum-500" />
                          {link.label}
                        </Link>
                      </li>
                    );
                  })}
                </ul>
              </li>
            ))}
          </ul>
        </section>
      ) : null}
      <section aria-labelledby={`${id}-public`}>
        <h2 id={`${id}-public`} className="px-3 pb-1 font-sans text-xs font-semibold tracking-wide text-ink-muted uppercase">
          {nav.myShows.length > 0 ? "Other public shows" : "Public shows"}
        </h2>
        {nav.publicShows.length > 0 ? (
          <ul>
            {nav.publicShows.map((s) => {
              const href = `/shows/${s.slug}`;
              return (
                <li key={s.slug}>
                  <Link href={href} aria-current={pathname === href ? "page" : undefined} className={itemClass}>
                    <NavIcon name="show" className="size-5 shrink-0 text-plum-500" />
                    {s.name}
                  </Link>
                </li>
              );
            })}
          </ul>
        ) : (
          <p className="px-3 text-sm text-ink-muted">No public shows right now.</p>
        )}
      </section>
    </div>
  );
}
