"use client";
// The phone menu: a button opening a side drawer (a native modal <dialog>, so focus stays
// inside, Escape closes it and the page behind is inert).
import { useEffect, useRef } from "react";
import Link from "next/link";
import { usePathname } from "next/navigation";
import { Menu, X } from "lucide-react";
import { cx } from "@/components/ui/cx";
import { isActive, NavIcon } from "./nav-icon";
import type { ShellNav } from "./nav-types";
import { ShowLists } from "./show-lists";
import { SignOutButton } from "./sign-out-button";

export function MobileNav({ nav }: { nav: ShellNav }) {
  const dialogRef = useRef<HTMLDialogElement>(null);
  const pathname = usePathname();

  const open = () => dialogRef.current?.showModal();
  const close = () => dialogRef.current?.close();

  // Navigating from a link inside the drawer closes it.
  useEffect(() => {
    dialogRef.current?.close();
  }, [pathname]);

  return (
    <>
      <button
        type="button"
        onClick={open}
        aria-haspopup="dialog"
        className="inline-flex min-h-tap min-w-tap items-center justify-center gap-2 rounded-control px-3 font-semibold text-paper-100 hover:bg-plum-800"
      >
        <Menu aria-hidden className="size-6" />
        <span>Menu</span>
      </button>
      <dialog
        ref={dialogRef}
        aria-label="Menu"
        onClick={(e) => {
          // A click on the backdrop lands on the <dialog> itself.
          if (e.target === e.currentTarget) close();
        }}
        className="fixed inset-y-0 right-0 left-auto m-0 h-dvh max-h-none w-[min(24rem,92vw)] max-w-none flex-col overflow-hidden bg-surface p-0 text-ink shadow-pop open:flex"
      >
        <div className="flex items-center justify-between border-b border-line px-4 py-2">
          <p className="font-display text-xl font-semibold">Menu</p>
          <button
            type="button"
            onClick={close}
            className="inline-flex min-h-tap min-w-tap items-center justify-center rounded-control hover:bg-plum-50"
          >
            <X aria-hidden className="size-6" />
            <span className="sr-only">Close menu</span>
          </button>
        </div>
        <nav aria-label="Main" className="flex-1 space-y-5 overflow-y-auto px-2 py-4">
          {nav.user ? (
            <div className="px-3">
              <p className="font-semibold">{nav.user.name}</p>
              <p className="text-sm break-all text-ink-muted">{nav.user.email}</p>
            </div>
          ) : null}
          <ul>
            {nav.personal.map((link) => {
              const active = isActive(pathname, link.href);
              return (
                <li key={link.href}>
                  <Link
                    href={link.href}
                    aria-current={active ? "page" : undefined}
                    className={cx(
                      "flex min-h-tap items-center gap-3 rounded-control px-3 font-semibold text-ink no-underline hover:bg-plum-50",
                      active && "bg-plum-100 text-plum-800",
                    )}
                  >
                    <NavIcon name={link.icon} className="size-5 shrink-0 text-plum-500" />
                    {link.label}
                  </Link>
                </li>
              );
            })}
          </ul>
          <ShowLists nav={nav} />
        </nav>
        {nav.user ? (
          <div className="border-t border-line p-4">
            <SignOutButton />
          </div>
        ) : null}
      </dialog>
    </>
  );
}
