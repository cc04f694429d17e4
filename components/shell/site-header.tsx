"use client";
// The plum header bar: mark and name, the show menu, personal links and the user. From the md
// breakpoint (tablets) everything sits in the bar; on phones it moves into the drawer.
import Link from "next/link";
import { usePathname } from "next/navigation";
import { UserRound } from "lucide-react";
import { RibbonMark } from "@/components/brand/ribbon-mark";
import { cx } from "@/components/ui/cx";
import { MobileNav } from "./mobile-nav";
import { isActive, NavIcon } from "./nav-icon";
import type { ShellNav } from "./nav-types";
import { ShowSwitcher } from "./show-switcher";
import { SignOutButton } from "./sign-out-button";

const barLink =
  "inline-flex min-h-tap items-center gap-2 rounded-control px-3 font-semibold text-paper-100 no-underline hover:bg-plum-800 " +
  "aria-[current=page]:bg-plum-800 aria-[current=page]:shadow-[inset_0_-3px_0_var(--color-gold-400)]";

export function SiteHeader({ nav }: { nav: ShellNav }) {
  const pathname = usePathname();
  // Signed out, the bar offers "Sign in" only; "Create an account" waits in the drawer and on pages.
  const links = nav.user ? nav.personal.filter((l) => l.icon !== "account") : nav.personal.filter((l) => l.icon === "signIn");
  const account = nav.personal.find((l) => l.icon === "account");
  const myEntries = nav.user ? nav.personal.find((l) => l.icon === "entries") : undefined;
  return (
    <header data-site-header className="on-dark sticky top-0 z-30 bg-plum-900 text-paper-100 shadow-[0_1px_0_var(--color-plum-700)]">
      <div className="container-page flex min-h-16 items-center gap-2 py-2">
        <Link href="/" className="mr-2 inline-flex min-h-tap items-center gap-2 rounded-control pr-2 text-paper-50 no-underline">
          <RibbonMark className="size-9" />
          <span className="font-display text-2xl font-semibold tracking-tight">Ribbonry</span>
        </Link>

        <div className="hidden md:block">
          <ShowSwitcher nav={nav} />
        </div>

        <nav aria-label="Main" className="hidden flex-1 md:block">
          <ul className="flex items-center gap-1">
            {links.map((link) => (
              <li key={link.href}>
                <Link href={link.href} aria-current={isActive(pathname, link.href) ? "page" : undefined} className={barLink}>
                  <NavIcon name={link.icon} className="size-5 shrink-0 text-gold-300" />
                  {link.label}
                </Link>
              </li>
            ))}
          </ul>
        </nav>

        {nav.user && account ? (
          <div className="hidden items-center gap-1 md:flex">
            <Link
              href={account.href}
              aria-current={isActive(pathname, account.href) ? "page" : undefined}
              className={cx(barLink, "max-w-[10rem] lg:max-w-[14rem]")}
            >
              <UserRound aria-hidden className="size-5 shrink-0 text-gold-300" />
              <span className="sr-only">Account: </span>
              <span className="truncate">{nav.user.name}</span>
            </Link>
            <SignOutButton tone="dark" compact />
          </div>
        ) : null}

        <div className="ml-auto flex items-center gap-1 md:hidden">
          {myEntries ? (
            // My entries stays one tap away on phones too, wherever signing in landed.
            <Link href={myEntries.href} aria-current={isActive(pathname, myEntries.href) ? "page" : undefined} className={cx(barLink, "min-w-tap justify-center px-2")}>
              <NavIcon name="entries" className="size-6 shrink-0 text-gold-300" />
              <span className="sr-only">{myEntries.label}</span>
            </Link>
          ) : null}
          <MobileNav nav={nav} />
        </div>
      </div>
    </header>
  );
}
