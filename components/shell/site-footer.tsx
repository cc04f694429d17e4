// The footer: the product line and the words that matter on every page.
import Link from "next/link";
import { RibbonMark } from "@/components/brand/ribbon-mark";

export function SiteFooter() {
  return (
    <footer className="mt-12 border-t border-line bg-paper-200">
      <div className="container-page flex flex-col gap-3 py-6 text-sm text-ink-muted sm:flex-row sm:items-center sm:justify-between">
        <p className="flex items-center gap-2">
          <RibbonMark className="size-6" />
          <span>Ribbonry — quilt shows from first entry to last ribbon.</span>
        </p>
        <ul className="flex flex-wrap gap-x-2">
          <li>
            <Link href="/#shows" className="inline-flex min-h-tap items-center px-2">
              Public shows
            </Link>
          </li>
          <li>
            <Link href="/my" className="inline-flex min-h-tap items-center px-2">
              My entries
            </Link>
          </li>
        </ul>
      </div>
    </footer>
  );
}
