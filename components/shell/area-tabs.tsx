"use client";
// Under the header, inside a show: links to that show's areas the viewer may enter.
import Link from "next/link";
import { usePathname } from "next/navigation";
import { isActive, NavIcon } from "./nav-icon";
import type { ShowNav } from "./nav-types";

export function AreaTabs({ shows }: { shows: ShowNav[] }) {
  const pathname = usePathname();
  const show = shows.find((s) => pathname === `/shows/${s.slug}` || pathname.startsWith(`/shows/${s.slug}/`));
  if (!show || show.links.length < 2) return null;
  return (
    <div className="border-b border-line bg-paper-200">
      <nav aria-label={`${show.name}: areas`} className="container-page">
        <ul className="-mb-px flex gap-1 overflow-x-auto">
          {show.links.map((link) => {
            const active = isActive(pathname, link.href, link.icon === "show");
            return (
              <li key={link.href} className="shrink-0">
                <Link
                  href={link.href}
                  aria-current={active ? "page" : undefined}
                  className="inline-flex min-h-tap items-center gap-2 border-b-4 border-transparent px-3 font-semibold text-ink-muted no-underline hover:text-ink aria-[current=page]:border-gold-500 aria-[current=page]:text-plum-800"
                >
                  <NavIcon name={link.icon} className="size-5 shrink-0" />
                  {link.label}
                </Link>
              </li>
            );
          })}
        </ul>
      </nav>
    </div>
  );
}
