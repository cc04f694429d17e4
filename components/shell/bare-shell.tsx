// A light frame for Next's root fallback pages (not found, 401, 403, error). Those files are sent
// with every route, so this does no data work: just the bar with the mark, and a main region.
// Inside a route group the group's own shell is already on the page; globals.css then hides
// this frame's bar and footer so the page never shows two headers.
import type { ReactNode } from "react";
import Link from "next/link";
import { RibbonMark } from "@/components/brand/ribbon-mark";
import { SiteFooter } from "./site-footer";

export function BareShell({ children }: { children: ReactNode }) {
  return (
    <>
      <header data-bare-header className="on-dark bg-plum-900 text-paper-100">
        <div className="container-page flex min-h-16 items-center py-2">
          <Link href="/" className="inline-flex min-h-tap items-center gap-2 rounded-control pr-2 text-paper-50 no-underline">
            <RibbonMark className="size-9" />
            <span className="font-display text-2xl font-semibold tracking-tight">Ribbonry</span>
          </Link>
        </div>
      </header>
      <main id="main" data-bare-main className="container-page flex-1 py-10 sm:py-14">
        {children}
      </main>
      <div data-bare-footer>
        <SiteFooter />
      </div>
    </>
  );
}
