// The app shell every route group's layout renders: header, area links for the current show,
// the main region and the footer. It loads the viewer and the public shows on the server.
import type { ReactNode } from "react";
import { listPublicShows } from "@/db/queries/shows";
import { AreaTabs } from "./area-tabs";
import { buildNav } from "./nav";
import { SiteFooter } from "./site-footer";
import { SiteHeader } from "./site-header";
import { currentViewer } from "./viewer";

export async function AppShell({ children, width = "wide" }: { children: ReactNode; width?: "wide" | "narrow" }) {
  const [viewer, shows] = await Promise.all([currentViewer(), listPublicShows()]);
  const nav = buildNav(
    viewer,
    shows.map((s) => ({ slug: s.slug, name: s.name, status: s.status })),
  );
  return (
    <>
      <SiteHeader nav={nav} />
      <AreaTabs shows={nav.myShows} />
      <main id="main" className="container-page flex-1 py-6 sm:py-10">
        {width === "narrow" ? <div className="mx-auto max-w-xl">{children}</div> : children}
      </main>
      <SiteFooter />
    </>
  );
}
