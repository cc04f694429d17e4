"use client";
// The step tabs scroll sideways on a phone: this keeps the current step in view (centred when it
// can be) rather than leaving later steps off to the right.
import { useEffect, useRef, type ReactNode } from "react";

export function ScrollToCurrent({ label, className, children }: { label: string; className?: string; children: ReactNode }) {
  const ref = useRef<HTMLElement>(null);
  useEffect(() => {
    const nav = ref.current;
    const current = nav?.querySelector<HTMLElement>('[aria-current="step"]');
    if (!nav || !current || nav.scrollWidth <= nav.clientWidth) return;
    // Only the tab strip scrolls; the page itself stays where it is.
    nav.scrollLeft = current.offsetLeft - (nav.clientWidth - current.offsetWidth) / 2;
  }, []);
  return (
    <nav ref={ref} aria-label={label} className={className}>
      {children}
    </nav>
  );
}
