"use client";
// The chair's pages within "Manage show": overview, entries, categories, judging, results, jurying (juried shows), settings.
import Link from "next/link";
import { usePathname } from "next/navigation";

export function ManageTabs({ slug, juried }: { slug: string; juried: boolean }) {
  const pathname = usePathname();
  const base = `/shows/${slug}/manage`;
  const links = [
    { href: base, label: "Overview", exact: true },
    { href: `${base}/entries`, label: "Entries" },
    { href: `${base}/categories`, label: "Categories" },
    { href: `${base}/judging`, label: "Judging" },
    { href: `${base}/results`, label: "Results" },
    ...(juried ? [{ href: `${base}/jurying`, label: "Jurying" }] : []),
    { href: `${base}/settings`, label: "Settings" },
  ];
  return (
    <nav aria-label="Manage show" className="mb-6">
      <ul className="flex flex-wrap gap-2">
        {links.map((l) => {
          const active = l.exact ? pathname === l.href : pathname.startsWith(l.href);
          return (
            <li key={l.href}>
              <Link
                href={l.href}
                aria-current={active ? "page" : undefined}
                className="inline-flex min-h-tap items-center rounded-control border border-line-strong px-4 font-semibold text-plum-800 no-underline hover:bg-plum-50 aria-[current=page]:border-plum-600 aria-[current=page]:bg-plum-600 aria-[current=page]:text-paper-50"
              >
                {l.label}
              </Link>
            </li>
          );
        })}
      </ul>
    </nav>
  );
}
