"use client";
// Signs out through better-auth, then leaves for a public page and refreshes server components.
import { useState, useTransition } from "react";
import { useRouter } from "next/navigation";
import { LogOut } from "lucide-react";
import { authClient } from "@/lib/auth-client";
import { buttonClasses } from "@/components/ui/button";
import { cx } from "@/components/ui/cx";

type Props = {
  redirectTo?: string;
  label?: string;
  /** "dark" for the plum header bar. */
  tone?: "light" | "dark";
  className?: string;
  /** In the header bar at tablet width: icon only until the lg breakpoint (the name stays). */
  compact?: boolean;
};

export function SignOutButton({ redirectTo = "/", label = "Sign out", tone = "light", className, compact }: Props) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [failed, setFailed] = useState(false);

  const signOut = () =>
    startTransition(async () => {
      setFailed(false);
      const { error } = await authClient.signOut();
      if (error) {
        setFailed(true);
        return;
      }
      router.push(redirectTo);
      router.refresh();
    });

  const classes =
    tone === "dark"
      ? "inline-flex min-h-tap min-w-tap items-center justify-center gap-2 rounded-control px-3 font-semibold text-paper-100 hover:bg-plum-800 disabled:opacity-60"
      : buttonClasses({ variant: "secondary" });

  return (
    <span className="inline-flex flex-col">
      <button type="button" onClick={signOut} disabled={pending} aria-busy={pending || undefined} className={cx(classes, className)}>
        <LogOut aria-hidden className="size-5" />
        <span className={compact ? "sr-only lg:not-sr-only" : undefined}>{pending ? "Signing out…" : label}</span>
      </button>
      {failed ? (
        <span role="alert" className={cx("mt-1 text-sm", tone === "dark" ? "text-gold-200" : "text-danger-700")}>
          Sign-out did not go through. Try again.
        </span>
      ) : null}
    </span>
  );
}
