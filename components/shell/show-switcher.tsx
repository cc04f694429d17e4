"use client";
// The "Shows" menu in the header: the viewer's shows (grouped, with the areas they may enter)
// and the public shows. A disclosure button with a panel; Escape or a click outside closes it.
import { useEffect, useId, useRef, useState } from "react";
import Link from "next/link";
import { usePathname } from "next/navigation";
import { ChevronDown } from "lucide-react";
import { cx } from "@/components/ui/cx";
import type { ShellNav } from "./nav-types";
import { ShowLists } from "./show-lists";

export function ShowSwitcher({ nav }: { nav: ShellNav }) {
  const [open, setOpen] = useState(false);
  const pathname = usePathname();
  const panelId = useId();
  const wrapRef = useRef<HTMLDivElement>(null);
  const buttonRef = useRef<HTMLButtonElement>(null);

  // Close after navigating.
  const [lastPath, setLastPath] = useState(pathname);
  if (pathname !== lastPath) {
    setLastPath(pathname);
    setOpen(false);
  }

  useEffect(() => {
    if (!open) return;
    const onKey = (e: KeyboardEvent) => {
      if (e.key === "Escape") {
        setOpen(false);
        buttonRef.current?.focus();
      }
    };
    const onPointer = (e: PointerEvent) => {
      if (wrapRef.current && !wrapRef.current.contains(e.target as Node)) setOpen(false);
    };
    document.addEventListener("keydown", onKey);
    document.addEventListener("pointerdown", onPointer);
    return () => {
      document.removeEventListener("keydown", onKey);
      document.removeEventListener("pointerdown", onPointer);
    };
  }, [open]);

  const inShow = (slug: string) => pathname === `/shows/${slug}` || pathname.startsWith(`/shows/${slug}/`);
  const current = (nav.myShows.find((s) => inShow(s.slug)) ?? nav.publicShows.find((s) => inShow(s.slug)))?.name;

  return (
    <div ref={wrapRef} className="relative">
      <button
        ref={buttonRef}
        type="button"
        aria-expanded={open}
        aria-controls={panelId}
        onClick={() => setOpen((o) => !o)}
        className="inline-flex min-h-tap items-center gap-2 rounded-control border border-plum-600 px-3 font-semibold text-paper-100 hover:bg-plum-800"
      >
        <span className="max-w-[8rem] truncate lg:max-w-[14rem]">{current ?? "Shows"}</span>
        <span className="sr-only"> — choose a show</span>
        <ChevronDown aria-hidden className={cx("size-5 transition-transform", open && "rotate-180")} />
      </button>
      <div
        id={panelId}
        hidden={!open}
        className="absolute top-full left-0 z-40 mt-2 max-h-[70dvh] w-[22rem] overflow-y-auto rounded-card border border-line bg-surface p-3 text-ink shadow-pop"
      >
        <ShowLists nav={nav} />
        <div className="mt-2 border-t border-line pt-2">
          <Link href="/#shows" className="flex min-h-tap items-center rounded-control px-3 font-medium hover:bg-plum-50">
            All public shows
          </Link>
        </div>
      </div>
    </div>
  );
}
